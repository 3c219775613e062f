package org.sectio.operator;

import org.ejml.data.DMatrixSparseCSC;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;

/**
 * The full-vector eigenproblem of a guide with dielectrics (μr = 1) at a given frequency, in the
 * transverse magnetic field on the Yee lattice of {@link YeeEdges}: the Yee-mesh formulation of
 * Z. Zhu &amp; T. G. Brown, "Full-vectorial finite-difference analysis of microstructured optical
 * fibers", Opt. Express 10(17) (2002) 853–864 (volume and pages from memory), written with the
 * cut-cell lengths of the scalar solvers so that metal walls stay conformal.
 *
 * <p>With fields ∝ exp(j(ωt − βz)), Ht = (Hx, Hy) continuous across dielectric interfaces, and the
 * free-space wavenumber k0, Maxwell's equations give
 *
 * <pre>
 *   ∇t(∇t·Ht) − εr ∇t×(εr⁻¹ ∇t×Ht) + k0² εr Ht = β² Ht,
 *   Hz = ∇t·Ht / (jβ),   Ez = (∇t×Ht)·ẑ / (jω ε0 εr).
 * </pre>
 *
 * Discretely, with D = S⁻¹B the divergence from edges to cells (B_pf = ±ℓ_f, outflow positive, S the
 * open cell areas), G = −W⁻¹Bᵀ the gradient back (W_f = ℓ_f d_f), C = Aₙ⁻¹T the circulation around
 * node dual cells (T_nf = ±d_f, counter-clockwise, Aₙ the dual-cell areas) and R = W⁻¹Tᵀ the rotated
 * gradient of a node field (φ = 0 on metal):
 *
 * <pre>
 *   A(k0) = k0² E − L,   L = W⁻¹ Bᵀ S⁻¹ B + E W⁻¹ Tᵀ (N Aₙ)⁻¹ T,
 * </pre>
 *
 * E = diag εr at the edges (the smoothed permittivity that the TE scheme's face flux sees, i.e.
 * 1 / {@link PermittivityMap#verticalFaceInverse}: Ey and Ex live on these faces) and N = diag ⟨εr⟩ of
 * the node dual cells (the TM scheme's mass). The discrete identities C G = 0 and D R = 0 hold
 * exactly, so there are no spurious modes, and in a homogeneous filling A Gψ = (k0² εr − kc²) Gψ for
 * every TE eigenvector ψ of {@link NeumannCellAssembler} and A Rφ = (k0² εr − kc²) Rφ for every TM
 * eigenvector φ of {@link DirichletNodeAssembler} (the open length of a cut link is the TM scheme's
 * θ h): β² = k0² εr − kc² mode by mode. At β = 0 the singular points of A(k0) are the scalar cutoffs
 * of both pencils (without the TE scheme's off-diagonal tensor terms at oblique interfaces).
 *
 * <p>L does not depend on k0, so a band sweep assembles it once; its pattern is structurally
 * symmetric, its values are not (E multiplies the curl term from the left). A lossy material has
 * εr = ε′(1 − j tan δ); then E and N are complex and so is L ({@link YeePencil#operatorImaginary}).
 */
public final class TransverseFieldAssembler {

    private TransverseFieldAssembler() {
    }

    /**
     * Assembles L of a lossless medium.
     *
     * @param cells the cut grid
     * @param medium εr averaged on the same grid
     * @return the pencil parts
     */
    public static YeePencil assemble(CutCells cells, PermittivityMap medium) {
        return assemble(cells, medium, null);
    }

    /**
     * Assembles L with lossy materials.
     *
     * @param cells the cut grid
     * @param medium εr′ averaged on the same grid
     * @param loss ⟨ε′ tan δ⟩ on the same control volumes, or null for a lossless medium
     * @return the pencil parts
     */
    public static YeePencil assemble(CutCells cells, PermittivityMap medium, LossMap loss) {
        YeeEdges edges = YeeEdges.of(cells);
        TensorGrid grid = cells.grid();
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        int n = edges.size();
        double[] weight = new double[n];
        double[] epsRe = new double[n];
        double[] epsIm = new double[n];
        int[] vertical = new int[(nx + 1) * ny];
        int[] horizontal = new int[nx * (ny + 1)];
        java.util.Arrays.fill(vertical, -1);
        java.util.Arrays.fill(horizontal, -1);
        for (int f = 0; f < n; f++) {
            int i = edges.faceColumn(f);
            int j = edges.faceRow(f);
            weight[f] = edges.openLength(f) * edges.dualLength(f);
            if (edges.kind(f) == YeeEdges.HX) {
                vertical[j * (nx + 1) + i] = f;
                epsRe[f] = 1.0 / medium.verticalFaceInverse(i, j);
                epsIm[f] = loss == null ? 0 : -loss.verticalFace(i, j);
            } else {
                horizontal[j * nx + i] = f;
                epsRe[f] = 1.0 / medium.horizontalFaceInverse(i, j);
                epsIm[f] = loss == null ? 0 : -loss.horizontalFace(i, j);
            }
        }
        PairAccumulator sum = new PairAccumulator(n, 16 * (edges.cellCount() + edges.nodes().unknowns()),
                loss != null);
        int[] local = new int[4];
        double[] coefficient = new double[4];
        double[] cellArea = new double[edges.cellCount()];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                if (edges.cellUnknown(i, j) < 0) {
                    continue;
                }
                double s = cells.cellArea(i, j);
                cellArea[edges.cellUnknown(i, j)] = s;
                // outflow: +ℓ on the right and top faces, −ℓ on the left and bottom
                int m = 0;
                m = put(vertical, j * (nx + 1) + i, -1, edges, local, coefficient, m, true);
                m = put(vertical, j * (nx + 1) + i + 1, +1, edges, local, coefficient, m, true);
                m = put(horizontal, j * nx + i, -1, edges, local, coefficient, m, true);
                m = put(horizontal, (j + 1) * nx + i, +1, edges, local, coefficient, m, true);
                for (int a = 0; a < m; a++) {
                    for (int b = 0; b < m; b++) {
                        sum.add(local[a], local[b], coefficient[a] * coefficient[b] / (weight[local[a]] * s), 0);
                    }
                }
            }
        }
        NodeLinks links = edges.nodes();
        double[] nodeArea = new double[links.unknowns()];
        double[] nodeRe = new double[links.unknowns()];
        double[] nodeIm = new double[links.unknowns()];
        for (int k = 0; k < links.unknowns(); k++) {
            int node = links.nodeOf(k);
            int i = node % (nx + 1);
            int j = node / (nx + 1);
            double area = 0.25 * (grid.xStep(i, -1) + grid.xStep(i, +1)) * (grid.yStep(j, -1) + grid.yStep(j, +1));
            nodeArea[k] = area;
            nodeRe[k] = medium.nodeMean(i, j);
            nodeIm[k] = loss == null ? 0 : -loss.node(i, j);
            // counter-clockwise circulation: +d on the link below (Hx) and the right link (Hy), −d above and left
            int m = 0;
            m = j > 0 ? put(vertical, (j - 1) * (nx + 1) + i, +1, edges, local, coefficient, m, false) : m;
            m = j < ny ? put(vertical, j * (nx + 1) + i, -1, edges, local, coefficient, m, false) : m;
            m = i > 0 ? put(horizontal, j * nx + i - 1, -1, edges, local, coefficient, m, false) : m;
            m = i < nx ? put(horizontal, j * nx + i, +1, edges, local, coefficient, m, false) : m;
            // E_f / N_n, complex when lossy
            double nn = nodeRe[k] * nodeRe[k] + nodeIm[k] * nodeIm[k];
            for (int a = 0; a < m; a++) {
                int f = local[a];
                double ratioRe = (epsRe[f] * nodeRe[k] + epsIm[f] * nodeIm[k]) / nn;
                double ratioIm = (epsIm[f] * nodeRe[k] - epsRe[f] * nodeIm[k]) / nn;
                for (int b = 0; b < m; b++) {
                    double t = coefficient[a] * coefficient[b] / (weight[f] * area);
                    sum.add(f, local[b], t * ratioRe, t * ratioIm);
                }
            }
        }
        DMatrixSparseCSC[] parts = sum.build();
        return new YeePencil(edges, parts[0], parts[1], epsRe, loss == null ? null : epsIm, weight, cellArea,
                nodeArea, nodeRe, loss == null ? null : nodeIm, edges.latticeColumns(), edges.latticeRows());
    }

    /** Appends the edge at {@code face} (if it is an unknown) with sign × (ℓ for cells, d for nodes). */
    private static int put(int[] faces, int face, int sign, YeeEdges edges, int[] local, double[] coefficient, int m,
                           boolean open) {
        int f = faces[face];
        if (f < 0) {
            return m;
        }
        local[m] = f;
        coefficient[m] = sign * (open ? edges.openLength(f) : edges.dualLength(f));
        return m + 1;
    }
}
