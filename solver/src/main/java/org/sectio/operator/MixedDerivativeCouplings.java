package org.sectio.operator;

import org.sectio.mesh.CutCells;
import org.sectio.mesh.TensorGrid;

/**
 * The cross term 2 a_xy ∂xHz ∂yHz of the Hz energy ∫ ∇Hz · a ∇Hz, a the smoothed εr⁻¹ tensor of
 * {@link PermittivityMap}, discretized at the grid nodes. At node (i, j) the four cells around it give
 * the gradient of the node's dual cell (the box between their centres, d_x × d_y):
 * ∂x = ((u_SE − u_SW) + (u_NE − u_NW)) / (2 d_x), ∂y = ((u_NW − u_SW) + (u_NE − u_SE)) / (2 d_y), so
 *
 * <pre>
 *   2 a_xy ∂x ∂y d_x d_y = c [(u_NE − u_SW)² − (u_SE − u_NW)²],   c = a_xy / 2,
 * </pre>
 *
 * which couples only the diagonal pairs of cells: with the 5-point face terms it is the symmetric
 * 9-point stencil of the full tensor (the mixed-derivative form of the symmetric finite-volume
 * discretization of anisotropic diffusion; the tensor itself is the subpixel smoothing of Farjadpour
 * et al., Opt. Lett. 31 (2006) 2972, whose second order needs the full tensor: Kottke, Farjadpour and
 * Johnson, Phys. Rev. E 77 (2008) 036611).
 *
 * <p>Positive semi-definiteness: half of each face's energy w Δ² is given to each of its two nodes.
 * At a node the two vertical faces then hold at least α X² with X = (u_SE − u_SW) + (u_NE − u_NW)
 * and α = w₁w₂ / (2(w₁ + w₂)), the two horizontal faces at least β Y², Y = (u_NW − u_SW) + (u_NE − u_SE),
 * and the cross term is c X Y. So the pencil stays semi-definite if c² ≤ 4αβ at every node; c is
 * clipped to that (for a smooth interface it never is: the bound is about a_xx a_yy ≥ a_xy²).
 *
 * <p>Only nodes whose four cells are whole (uncut) and whose four faces are wholly open carry the
 * term; elsewhere (next to a wall) it is left out, which touches O(1) nodes per interface–wall contact.
 */
final class MixedDerivativeCouplings {

    private static final double WHOLE = 1 - 1e-9;

    private MixedDerivativeCouplings() {
    }

    /**
     * @param cells the cut grid
     * @param medium the averaged permittivity
     * @param unknownOf unknown of every cell (row by row), or −1
     * @param vertical face weights w of the vertical faces, index j (cellsX + 1) + i
     * @param horizontal face weights of the horizontal faces, index j cellsX + i
     * @return c of every node, index j (cellsX + 1) + i, or null if every c is 0
     */
    static double[] of(CutCells cells, PermittivityMap medium, int[] unknownOf, double[] vertical,
                       double[] horizontal) {
        if (medium.isUniform()) {
            return null;
        }
        TensorGrid grid = cells.grid();
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        double[] c = new double[(nx + 1) * (ny + 1)];
        boolean any = false;
        for (int j = 1; j < ny; j++) {
            for (int i = 1; i < nx; i++) {
                double axy = medium.nodeCrossInverse(i, j);
                if (axy == 0 || !whole(cells, unknownOf, xs, ys, i, j)) {
                    continue;
                }
                double w1 = vertical[(j - 1) * (nx + 1) + i];
                double w2 = vertical[j * (nx + 1) + i];
                double v1 = horizontal[j * nx + i - 1];
                double v2 = horizontal[j * nx + i];
                double alpha = w1 * w2 / (2 * (w1 + w2));
                double beta = v1 * v2 / (2 * (v1 + v2));
                double bound = 2 * Math.sqrt(alpha * beta);
                c[j * (nx + 1) + i] = Math.max(-bound, Math.min(bound, 0.5 * axy));
                any = true;
            }
        }
        return any ? c : null;
    }

    private static boolean whole(CutCells cells, int[] unknownOf, double[] xs, double[] ys, int i, int j) {
        int nx = xs.length - 1;
        for (int dj = -1; dj <= 0; dj++) {
            for (int di = -1; di <= 0; di++) {
                int ci = i + di;
                int cj = j + dj;
                double full = (xs[ci + 1] - xs[ci]) * (ys[cj + 1] - ys[cj]);
                if (unknownOf[cj * nx + ci] < 0 || cells.cellArea(ci, cj) < WHOLE * full) {
                    return false;
                }
            }
        }
        return cells.verticalFaceOpenLength(i, j - 1) >= WHOLE * (ys[j] - ys[j - 1])
                && cells.verticalFaceOpenLength(i, j) >= WHOLE * (ys[j + 1] - ys[j])
                && cells.horizontalFaceOpenLength(i - 1, j) >= WHOLE * (xs[i] - xs[i - 1])
                && cells.horizontalFaceOpenLength(i, j) >= WHOLE * (xs[i + 1] - xs[i]);
    }
}
