package org.sectio.mesh;

import java.util.List;
import org.sectio.geometry.WallCrossings;
import org.sectio.geometry.WallPiece;

/**
 * How much of each cell of a tensor grid lies inside a region bounded by closed pieces (a dielectric
 * region, or the guide itself), and the integral of the region boundary's normal over the part of
 * the boundary inside each cell. The grid may be any tensor grid, in particular a dual or staggered
 * grid whose cells are the control volumes of nodes or of links.
 *
 * <p>Areas are exact for segments and arcs, by the same Green's theorem as {@link CutCells}:
 * area = ∮ (x − x_i) dy around the part of the cell inside the region, which is the cell's right
 * edge (its length inside the region times the cell width) plus the boundary pieces passing through
 * the cell. The normal integral is N = ∫ (dy, −dx) over the boundary inside the cell, m; for pieces
 * oriented with the region on their left it points out of the region. Only its direction is used
 * (as the interface normal for the averaging of the permittivity).
 *
 * <p>Cell (i, j) is {@code j * cellsX + i}. The region's pieces must lie within the grid (a piece
 * outside it would be clamped into an edge cell).
 */
public final class MaterialAreas {

    private final TensorGrid grid;
    private final double[] area;
    private final double[] normalX;
    private final double[] normalY;

    private MaterialAreas(TensorGrid grid, double[] area, double[] normalX, double[] normalY) {
        this.grid = grid;
        this.area = area;
        this.normalX = normalX;
        this.normalY = normalY;
    }

    /**
     * Cuts the grid by the closed boundary of a region.
     *
     * @param boundary the region's boundary, monotone pieces with the region on their left, m
     * @param grid the grid whose cells are measured
     */
    public static MaterialAreas of(List<WallPiece> boundary, TensorGrid grid) {
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        double[] rightEdgeInside = new double[(nx + 1) * ny];
        for (int i = 1; i <= nx; i++) {
            CutCells.accumulateOpenLengths(WallCrossings.atX(boundary, xs[i]), ys, rightEdgeInside, i, nx + 1);
        }
        double[] area = new double[nx * ny];
        double[] rise = new double[nx * ny];
        double[] run = new double[nx * ny];
        for (WallPiece piece : boundary) {
            CutCells.addWallIntegrals(piece, grid, area, rise, run);
        }
        double[] normalY = new double[nx * ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int c = j * nx + i;
                area[c] += (xs[i + 1] - xs[i]) * rightEdgeInside[j * (nx + 1) + i + 1];
                double full = (xs[i + 1] - xs[i]) * (ys[j + 1] - ys[j]);
                // round-off of the Green sum is ~1e-13 of a cell (as in CutCells)
                area[c] = area[c] < 1e-11 * full ? 0.0 : Math.min(area[c], full);
                normalY[c] = -run[c];
            }
        }
        return new MaterialAreas(grid, area, rise, normalY);
    }

    /** @return the grid */
    public TensorGrid grid() {
        return grid;
    }

    /** @return the area of cell (i, j) inside the region, m² */
    public double area(int i, int j) {
        return area[j * grid.cellsX() + i];
    }

    /** @return x component of ∫ n dℓ over the region's boundary inside cell (i, j), m */
    public double normalX(int i, int j) {
        return normalX[j * grid.cellsX() + i];
    }

    /** @return y component of ∫ n dℓ over the region's boundary inside cell (i, j), m */
    public double normalY(int i, int j) {
        return normalY[j * grid.cellsX() + i];
    }

    /** @return the sum of all cell areas, m² */
    public double totalArea() {
        double sum = 0;
        for (double a : area) {
            sum += a;
        }
        return sum;
    }
}
