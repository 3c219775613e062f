package org.sectio.geometry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A waveguide cross-section as the solver sees it: metal walls given as exact curves, and a filling.
 * This is the only view of geometry the solver uses, so a new family of shapes (ridges, rounded
 * corners, inner conductors, dielectric regions) needs nothing more than an implementation of it.
 *
 * <p>All coordinates are in metres. Crossing queries follow one convention everywhere: a line
 * {@code y = c} is treated as the line {@code y = c + ε} for an infinitesimal ε &gt; 0 (likewise for
 * x), so a wall lying exactly on a grid line, or a vertex on it, is counted consistently and once.
 */
public interface CrossSection {

    /** @return a short human-readable name, e.g. "rectangle 22.86 × 10.16 mm" */
    String name();

    /** @return a box holding every wall, m */
    Bounds bounds();

    /**
     * @return every metal wall as monotone pieces oriented with the guide's interior on their left:
     *     the outer wall counter-clockwise, inner conductors clockwise
     */
    List<WallPiece> wallPieces();

    /**
     * @param x a point, m
     * @param y a point, m
     * @return the filling at that point (only meaningful inside the guide)
     */
    Material materialAt(double x, double y);

    /**
     * The x coordinates, ascending, where the line {@code y = const} crosses a wall. Between the
     * first and second crossing the line is inside the guide, between the second and third outside,
     * and so on.
     */
    default double[] wallCrossingsAtY(double y) {
        List<WallPiece> pieces = wallPieces();
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

    /** The y coordinates, ascending, where the line {@code x = const} crosses a wall; see {@link #wallCrossingsAtY}. */
    default double[] wallCrossingsAtX(double x) {
        List<WallPiece> pieces = wallPieces();
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

    /** @return whether (x, y), m, lies inside the guide (on the interior side of every wall) */
    default boolean contains(double x, double y) {
        int before = 0;
        for (double c : wallCrossingsAtY(y)) {
            if (c <= x) {
                before++;
            }
        }
        return before % 2 == 1;
    }

    /**
     * The walls as polylines for drawing, each a closed chain of points {@code {x0, y0, x1, y1, …}}.
     *
     * @param maxStepMetres the longest straight step used to draw a curved piece, m, &gt; 0
     */
    default List<double[]> wallPolylines(double maxStepMetres) {
        if (!(maxStepMetres > 0)) {
            throw new IllegalArgumentException("drawing step must be positive, got " + maxStepMetres);
        }
        List<double[]> lines = new ArrayList<>();
        for (WallPiece p : wallPieces()) {
            double t0 = p.startParameter();
            double t1 = p.endParameter();
            double length = Math.hypot(p.endX() - p.startX(), p.endY() - p.startY());
            int steps = p instanceof LineSegment ? 1 : Math.max(2, (int) Math.ceil(2 * length / maxStepMetres));
            double[] points = new double[2 * (steps + 1)];
            for (int s = 0; s <= steps; s++) {
                double t = s == steps ? t1 : t0 + (t1 - t0) * s / steps;
                points[2 * s] = p.x(t);
                points[2 * s + 1] = p.y(t);
            }
            lines.add(points);
        }
        return lines;
    }
}
