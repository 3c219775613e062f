package org.sectio.eigen;

import org.ejml.data.DMatrixSparseCSC;

/**
 * Supernodal (multifrontal) Cholesky factorization {@code P A Pᵀ = L Lᵀ} of a sparse symmetric
 * positive definite lattice matrix (5- or 9-point couplings), with {@code P} the nested-dissection order
 * of {@link NestedDissection} and one dense front per dissection node (Duff and Reid, ACM TOMS 9
 * (1983) 302–325; Liu, SIAM Review 34 (1992) 82–109). The factor is immutable; {@link #solve} keeps
 * all working storage local and may be called from several threads at once.
 *
 * <p>A solve is a forward sweep up the tree ({@code L11 y = b}, then {@code b_boundary −= L21 y}
 * per front) and a backward sweep down it ({@code y −= L21ᵀ x_boundary}, then {@code L11ᵀ x = y}).
 * The sweeps, with the top levels' subtrees swept apart on two cores when {@code threads > 1} at
 * factor time, are {@link SplitSweeps}; the result does not depend on the thread count.
 */
public final class MultifrontalCholesky implements SymmetricFactorization {

    private final MultifrontalAnalysis analysis;
    private final FrontFactor[] fronts;
    private final long nonZeros;
    private final boolean parallel;
    private final SplitSweeps sweeps;

    MultifrontalCholesky(MultifrontalAnalysis analysis, FrontFactor[] fronts, int threads) {
        this.analysis = analysis;
        this.fronts = fronts;
        this.parallel = threads > 1;
        this.sweeps = new SplitSweeps(analysis, parallel);
        long count = 0;
        for (FrontFactor front : fronts) {
            count += front.nonZeros();
        }
        this.nonZeros = count;
    }

    /**
     * Orders, analyses and factors in one call; use {@link MultifrontalAnalysis#analyse} and
     * {@link MultifrontalAnalysis#factor} to reuse the analysis over matrices of one pattern.
     *
     * @param symmetric SPD matrix in full symmetric storage, couplings between lattice neighbours only
     * @param column lattice column of every unknown
     * @param row lattice row of every unknown (points distinct)
     * @param threads worker threads, {@code ≥ 1}; with more than one, solves also use the common pool
     * @return the factorization
     * @throws IllegalArgumentException if the input is inconsistent (see {@link MultifrontalAnalysis#analyse})
     * @throws NotPositiveDefiniteException if a pivot is {@code ≤ 0}
     */
    public static MultifrontalCholesky factor(DMatrixSparseCSC symmetric, int[] column, int[] row, int threads) {
        return MultifrontalAnalysis.analyse(symmetric, column, row).factor(symmetric, threads);
    }

    @Override
    public int size() {
        return analysis.size();
    }

    @Override
    public long factorNonZeros() {
        return nonZeros;
    }

    /** @return the symbolic analysis this factor was computed from */
    public MultifrontalAnalysis analysis() {
        return analysis;
    }

    @Override
    public void solve(double[] rightHandSide, double[] solution) {
        int n = analysis.size();
        if (rightHandSide.length != n || solution.length != n) {
            throw new IllegalArgumentException("multifrontal solve: matrix order " + n + ", right-hand side length "
                    + rightHandSide.length + ", solution length " + solution.length);
        }
        if (rightHandSide == solution) {
            throw new IllegalArgumentException("multifrontal solve: right-hand side and solution must be distinct arrays");
        }
        int[] perm = analysis.tree().permutation();
        double[] work = new double[n];
        int half = n / 2;
        TaskPair.run(parallel, () -> gather(rightHandSide, perm, work, 0, half),
                () -> gather(rightHandSide, perm, work, half, n));
        sweep(work, 1);
        TaskPair.run(parallel, () -> scatter(work, perm, solution, 0, half),
                () -> scatter(work, perm, solution, half, n));
    }

    /**
     * Solves {@code A X = B} for several right-hand sides in one pass over the factor: the sweeps
     * read each entry of {@code L} once for all columns (see {@link BlockFrontSubstitution}). Every
     * solution is bitwise equal to {@link #solve(double[], double[])} of its right-hand side.
     *
     * @param rightHandSides {@code k ≥ 1} vectors of length {@link #size()}
     * @param solutions {@code k} vectors of length {@link #size()}, distinct from the right-hand sides
     * @throws IllegalArgumentException if counts or lengths disagree, or a solution array is also a
     *     right-hand side or appears twice
     */
    public void solve(double[][] rightHandSides, double[][] solutions) {
        int n = analysis.size();
        int k = rightHandSides.length;
        if (k == 0 || solutions.length != k) {
            throw new IllegalArgumentException("multifrontal solve: " + k + " right-hand sides and "
                    + solutions.length + " solutions; need as many of each, at least one");
        }
        for (int j = 0; j < k; j++) {
            if (rightHandSides[j].length != n || solutions[j].length != n) {
                throw new IllegalArgumentException("multifrontal solve: matrix order " + n + ", right-hand side " + j
                        + " of length " + rightHandSides[j].length + ", solution of length " + solutions[j].length);
            }
            for (int i = 0; i < k; i++) {
                if (solutions[j] == rightHandSides[i] || (i != j && solutions[j] == solutions[i])) {
                    throw new IllegalArgumentException("multifrontal solve: solution " + j
                            + " shares its array with another right-hand side or solution");
                }
            }
        }
        if (k == 1) {
            solve(rightHandSides[0], solutions[0]);
            return;
        }
        int[] perm = analysis.tree().permutation();
        double[] work = new double[n * k];
        int half = n / 2;
        TaskPair.run(parallel, () -> gather(rightHandSides, perm, work, 0, half),
                () -> gather(rightHandSides, perm, work, half, n));
        sweep(work, k);
        TaskPair.run(parallel, () -> scatter(work, perm, solutions, 0, half),
                () -> scatter(work, perm, solutions, half, n));
    }

    private static void gather(double[] source, int[] perm, double[] target, int from, int to) {
        for (int p = from; p < to; p++) {
            target[p] = source[perm[p]];
        }
    }

    private static void scatter(double[] source, int[] perm, double[] target, int from, int to) {
        for (int p = from; p < to; p++) {
            target[perm[p]] = source[p];
        }
    }

    private static void gather(double[][] source, int[] perm, double[] target, int from, int to) {
        int k = source.length;
        for (int p = from; p < to; p++) {
            int q = perm[p];
            for (int j = 0; j < k; j++) {
                target[p * k + j] = source[j][q];
            }
        }
    }

    private static void scatter(double[] source, int[] perm, double[][] target, int from, int to) {
        int k = target.length;
        for (int p = from; p < to; p++) {
            int q = perm[p];
            for (int j = 0; j < k; j++) {
                target[j][q] = source[p * k + j];
            }
        }
    }

    /** Forward step of front {@code u} on {@code k} interleaved vectors. */
    private void forward(int u, double[] work, double[] scratch, int k) {
        if (k == 1) {
            FrontSubstitution.forward(fronts[u], work, scratch);
        } else {
            BlockFrontSubstitution.forward(fronts[u], work, scratch, k);
        }
    }

    /** Backward step of front {@code u} on {@code k} interleaved vectors. */
    private void backward(int u, double[] work, double[] scratch, int k) {
        if (k == 1) {
            FrontSubstitution.backward(fronts[u], work, scratch);
        } else {
            BlockFrontSubstitution.backward(fronts[u], work, scratch, k);
        }
    }

    /** Both sweeps on k interleaved vectors. */
    private void sweep(double[] work, int k) {
        sweeps.forward(work, k, (u, w, scratch, more) -> forward(u, w, scratch, k));
        sweeps.backward(work, k, (u, w, scratch, more) -> backward(u, w, scratch, k));
    }
}
