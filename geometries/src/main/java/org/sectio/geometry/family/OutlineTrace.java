package org.sectio.geometry.family;

import java.util.List;
import org.sectio.geometry.Outline;
import org.sectio.geometry.WallPiece;

/**
 * An {@link Outline} that drops the steps a family's limiting cases make degenerate: a segment or arc
 * shorter than 1e-12 of the guide's size is left out, so a
 * stadium has no zero-length sides and a ridge whose radii use its whole depth has no zero-length
 * flank. A step ending that close to the start ends exactly on it.
 */
final class OutlineTrace {

    private static final double RELATIVE_TOLERANCE = 1e-12;

    private final Outline outline;
    private final double startX;
    private final double startY;
    private final double tolerance;
    private double x;
    private double y;

    private OutlineTrace(double startX, double startY, double size) {
        this.outline = Outline.startAt(startX, startY);
        this.startX = startX;
        this.startY = startY;
        this.tolerance = RELATIVE_TOLERANCE * size;
        this.x = startX;
        this.y = startY;
    }

    /**
     * @param x start point x, m
     * @param y start point y, m
     * @param size the guide's largest dimension, m, which scales the length below which steps are dropped
     */
    static OutlineTrace startAt(double x, double y, double size) {
        return new OutlineTrace(x, y, size);
    }

    /** A straight step to (x, y), m, unless it would be shorter than the tolerance. */
    OutlineTrace lineTo(double toX, double toY) {
        if (!negligible(toX, toY)) {
            double[] end = snapped(toX, toY);
            outline.lineTo(end[0], end[1]);
            x = end[0];
            y = end[1];
        }
        return this;
    }

    /** A circular step to (x, y), m, turning by {@code sweep} radians (positive: counter-clockwise), unless negligible. */
    OutlineTrace arcTo(double toX, double toY, double sweep) {
        if (!negligible(toX, toY)) {
            double[] end = snapped(toX, toY);
            outline.arcTo(end[0], end[1], sweep);
            x = end[0];
            y = end[1];
        }
        return this;
    }

    /** @return the closed loop, counter-clockwise */
    List<WallPiece> close() {
        return outline.close();
    }

    private boolean negligible(double toX, double toY) {
        return Math.hypot(toX - x, toY - y) <= tolerance;
    }

    private double[] snapped(double toX, double toY) {
        return Math.hypot(toX - startX, toY - startY) <= tolerance ? new double[] {startX, startY} : new double[] {toX, toY};
    }
}
