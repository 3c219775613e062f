package org.sectio.eigen;

import org.ejml.data.DMatrixSparseCSC;

/**
 * Residual kernels for a pencil {@code A x = λ M x} with sparse symmetric {@code A} (both triangles
 * stored, compressed sparse columns) and diagonal {@code M}.
 */
final class PencilResiduals {

    private PencilResiduals() {
    }

    /** {@code product = A x}; allocation-free. */
    static void multiply(DMatrixSparseCSC a, double[] x, double[] product) {
        java.util.Arrays.fill(product, 0.0);
        for (int column = 0; column < a.numCols; column++) {
            double xj = x[column];
            if (xj == 0.0) {
                continue;
            }
            for (int p = a.col_idx[column]; p < a.col_idx[column + 1]; p++) {
                product[a.nz_rows[p]] += a.nz_values[p] * xj;
            }
        }
    }

    /**
     * The relative residual {@code ‖A x − λ M x‖₂ / (‖A x‖₂ + |λ| ‖M x‖₂)}, using {@code work} (length n)
     * for {@code A x}. It is 0 for an exact pair; for an eigenvalue at (or within rounding of) zero it is
     * of order one whatever the accuracy, since both terms of the denominator then vanish with the error.
     */
    static double relativeResidual(DMatrixSparseCSC a, double[] m, double lambda, double[] x, double[] work) {
        multiply(a, x, work);
        double residualSquared = 0;
        double productSquared = 0;
        double massSquared = 0;
        for (int i = 0; i < x.length; i++) {
            double mx = m[i] * x[i];
            double r = work[i] - lambda * mx;
            residualSquared += r * r;
            productSquared += work[i] * work[i];
            massSquared += mx * mx;
        }
        double denominator = Math.sqrt(productSquared) + Math.abs(lambda) * Math.sqrt(massSquared);
        return denominator == 0 ? 0 : Math.sqrt(residualSquared) / denominator;
    }

    /**
     * The normwise backward error {@code ‖A x − λ M x‖₂ / ((‖A‖₁ + |λ| ‖M‖₁) ‖x‖₂)} (Higham &amp; Higham,
     * SIAM J. Matrix Anal. Appl. 20 (1998) 493–512, with the 1-norm as a cheap bound of the 2-norm of a
     * symmetric matrix); meaningful for every eigenvalue, zero included.
     */
    static double backwardError(DMatrixSparseCSC a, double aNorm1, double[] m, double mNorm1, double lambda,
            double[] x, double[] work) {
        multiply(a, x, work);
        double residualSquared = 0;
        double vectorSquared = 0;
        for (int i = 0; i < x.length; i++) {
            double r = work[i] - lambda * m[i] * x[i];
            residualSquared += r * r;
            vectorSquared += x[i] * x[i];
        }
        double denominator = (aNorm1 + Math.abs(lambda) * mNorm1) * Math.sqrt(vectorSquared);
        return denominator == 0 ? 0 : Math.sqrt(residualSquared) / denominator;
    }

    /** The largest absolute column sum {@code ‖A‖₁}. */
    static double norm1(DMatrixSparseCSC a) {
        double largest = 0;
        for (int column = 0; column < a.numCols; column++) {
            double sum = 0;
            for (int p = a.col_idx[column]; p < a.col_idx[column + 1]; p++) {
                sum += Math.abs(a.nz_values[p]);
            }
            largest = Math.max(largest, sum);
        }
        return largest;
    }

    /** The largest entry of a positive diagonal, its 1-norm. */
    static double norm1(double[] diagonal) {
        double largest = 0;
        for (double d : diagonal) {
            largest = Math.max(largest, Math.abs(d));
        }
        return largest;
    }

    /**
     * Checks that A, M and the factorization have one order and that M is positive and finite.
     *
     * @return the order n
     * @throws IllegalArgumentException naming the sizes or the first bad entry of M
     */
    static int checkedOrder(DMatrixSparseCSC a, double[] m, SymmetricFactorization shifted) {
        int n = a.numRows;
        if (a.numCols != n || m.length != n || shifted.size() != n) {
            throw new IllegalArgumentException("pencil sizes disagree: A is " + a.numRows + " x " + a.numCols
                    + ", M has " + m.length + " diagonal entries, the factorization has order " + shifted.size());
        }
        for (int i = 0; i < n; i++) {
            if (!(m[i] > 0) || Double.isInfinite(m[i])) {
                throw new IllegalArgumentException("M[" + i + "] = " + m[i] + ": the diagonal of M must be positive"
                        + " and finite");
            }
        }
        return n;
    }

    /**
     * {@code {‖r‖₂ / (‖A x‖₂ + |λ| ‖M x‖₂), ‖r‖₂, ‖x‖₂}} with {@code r = A x − λ M x}, from one product:
     * the relative residual, and the two norms the normwise backward error is made of.
     */
    static double[] residualParts(DMatrixSparseCSC a, double[] m, double lambda, double[] x) {
        double[] ax = new double[x.length];
        double relative = relativeResidual(a, m, lambda, x, ax);
        double residualSquared = 0;
        double vectorSquared = 0;
        for (int i = 0; i < x.length; i++) {
            double r = ax[i] - lambda * m[i] * x[i];
            residualSquared += r * r;
            vectorSquared += x[i] * x[i];
        }
        return new double[] {relative, Math.sqrt(residualSquared), Math.sqrt(vectorSquared)};
    }
}
