package org.sectio.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A wall piece on an ellipse, monotone in x and y, parameterized by the eccentric angle t (radians):
 * (x, y) = c + R(φ) (a cos t, b sin t), with R(φ) the counter-clockwise rotation by φ. Counter-clockwise
 * when {@code endParameter > startParameter}.
 *
 * <p>Why this form: each coordinate is a shifted sinusoid in t, x − cx = A cos t + B sin t = ρ cos(t − α),
 * so x and y turn back exactly at t = α + kπ. Splitting there (see {@link #monotonePieces}) gives
 * pieces on which the inverse is a single arccosine, and ∫ x dy is elementary. For a rotated ellipse
 * these turning parameters are not multiples of π/2, which is why circles' quadrant splitting is not
 * enough. The end points are stored so that neighbouring pieces meet exactly.
 *
 * @param centreX centre x, m
 * @param centreY centre y, m
 * @param semiAxisA semi-axis along the rotated x direction, m, &gt; 0
 * @param semiAxisB semi-axis along the rotated y direction, m, &gt; 0
 * @param rotation φ, radians
 * @param startParameter eccentric angle of the start
 * @param endParameter eccentric angle of the end, different from the start
 * @param startX x of the start, m
 * @param startY y of the start, m
 * @param endX x of the end, m
 * @param endY y of the end, m
 */
record EllipseArcPiece(double centreX, double centreY, double semiAxisA, double semiAxisB, double rotation,
        double startParameter, double endParameter, double startX, double startY, double endX, double endY)
        implements WallPiece {

    EllipseArcPiece {
        if (!(semiAxisA > 0) || !(semiAxisB > 0) || !Double.isFinite(semiAxisA + semiAxisB)
                || !(startParameter != endParameter) || !Double.isFinite(rotation)) {
            throw new IllegalArgumentException("elliptical arc with semi-axes " + semiAxisA + " × " + semiAxisB
                    + " m and parameters " + startParameter + " .. " + endParameter);
        }
    }

    /** An elliptical piece whose end points are computed from its parameters. */
    static EllipseArcPiece of(double cx, double cy, double a, double b, double rotation, double t0, double t1) {
        double c = Math.cos(rotation);
        double s = Math.sin(rotation);
        return new EllipseArcPiece(cx, cy, a, b, rotation, t0, t1,
                cx + a * c * Math.cos(t0) - b * s * Math.sin(t0), cy + a * s * Math.cos(t0) + b * c * Math.sin(t0),
                cx + a * c * Math.cos(t1) - b * s * Math.sin(t1), cy + a * s * Math.cos(t1) + b * c * Math.sin(t1));
    }

    /**
     * The arc from t0 to t1 (any span up to 2π) cut at every parameter where dx/dt = 0 or dy/dt = 0,
     * so that each piece is monotone in x and y. The first piece starts exactly at (x0, y0), the last
     * ends exactly at (x1, y1).
     */
    static List<WallPiece> monotonePieces(double cx, double cy, double a, double b, double rotation,
                                          double t0, double t1, double x0, double y0, double x1, double y1) {
        double lo = Math.min(t0, t1);
        double hi = Math.max(t0, t1);
        double[] turns = new double[0];
        double margin = 1e-12 * Math.max(1.0, Math.abs(hi));
        for (double alpha : new double[] {xPhase(a, b, rotation), yPhase(a, b, rotation)}) {
            for (double k = Math.ceil((lo - alpha) / Math.PI); alpha + k * Math.PI < hi; k++) {
                double turn = alpha + k * Math.PI;
                if (turn > lo + margin && turn < hi - margin) {
                    turns = Arrays.copyOf(turns, turns.length + 1);
                    turns[turns.length - 1] = turn;
                }
            }
        }
        Arrays.sort(turns);
        if (t1 < t0) {
            for (int i = 0; i < turns.length / 2; i++) {
                double keep = turns[i];
                turns[i] = turns[turns.length - 1 - i];
                turns[turns.length - 1 - i] = keep;
            }
        }
        List<WallPiece> pieces = new ArrayList<>();
        double from = t0;
        double fromX = x0;
        double fromY = y0;
        for (double turn : turns) {
            EllipseArcPiece next = of(cx, cy, a, b, rotation, from, turn);
            pieces.add(new EllipseArcPiece(cx, cy, a, b, rotation, from, turn, fromX, fromY, next.endX, next.endY));
            from = turn;
            fromX = next.endX;
            fromY = next.endY;
        }
        pieces.add(new EllipseArcPiece(cx, cy, a, b, rotation, from, t1, fromX, fromY, x1, y1));
        return pieces;
    }

    /** α of x − cx = ρ cos(t − α). */
    private static double xPhase(double a, double b, double rotation) {
        return Math.atan2(-b * Math.sin(rotation), a * Math.cos(rotation));
    }

    /** α of y − cy = ρ cos(t − α). */
    private static double yPhase(double a, double b, double rotation) {
        return Math.atan2(b * Math.cos(rotation), a * Math.sin(rotation));
    }

    private double ax() {
        return semiAxisA * Math.cos(rotation);
    }

    private double bx() {
        return -semiAxisB * Math.sin(rotation);
    }

    private double ay() {
        return semiAxisA * Math.sin(rotation);
    }

    private double by() {
        return semiAxisB * Math.cos(rotation);
    }

    @Override
    public double x(double t) {
        if (t == startParameter) {
            return startX;
        }
        if (t == endParameter) {
            return endX;
        }
        return centreX + ax() * Math.cos(t) + bx() * Math.sin(t);
    }

    @Override
    public double y(double t) {
        if (t == startParameter) {
            return startY;
        }
        if (t == endParameter) {
            return endY;
        }
        return centreY + ay() * Math.cos(t) + by() * Math.sin(t);
    }

    @Override
    public double parameterAtX(double x) {
        return invert(ax(), bx(), x - centreX);
    }

    @Override
    public double parameterAtY(double y) {
        return invert(ay(), by(), y - centreY);
    }

    /**
     * Solves A cos t + B sin t = ρ cos(t − α) = value for the t inside this piece: the piece lies in one
     * interval α + [kπ, (k + 1)π] on which the cosine is monotone, so t = α + kπ + arccos((−1)^k value/ρ).
     */
    private double invert(double a, double b, double value) {
        double rho = Math.hypot(a, b);
        double alpha = Math.atan2(b, a);
        double mid = 0.5 * (startParameter + endParameter);
        double k = Math.floor((mid - alpha) / Math.PI);
        double c = Math.max(-1.0, Math.min(1.0, value / rho));
        boolean even = ((long) k & 1L) == 0;
        return alpha + k * Math.PI + Math.acos(even ? c : -c);
    }

    /**
     * ∫ x dy with x = cx + A cos t + B sin t and dy = (−C sin t + D cos t) dt:
     * cx [C cos t + D sin t] + (AD − BC) t/2 + (AD + BC) sin 2t / 4 + (BD − AC) sin² t / 2, where
     * AD − BC = ab.
     */
    @Override
    public double integralXdy(double t0, double t1) {
        double a = ax();
        double b = bx();
        double c = ay();
        double d = by();
        double s0 = Math.sin(t0);
        double s1 = Math.sin(t1);
        return centreX * (c * (Math.cos(t1) - Math.cos(t0)) + d * (s1 - s0))
                + semiAxisA * semiAxisB * 0.5 * (t1 - t0)
                + (a * d + b * c) * 0.25 * (Math.sin(2 * t1) - Math.sin(2 * t0))
                + (b * d - a * c) * 0.5 * (s1 - s0) * (s1 + s0);
    }

    /** @return the same piece traversed the other way */
    EllipseArcPiece reversed() {
        return new EllipseArcPiece(centreX, centreY, semiAxisA, semiAxisB, rotation, endParameter, startParameter,
                endX, endY, startX, startY);
    }

    /**
     * Signed distance, to first order, from (x, y) to the whole ellipse: g / |∇g| with
     * g = (u/a)² + (v/b)² − 1 in the ellipse's own frame; positive outside, m.
     */
    double curveDistance(double x, double y) {
        double c = Math.cos(rotation);
        double s = Math.sin(rotation);
        double u = c * (x - centreX) + s * (y - centreY);
        double v = -s * (x - centreX) + c * (y - centreY);
        double g = u * u / (semiAxisA * semiAxisA) + v * v / (semiAxisB * semiAxisB) - 1;
        double gu = 2 * u / (semiAxisA * semiAxisA);
        double gv = 2 * v / (semiAxisB * semiAxisB);
        double gradient = Math.hypot(gu, gv);
        return gradient > 0 ? g / gradient : -Math.min(semiAxisA, semiAxisB);
    }
}
