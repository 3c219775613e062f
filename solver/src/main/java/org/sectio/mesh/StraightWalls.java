package org.sectio.mesh;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.WallPiece;

/**
 * The coordinates of the axis-aligned straight boundaries of a cross-section — metal walls and the
 * faces of dielectric regions: the x of every vertical segment and the y of every horizontal one. A
 * grid line placed exactly on a wall leaves no sliver cells along it; on a dielectric face it makes
 * the material averaging exact (the slab-loaded guide converges at order 2.0 with its faces on grid
 * lines, and irregularly, with an error estimate below the true error, when they cut cells).
 *
 * <p>Why the midpoint test: the solver sees walls only as {@link WallPiece}s. A monotone piece whose
 * ends share an x and whose midpoint has that x too is a vertical segment (a monotone arc cannot do
 * this: its x varies strictly between its ends or it is a single point).
 */
public final class StraightWalls {

    private StraightWalls() {
    }

    /** @return the x, m, of every vertical straight wall, ascending, without repeats */
    public static double[] verticalXs(CrossSection section) {
        TreeSet<Double> xs = new TreeSet<>();
        for (WallPiece p : boundaries(section)) {
            double mid = 0.5 * (p.startParameter() + p.endParameter());
            if (p.startX() == p.endX() && p.x(mid) == p.startX() && p.startY() != p.endY()) {
                xs.add(p.startX());
            }
        }
        return unboxed(xs);
    }

    /** @return the y, m, of every horizontal straight wall, ascending, without repeats */
    public static double[] horizontalYs(CrossSection section) {
        TreeSet<Double> ys = new TreeSet<>();
        for (WallPiece p : boundaries(section)) {
            double mid = 0.5 * (p.startParameter() + p.endParameter());
            if (p.startY() == p.endY() && p.y(mid) == p.startY() && p.startX() != p.endX()) {
                ys.add(p.startY());
            }
        }
        return unboxed(ys);
    }

    /** @return every metal wall piece and every dielectric face piece of the section */
    static List<WallPiece> boundaries(CrossSection section) {
        List<WallPiece> all = new ArrayList<>(section.wallPieces());
        for (Dielectric d : section.dielectrics()) {
            all.addAll(d.region().pieces());
        }
        return all;
    }

    static double[] unboxed(TreeSet<Double> values) {
        List<Double> list = List.copyOf(values);
        double[] out = new double[list.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = list.get(k);
        }
        return out;
    }
}
