package org.sectio.operator;

import org.sectio.mesh.CutCells;
import org.sectio.mesh.TensorGrid;

/**
 * The TE pencil: −∇²Hz = kc² Hz with ∂Hz/∂n = 0 on metal, as a conformal finite-volume scheme on the
 * cut cells. Hz lives at cell centres; the flux through a face is the open length of that face times
 * the difference quotient between the two cell centres; walls carry no flux, which is the Neumann
 * condition. So the weak form ∫∇u·∇v = kc² ∫uv becomes
 *
 * <pre>
 *   A = Σ_faces (ℓ_open / d) (e_p − e_q)(e_p − e_q)ᵀ,    M = diag(open cell area)
 * </pre>
 *
 * with d the distance between the two cell centres. This is the two-dimensional form of the
 * conformal scheme of Dey &amp; Mittra (IEEE Microwave and Guided Wave Letters 7(9), 1997), which uses
 * partial edge lengths and partial cell areas in Faraday's law and keeps the full dual lengths.
 * Tiny cut cells are kept: they add only large eigenvalues, and merging them costs an order of
 * accuracy. A cell with open area but no open face to a neighbour would be an isolated spurious zero
 * mode and is dropped.
 */
public final class NeumannCellAssembler {

    private NeumannCellAssembler() {
    }

    /** @return the TE pencil of the cut grid of an air-filled guide; unknowns are the cells with open area */
    public static LatticePencil assemble(CutCells cells) {
        return assemble(cells, PermittivityMap.uniform(1.0));
    }

    /**
     * The Hz pencil at cutoff of a guide with dielectrics (μr = 1): −∇·(a ∇Hz) = k0² Hz with a the
     * smoothed εr⁻¹ tensor of {@link PermittivityMap}. Each face weight is multiplied by the diagonal
     * entry a_eff of its link; where an interface is oblique or curved the off-diagonal entry a_xy adds
     * the node cross term of {@link MixedDerivativeCouplings}, which couples diagonal neighbours
     * (9-point pattern; without it the scheme is only first order at a curved interface). Interfaces
     * parallel to the axes and air give a_xy = 0 and the 5-point pencil. The mass stays the open cell
     * area. λ = k0², the free-space wavenumber at cutoff squared; for air λ = kc².
     *
     * @param cells the cut grid
     * @param medium εr averaged on the same grid
     * @return the pencil; unknowns are the cells with open area
     */
    public static LatticePencil assemble(CutCells cells, PermittivityMap medium) {
        TensorGrid grid = cells.grid();
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        int[] unknownOf = new int[nx * ny];
        int n = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                unknownOf[j * nx + i] = isUnknown(cells, i, j) ? n++ : -1;
            }
        }
        double[] vertical = new double[(nx + 1) * ny];
        double[] horizontal = new double[nx * (ny + 1)];
        for (int j = 0; j < ny; j++) {
            for (int i = 1; i < nx; i++) {
                vertical[j * (nx + 1) + i] = cells.verticalFaceOpenLength(i, j) / centreDistance(xs, i)
                        * medium.verticalFaceInverse(i, j);
            }
        }
        for (int j = 1; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                horizontal[j * nx + i] = cells.horizontalFaceOpenLength(i, j) / centreDistance(ys, j)
                        * medium.horizontalFaceInverse(i, j);
            }
        }
        double[] cross = MixedDerivativeCouplings.of(cells, medium, unknownOf, vertical, horizontal);
        double[] mass = new double[n];
        int[] column = new int[n];
        int[] row = new int[n];
        LatticeMatrixBuilder a = new LatticeMatrixBuilder(n, cross == null ? 5 : 9);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = unknownOf[j * nx + i];
                if (k < 0) {
                    continue;
                }
                column[k] = i;
                row[k] = j;
                mass[k] = cells.cellArea(i, j);
                double down = j > 0 ? horizontal[j * nx + i] : 0;
                double left = i > 0 ? vertical[j * (nx + 1) + i] : 0;
                double right = i + 1 < nx ? vertical[j * (nx + 1) + i + 1] : 0;
                double up = j + 1 < ny ? horizontal[(j + 1) * nx + i] : 0;
                int kDown = j > 0 ? unknownOf[(j - 1) * nx + i] : -1;
                int kLeft = i > 0 ? unknownOf[j * nx + i - 1] : -1;
                int kRight = i + 1 < nx ? unknownOf[j * nx + i + 1] : -1;
                int kUp = j + 1 < ny ? unknownOf[(j + 1) * nx + i] : -1;
                // node (i', j') is the lower-left corner of cell (i', j'); c > 0 pairs SW–NE with +c
                double cSw = cross == null ? 0 : cross[j * (nx + 1) + i];
                double cSe = cross == null ? 0 : cross[j * (nx + 1) + i + 1];
                double cNw = cross == null ? 0 : cross[(j + 1) * (nx + 1) + i];
                double cNe = cross == null ? 0 : cross[(j + 1) * (nx + 1) + i + 1];
                if (cSw != 0) {
                    a.add(unknownOf[(j - 1) * nx + i - 1], -cSw);
                }
                double diagonal = 0;
                if (kDown >= 0 && down > 0) {
                    a.add(kDown, -down);
                    diagonal += down;
                }
                if (cSe != 0) {
                    a.add(unknownOf[(j - 1) * nx + i + 1], cSe);
                }
                if (kLeft >= 0 && left > 0) {
                    a.add(kLeft, -left);
                    diagonal += left;
                }
                int self = k;
                double rightWeight = kRight >= 0 ? right : 0;
                double upWeight = kUp >= 0 ? up : 0;
                double crossDiagonal = cSw - cSe - cNw + cNe;
                a.add(self, crossDiagonal == 0 ? diagonal + rightWeight + upWeight
                        : diagonal + rightWeight + upWeight + crossDiagonal);
                if (rightWeight > 0) {
                    a.add(kRight, -rightWeight);
                }
                if (cNw != 0) {
                    a.add(unknownOf[(j + 1) * nx + i - 1], cNw);
                }
                if (upWeight > 0) {
                    a.add(kUp, -upWeight);
                }
                if (cNe != 0) {
                    a.add(unknownOf[(j + 1) * nx + i + 1], -cNe);
                }
                a.endColumn();
            }
        }
        return new LatticePencil(a.build(), mass, column, row);
    }

    /** Whether cell (i, j) is an unknown of this scheme: open area and an open face to an open neighbour. */
    static boolean isUnknown(CutCells cells, int i, int j) {
        return cells.cellArea(i, j) > 0 && hasOpenFace(cells, i, j);
    }

    private static boolean hasOpenFace(CutCells cells, int i, int j) {
        int nx = cells.grid().cellsX();
        int ny = cells.grid().cellsY();
        return (i > 0 && cells.verticalFaceOpenLength(i, j) > 0 && cells.cellArea(i - 1, j) > 0)
                || (i + 1 < nx && cells.verticalFaceOpenLength(i + 1, j) > 0 && cells.cellArea(i + 1, j) > 0)
                || (j > 0 && cells.horizontalFaceOpenLength(i, j) > 0 && cells.cellArea(i, j - 1) > 0)
                || (j + 1 < ny && cells.horizontalFaceOpenLength(i, j + 1) > 0 && cells.cellArea(i, j + 1) > 0);
    }

    /** Distance between the centres of the cells either side of line k. */
    private static double centreDistance(double[] lines, int k) {
        return 0.5 * (lines[k + 1] - lines[k - 1]);
    }
}
