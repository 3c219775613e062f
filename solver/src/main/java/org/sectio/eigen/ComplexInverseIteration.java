package org.sectio.eigen;

import org.ejml.data.DMatrixSparseCSC;

/**
 * One eigenpair of a complex sparse matrix Z = X + jY near a given shift σ, by shifted inverse
 * iteration (Wilkinson; Y. Saad, <i>Numerical Methods for Large Eigenvalue Problems</i>, 2nd ed.,
 * SIAM 2011, §4.1): x ← (Z − σI)⁻¹ x, with the eigenvalue estimate λ = σ + (x_kᴴ x_k)/(x_kᴴ x_{k+1}).
 *
 * <p>Why this and not a complex Krylov method: it serves small perturbations of a known real
 * eigenproblem (a lossy dielectric of small tan δ), whose real eigenvector is an excellent start and
 * whose real eigenvalue, used as σ, lies so close to the complex one that each step gains many digits
 * (the rate is |λ − σ| / |λ′ − σ| for the next nearest λ′). Z − σI is factored once by
 * {@link ComplexMultifrontalLU} on the multifrontal analysis of the real problem's pattern.
 */
public final class ComplexInverseIteration {

    /** The pair found: λ = re + j im, x = xr + j xi of unit 2-norm. */
    public record Pair(double valueReal, double valueImaginary, double[] vectorReal, double[] vectorImaginary,
                       int iterations, double relativeChange) {
    }

    private ComplexInverseIteration() {
    }

    /**
     * @param real X, n × n
     * @param imaginary Y, same pattern as X (which must hold the diagonal)
     * @param shiftReal Re σ
     * @param shiftImaginary Im σ
     * @param startReal Re of the start vector
     * @param startImaginary Im of the start vector (may be all zero)
     * @param symbolic the multifrontal analysis of the common pattern
     * @param relativeTolerance stop when |λ_k − λ_{k−1}| ≤ tolerance · |λ_k|
     * @param maxIterations most iterations, ≥ 2
     * @return the pair
     * @throws EigenSolverException if it does not settle within maxIterations, or Z − σI is singular
     */
    public static Pair near(DMatrixSparseCSC real, DMatrixSparseCSC imaginary, double shiftReal, double shiftImaginary,
                            double[] startReal, double[] startImaginary, MultifrontalLU.Analysis symbolic,
                            double relativeTolerance, int maxIterations) {
        int n = real.numCols;
        ComplexMultifrontalLU lu = ComplexMultifrontalLU.factor(symbolic, shifted(real, shiftReal),
                shifted(imaginary, shiftImaginary));
        double[] x = new double[2 * n];
        for (int i = 0; i < n; i++) {
            x[2 * i] = startReal[i];
            x[2 * i + 1] = startImaginary[i];
        }
        normalize(x);
        double lambdaRe = shiftReal;
        double lambdaIm = shiftImaginary;
        double change = Double.POSITIVE_INFINITY;
        double[] y = new double[2 * n];
        double[] rhsRe = new double[n];
        double[] rhsIm = new double[n];
        double[] yr = new double[n];
        double[] yi = new double[n];
        for (int it = 1; it <= maxIterations; it++) {
            for (int i = 0; i < n; i++) {
                rhsRe[i] = x[2 * i];
                rhsIm[i] = x[2 * i + 1];
            }
            lu.solve(rhsRe, rhsIm, yr, yi);
            for (int i = 0; i < n; i++) {
                y[2 * i] = yr[i];
                y[2 * i + 1] = yi[i];
            }
            // ρ = xᴴ y (complex), λ = σ + 1/ρ
            double rhoRe = 0;
            double rhoIm = 0;
            for (int i = 0; i < n; i++) {
                double ar = x[2 * i];
                double ai = x[2 * i + 1];
                double br = y[2 * i];
                double bi = y[2 * i + 1];
                rhoRe += ar * br + ai * bi;
                rhoIm += ar * bi - ai * br;
            }
            double rr = rhoRe * rhoRe + rhoIm * rhoIm;
            double newRe = shiftReal + rhoRe / rr;
            double newIm = shiftImaginary - rhoIm / rr;
            change = Math.hypot(newRe - lambdaRe, newIm - lambdaIm) / Math.hypot(newRe, newIm);
            lambdaRe = newRe;
            lambdaIm = newIm;
            System.arraycopy(y, 0, x, 0, 2 * n);
            normalize(x);
            if (change <= relativeTolerance && it > 1) {
                return pair(x, lambdaRe, lambdaIm, it, change);
            }
        }
        throw new EigenSolverException(String.format(java.util.Locale.ROOT, "complex inverse iteration: no settled"
                + " eigenvalue after %d iterations (last relative change %.3g, tolerance %.3g); the shift is not close"
                + " enough to one eigenvalue", maxIterations, change, relativeTolerance), 0, maxIterations,
                relativeTolerance, 0);
    }

    private static Pair pair(double[] x, double re, double im, int iterations, double change) {
        int n = x.length / 2;
        double[] xr = new double[n];
        double[] xi = new double[n];
        for (int i = 0; i < n; i++) {
            xr[i] = x[2 * i];
            xi[i] = x[2 * i + 1];
        }
        return new Pair(re, im, xr, xi, iterations, change);
    }

    private static void normalize(double[] x) {
        double s = Math.sqrt(ThickRestartArnoldi.dot(x, x));
        for (int i = 0; i < x.length; i++) {
            x[i] /= s;
        }
    }

    /** A copy with σ subtracted on the diagonal. */
    private static DMatrixSparseCSC shifted(DMatrixSparseCSC a, double sigma) {
        DMatrixSparseCSC out = a.copy();
        for (int c = 0; c < out.numCols; c++) {
            for (int p = out.col_idx[c]; p < out.col_idx[c + 1]; p++) {
                if (out.nz_rows[p] == c) {
                    out.nz_values[p] -= sigma;
                }
            }
        }
        return out;
    }
}
