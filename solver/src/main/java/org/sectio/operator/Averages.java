package org.sectio.operator;

import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.mesh.MaterialAreas;
import org.sectio.mesh.TensorGrid;

/**
 * Per cell of one control grid: ⟨εr⟩, ⟨εr⁻¹⟩ over the part inside the guide, and the dielectric
 * interfaces' normal integral; see {@link PermittivityMap} for the formulas and their source.
 * A cell with no area inside the guide takes the filling's values.
 */
final class Averages {

    private final TensorGrid grid;
    private final double[] mean;
    private final double[] inverseMean;
    private final double[] normalX;
    private final double[] normalY;

    private Averages(TensorGrid grid, double[] mean, double[] inverseMean, double[] normalX, double[] normalY) {
        this.grid = grid;
        this.mean = mean;
        this.inverseMean = inverseMean;
        this.normalX = normalX;
        this.normalY = normalY;
    }

    static Averages on(CrossSection section, TensorGrid grid) {
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        int cells = nx * ny;
        MaterialAreas guide = MaterialAreas.of(section.wallPieces(), grid);
        List<Dielectric> regions = section.dielectrics();
        double fill = section.filling().relativePermittivity();
        double[] regionArea = new double[cells];
        double[] mean = new double[cells];
        double[] inverse = new double[cells];
        double[] nX = new double[cells];
        double[] nY = new double[cells];
        for (Dielectric d : regions) {
            MaterialAreas in = MaterialAreas.of(d.region().pieces(), grid);
            double eps = d.material().relativePermittivity();
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    int c = j * nx + i;
                    double s = in.area(i, j);
                    regionArea[c] += s;
                    mean[c] += eps * s;
                    inverse[c] += s / eps;
                    nX[c] += in.normalX(i, j);
                    nY[c] += in.normalY(i, j);
                }
            }
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int c = j * nx + i;
                double total = guide.area(i, j);
                if (!(total > 0)) {
                    mean[c] = fill;
                    inverse[c] = 1.0 / fill;
                    continue;
                }
                // regions lie inside the guide; clip round-off so that the filling's share is never negative
                double inRegions = Math.min(regionArea[c], total);
                double scale = regionArea[c] > total ? total / regionArea[c] : 1.0;
                double rest = total - inRegions;
                mean[c] = (scale * mean[c] + fill * rest) / total;
                inverse[c] = (scale * inverse[c] + rest / fill) / total;
            }
        }
        return new Averages(grid, mean, inverse, nX, nY);
    }

    /** @return ⟨εr⟩ of every cell, row by row */
    double[] arithmetic() {
        return mean.clone();
    }

    /**
     * @param alongX whether the links of these boxes run along x (vertical faces) or along y
     * @return a_eff = (n·e)² / ⟨εr⟩ + (1 − (n·e)²) ⟨εr⁻¹⟩ of every cell, row by row
     */
    double[] effectiveInverse(boolean alongX) {
        double[] out = new double[mean.length];
        for (int c = 0; c < out.length; c++) {
            double harmonic = 1.0 / mean[c];
            double arithmetic = inverseMean[c];
            // one material: ⟨εr⟩⟨εr⁻¹⟩ = 1 up to round-off, and both means are 1/εr
            if (Math.abs(mean[c] * arithmetic - 1.0) < 1e-12) {
                out[c] = harmonic;
                continue;
            }
            double nx = normalX[c];
            double ny = normalY[c];
            double norm = nx * nx + ny * ny;
            double along = norm > 0 ? (alongX ? nx * nx : ny * ny) / norm : 0.5;
            out[c] = along * harmonic + (1.0 - along) * arithmetic;
        }
        return out;
    }

    /**
     * The off-diagonal entry of the smoothed tensor a = ⟨εr⁻¹⟩ I + (1/⟨εr⟩ − ⟨εr⁻¹⟩) n nᵀ (see
     * {@link PermittivityMap}): a_xy = n_x n_y (1/⟨εr⟩ − ⟨εr⁻¹⟩) ≤ 0 in the sign of n_x n_y. A cell of one
     * material, or one whose interface normals cancel, gets exactly 0.
     *
     * @return a_xy of every cell, row by row
     */
    double[] offDiagonalInverse() {
        double[] out = new double[mean.length];
        for (int c = 0; c < out.length; c++) {
            double arithmetic = inverseMean[c];
            if (Math.abs(mean[c] * arithmetic - 1.0) < 1e-12) {
                continue;
            }
            double nx = normalX[c];
            double ny = normalY[c];
            double norm = nx * nx + ny * ny;
            out[c] = norm > 0 ? nx * ny / norm * (1.0 / mean[c] - arithmetic) : 0.0;
        }
        return out;
    }

    /** @return the grid averaged over */
    TensorGrid grid() {
        return grid;
    }
}
