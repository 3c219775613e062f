package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

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
     * @return the material at that point: the first dielectric region holding it, else the filling
     *     (only meaningful inside the guide)
     */
    default Material materialAt(double x, double y) {
        for (Dielectric d : dielectrics()) {
            if (d.region().contains(x, y)) {
                return d.material();
            }
        }
        return filling();
    }

    /**
     * The metal walls grouped by conductor: each entry is one closed loop of {@link #wallPieces()} that
     * is a separate conductor (the outer wall with any ridges first, then each inner conductor). A guide
     * with N conductors carries N − 1 TEM modes.
     */
    default List<Loop> conductors() {
        return List.of(new Loop(wallPieces()));
    }

    /**
     * The metal of one conductor's wall, when the cross-section says (a geometry file's
     * {@code "conductor"} keys); the conductor loss is computed with it.
     *
     * @param conductorIndex the conductor's place in {@link #conductors()}: 0 the outer wall, ≥ 1 the inner ones
     * @return the metal, or empty when not given (the caller's default applies)
     * @throws IllegalArgumentException if the index is negative
     */
    default Optional<WallMetal> wallMetal(int conductorIndex) {
        if (conductorIndex < 0) {
            throw new IllegalArgumentException("conductor index must be ≥ 0, got " + conductorIndex);
        }
        return Optional.empty();
    }

    /** @return the regions filled with another material than {@link #filling()}, not overlapping */
    default List<Dielectric> dielectrics() {
        return List.of();
    }

    /** @return the material that fills the guide outside its dielectric regions */
    default Material filling() {
        return Material.AIR;
    }

    /**
     * The x coordinates, ascending, where the line {@code y = const} crosses a wall. Between the
     * first and second crossing the line is inside the guide, between the second and third outside,
     * and so on.
     */
    default double[] wallCrossingsAtY(double y) {
        return WallCrossings.atY(wallPieces(), y);
    }

    /** The y coordinates, ascending, where the line {@code x = const} crosses a wall; see {@link #wallCrossingsAtY}. */
    default double[] wallCrossingsAtX(double x) {
        return WallCrossings.atX(wallPieces(), x);
    }

    /** @return whether (x, y), m, lies inside the guide (on the interior side of every wall) */
    default boolean contains(double x, double y) {
        return WallCrossings.contains(wallPieces(), x, y);
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
