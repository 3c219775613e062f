package org.sectio.eigen;

import java.util.Arrays;
import org.ejml.data.DMatrixSparseCSC;

/**
 * Multifrontal LU factorization {@code P Q A Qᵀ = L U} of a square lattice matrix with a structurally
 * symmetric pattern and unsymmetric values, on the nested-dissection tree and front structure of
 * {@link MultifrontalAnalysis} (which depend on the pattern only, so one analysis serves every matrix
 * of a sweep). The fronts are dense and square: the front of node v holds its own columns and rows
 * and the boundary; its own columns are eliminated with partial pivoting among its own (fully summed)
 * rows, which keeps the tree's structure static (I. S. Duff and J. K. Reid, "The multifrontal solution
 * of unsymmetric sets of linear equations", SIAM J. Sci. Stat. Comput. 5 (1984) 633–641; J. W. H. Liu,
 * SIAM Review 34 (1992) 82–109). A pivot smaller than {@value #STATIC_PIVOT} times the largest entry
 * of the matrix is replaced by that size (static pivoting, X. S. Li and J. W. Demmel, ACM TOMS 29
 * (2003) 110–140), and every solve is then followed by iterative refinement against the original
 * matrix; {@link #perturbedPivots()} counts them.
 *
 * <p>The dense work is {@link LuFrontKernels} (blocked, split over workers in large fronts), the
 * tree walk {@link LuElimination} (sibling subtrees as fork-join tasks) and the solve
 * {@link LuFrontSubstitution}, with the top two tree levels' subtrees swept independently. The factor
 * is immutable; {@link #solve} keeps its working storage local and may run from several threads.
 */
public final class MultifrontalLU {

    /** Relative size of a static pivot. */
    static final double STATIC_PIVOT = 1e-10;
    private static final int REFINEMENT_STEPS = 3;

    private final MultifrontalAnalysis analysis;
    private final DMatrixSparseCSC matrix;
    private final LuFactor factor;
    private final int perturbed;
    private final SplitSweeps sweeps;

    private MultifrontalLU(MultifrontalAnalysis analysis, DMatrixSparseCSC matrix, LuFactor factor, int perturbed,
                           boolean parallel) {
        this.analysis = analysis;
        this.matrix = matrix;
        this.factor = factor;
        this.perturbed = perturbed;
        this.sweeps = new SplitSweeps(analysis, parallel);
    }

    /**
     * The pattern-only phase: nested-dissection tree, fronts and the map from matrix entries (both
     * triangles) into them.
     *
     * @param symbolic the multifrontal analysis of the pattern
     * @param transposeIndex for every stored entry (r, c) the index of the entry (c, r)
     */
    public record Analysis(MultifrontalAnalysis symbolic, int[] transposeIndex) {

        /**
         * @param pattern structurally symmetric lattice matrix (see {@link MultifrontalAnalysis#analyse}),
         *     rows sorted within columns
         * @param column lattice column of every unknown
         * @param row lattice row of every unknown
         * @return the analysis
         * @throws IllegalArgumentException as {@link MultifrontalAnalysis#analyse}, or if rows are not sorted
         */
        public static Analysis of(DMatrixSparseCSC pattern, int[] column, int[] row) {
            int n = pattern.numCols;
            for (int c = 0; c < n; c++) {
                for (int idx = pattern.col_idx[c] + 1; idx < pattern.col_idx[c + 1]; idx++) {
                    if (pattern.nz_rows[idx] <= pattern.nz_rows[idx - 1]) {
                        throw new IllegalArgumentException("multifrontal LU: rows of column " + c + " are not strictly"
                                + " ascending; sort the matrix (DMatrixSparseCSC.sortIndices) first");
                    }
                }
            }
            MultifrontalAnalysis symbolic = MultifrontalAnalysis.analyse(pattern, column, row);
            int[] next = Arrays.copyOf(pattern.col_idx, n);
            int[] transpose = new int[pattern.nz_length];
            for (int c = 0; c < n; c++) {
                for (int idx = pattern.col_idx[c]; idx < pattern.col_idx[c + 1]; idx++) {
                    transpose[idx] = next[pattern.nz_rows[idx]]++;
                }
            }
            return new Analysis(symbolic, transpose);
        }

        /**
         * Factors on one thread.
         *
         * @param a matrix with the analysed pattern, not modified (kept for refinement)
         * @return the factorization
         * @throws IllegalArgumentException if the pattern differs
         */
        public MultifrontalLU factor(DMatrixSparseCSC a) {
            return MultifrontalLU.factor(this, a, 1);
        }

        /**
         * @param a matrix with the analysed pattern, not modified (kept for refinement)
         * @param threads worker threads, ≥ 1; with more than one, solves also use the common fork-join
         *     pool; the factor and every solve are the same for any thread count
         * @return the factorization
         * @throws IllegalArgumentException if the pattern differs or threads &lt; 1
         */
        public MultifrontalLU factor(DMatrixSparseCSC a, int threads) {
            return MultifrontalLU.factor(this, a, threads);
        }
    }

    static MultifrontalLU factor(Analysis analysis, DMatrixSparseCSC a, int threads) {
        MultifrontalAnalysis symbolic = analysis.symbolic();
        int n = symbolic.size();
        if (a.numCols != n || a.numRows != n || a.nz_length != analysis.transposeIndex().length) {
            throw new IllegalArgumentException("multifrontal LU: matrix " + a.numRows + " × " + a.numCols + " with "
                    + a.nz_length + " entries does not have the analysed pattern of order " + n);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("multifrontal LU: threads must be at least 1, got " + threads);
        }
        double largest = 0;
        for (int k = 0; k < a.nz_length; k++) {
            largest = Math.max(largest, Math.abs(a.nz_values[k]));
        }
        LuElimination.Result r = LuElimination.eliminate(symbolic, a.nz_values, analysis.transposeIndex(),
                STATIC_PIVOT * largest, threads);
        return new MultifrontalLU(symbolic, a, r.factor(), r.perturbedPivots(), threads > 1);
    }

    /** @return the order n */
    public int size() {
        return analysis.size();
    }

    /** @return the number of pivots replaced by static pivoting (0 for a well-pivoted matrix) */
    public int perturbedPivots() {
        return perturbed;
    }

    /** @return stored entries of L and U */
    public long factorNonZeros() {
        return factor.entries();
    }

    /**
     * Solves {@code A x = b} (with iterative refinement if pivots were perturbed).
     *
     * @param rightHandSide b, length n, not modified
     * @param solution x, length n, overwritten; distinct from b
     */
    public void solve(double[] rightHandSide, double[] solution) {
        substitute(rightHandSide, solution);
        if (perturbed == 0) {
            return;
        }
        int n = size();
        double[] residual = new double[n];
        double[] correction = new double[n];
        for (int step = 0; step < REFINEMENT_STEPS; step++) {
            System.arraycopy(rightHandSide, 0, residual, 0, n);
            for (int c = 0; c < n; c++) {
                for (int idx = matrix.col_idx[c]; idx < matrix.col_idx[c + 1]; idx++) {
                    residual[matrix.nz_rows[idx]] -= matrix.nz_values[idx] * solution[c];
                }
            }
            substitute(residual, correction);
            for (int k = 0; k < n; k++) {
                solution[k] += correction[k];
            }
        }
    }

    private void substitute(double[] rightHandSide, double[] solution) {
        int n = size();
        int[] perm = analysis.tree().permutation();
        double[] work = new double[n];
        for (int p = 0; p < n; p++) {
            work[p] = rightHandSide[perm[p]];
        }
        sweeps.forward(work, 1, (v, w, scratch, more) -> LuFrontSubstitution.forward(factor, v, w, scratch));
        sweeps.backward(work, 1, (v, w, scratch, more) -> LuFrontSubstitution.backward(factor, v, w, scratch, more));
        for (int p = 0; p < n; p++) {
            solution[perm[p]] = work[p];
        }
    }
}
