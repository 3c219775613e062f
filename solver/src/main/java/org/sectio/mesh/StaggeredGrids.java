package org.sectio.mesh;

/**
 * The control-volume grids that go with a primary {@link TensorGrid}, as tensor grids of their own so
 * that {@link MaterialAreas} can measure them.
 *
 * <ul>
 *   <li>{@link #nodeDual}: cell (i, j) is the dual cell of node (i, j), from the midpoint of the link
 *       on its left to the midpoint of the link on its right (at the grid's edge the missing link is
 *       mirrored, as in {@link TensorGrid#xStep}); its area is the TM mass of that node.</li>
 *   <li>{@link #acrossVerticalFaces}: lines at x_0, the cell centres, x_n; y lines the primary ones.
 *       Cell (i, j), 1 ≤ i ≤ cellsX − 1, is the box spanned by the link between the centres of cells
 *       (i − 1, j) and (i, j) and the vertical face (i, j) it crosses.</li>
 *   <li>{@link #acrossHorizontalFaces}: the same with x and y exchanged; cell (i, j), 1 ≤ j ≤ cellsY − 1,
 *       belongs to horizontal face (i, j).</li>
 * </ul>
 */
public final class StaggeredGrids {

    private StaggeredGrids() {
    }

    /** @return the grid of node dual cells; cellsX + 1 by cellsY + 1 cells */
    public static TensorGrid nodeDual(TensorGrid grid) {
        return new TensorGrid(dualLines(grid.xLines()), dualLines(grid.yLines()));
    }

    /** @return the grid of vertical-face link boxes; cellsX + 1 by cellsY cells */
    public static TensorGrid acrossVerticalFaces(TensorGrid grid) {
        return new TensorGrid(centresWithEnds(grid.xLines()), grid.yLines());
    }

    /** @return the grid of horizontal-face link boxes; cellsX by cellsY + 1 cells */
    public static TensorGrid acrossHorizontalFaces(TensorGrid grid) {
        return new TensorGrid(grid.xLines(), centresWithEnds(grid.yLines()));
    }

    private static double[] dualLines(double[] lines) {
        int n = lines.length - 1;
        double[] out = new double[n + 2];
        out[0] = lines[0] - 0.5 * (lines[1] - lines[0]);
        for (int k = 0; k < n; k++) {
            out[k + 1] = 0.5 * (lines[k] + lines[k + 1]);
        }
        out[n + 1] = lines[n] + 0.5 * (lines[n] - lines[n - 1]);
        return out;
    }

    private static double[] centresWithEnds(double[] lines) {
        int n = lines.length - 1;
        double[] out = new double[n + 2];
        out[0] = lines[0];
        for (int k = 0; k < n; k++) {
            out[k + 1] = 0.5 * (lines[k] + lines[k + 1]);
        }
        out[n + 1] = lines[n];
        return out;
    }
}
