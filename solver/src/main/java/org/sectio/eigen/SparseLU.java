package org.sectio.eigen;

import org.ejml.data.DMatrixSparseCSC;
import org.ejml.sparse.csc.decomposition.lu.LuUpLooking_DSCC;
import org.ejml.sparse.csc.misc.TriangularSolver_DSCC;

/**
 * Sparse LU factorization {@code P (Q A Qᵀ) = L U} of a square, structurally symmetric matrix whose
 * unknowns sit on a lattice: Q is the nested-dissection order of {@link NestedDissection} (George 1973),
 * computed once per pattern and reused, P the row pivoting of the left-looking Gilbert–Peierls
 * factorization with partial pivoting (J. R. Gilbert and T. Peierls, "Sparse partial pivoting in time
 * proportional to arithmetic operations", SIAM J. Sci. Stat. Comput. 9 (1988) 862–874), here EJML's
 * {@code LuUpLooking_DSCC} (T. Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006,
 * §6.3). Why not our multifrontal kernels: they are Cholesky-only, and the non-symmetric operators
 * of the vector solver need pivoting; this factorization is exact and its cost is measured in the
 * benchmarks. The factor is immutable; {@link #solve} keeps its working storage local.
 */
public final class SparseLU {

    private final int[] order;
    private final int[] pivotInverse;
    private final DMatrixSparseCSC lower;
    private final DMatrixSparseCSC upper;

    private SparseLU(int[] order, int[] pivotInverse, DMatrixSparseCSC lower, DMatrixSparseCSC upper) {
        this.order = order;
        this.pivotInverse = pivotInverse;
        this.lower = lower;
        this.upper = upper;
    }

    /**
     * The nested-dissection order of lattice unknowns, to be reused for every matrix of one pattern.
     *
     * @param column lattice column of every unknown
     * @param row lattice row of every unknown (points distinct, couplings between lattice neighbours)
     * @return {@code order[p]} = original index of the unknown eliminated p-th
     * @throws IllegalArgumentException as {@link NestedDissection#latticeOrdering}
     */
    public static int[] latticeOrder(int[] column, int[] row) {
        return NestedDissection.latticeOrdering(column, row);
    }

    /**
     * Factors {@code a} in the given elimination order.
     *
     * @param a square matrix, not modified
     * @param order a permutation of 0 … n−1 (e.g. {@link #latticeOrder})
     * @return the factorization
     * @throws IllegalArgumentException if sizes disagree
     * @throws EigenSolverException if the matrix is singular to working precision
     */
    public static SparseLU factor(DMatrixSparseCSC a, int[] order) {
        int n = a.numCols;
        if (a.numRows != n || order.length != n) {
            throw new IllegalArgumentException("sparse LU: matrix is " + a.numRows + " × " + a.numCols + " with an order"
                    + " of " + order.length + " unknowns; need a square matrix and one position per unknown");
        }
        DMatrixSparseCSC permuted = permuteSymmetric(a, order);
        LuUpLooking_DSCC lu = new LuUpLooking_DSCC(null);
        if (!lu.decompose(permuted) || lu.isSingular()) {
            throw new EigenSolverException("sparse LU: the matrix of order " + n + " is singular to working precision;"
                    + " choose another shift", 0, 0, 0, 0);
        }
        return new SparseLU(order.clone(), lu.getPinv().clone(), lu.getL(), lu.getU());
    }

    /** B = Q A Qᵀ, B[p][q] = A[order[p]][order[q]], rows sorted. */
    static DMatrixSparseCSC permuteSymmetric(DMatrixSparseCSC a, int[] order) {
        int n = a.numCols;
        int[] position = new int[n];
        for (int p = 0; p < n; p++) {
            position[order[p]] = p;
        }
        DMatrixSparseCSC b = new DMatrixSparseCSC(n, n, a.nz_length);
        int out = 0;
        int[] rows = new int[16];
        double[] values = new double[16];
        for (int q = 0; q < n; q++) {
            b.col_idx[q] = out;
            int c = order[q];
            int count = a.col_idx[c + 1] - a.col_idx[c];
            if (count > rows.length) {
                rows = new int[count];
                values = new double[count];
            }
            for (int k = 0; k < count; k++) {
                int r = position[a.nz_rows[a.col_idx[c] + k]];
                double v = a.nz_values[a.col_idx[c] + k];
                int at = k - 1;
                while (at >= 0 && rows[at] > r) {
                    rows[at + 1] = rows[at];
                    values[at + 1] = values[at];
                    at--;
                }
                rows[at + 1] = r;
                values[at + 1] = v;
            }
            System.arraycopy(rows, 0, b.nz_rows, out, count);
            System.arraycopy(values, 0, b.nz_values, out, count);
            out += count;
        }
        b.col_idx[n] = out;
        b.nz_length = out;
        b.indicesSorted = true;
        return b;
    }

    /** @return the order n */
    public int size() {
        return order.length;
    }

    /** @return non-zeros of L and U together */
    public long factorNonZeros() {
        return (long) lower.nz_length + upper.nz_length;
    }

    /**
     * Solves {@code A x = b}.
     *
     * @param rightHandSide b, length n, not modified
     * @param solution x, length n, overwritten
     */
    public void solve(double[] rightHandSide, double[] solution) {
        int n = order.length;
        double[] work = new double[n];
        for (int p = 0; p < n; p++) {
            work[pivotInverse[p]] = rightHandSide[order[p]];
        }
        TriangularSolver_DSCC.solveL(lower, work);
        TriangularSolver_DSCC.solveU(upper, work);
        for (int p = 0; p < n; p++) {
            solution[order[p]] = work[p];
        }
    }
}
