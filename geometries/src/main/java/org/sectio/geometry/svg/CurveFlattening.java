package org.sectio.geometry.svg;

/**
 * Replaces Bézier curves by chords of the curve, adaptively, so that no point of the curve is farther
 * than a tolerance from the chord that replaces its piece.
 *
 * <p>Why this bound holds: a Bézier curve lies in the convex hull of its control points (the convex
 * hull property, see e.g. G. Farin, "Curves and Surfaces for CAGD", §4.3), and the distance to a
 * segment is a convex function, so its maximum over the hull — hence over the curve — is reached at a
 * control point. A cubic is therefore within {@code max(dist(P1, P0P3), dist(P2, P0P3))} of its chord
 * P0P3. Pieces failing the bound are split in half by de Casteljau's construction and tested again.
 * The vertices emitted lie on the curve.
 */
final class CurveFlattening {

    /** Deepest split: 2^20 chords per curve, far beyond any sensible tolerance. */
    private static final int MAX_DEPTH = 20;

    /** Receives one chord end point. */
    interface Vertex {
        void at(double x, double y) throws SvgPathException;
    }

    private CurveFlattening() {
    }

    /**
     * Emits the end points of the chords of a cubic from (x0, y0), excluding the start, ending with (x3, y3).
     *
     * @param tolerance largest allowed distance between the curve and its chords, &gt; 0
     * @param position where the curve is in the path data, for the error
     * @throws SvgPathException if the tolerance is too small to reach within {@value #MAX_DEPTH} halvings
     */
    static void cubic(double x0, double y0, double x1, double y1, double x2, double y2, double x3, double y3,
                      double tolerance, int position, Vertex out) throws SvgPathException {
        split(new double[] {x0, y0, x1, y1, x2, y2, x3, y3}, tolerance, 0, position, out);
    }

    /**
     * A quadratic Bézier curve, raised exactly to the cubic with control points P0 + 2/3 (Q1 − P0) and
     * P2 + 2/3 (Q1 − P2), then flattened as {@link #cubic}.
     */
    static void quadratic(double x0, double y0, double x1, double y1, double x2, double y2,
                          double tolerance, int position, Vertex out) throws SvgPathException {
        cubic(x0, y0, x0 + 2.0 / 3 * (x1 - x0), y0 + 2.0 / 3 * (y1 - y0),
                x2 + 2.0 / 3 * (x1 - x2), y2 + 2.0 / 3 * (y1 - y2), x2, y2, tolerance, position, out);
    }

    /** @return the bound on the distance between the cubic {@code p} and its chord */
    static double hullDistance(double[] p) {
        return Math.max(segmentDistance(p[2], p[3], p[0], p[1], p[6], p[7]),
                segmentDistance(p[4], p[5], p[0], p[1], p[6], p[7]));
    }

    private static void split(double[] p, double tolerance, int depth, int position, Vertex out)
            throws SvgPathException {
        if (hullDistance(p) <= tolerance) {
            out.at(p[6], p[7]);
            return;
        }
        if (depth == MAX_DEPTH) {
            throw new SvgPathException(position, "the curve cannot be flattened to a tolerance of " + tolerance
                    + " in " + (1 << MAX_DEPTH) + " chords, expected a larger tolerance");
        }
        double[] left = new double[8];
        double[] right = new double[8];
        for (int k = 0; k < 2; k++) {
            double a = p[k];
            double b = p[2 + k];
            double c = p[4 + k];
            double e = p[6 + k];
            double ab = (a + b) / 2;
            double bc = (b + c) / 2;
            double ce = (c + e) / 2;
            double abc = (ab + bc) / 2;
            double bce = (bc + ce) / 2;
            double mid = (abc + bce) / 2;
            left[k] = a;
            left[2 + k] = ab;
            left[4 + k] = abc;
            left[6 + k] = mid;
            right[k] = mid;
            right[2 + k] = bce;
            right[4 + k] = ce;
            right[6 + k] = e;
        }
        split(left, tolerance, depth + 1, position, out);
        split(right, tolerance, depth + 1, position, out);
    }

    /** @return the distance from (px, py) to the segment from (ax, ay) to (bx, by) */
    static double segmentDistance(double px, double py, double ax, double ay, double bx, double by) {
        double dx = bx - ax;
        double dy = by - ay;
        double lengthSquared = dx * dx + dy * dy;
        double t = lengthSquared == 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / lengthSquared));
        return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
    }
}
