package org.sectio.operator;

import org.ejml.data.DMatrixSparseCSC;

/**
 * The parts of the transverse-field eigenproblem A(k0) h = β² h, A = k0² E − L, of
 * {@link TransverseFieldAssembler}, with what is needed to rebuild the full field from h.
 * Arrays are shared, not copied: this is a kernel value handed between the operator and modes
 * packages, never to a user.
 *
 * @param edges the edge unknowns and their lengths
 * @param operatorReal Re L, n × n, structurally symmetric pattern, rad⁰·m⁻² (1/m²)
 * @param operatorImaginary Im L with the same pattern, or null for a lossless medium
 * @param edgePermittivityReal Re εr at every edge
 * @param edgePermittivityImaginary Im εr = −⟨ε′ tan δ⟩ at every edge, or null
 * @param edgeWeight W_f = ℓ_f d_f, m²
 * @param cellArea S of every TE cell unknown, m²
 * @param nodeArea dual-cell area of every TM node unknown, m²
 * @param nodePermittivityReal Re ⟨εr⟩ of every TM node unknown
 * @param nodePermittivityImaginary Im ⟨εr⟩ of every node, or null
 * @param latticeColumn lattice column of every edge (nested-dissection ordering)
 * @param latticeRow lattice row of every edge
 */
public record YeePencil(YeeEdges edges, DMatrixSparseCSC operatorReal, DMatrixSparseCSC operatorImaginary,
                        double[] edgePermittivityReal, double[] edgePermittivityImaginary, double[] edgeWeight,
                        double[] cellArea, double[] nodeArea, double[] nodePermittivityReal,
                        double[] nodePermittivityImaginary, int[] latticeColumn, int[] latticeRow) {

    /** @return the number of edge unknowns */
    public int size() {
        return edgeWeight.length;
    }

    /** @return whether a material is lossy (L, E and N complex) */
    public boolean lossy() {
        return operatorImaginary != null;
    }

    /** @return the largest Re εr over the edges */
    public double maximumPermittivity() {
        double max = 1;
        for (double e : edgePermittivityReal) {
            max = Math.max(max, e);
        }
        for (double e : nodePermittivityReal) {
            max = Math.max(max, e);
        }
        return max;
    }

    /**
     * The real matrix τ I − A(k0) = L + diag(τ − k0² Re E), new, same pattern as L.
     *
     * @param k0 free-space wavenumber, rad/m
     * @param shift τ, rad²/m²
     * @return the shifted operator's real part
     */
    public DMatrixSparseCSC shiftedReal(double k0, double shift) {
        DMatrixSparseCSC k = operatorReal.copy();
        for (int c = 0; c < k.numCols; c++) {
            for (int p = k.col_idx[c]; p < k.col_idx[c + 1]; p++) {
                if (k.nz_rows[p] == c) {
                    k.nz_values[p] += shift - k0 * k0 * edgePermittivityReal[c];
                }
            }
        }
        return k;
    }
}
