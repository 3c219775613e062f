package org.sectio.geometry;

import java.util.Arrays;
import java.util.List;

/**
 * Where a grid line crosses a set of closed boundary pieces, under the convention of
 * {@link CrossSection}: the line {@code y = c} is treated as {@code y = c + ε}, so that a piece lying on
 * the line, or a vertex on it, is counted once and consistently.
 */
public final class WallCrossings {

    private WallCrossings() {
    }

    /** @return the x coordinates, ascending, where {@code y = const} crosses the pieces */
    public static double[] atY(List<WallPiece> pieces, double y) {
        double[] found = new double[pieces.size()];
        int count = 0;
        for (WallPiece p : pieces) {
            if ((p.startY() > y) != (p.endY() > y)) {
                found[count++] = p.x(p.parameterAtY(y));
            }
        }
        double[] crossings = Arrays.copyOf(found, count);
        Arrays.sort(crossings);
        return crossings;
    }

    /** @return the y coordinates, ascending, where {@code x = const} crosses the pieces */
    public static double[] atX(List<WallPiece> pieces, double x) {
        double[] found = new double[pieces.size()];
        int count = 0;
        for (WallPiece p : pieces) {
            if ((p.startX() > x) != (p.endX() > x)) {
                found[count++] = p.y(p.parameterAtX(x));
            }
        }
        double[] crossings = Arrays.copyOf(found, count);
        Arrays.sort(crossings);
        return crossings;
    }

    /** @return whether (x, y) is inside the pieces by the even-odd rule */
    public static boolean contains(List<WallPiece> pieces, double x, double y) {
        int before = 0;
        for (double c : atY(pieces, y)) {
            if (c <= x) {
                before++;
            }
        }
        return before % 2 == 1;
    }

    /** @return ∮ x dy over the pieces: the enclosed area, positive for counter-clockwise loops, m² */
    public static double signedArea(List<WallPiece> pieces) {
        double area = 0;
        for (WallPiece p : pieces) {
            area += p.integralXdy(p.startParameter(), p.endParameter());
        }
        return area;
    }

    /** @return the box holding the pieces' end points (pieces are monotone, so that holds them whole) */
    public static Bounds bounds(List<WallPiece> pieces) {
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (WallPiece p : pieces) {
            minX = Math.min(minX, Math.min(p.startX(), p.endX()));
            maxX = Math.max(maxX, Math.max(p.startX(), p.endX()));
            minY = Math.min(minY, Math.min(p.startY(), p.endY()));
            maxY = Math.max(maxY, Math.max(p.startY(), p.endY()));
        }
        return new Bounds(minX, minY, maxX, maxY);
    }
}
