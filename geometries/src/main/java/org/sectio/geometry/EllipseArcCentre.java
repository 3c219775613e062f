package org.sectio.geometry;

/**
 * The centre form of an elliptical arc given by its end points, semi-axes, rotation and two flags, as
 * in the endpoint-to-centre conversion of the W3C SVG 1.1 specification (Second Edition, 2011),
 * Appendix F.6 "Elliptical arc implementation notes", F.6.5 steps 1–4, with the out-of-range radii
 * correction of F.6.6 (semi-axes too small to join the points are scaled up by √Λ).
 *
 * <p>Why a record of its own: the conversion has enough sign conventions (which of the four candidate
 * arcs, which of the two centres) to deserve one place and one test, and a later SVG importer calls it
 * through {@link Outline#ellipticalArcTo} and reads the sweep of circular arcs from it. Angles are eccentric angles of the ellipse
 * (x, y) = c + R(φ)(a cos t, b sin t), in a y-up frame: positive sweep is counter-clockwise.
 *
 * @param centreX centre x, m
 * @param centreY centre y, m
 * @param semiAxisA semi-axis along the rotated x direction after any scaling, m
 * @param semiAxisB semi-axis along the rotated y direction after any scaling, m
 * @param startParameter eccentric angle of the start point, radians
 * @param sweep signed change of the eccentric angle, radians, 0 &lt; |sweep| &lt; 2π
 */
public record EllipseArcCentre(double centreX, double centreY, double semiAxisA, double semiAxisB,
        double startParameter, double sweep) {

    /**
     * @param x1 start x, m
     * @param y1 start y, m
     * @param x2 end x, m, not equal to the start
     * @param y2 end y, m
     * @param a semi-axis along the rotated x direction, m, &gt; 0
     * @param b semi-axis along the rotated y direction, m, &gt; 0
     * @param rotation φ, radians
     * @param largeArc take the arc of more than half a turn
     * @param counterClockwise take the arc along which the eccentric angle increases
     * @throws IllegalArgumentException if a semi-axis is not positive or the end equals the start
     */
    public static EllipseArcCentre fromEndpoints(double x1, double y1, double x2, double y2, double a, double b,
                                          double rotation, boolean largeArc, boolean counterClockwise) {
        if (!(a > 0) || !(b > 0) || !Double.isFinite(a + b) || !Double.isFinite(rotation)) {
            throw new IllegalArgumentException("elliptical arc to " + Millimetres.point(x2, y2)
                    + " needs finite positive semi-axes and rotation, got " + Millimetres.length(a) + " × "
                    + Millimetres.length(b) + " mm turned " + rotation + " rad");
        }
        if (x1 == x2 && y1 == y2) {
            throw new IllegalArgumentException("elliptical arc of zero chord at " + Millimetres.point(x2, y2));
        }
        double c = Math.cos(rotation);
        double s = Math.sin(rotation);
        // F.6.5.1: the mid-chord in the ellipse's own frame
        double hx = 0.5 * (x1 - x2);
        double hy = 0.5 * (y1 - y2);
        double px = c * hx + s * hy;
        double py = -s * hx + c * hy;
        // F.6.6: scale radii up if they cannot reach. Within 1e-12 of just reaching, scale them to reach
        // exactly: the centre offset grows like √(1 − Λ), so rounding in Λ would otherwise move it by
        // 1e-8 of the radii
        double lambda = px * px / (a * a) + py * py / (b * b);
        if (lambda > 1 - 1e-12) {
            double grow = Math.sqrt(lambda);
            a *= grow;
            b *= grow;
        }
        // F.6.5.2: the centre in the ellipse's frame
        double num = a * a * b * b - a * a * py * py - b * b * px * px;
        double den = a * a * py * py + b * b * px * px;
        double factor = lambda > 1 - 1e-12 ? 0 : Math.sqrt(Math.max(0, num / den)) * (largeArc != counterClockwise ? 1 : -1);
        double qx = factor * a * py / b;
        double qy = -factor * b * px / a;
        // F.6.5.3: back to the plane
        double cx = c * qx - s * qy + 0.5 * (x1 + x2);
        double cy = s * qx + c * qy + 0.5 * (y1 + y2);
        // F.6.5.4: start angle and sweep
        double ux = (px - qx) / a;
        double uy = (py - qy) / b;
        double vx = (-px - qx) / a;
        double vy = (-py - qy) / b;
        double start = Math.atan2(uy, ux);
        double sweep = Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
        if (!counterClockwise && sweep > 0) {
            sweep -= 2 * Math.PI;
        } else if (counterClockwise && sweep < 0) {
            sweep += 2 * Math.PI;
        }
        return new EllipseArcCentre(cx, cy, a, b, start, sweep);
    }

    /** @return whether the two semi-axes are equal to rounding, so that the arc is circular */
    public boolean circular() {
        return Math.abs(semiAxisA - semiAxisB) <= 1e-12 * Math.max(semiAxisA, semiAxisB);
    }
}
