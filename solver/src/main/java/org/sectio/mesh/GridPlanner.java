package org.sectio.mesh;

import java.util.List;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;

/**
 * Plans the tensor grid for a cross-section: lines on the bounding box, on every axis-aligned straight
 * wall, through every point where a curved boundary turns back ({@link CurveExtremes}) and on every
 * re-entrant corner, with cells graded toward the corners by {@link GradingRule}.
 *
 * <p>Why plan coarse first: the solver's error estimate re-solves on the grid of every second line and
 * assumes it is the same kind of grid with twice the cell size. So the planner lays out the coarse
 * grid (base size 2h) and cuts every coarse interval in two; every second line of the result is then
 * exactly the coarse plan, snapped and graded lines included, and the grading law, which is
 * proportional to the base size, is the same law at both levels.
 *
 * <p>For a shape with no straight axis-aligned wall and no re-entrant corner (a circle, a turned
 * rectangle) the plan is the uniform grid fitted to the bounding box, with an even number of cells.
 */
public final class GridPlanner {

    private GridPlanner() {
    }

    /**
     * The planned grid with the default rule (snapping and grading).
     *
     * @param section the cross-section, m
     * @param cellsAcross base cells along the longer side of the bounding box, ≥ 2: h = longer side / cells
     * @throws IllegalArgumentException if {@code cellsAcross} &lt; 2
     */
    public static TensorGrid plan(CrossSection section, int cellsAcross) {
        return plan(section, cellsAcross, GradingRule.DEFAULT);
    }

    /**
     * The planned grid: {@link #coarsePlan} with every interval bisected.
     *
     * @param section the cross-section, m
     * @param cellsAcross base cells along the longer side, ≥ 2
     * @param rule what to snap and grade
     * @throws IllegalArgumentException if {@code cellsAcross} &lt; 2
     */
    public static TensorGrid plan(CrossSection section, int cellsAcross, GradingRule rule) {
        TensorGrid coarse = coarsePlan(section, cellsAcross, rule);
        return new TensorGrid(AxisLines.bisect(coarse.xLines()), AxisLines.bisect(coarse.yLines()));
    }

    /**
     * The coarse grid, base size 2h with h = longer side / {@code cellsAcross}, that {@link #plan}
     * bisects; it is every second line of the planned grid.
     *
     * @throws IllegalArgumentException if {@code cellsAcross} &lt; 2
     */
    public static TensorGrid coarsePlan(CrossSection section, int cellsAcross, GradingRule rule) {
        if (cellsAcross < 2) {
            throw new IllegalArgumentException("cells across must be at least 2, got " + cellsAcross);
        }
        Bounds b = section.bounds();
        double longer = Math.max(b.width(), b.height());
        double base = 2 * longer / cellsAcross;
        double reach = rule.reachShare() * longer;
        List<ReentrantCorner> corners = rule.gradeCorners() ? ReentrantCorner.of(section) : List.of();
        double[] cornerX = new double[corners.size()];
        double[] cornerY = new double[corners.size()];
        double[] exponents = new double[corners.size()];
        for (int c = 0; c < corners.size(); c++) {
            cornerX[c] = corners.get(c).x();
            cornerY[c] = corners.get(c).y();
            exponents[c] = corners.get(c).singularExponent();
        }
        double[] wallX = rule.snapWalls() ? joined(StraightWalls.verticalXs(section),
                CurveExtremes.verticalTangentXs(section)) : new double[0];
        double[] wallY = rule.snapWalls() ? joined(StraightWalls.horizontalYs(section),
                CurveExtremes.horizontalTangentYs(section)) : new double[0];
        double[] xs = AxisLines.place(b.minX(), b.maxX(), cornerX, wallX,
                new CornerSpacing(base, cornerX, exponents, rule, reach), rule.mergeShare());
        double[] ys = AxisLines.place(b.minY(), b.maxY(), cornerY, wallY,
                new CornerSpacing(base, cornerY, exponents, rule, reach), rule.mergeShare());
        return new TensorGrid(xs, ys);
    }

    private static double[] joined(double[] a, double[] b) {
        return java.util.stream.DoubleStream.concat(java.util.Arrays.stream(a), java.util.Arrays.stream(b))
                .sorted().distinct().toArray();
    }
}
