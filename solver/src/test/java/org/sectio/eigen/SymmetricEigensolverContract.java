package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.csc.CommonOps_DSCC;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * What every solver of the lowest eigenpairs of a symmetric pencil {@code A x = λ M x} (M diagonal,
 * positive) must do. A subclass supplies the solver; the cases check it against closed forms and EJML's
 * dense symmetric eigen-decomposition. Residuals are recomputed here with EJML's sparse product.
 *
 * <p>Measured with ARPACK at tolerance 1e-12 on these cases: eigenvalue errors at most 1.5e-14 relative
 * (closed forms and EJML dense alike), relative residuals at most 1.2e-12 (3.1e-12 on a 100 × 100 lattice),
 * {@code |XᵀMX − I|} at most 1e-14; the eigenvalue bound leaves a factor ~70, the residual and
 * orthonormality bounds are the contract's 1e-10.
 */
abstract class SymmetricEigensolverContract {

    /** Bound on relative eigenvalue errors against closed forms and dense references (measured ≤ 1.5e-14). */
    static final double EIGENVALUE_TOLERANCE = 1e-12;
    /** Bound on relative residuals and on {@code M}-orthonormality defects (the contract's 1e-10). */
    static final double RESIDUAL_TOLERANCE = 1e-10;

    /**
     * @param a symmetric, both triangles stored
     * @param m positive diagonal of M
     * @param shift below the lowest eigenvalue of the pencil
     * @param count how many of the lowest pairs are wanted
     * @return the pairs found by the solver under test
     */
    protected Eigenpairs lowestPairs(DMatrixSparseCSC a, double[] m, double shift, int count) {
        return solve(a, m, shift, new EjmlCholesky(TestPencils.shifted(a, m, shift), null), count);
    }

    /**
     * @param factor a factorization said to be of A − shift·M (the contract also hands over wrong ones)
     * @return the pairs found by the solver under test
     */
    protected abstract Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization factor,
            int count);

    @Test
    @DisplayName("finds the lowest eigenvalues of the 1-D Dirichlet second difference, 4/h² sin²(kπ/(2(n+1))) (Strang)")
    void findsTheClosedFormSpectrumOfTheOneDimensionalLaplacian() {
        int n = 200;
        double h = 1.0 / (n + 1);
        DMatrixSparseCSC a = TestPencils.dirichlet1D(n, h);
        double[] m = TestPencils.constantDiagonal(n, 1.0);
        Eigenpairs pairs = lowestPairs(a, m, 0.0, 6);
        assertValuesMatch(Arrays.copyOf(TestPencils.dirichlet1DEigenvalues(n, h), 6), pairs.values(), EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, pairs);
    }

    @Test
    @DisplayName("returns each exact doublet λ(p,q) = λ(q,p) of the 2-D 5-point Laplacian twice, spanning its eigenspace (closed form, Strang)")
    void returnsBothVectorsOfEveryExactlyDegenerateEigenvalue() {
        int side = 40;
        double h = 1.0 / (side + 1);
        DMatrixSparseCSC a = TestPencils.laplacian2D(side, h, false);
        double mass = h * h;
        double[] m = TestPencils.constantDiagonal(side * side, mass);
        int count = 10;
        Eigenpairs pairs = lowestPairs(a, m, 0.0, count);
        double[] expected = new double[count];
        double[] closedForm = TestPencils.laplacian2DEigenvalues(side, h, false);
        for (int k = 0; k < count; k++) {
            expected[k] = closedForm[k] / mass;
        }
        // the lowest ten are (1,1), (1,2)x2, (2,2), (1,3)x2, (2,3)x2, (1,4)x2: four doublets
        assertEquals(expected[1], expected[2], 1e-12 * expected[1], "closed form doublet (1,2)/(2,1)");
        assertValuesMatch(expected, pairs.values(), EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, pairs);
        int[][] doublets = {{1, 2}, {1, 3}, {2, 3}, {1, 4}};
        int[] firstIndex = {1, 4, 6, 8};
        for (int d = 0; d < doublets.length; d++) {
            int p = doublets[d][0];
            int q = doublets[d][1];
            double[] x = pairs.vector(firstIndex[d]);
            double[] y = pairs.vector(firstIndex[d] + 1);
            for (int[] mode : new int[][] {{p, q}, {q, p}}) {
                double[] exact = latticeSineMode(side, mode[0], mode[1], m);
                double cx = mInner(exact, x, m);
                double cy = mInner(exact, y, m);
                assertEquals(1.0, cx * cx + cy * cy, 1e-10,
                        "exact mode (" + mode[0] + "," + mode[1] + ") lies in the span of the returned doublet");
            }
        }
    }

    @Test
    @DisplayName("matches EJML's dense symmetric eigen-decomposition of M^-1/2 A M^-1/2 for a random SPD A and random diagonal M")
    void matchesDenseEigenvaluesOfARandomGeneralizedPencil() {
        int n = 300;
        DMatrixSparseCSC a = TestPencils.randomSpd(n, 3, 7L);
        double[] m = TestPencils.randomDiagonal(n, 0.5, 2.0, 11L);
        DMatrixRMaj scaled = DConvertMatrixStruct.convert(a, (DMatrixRMaj) null);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                scaled.set(i, j, scaled.get(i, j) / Math.sqrt(m[i] * m[j]));
            }
        }
        EigenDecomposition_F64<DMatrixRMaj> dense = DecompositionFactory_DDRM.eig(n, true, true);
        assertTrue(dense.decompose(scaled), "EJML dense symmetric eigen-decomposition succeeds");
        double[] all = new double[n];
        for (int i = 0; i < n; i++) {
            all[i] = dense.getEigenvalue(i).getReal();
        }
        Arrays.sort(all);
        int count = 8;
        Eigenpairs pairs = lowestPairs(a, m, 0.0, count);
        assertValuesMatch(Arrays.copyOf(all, count), pairs.values(), EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, pairs);
    }

    @Test
    @DisplayName("returns the zero mode of the 2-D Neumann Laplacian and the next ones with a negative shift (closed form, Strang 1999 DCT)")
    void returnsTheZeroModeOfASingularPencilWhenShiftedBelowZero() {
        int side = 30;
        double h = 1.0 / side;
        DMatrixSparseCSC a = TestPencils.laplacian2D(side, h, true);
        double[] m = TestPencils.constantDiagonal(side * side, 1.0);
        double[] closedForm = TestPencils.laplacian2DEigenvalues(side, h, true);
        double shift = -0.5 * closedForm[1];
        int count = 6;
        Eigenpairs pairs = lowestPairs(a, m, shift, count);
        double aNorm = closedForm[closedForm.length - 1]; // ‖A‖₂, the largest closed-form eigenvalue
        assertEquals(0.0, pairs.values()[0], 1e-14 * aNorm, "lowest eigenvalue is zero to rounding of ‖A‖ (measured 2e-17 ‖A‖)");
        assertValuesMatch(Arrays.copyOfRange(closedForm, 1, count), Arrays.copyOfRange(pairs.values(), 1, count),
                EIGENVALUE_TOLERANCE);
        // the zero mode is the M-normalized constant; its relative residual is 0/0-like, so check the
        // normwise backward error ‖Ax − λMx‖ / ((‖A‖ + |λ|‖M‖)‖x‖) (Higham & Higham, SIMAX 20, 1998)
        double[] zeroMode = pairs.vector(0);
        double constant = 1 / Math.sqrt(Arrays.stream(m).sum());
        for (double entry : zeroMode) {
            assertEquals(constant, Math.abs(entry), 1e-12 * constant, "zero mode is constant (measured 1e-14)");
        }
        double[] ax = multiply(a, zeroMode);
        double residual = 0;
        double norm = 0;
        for (int i = 0; i < ax.length; i++) {
            residual += Math.pow(ax[i] - pairs.values()[0] * m[i] * zeroMode[i], 2);
            norm += zeroMode[i] * zeroMode[i];
        }
        assertTrue(Math.sqrt(residual) / ((aNorm + Math.abs(pairs.values()[0])) * Math.sqrt(norm)) <= RESIDUAL_TOLERANCE,
                "zero mode backward error");
        assertMOrthonormal(m, pairs);
        for (int k = 1; k < count; k++) {
            assertTrue(relativeResidual(a, m, pairs.values()[k], pairs.vector(k)) <= RESIDUAL_TOLERANCE,
                    "relative residual of pair " + k);
        }
    }

    @Test
    @DisplayName("a factorization of A − σ'M for another shift than the stated one is caught by the residual check")
    void factorizationOfAnotherShiftIsCaught() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(30, 1.0 / 31, false);
        double[] m = TestPencils.constantDiagonal(30 * 30, 1.0);
        SymmetricFactorization otherShift = new EjmlCholesky(TestPencils.shifted(a, m, -10.0), null);
        EigenSolverException failure = assertThrows(EigenSolverException.class,
                () -> solve(a, m, 0.0, otherShift, 3));
        assertTrue(failure.getMessage().contains("backward error"), failure.getMessage());
    }

    @Test
    @DisplayName("asking for as many pairs as the order is rejected")
    void askingForAllPairsIsRejected() {
        DMatrixSparseCSC a = TestPencils.dirichlet1D(5, 1.0);
        double[] m = TestPencils.constantDiagonal(5, 1.0);
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> solve(a, m, 0.0, new EjmlCholesky(a, null), 5));
        assertTrue(failure.getMessage().contains("count = 5"), failure.getMessage());
    }

    @Test
    @DisplayName("a non-positive entry of M is rejected with its index and value")
    void nonPositiveMassIsRejected() {
        DMatrixSparseCSC a = TestPencils.dirichlet1D(5, 1.0);
        double[] m = {1, 1, 0, 1, 1};
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> solve(a, m, 0.0, new EjmlCholesky(a, null), 2));
        assertTrue(failure.getMessage().contains("M[2] = 0.0"), failure.getMessage());
    }

    @Test
    @DisplayName("a pencil of order 4 with count 3 uses the whole space and still matches the closed form (Strang)")
    void tinyPencilMatchesClosedForm() {
        int n = 4;
        DMatrixSparseCSC a = TestPencils.dirichlet1D(n, 1.0);
        double[] m = TestPencils.constantDiagonal(n, 1.0);
        Eigenpairs pairs = lowestPairs(a, m, -0.1, 3);
        assertValuesMatch(Arrays.copyOf(TestPencils.dirichlet1DEigenvalues(n, 1.0), 3), pairs.values(),
                EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, pairs);
    }
    static void assertValuesMatch(double[] expected, double[] actual, double relativeTolerance) {
        assertEquals(expected.length, actual.length, "number of eigenvalues");
        for (int k = 0; k < expected.length; k++) {
            assertEquals(expected[k], actual[k], relativeTolerance * Math.abs(expected[k]), "eigenvalue " + k);
        }
    }

    static void assertAccuratePairs(DMatrixSparseCSC a, double[] m, Eigenpairs pairs) {
        assertMOrthonormal(m, pairs);
        double[] reported = pairs.relativeResiduals();
        for (int k = 0; k < pairs.count(); k++) {
            double independent = relativeResidual(a, m, pairs.values()[k], pairs.vector(k));
            assertTrue(independent <= RESIDUAL_TOLERANCE, "relative residual of pair " + k + " is " + independent);
            assertEquals(independent, reported[k], 1e-3 * independent + 1e-16, "reported residual of pair " + k);
        }
    }

    static void assertMOrthonormal(double[] m, Eigenpairs pairs) {
        for (int i = 0; i < pairs.count(); i++) {
            for (int j = 0; j <= i; j++) {
                assertEquals(i == j ? 1.0 : 0.0, mInner(pairs.vector(i), pairs.vector(j), m), RESIDUAL_TOLERANCE,
                        "x" + i + "ᵀ M x" + j);
            }
        }
    }

    /** ‖A x − λ M x‖₂ / (‖A x‖₂ + |λ| ‖M x‖₂), with EJML's sparse product for A x. */
    static double relativeResidual(DMatrixSparseCSC a, double[] m, double lambda, double[] x) {
        double[] ax = multiply(a, x);
        double r = 0;
        double axNorm = 0;
        double mxNorm = 0;
        for (int i = 0; i < x.length; i++) {
            r += Math.pow(ax[i] - lambda * m[i] * x[i], 2);
            axNorm += ax[i] * ax[i];
            mxNorm += Math.pow(m[i] * x[i], 2);
        }
        return Math.sqrt(r) / (Math.sqrt(axNorm) + Math.abs(lambda) * Math.sqrt(mxNorm));
    }

    static double[] multiply(DMatrixSparseCSC a, double[] x) {
        DMatrixRMaj product = new DMatrixRMaj(a.numRows, 1);
        CommonOps_DSCC.mult(a, DMatrixRMaj.wrap(x.length, 1, x.clone()), product);
        return product.data;
    }

    static double mInner(double[] x, double[] y, double[] m) {
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            s += x[i] * m[i] * y[i];
        }
        return s;
    }

    /** The M-normalized lattice mode sin(pπi/(n+1)) sin(qπj/(n+1)) at node i·n + j (0-based i, j). */
    private static double[] latticeSineMode(int side, int p, int q, double[] m) {
        double[] mode = new double[side * side];
        for (int i = 0; i < side; i++) {
            for (int j = 0; j < side; j++) {
                mode[i * side + j] = Math.sin(p * Math.PI * (i + 1) / (side + 1)) * Math.sin(q * Math.PI * (j + 1) / (side + 1));
            }
        }
        double norm = Math.sqrt(mInner(mode, mode, m));
        for (int k = 0; k < mode.length; k++) {
            mode[k] /= norm;
        }
        return mode;
    }
}
