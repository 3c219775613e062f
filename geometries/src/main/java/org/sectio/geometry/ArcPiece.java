package org.sectio.geometry;

/**
 * A circular wall piece within one quadrant of its circle, parameterized by the polar angle θ (radians)
 * about the centre: (cx + r cos θ, cy + r sin θ). Staying inside one quadrant keeps it monotone in
 * x and y. Counter-clockwise when {@code endAngle > startAngle}.
 */
record ArcPiece(double centreX, double centreY, double radius, double startAngle, double endAngle,
        double startX, double startY, double endX, double endY) implements WallPiece {

    ArcPiece {
        if (!(radius > 0) || startAngle == endAngle) {
            throw new IllegalArgumentException("arc with radius " + radius + " and angles " + startAngle
                    + " .. " + endAngle);
        }
    }

    /** An arc whose end points are computed from its angles. */
    static ArcPiece of(double centreX, double centreY, double radius, double startAngle, double endAngle) {
        return new ArcPiece(centreX, centreY, radius, startAngle, endAngle,
                centreX + radius * Math.cos(startAngle), centreY + radius * Math.sin(startAngle),
                centreX + radius * Math.cos(endAngle), centreY + radius * Math.sin(endAngle));
    }

    private double quadrantBase() {
        return Math.floor(Math.min(startAngle, endAngle) / (0.5 * Math.PI) + 1e-12) * 0.5 * Math.PI;
    }

    @Override
    public double startParameter() {
        return startAngle;
    }

    @Override
    public double endParameter() {
        return endAngle;
    }

    @Override
    public double x(double t) {
        if (t == startAngle) {
            return startX;
        }
        if (t == endAngle) {
            return endX;
        }
        return centreX + radius * Math.cos(t);
    }

    @Override
    public double y(double t) {
        if (t == startAngle) {
            return startY;
        }
        if (t == endAngle) {
            return endY;
        }
        return centreY + radius * Math.sin(t);
    }

    @Override
    public double parameterAtX(double x) {
        double c = Math.max(-1.0, Math.min(1.0, (x - centreX) / radius));
        double base = quadrantBase();
        double principal = Math.acos(c); // in [0, π]
        // the angle with this cosine inside [base, base + π/2]
        return bestInQuadrant(base, principal, -principal);
    }

    @Override
    public double parameterAtY(double y) {
        double s = Math.max(-1.0, Math.min(1.0, (y - centreY) / radius));
        double base = quadrantBase();
        double principal = Math.asin(s); // in [−π/2, π/2]
        return bestInQuadrant(base, principal, Math.PI - principal);
    }

    private static double bestInQuadrant(double base, double a, double b) {
        double centre = base + 0.25 * Math.PI;
        double best = Double.NaN;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (double candidate : new double[] {a, b}) {
            double shifted = candidate + 2 * Math.PI * Math.rint((centre - candidate) / (2 * Math.PI));
            double distance = Math.abs(shifted - centre);
            if (distance < bestDistance) {
                bestDistance = distance;
                best = shifted;
            }
        }
        return best;
    }

    @Override
    public double integralXdy(double t0, double t1) {
        // x dy = (cx + r cos θ) r cos θ dθ
        return centreX * radius * (Math.sin(t1) - Math.sin(t0))
                + radius * radius * (0.5 * (t1 - t0) + 0.25 * (Math.sin(2 * t1) - Math.sin(2 * t0)));
    }
}
