package org.sectio.eigen;

import org.apache.commons.math3.exception.MaxCountExceededException;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.ejml.data.Complex_F64;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.CommonOps_ZDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * Eigenvalues and real block eigenvectors of the small dense Hessenberg-like matrix of an Arnoldi
 * cycle, in Commons Math's convention: a complex pair λ, λ̄ sits at adjacent indices i, i + 1 with
 * the eigenvector of {@code re[i] + j·im[i]} equal to column i + j·column i + 1. Commons Math's real
 * Schur iteration gives up on some nearly degenerate matrices (seen on a dielectric-rod guide whose
 * grid breaks the pair's symmetry slightly); then EJML's double-shift QR gives the eigenvalues
 * (Golub and Van Loan, "Matrix Computations", 4th ed., §7.5) and two steps of inverse iteration per
 * eigenvalue, in complex arithmetic for a pair, give the vectors (§7.6.1).
 */
final class SmallEigen {

    /** Relative shift off λ for inverse iteration, so that H − λI is not exactly singular. */
    private static final double SHIFT_OFFSET = 1e-12;

    private SmallEigen() {
    }

    /** @param re real parts @param im imaginary parts @param blocks real block eigenvectors as columns */
    record Result(double[] re, double[] im, RealMatrix blocks) {
    }

    /**
     * @param h rows of a matrix holding at least p × p entries; its leading p × p part is decomposed
     * @param p order ≥ 1
     * @return the decomposition
     * @throws EigenSolverException if neither decomposition converges
     */
    static Result of(double[][] h, int p) {
        RealMatrix hm = new Array2DRowRealMatrix(p, p);
        for (int r = 0; r < p; r++) {
            for (int c = 0; c < p; c++) {
                hm.setEntry(r, c, h[r][c]);
            }
        }
        try {
            EigenDecomposition eig = new EigenDecomposition(hm);
            return new Result(eig.getRealEigenvalues(), eig.getImagEigenvalues(), eig.getV());
        } catch (MaxCountExceededException e) {
            return byEjml(hm, p);
        }
    }

    static Result byEjml(RealMatrix hm, int p) {
        DMatrixRMaj a = new DMatrixRMaj(hm.getData());
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(p, false, false);
        if (!eig.decompose(a.copy())) {
            throw new EigenSolverException("Arnoldi: the eigenvalues of the " + p + " × " + p + " projected matrix did"
                    + " not converge (Commons Math and EJML)", 0, 0, 0, 0);
        }
        double[] re = new double[p];
        double[] im = new double[p];
        RealMatrix blocks = new Array2DRowRealMatrix(p, p);
        boolean[] used = new boolean[p];
        int at = 0;
        for (int i = 0; i < p; i++) {
            if (used[i]) {
                continue;
            }
            used[i] = true;
            Complex_F64 lambda = eig.getEigenvalue(i);
            if (lambda.imaginary == 0) {
                re[at] = lambda.real;
                double[][] y = inverseIteration(hm, p, lambda.real, 0);
                blocks.setColumn(at, y[0]);
                at++;
                continue;
            }
            int partner = conjugate(eig, used, i, p);
            used[partner] = true;
            double q = Math.abs(lambda.imaginary);
            re[at] = lambda.real;
            im[at] = q;
            re[at + 1] = lambda.real;
            im[at + 1] = -q;
            double[][] y = inverseIteration(hm, p, lambda.real, q);
            blocks.setColumn(at, y[0]);
            blocks.setColumn(at + 1, y[1]);
            at += 2;
        }
        return new Result(re, im, blocks);
    }

    /** The index of the unused eigenvalue nearest the conjugate of eigenvalue i. */
    private static int conjugate(EigenDecomposition_F64<DMatrixRMaj> eig, boolean[] used, int i, int p) {
        Complex_F64 lambda = eig.getEigenvalue(i);
        int best = -1;
        double distance = Double.POSITIVE_INFINITY;
        for (int k = 0; k < p; k++) {
            if (!used[k]) {
                Complex_F64 mu = eig.getEigenvalue(k);
                double d = Math.hypot(mu.real - lambda.real, mu.imaginary + lambda.imaginary);
                if (d < distance) {
                    distance = d;
                    best = k;
                }
            }
        }
        if (best < 0) {
            throw new EigenSolverException("Arnoldi: a complex eigenvalue of the projected matrix has no conjugate", 0,
                    0, 0, 0);
        }
        return best;
    }

    /** Re and Im of the unit eigenvector of H for λ = a + j b, by two steps of inverse iteration. */
    private static double[][] inverseIteration(RealMatrix hm, int p, double a, double b) {
        double scale = Math.max(Math.hypot(a, b), 1e-300);
        double sr = a + SHIFT_OFFSET * scale;
        ZMatrixRMaj shifted = new ZMatrixRMaj(p, p);
        for (int r = 0; r < p; r++) {
            for (int c = 0; c < p; c++) {
                shifted.set(r, c, hm.getEntry(r, c) - (r == c ? sr : 0), r == c ? -b : 0);
            }
        }
        ZMatrixRMaj x = new ZMatrixRMaj(p, 1);
        for (int r = 0; r < p; r++) {
            x.set(r, 0, 1.0 / Math.sqrt(p), 0);
        }
        for (int step = 0; step < 2; step++) {
            ZMatrixRMaj next = new ZMatrixRMaj(p, 1);
            if (!CommonOps_ZDRM.solve(shifted.copy(), x, next)) {
                throw new EigenSolverException("Arnoldi: inverse iteration on the projected matrix failed", 0, 0, 0, 0);
            }
            double norm = 0;
            for (int r = 0; r < p; r++) {
                norm += next.getReal(r, 0) * next.getReal(r, 0) + next.getImag(r, 0) * next.getImag(r, 0);
            }
            norm = Math.sqrt(norm);
            for (int r = 0; r < p; r++) {
                next.set(r, 0, next.getReal(r, 0) / norm, next.getImag(r, 0) / norm);
            }
            x = next;
        }
        double[] real = new double[p];
        double[] imag = new double[p];
        for (int r = 0; r < p; r++) {
            real[r] = x.getReal(r, 0);
            imag[r] = x.getImag(r, 0);
        }
        return new double[][] {real, imag};
    }
}
