package org.sectio.geometry.svg;

/**
 * An elliptical arc in centre form, converted from the endpoint form of SVG path data by the
 * formulas of SVG 1.1 Appendix F.6.5 (steps 1–4), with out-of-range radii handled as in F.6.6
 * (absolute values; radii scaled up by √Λ when no ellipse of the given radii fits the end points).
 *
 * @param centreX centre x, user units
 * @param centreY centre y, user units
 * @param rx x radius after correction, &gt; 0
 * @param ry y radius after correction, &gt; 0
 * @param rotation x-axis rotation φ, radians
 * @param startAngle θ1, radians
 * @param sweepAngle Δθ, radians, 0 &lt; |Δθ| &lt; 2π: positive in the positive-angle direction
 */
record CentreArc(double centreX, double centreY, double rx, double ry, double rotation, double startAngle,
                 double sweepAngle) {

    /**
     * Converts an arc from (x1, y1) to (x2, y2). The caller handles the cases F.6.2 treats first: equal
     * end points (the arc is omitted) and a zero radius (a straight line).
     */
    static CentreArc fromEndpoints(double x1, double y1, double x2, double y2, double rxIn, double ryIn,
                                   double rotationDegrees, boolean largeArc, boolean sweep) {
        double phi = Math.toRadians(rotationDegrees % 360);
        double cos = Math.cos(phi);
        double sin = Math.sin(phi);
        // F.6.5.1: the mid-point frame
        double hx = (x1 - x2) / 2;
        double hy = (y1 - y2) / 2;
        double x1p = cos * hx + sin * hy;
        double y1p = -sin * hx + cos * hy;
        // F.6.6: absolute radii, enlarged if too small
        double rx = Math.abs(rxIn);
        double ry = Math.abs(ryIn);
        double lambda = x1p * x1p / (rx * rx) + y1p * y1p / (ry * ry);
        if (lambda > 1) {
            rx *= Math.sqrt(lambda);
            ry *= Math.sqrt(lambda);
        }
        // F.6.5.2: the centre in the mid-point frame
        double numerator = rx * rx * ry * ry - rx * rx * y1p * y1p - ry * ry * x1p * x1p;
        double denominator = rx * rx * y1p * y1p + ry * ry * x1p * x1p;
        double coefficient = Math.sqrt(Math.max(0, numerator / denominator)) * (largeArc != sweep ? 1 : -1);
        double cxp = coefficient * rx * y1p / ry;
        double cyp = -coefficient * ry * x1p / rx;
        // F.6.5.3: back to user space
        double cx = cos * cxp - sin * cyp + (x1 + x2) / 2;
        double cy = sin * cxp + cos * cyp + (y1 + y2) / 2;
        // F.6.5.4: start angle and sweep
        double ux = (x1p - cxp) / rx;
        double uy = (y1p - cyp) / ry;
        double vx = (-x1p - cxp) / rx;
        double vy = (-y1p - cyp) / ry;
        double theta1 = Math.atan2(uy, ux);
        double delta = Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
        if (!sweep && delta > 0) {
            delta -= 2 * Math.PI;
        } else if (sweep && delta < 0) {
            delta += 2 * Math.PI;
        }
        return new CentreArc(cx, cy, rx, ry, phi, theta1, delta);
    }

    /** @return whether the two radii are equal to rounding, so that the arc is circular */
    boolean circular() {
        return Math.abs(rx - ry) <= 1e-12 * Math.max(rx, ry);
    }
}
