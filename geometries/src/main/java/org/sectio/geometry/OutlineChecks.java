package org.sectio.geometry;

import java.util.List;

/**
 * Checks that outlines describe a cross-section the solver can use, each failing with one
 * {@link IllegalArgumentException} whose message says what is wrong and where, in millimetres:
 * pieces of zero length, loops of zero area, loops that cross or touch themselves or each other,
 * inner conductors that touch or leave the outer wall.
 *
 * <p>Contacts are found with the same routine the boolean operations use ({@link PieceIntersections}),
 * so a geometry these checks pass is one the booleans treat consistently. Points closer than 1e-9 of
 * the loop's (or region's) larger side coincide; a loop whose area is below 1e-12 of the square of that
 * side encloses none.
 *
 * <p>The {@code what} arguments describe the object for the message and start it, e.g.
 * {@code "outer wall"} or {@code "inner conductor 'pin'"}.
 */
public final class OutlineChecks {

    private static final double RELATIVE_AREA = 1e-12;

    private OutlineChecks() {
    }

    /**
     * Every check on every loop of the region, then that no two loops cross or touch.
     *
     * @throws IllegalArgumentException on the first problem found, naming it and where
     */
    public static void requireValid(Region region, String what) {
        List<Loop> loops = region.loops();
        for (int k = 0; k < loops.size(); k++) {
            requireValid(loops.get(k), loops.size() == 1 ? what : what + ", loop " + (k + 1));
        }
        requireLoopsApart(region, what);
    }

    /**
     * No zero-length piece, no self-crossing, a non-zero area, in that order (a figure-of-eight with
     * equal lobes is reported as crossing itself, not as empty).
     *
     * @throws IllegalArgumentException on the first problem found, naming it and where
     */
    public static void requireValid(Loop loop, String what) {
        requireNoZeroLengthPiece(loop, what);
        requireNoSelfCrossing(loop, what);
        requireArea(loop, what);
    }

    /**
     * @throws IllegalArgumentException "WHAT: piece K of N has zero length at (x, y) mm" for a piece
     *     whose ends are closer than the tolerance (a monotone piece is then that short)
     */
    public static void requireNoZeroLengthPiece(Loop loop, String what) {
        double tol = tolerance(loop.bounds());
        List<WallPiece> pieces = loop.pieces();
        for (int k = 0; k < pieces.size(); k++) {
            WallPiece p = pieces.get(k);
            if (Math.hypot(p.endX() - p.startX(), p.endY() - p.startY()) <= tol) {
                throw new IllegalArgumentException(what + ": piece " + (k + 1) + " of " + pieces.size()
                        + " has zero length at " + Millimetres.point(p.startX(), p.startY()));
            }
        }
    }

    /**
     * @throws IllegalArgumentException "WHAT encloses no area (it starts at (x, y) mm)" when |∮ x dy| is
     *     below 1e-12 of the square of the loop's larger side
     */
    public static void requireArea(Loop loop, String what) {
        Bounds box = loop.bounds();
        double size = Math.max(box.width(), box.height());
        if (!(Math.abs(loop.signedArea()) > RELATIVE_AREA * size * size)) {
            WallPiece first = loop.pieces().get(0);
            throw new IllegalArgumentException(what + " encloses no area (it starts at "
                    + Millimetres.point(first.startX(), first.startY()) + ")");
        }
    }

    /**
     * @throws IllegalArgumentException "WHAT crosses itself: pieces I and J of N meet at (x, y) mm" when
     *     two pieces meet anywhere but at the vertex joining neighbours
     */
    public static void requireNoSelfCrossing(Loop loop, String what) {
        double tol = tolerance(loop.bounds());
        List<WallPiece> pieces = loop.pieces();
        int n = pieces.size();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                WallPiece p = pieces.get(i);
                WallPiece q = pieces.get(j);
                for (double[] m : PieceIntersections.meet(p, q, tol)) {
                    boolean joint = j == i + 1 && near(m, p.endX(), p.endY(), tol)
                            || i == 0 && j == n - 1 && near(m, q.endX(), q.endY(), tol);
                    if (!joint) {
                        throw new IllegalArgumentException(what + " crosses itself: pieces " + (i + 1) + " and "
                                + (j + 1) + " of " + n + " meet at " + Millimetres.point(m[0], m[1]));
                    }
                }
            }
        }
    }

    /**
     * @throws IllegalArgumentException "WHAT: loops K and L cross or touch at (x, y) mm"
     */
    public static void requireLoopsApart(Region region, String what) {
        double tol = tolerance(region.bounds());
        List<Loop> loops = region.loops();
        for (int k = 0; k < loops.size(); k++) {
            for (int l = k + 1; l < loops.size(); l++) {
                double[] m = firstContact(loops.get(k).pieces(), loops.get(l).pieces(), tol);
                if (m != null) {
                    throw new IllegalArgumentException(what + ": loops " + (k + 1) + " and " + (l + 1)
                            + " cross or touch at " + Millimetres.point(m[0], m[1]));
                }
            }
        }
    }

    /**
     * Requires {@code inner} to lie strictly inside {@code outer}: no contact between their boundaries,
     * a point of inner inside outer, and no loop of outer inside inner.
     *
     * @throws IllegalArgumentException "WHAT touches or leaves the outer wall at (x, y) mm", or
     *     "WHAT encloses another wall at (x, y) mm" when a loop of outer lies within inner
     */
    public static void requireInside(Region inner, Region outer, String what) {
        double tol = Booleans.tolerance(inner, outer);
        double[] m = firstContact(inner.pieces(), outer.pieces(), tol);
        if (m == null) {
            WallPiece p = inner.pieces().get(0);
            double t = PieceGeometry.middle(p);
            if (!outer.contains(p.x(t), p.y(t))) {
                m = new double[] {p.x(t), p.y(t)};
            }
        }
        if (m != null) {
            throw new IllegalArgumentException(what + " touches or leaves the outer wall at " + Millimetres.point(m[0], m[1]));
        }
        for (Loop loop : outer.loops()) {
            WallPiece p = loop.pieces().get(0);
            double t = PieceGeometry.middle(p);
            if (inner.contains(p.x(t), p.y(t))) {
                throw new IllegalArgumentException(what + " encloses another wall at " + Millimetres.point(p.x(t), p.y(t)));
            }
        }
    }

    private static double[] firstContact(List<WallPiece> a, List<WallPiece> b, double tol) {
        for (WallPiece p : a) {
            for (WallPiece q : b) {
                List<double[]> met = PieceIntersections.meet(p, q, tol);
                if (!met.isEmpty()) {
                    return met.get(0);
                }
            }
        }
        return null;
    }

    private static boolean near(double[] m, double x, double y, double tol) {
        return Math.hypot(m[0] - x, m[1] - y) <= tol;
    }

    private static double tolerance(Bounds box) {
        return Booleans.RELATIVE_TOLERANCE * Math.max(box.width(), box.height());
    }
}
