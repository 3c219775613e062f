package org.sectio.batch.tolerance;

import org.sectio.geometry.CrossSection;
import org.sectio.geometry.WallPiece;

/**
 * How far the walls move, along their outward normal, when a parameter changes: measured by building
 * the guide at the changed value and taking, at each wall point of the original guide, the distance to
 * the nearest point of the new walls, positive where the point now lies inside the new guide (the wall
 * moved outward). This needs nothing of the shape but its exact walls, so it works for every family and
 * geometry file.
 *
 * <p>To first order in the change the distance is the normal displacement; where a wall's end slides
 * along a neighbouring wall (a width change moves the ends of the broad walls) the points stay on the
 * new wall and read zero, as they should. The nearest point is found on the exact pieces: 64 samples
 * per piece, then a golden-section search in the piece parameter around the best sample.
 */
final class WallDisplacement {

    private static final int SAMPLES = 64;
    private static final int GOLDEN_STEPS = 80;
    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;

    private WallDisplacement() {
    }

    /**
     * @param x wall point abscissae of the original guide, m
     * @param y wall point ordinates, m
     * @param moved the guide after the change
     * @return the outward displacement at each point, m
     */
    static double[] outward(double[] x, double[] y, CrossSection moved) {
        double[] out = new double[x.length];
        for (int p = 0; p < x.length; p++) {
            double d = distance(x[p], y[p], moved);
            out[p] = moved.contains(x[p], y[p]) ? d : -d;
        }
        return out;
    }

    /** @return the distance from (px, py) to the nearest wall of the section, m */
    static double distance(double px, double py, CrossSection section) {
        double best = Double.POSITIVE_INFINITY;
        for (WallPiece piece : section.wallPieces()) {
            double lowX = Math.min(piece.startX(), piece.endX());
            double highX = Math.max(piece.startX(), piece.endX());
            double lowY = Math.min(piece.startY(), piece.endY());
            double highY = Math.max(piece.startY(), piece.endY());
            // pieces are monotone in x and y, so their box is spanned by their ends
            double dx = Math.max(0, Math.max(lowX - px, px - highX));
            double dy = Math.max(0, Math.max(lowY - py, py - highY));
            if (Math.hypot(dx, dy) >= best) {
                continue;
            }
            best = Math.min(best, distanceToPiece(px, py, piece));
        }
        return best;
    }

    private static double distanceToPiece(double px, double py, WallPiece piece) {
        double t0 = piece.startParameter();
        double t1 = piece.endParameter();
        int bestK = 0;
        double bestD = Double.POSITIVE_INFINITY;
        for (int k = 0; k <= SAMPLES; k++) {
            double t = t0 + (t1 - t0) * k / SAMPLES;
            double d = Math.hypot(piece.x(t) - px, piece.y(t) - py);
            if (d < bestD) {
                bestD = d;
                bestK = k;
            }
        }
        double a = t0 + (t1 - t0) * Math.max(0, bestK - 1) / SAMPLES;
        double b = t0 + (t1 - t0) * Math.min(SAMPLES, bestK + 1) / SAMPLES;
        double c = b - GOLDEN * (b - a);
        double d = a + GOLDEN * (b - a);
        double fc = Math.hypot(piece.x(c) - px, piece.y(c) - py);
        double fd = Math.hypot(piece.x(d) - px, piece.y(d) - py);
        for (int i = 0; i < GOLDEN_STEPS; i++) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - GOLDEN * (b - a);
                fc = Math.hypot(piece.x(c) - px, piece.y(c) - py);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + GOLDEN * (b - a);
                fd = Math.hypot(piece.x(d) - px, piece.y(d) - py);
            }
        }
        return Math.min(bestD, Math.min(fc, fd));
    }
}
