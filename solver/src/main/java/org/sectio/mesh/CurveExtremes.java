package org.sectio.mesh;

import java.util.TreeSet;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.WallPiece;

/**
 * The coordinates where a curved boundary (metal wall or dielectric face) turns back in x or y: the x
 * of every point with a vertical tangent and the y of every point with a horizontal one, such as the
 * four quadrant points of an inner conductor or a dielectric rod.
 *
 * <p>Why: a grid line through such a point makes the curve meet the grid the same way on every grid
 * of a refinement sequence. Without it the cutoffs jitter with how the curve falls on the grid: the
 * coaxial guide's TE11 error was (0.01 … 0.19)/N² depending on N mod 60 (its inner radius is 0.217 of
 * the cells across), so that two nested grids could both sit on a low phase and under-state the error.
 *
 * <p>The solver sees curves as monotone {@link WallPiece}s, so the turning points are piece ends; an
 * end has a vertical tangent when x moves much less than y just inside the piece (x − x₀ grows like
 * t² there, y − y₀ like t).
 */
public final class CurveExtremes {

    /** A step of this share of a piece's parameter range probes the tangent at its ends. */
    private static final double PROBE = 1e-4;
    /** |Δx| below this share of |Δy| at the probe marks a vertical tangent (a slope of 1e-4 gives 1e-4). */
    private static final double FLAT = 1e-2;

    private CurveExtremes() {
    }

    /** @return the x, m, of every point of a curved boundary where its tangent is vertical, ascending */
    public static double[] verticalTangentXs(CrossSection section) {
        TreeSet<Double> xs = new TreeSet<>();
        for (WallPiece p : StraightWalls.boundaries(section)) {
            for (boolean atStart : new boolean[] {true, false}) {
                double[] d = probe(p, atStart);
                if (d != null && Math.abs(d[0]) < FLAT * Math.abs(d[1])) {
                    xs.add(atStart ? p.startX() : p.endX());
                }
            }
        }
        return StraightWalls.unboxed(xs);
    }

    /** @return the y, m, of every point of a curved boundary where its tangent is horizontal, ascending */
    public static double[] horizontalTangentYs(CrossSection section) {
        TreeSet<Double> ys = new TreeSet<>();
        for (WallPiece p : StraightWalls.boundaries(section)) {
            for (boolean atStart : new boolean[] {true, false}) {
                double[] d = probe(p, atStart);
                if (d != null && Math.abs(d[1]) < FLAT * Math.abs(d[0])) {
                    ys.add(atStart ? p.startY() : p.endY());
                }
            }
        }
        return StraightWalls.unboxed(ys);
    }

    /** (Δx, Δy) a small step inside a curved piece from one end, or null for a straight piece. */
    private static double[] probe(WallPiece p, boolean atStart) {
        double t0 = p.startParameter();
        double t1 = p.endParameter();
        double mid = 0.5 * (t0 + t1);
        boolean straight = Math.abs((p.x(mid) - p.startX()) * (p.endY() - p.startY())
                - (p.y(mid) - p.startY()) * (p.endX() - p.startX()))
                <= 1e-12 * (Math.abs(p.endX() - p.startX()) + Math.abs(p.endY() - p.startY()))
                        * (Math.abs(p.endX() - p.startX()) + Math.abs(p.endY() - p.startY()));
        if (straight) {
            return null;
        }
        double from = atStart ? t0 : t1;
        double to = from + (atStart ? 1 : -1) * PROBE * (t1 - t0);
        return new double[] {p.x(to) - p.x(from), p.y(to) - p.y(from)};
    }
}
