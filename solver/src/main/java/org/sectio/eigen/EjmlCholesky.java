package org.sectio.eigen;

import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.csc.decomposition.chol.CholeskyUpLooking_DSCC;
import org.ejml.sparse.csc.misc.TriangularSolver_DSCC;

/**
 * The reference sparse Cholesky factorization {@code P K Pᵀ = L Lᵀ} of a symmetric positive definite
 * matrix {@code K}, computed by EJML's up-looking Cholesky ({@link CholeskyUpLooking_DSCC}, the
 * algorithm of T. A. Davis, <i>Direct Methods for Sparse Linear Systems</i>, SIAM 2006, §4.4, routine
 * {@code cs_chol}).
 *
 * <p>EJML has no fill-reducing ordering of its own: the caller supplies the permutation (for example
 * from a nested dissection), or none, in which case the natural order is used. The permuted matrix is
 * handed to EJML as its <b>upper triangle only</b>: the up-looking algorithm reads entries
 * {@code (i, j)} with {@code i ≤ j} and ignores the strict lower triangle, so the input {@code K} must
 * be stored with both triangles and is assumed exactly symmetric (only its upper triangle after
 * permutation is read).
 *
 * <p>Instances are immutable; {@link #solve} only reads the factor and uses one work vector per
 * calling thread, so it may be called from several threads at once and does not allocate after the
 * first call on a thread.
 */
public final class EjmlCholesky implements SymmetricFactorization {

    private final int order;
    private final int[] permutation;
    private final DMatrixSparseCSC lower;
    private final ThreadLocal<double[]> workspace;

    /**
     * Factors {@code P K Pᵀ} where {@code (P K Pᵀ)[k][l] = K[perm[k]][perm[l]]}.
     *
     * @param matrix {@code K}, square, symmetric positive definite, both triangles stored; not modified
     * @param permutation {@code perm[k]} is the original index of row {@code k} of the permuted matrix;
     *        must be a permutation of {@code 0..n-1}; {@code null} means the identity
     * @throws IllegalArgumentException if {@code K} is not square, the permutation is not one of
     *         {@code 0..n-1}, or the factorization meets a non-positive pivot ({@code K} not positive
     *         definite, e.g. a shift above the lowest eigenvalue)
     */
    public EjmlCholesky(DMatrixSparseCSC matrix, int[] permutation) {
        if (matrix.numRows != matrix.numCols) {
            throw new IllegalArgumentException("Cholesky needs a square matrix, got " + matrix.numRows + " x "
                    + matrix.numCols);
        }
        this.order = matrix.numRows;
        this.permutation = permutation == null ? identity(order) : validated(permutation, order);
        DMatrixSparseCSC upper = permutedUpperTriangle(matrix, this.permutation);
        CholeskyUpLooking_DSCC cholesky = new CholeskyUpLooking_DSCC();
        if (!cholesky.decompose(upper)) {
            throw new IllegalArgumentException("Cholesky of the " + order + " x " + order
                    + " matrix met a non-positive pivot: the matrix is not positive definite"
                    + " (if it is A - sigma M, lower the shift sigma below the lowest eigenvalue)");
        }
        this.lower = cholesky.getL().copy();
        this.workspace = ThreadLocal.withInitial(() -> new double[order]);
    }

    @Override
    public int size() {
        return order;
    }

    /**
     * Solves {@code K x = b} as {@code x = Pᵀ L⁻ᵀ L⁻¹ P b}.
     *
     * @throws IllegalArgumentException if a length differs from {@link #size()} or both arrays are the same
     */
    @Override
    public void solve(double[] rightHandSide, double[] solution) {
        if (rightHandSide.length != order || solution.length != order) {
            throw new IllegalArgumentException("solve: right-hand side length " + rightHandSide.length
                    + " and solution length " + solution.length + " must both equal the order " + order);
        }
        if (rightHandSide == solution) {
            throw new IllegalArgumentException("solve: pass distinct arrays for the right-hand side and the solution");
        }
        double[] permuted = workspace.get();
        for (int k = 0; k < order; k++) {
            permuted[k] = rightHandSide[permutation[k]];
        }
        TriangularSolver_DSCC.solveL(lower, permuted);
        TriangularSolver_DSCC.solveTranL(lower, permuted);
        for (int k = 0; k < order; k++) {
            solution[permutation[k]] = permuted[k];
        }
    }

    @Override
    public long factorNonZeros() {
        return lower.nz_length;
    }

    private static DMatrixSparseCSC permutedUpperTriangle(DMatrixSparseCSC matrix, int[] permutation) {
        int n = matrix.numRows;
        int[] position = new int[n];
        for (int k = 0; k < n; k++) {
            position[permutation[k]] = k;
        }
        DMatrixSparseTriplet triplets = new DMatrixSparseTriplet(n, n, matrix.nz_length / 2 + n);
        for (int column = 0; column < n; column++) {
            for (int p = matrix.col_idx[column]; p < matrix.col_idx[column + 1]; p++) {
                int newRow = position[matrix.nz_rows[p]];
                int newColumn = position[column];
                if (newRow <= newColumn) {
                    triplets.addItem(newRow, newColumn, matrix.nz_values[p]);
                }
            }
        }
        DMatrixSparseCSC upper = DConvertMatrixStruct.convert(triplets, (DMatrixSparseCSC) null);
        upper.sortIndices(null);
        return upper;
    }

    private static int[] identity(int n) {
        int[] identity = new int[n];
        for (int k = 0; k < n; k++) {
            identity[k] = k;
        }
        return identity;
    }

    private static int[] validated(int[] permutation, int n) {
        if (permutation.length != n) {
            throw new IllegalArgumentException("permutation has length " + permutation.length
                    + " but the matrix order is " + n);
        }
        boolean[] seen = new boolean[n];
        for (int k = 0; k < n; k++) {
            int original = permutation[k];
            if (original < 0 || original >= n || seen[original]) {
                throw new IllegalArgumentException("permutation entry perm[" + k + "] = " + original
                        + " is out of 0.." + (n - 1) + " or repeated; pass a permutation of 0..n-1");
            }
            seen[original] = true;
        }
        return permutation.clone();
    }
}
