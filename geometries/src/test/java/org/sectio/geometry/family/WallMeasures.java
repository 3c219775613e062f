package org.sectio.geometry.family;

import java.util.List;
import org.sectio.geometry.Loop;
import org.sectio.geometry.WallPiece;

/**
 * Measurements of walls computed independently of the family code: length by chords (a straight piece
 * is its chord; a curved one is sampled and the two-grid Richardson extrapolation of the inscribed
 * polyline). For a quarter circle the extrapolation leaves 7e-16 relative; the rounding of some
 * thousand chord lengths leaves up to about 3e-14, so lengths measured here are good to
 * {@link #RELATIVE_ACCURACY}.
 */
final class WallMeasures {

    /** How closely {@link #length} reproduces a wall's true length, relative: 2e-13 (about 6× the worst seen). */
    static final double RELATIVE_ACCURACY = 2e-13;

    private static final int SAMPLES = 1024;

    private WallMeasures() {
    }

    /** @return the total length of the pieces, m */
    static double length(List<WallPiece> pieces) {
        double sum = 0;
        for (WallPiece p : pieces) {
            sum += length(p);
        }
        return sum;
    }

    /** @return the total length of every loop, m */
    static double loopsLength(List<Loop> loops) {
        double sum = 0;
        for (Loop loop : loops) {
            sum += length(loop.pieces());
        }
        return sum;
    }

    /** @return the length of one piece, m */
    static double length(WallPiece p) {
        if (isStraight(p)) {
            return chord(p);
        }
        double coarse = polyline(p, SAMPLES);
        double fine = polyline(p, 2 * SAMPLES);
        return (4 * fine - coarse) / 3;
    }

    /** @return the distance between the piece's ends, m */
    static double chord(WallPiece p) {
        return Math.hypot(p.endX() - p.startX(), p.endY() - p.startY());
    }

    /** @return the shortest chord among the pieces, m */
    static double shortestChord(List<WallPiece> pieces) {
        double shortest = Double.POSITIVE_INFINITY;
        for (WallPiece p : pieces) {
            shortest = Math.min(shortest, chord(p));
        }
        return shortest;
    }

    /** @return how many pieces are straight (their mid-parameter point is their chord's midpoint) */
    static long straightCount(List<WallPiece> pieces) {
        return pieces.stream().filter(WallMeasures::isStraight).count();
    }

    private static boolean isStraight(WallPiece p) {
        double mid = 0.5 * (p.startParameter() + p.endParameter());
        double dx = p.x(mid) - 0.5 * (p.startX() + p.endX());
        double dy = p.y(mid) - 0.5 * (p.startY() + p.endY());
        return Math.hypot(dx, dy) <= 1e-12 * chord(p);
    }

    private static double polyline(WallPiece p, int steps) {
        double t0 = p.startParameter();
        double t1 = p.endParameter();
        double sum = 0;
        double px = p.startX();
        double py = p.startY();
        for (int k = 1; k <= steps; k++) {
            double t = k == steps ? t1 : t0 + (t1 - t0) * k / steps;
            double x = p.x(t);
            double y = p.y(t);
            sum += Math.hypot(x - px, y - py);
            px = x;
            py = y;
        }
        return sum;
    }
}
