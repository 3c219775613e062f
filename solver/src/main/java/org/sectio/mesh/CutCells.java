package org.sectio.mesh;

import java.util.Arrays;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.WallPiece;

/**
 * The conformal (cut-cell) description of a cross-section on a tensor grid: for every cell the area
 * that lies inside the guide, for every cell face the length of it that lies inside, and for every
 * grid line the exact points where it crosses a wall.
 *
 * <p>Why exact: a staircase approximation of a curved or oblique wall moves the boundary by O(h) and
 * makes cutoffs first-order accurate. Partial face lengths come from the exact crossings; partial
 * areas from Green's theorem, area = ∮ (x − x_i) dy around the part of the cell inside the guide,
 * split into the cell's own right edge (its open length times the cell width) and the wall pieces
 * that pass through the cell (integrated in closed form by {@link WallPiece#integralXdy}).
 *
 * <p>Flat arrays: cell (i, j) is {@code j * cellsX + i}; vertical face (i, j) on line x_i between
 * y_j and y_{j+1} is {@code j * (cellsX + 1) + i}; horizontal face (i, j) on line y_j between x_i and
 * x_{i+1} is {@code j * cellsX + i}.
 */
public final class CutCells {

    private final TensorGrid grid;
    private final double[][] crossingsOnVerticalLines;
    private final double[][] crossingsOnHorizontalLines;
    private final double[] cellArea;
    private final double[] verticalFaceOpenLength;
    private final double[] horizontalFaceOpenLength;

    private CutCells(TensorGrid grid, double[][] vertical, double[][] horizontal, double[] area,
                     double[] verticalOpen, double[] horizontalOpen) {
        this.grid = grid;
        this.crossingsOnVerticalLines = vertical;
        this.crossingsOnHorizontalLines = horizontal;
        this.cellArea = area;
        this.verticalFaceOpenLength = verticalOpen;
        this.horizontalFaceOpenLength = horizontalOpen;
    }

    /**
     * Cuts the grid by the cross-section's walls.
     *
     * @throws IllegalArgumentException if the grid does not cover the cross-section's bounds
     */
    public static CutCells of(CrossSection section, TensorGrid grid) {
        var b = section.bounds();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        if (xs[0] > b.minX() || xs[xs.length - 1] < b.maxX() || ys[0] > b.minY() || ys[ys.length - 1] < b.maxY()) {
            throw new IllegalArgumentException("grid [" + xs[0] + ", " + xs[xs.length - 1] + "] × [" + ys[0] + ", "
                    + ys[ys.length - 1] + "] m does not cover the cross-section " + b);
        }
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        double[][] vertical = new double[nx + 1][];
        double[] verticalOpen = new double[(nx + 1) * ny];
        for (int i = 0; i <= nx; i++) {
            vertical[i] = section.wallCrossingsAtX(xs[i]);
            accumulateOpenLengths(vertical[i], ys, verticalOpen, i, nx + 1);
        }
        double[][] horizontal = new double[ny + 1][];
        double[] horizontalOpen = new double[nx * (ny + 1)];
        for (int j = 0; j <= ny; j++) {
            horizontal[j] = section.wallCrossingsAtY(ys[j]);
            accumulateOpenLengths(horizontal[j], xs, horizontalOpen, j * nx, 1);
        }
        double[] area = new double[nx * ny];
        for (WallPiece piece : section.wallPieces()) {
            addWallIntegrals(piece, grid, area);
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                area[j * nx + i] += (xs[i + 1] - xs[i]) * verticalOpen[j * (nx + 1) + i + 1];
            }
        }
        for (int c = 0; c < area.length; c++) {
            int i = c % nx;
            int j = c / nx;
            double full = (xs[i + 1] - xs[i]) * (ys[j + 1] - ys[j]);
            // round-off of the Green sum is ~1e-13 of a cell; below that the cell is empty
            area[c] = area[c] < 1e-11 * full ? 0.0 : Math.min(area[c], full);
        }
        return new CutCells(grid, vertical, horizontal, area, verticalOpen, horizontalOpen);
    }

    /**
     * Adds, for one grid line whose inside intervals are [c0, c1], [c2, c3], …, the overlap of each
     * interval with each span [lines[k], lines[k+1]] into {@code open[offset + k * stride]}.
     */
    static void accumulateOpenLengths(double[] crossings, double[] lines, double[] open, int offset, int stride) {
        for (int p = 0; p + 1 < crossings.length; p += 2) {
            double from = crossings[p];
            double to = crossings[p + 1];
            int k = Math.max(0, spanOf(lines, from));
            for (; k + 1 < lines.length && lines[k] < to; k++) {
                double overlap = Math.min(to, lines[k + 1]) - Math.max(from, lines[k]);
                if (overlap > 0) {
                    open[offset + k * stride] += overlap;
                }
            }
        }
    }

    private static int spanOf(double[] lines, double v) {
        int at = Arrays.binarySearch(lines, v);
        return at >= 0 ? at : -at - 2;
    }

    /** Splits the piece where it crosses grid lines and adds ∫ (x − x_i) dy of each part to its cell. */
    private static void addWallIntegrals(WallPiece piece, TensorGrid grid, double[] area) {
        addWallIntegrals(piece, grid, area, null, null);
    }

    /**
     * Splits the piece where it crosses grid lines and adds ∫ (x − x_i) dy of each part to its cell
     * and, when the arrays are given, the part's rise Δy to {@code rise} and run Δx to {@code run}
     * (so that (Σ Δy, −Σ Δx) is ∫ n dℓ over the pieces in the cell, n the normal on their right).
     */
    static void addWallIntegrals(WallPiece piece, TensorGrid grid, double[] area, double[] rise, double[] run) {
        double t0 = piece.startParameter();
        double t1 = piece.endParameter();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        double[] cuts = new double[xs.length + ys.length + 2];
        int count = 0;
        cuts[count++] = t0;
        cuts[count++] = t1;
        count = addCuts(piece, xs, Math.min(piece.startX(), piece.endX()), Math.max(piece.startX(), piece.endX()),
                true, cuts, count);
        count = addCuts(piece, ys, Math.min(piece.startY(), piece.endY()), Math.max(piece.startY(), piece.endY()),
                false, cuts, count);
        double[] sorted = Arrays.copyOf(cuts, count);
        Arrays.sort(sorted);
        if (t1 < t0) {
            for (int a = 0, z = sorted.length - 1; a < z; a++, z--) {
                double swap = sorted[a];
                sorted[a] = sorted[z];
                sorted[z] = swap;
            }
        }
        int nx = grid.cellsX();
        for (int k = 0; k + 1 < sorted.length; k++) {
            double ta = sorted[k];
            double tb = sorted[k + 1];
            if (ta == tb) {
                continue;
            }
            double mid = 0.5 * (ta + tb);
            int i = grid.cellColumnOf(piece.x(mid));
            int j = grid.cellRowOf(piece.y(mid));
            double dy = piece.y(tb) - piece.y(ta);
            area[j * nx + i] += piece.integralXdy(ta, tb) - xs[i] * dy;
            if (rise != null) {
                rise[j * nx + i] += dy;
                run[j * nx + i] += piece.x(tb) - piece.x(ta);
            }
        }
    }

    private static int addCuts(WallPiece piece, double[] lines, double low, double high, boolean vertical,
                               double[] cuts, int count) {
        int k = Math.max(0, spanOf(lines, low) + 1);
        for (; k < lines.length && lines[k] < high; k++) {
            if (lines[k] > low) {
                cuts[count++] = vertical ? piece.parameterAtX(lines[k]) : piece.parameterAtY(lines[k]);
            }
        }
        return count;
    }

    /** @return the grid */
    public TensorGrid grid() {
        return grid;
    }

    /** @return area of cell (i, j) inside the guide, m² */
    public double cellArea(int i, int j) {
        return cellArea[j * grid.cellsX() + i];
    }

    /** @return length of the vertical face on line x_i between y_j and y_{j+1} inside the guide, m */
    public double verticalFaceOpenLength(int i, int j) {
        return verticalFaceOpenLength[j * (grid.cellsX() + 1) + i];
    }

    /** @return length of the horizontal face on line y_j between x_i and x_{i+1} inside the guide, m */
    public double horizontalFaceOpenLength(int i, int j) {
        return horizontalFaceOpenLength[j * grid.cellsX() + i];
    }

    /** @return the wall crossings of the vertical line x_i, ascending y, m (do not modify) */
    double[] crossingsOnVerticalLine(int i) {
        return crossingsOnVerticalLines[i];
    }

    /** @return the wall crossings of the horizontal line y_j, ascending x, m (do not modify) */
    double[] crossingsOnHorizontalLine(int j) {
        return crossingsOnHorizontalLines[j];
    }

    /** @return the total open area, m² */
    public double totalArea() {
        double sum = 0;
        for (double a : cellArea) {
            sum += a;
        }
        return sum;
    }
}
