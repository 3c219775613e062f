package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Thick-restart Arnoldi on tridiagonal Toeplitz matrices tridiag(b, a, c), whose eigenvalues are
 * a + 2√(bc) cos(kπ/(n+1)), k = 1 … n (G. D. Smith, Numerical Solution of Partial Differential
 * Equations, 3rd ed., Oxford 1985, ch. 2, from memory; real for bc &gt; 0, complex conjugate pairs for
 * bc &lt; 0). The matrix is non-normal for b ≠ c.
 */
class ThickRestartArnoldiTest {

    private static LinearMap tridiagonal(double b, double a, double c) {
        return (x, y) -> {
            int n = x.length;
            for (int i = 0; i < n; i++) {
                y[i] = a * x[i] + (i > 0 ? b * x[i - 1] : 0) + (i + 1 < n ? c * x[i + 1] : 0);
            }
        };
    }

    @Test
    void largestRealEigenvaluesOfANonSymmetricTridiagonalMatrix() {
        // mildly non-normal: the eigenvector basis has condition (c/b)^(n/2) ≈ 2e4
        int n = 100;
        double b = 0.9;
        double a = 1.0;
        double c = 1.1;
        ArnoldiPairs pairs = ThickRestartArnoldi.largest(tridiagonal(b, a, c), n, 6, 40, 1e-12, 2000, new double[0][], 1);
        double[] expected = new double[6];
        for (int k = 1; k <= 6; k++) {
            expected[k - 1] = a + 2 * Math.sqrt(b * c) * Math.cos(k * Math.PI / (n + 1));
        }
        for (int k = 0; k < 6; k++) {
            assertEquals(expected[k], pairs.valueReal()[k], 1e-9, "eigenvalue " + k);
            assertEquals(0, pairs.valueImaginary()[k], 1e-9);
            assertTrue(pairs.residualEstimates()[k] <= 1e-12);
        }
    }

    @Test
    void complexConjugatePairsComeTogether() {
        int n = 120;
        double b = -1.0;
        double a = 0.3;
        double c = 1.0;
        ArnoldiPairs pairs = ThickRestartArnoldi.largest(tridiagonal(b, a, c), n, 4, 40, 1e-11, 2000, new double[0][], 2);
        // eigenvalues a ± 2j cos(kπ/(n+1)): largest modulus for k = 1 and k = n (same |Im|), then k = 2, n − 1
        List<Double> imag = new ArrayList<>();
        for (int k = 0; k < pairs.count(); k++) {
            assertEquals(a, pairs.valueReal()[k], 1e-9);
            imag.add(Math.abs(pairs.valueImaginary()[k]));
        }
        double top = 2 * Math.cos(Math.PI / (n + 1));
        assertEquals(top, imag.get(0), 1e-9, imag.toString());
        assertEquals(top, imag.get(1), 1e-9, imag.toString());
        assertEquals(-pairs.valueImaginary()[0], pairs.valueImaginary()[1], 1e-9, "a conjugate pair");
        assertTrue(pairs.count() >= 4, Arrays.toString(pairs.valueReal()));
    }

    /**
     * S D S⁻¹ with D = diag(1/(1+i)²) and S unit upper bidiagonal with 0.5 above the diagonal: a
     * non-normal map with the well separated spectrum of a shift-invert operator, eigenvalues exactly
     * 1/(1+i)².
     */
    private static LinearMap similarToDiagonal() {
        return (x, y) -> {
            int n = x.length;
            double[] z = new double[n];
            for (int i = n - 1; i >= 0; i--) {
                z[i] = x[i] - (i + 1 < n ? 0.5 * z[i + 1] : 0);
            }
            for (int i = 0; i < n; i++) {
                z[i] /= (1.0 + i) * (1.0 + i);
            }
            for (int i = 0; i < n; i++) {
                y[i] = z[i] + (i + 1 < n ? 0.5 * z[i + 1] : 0);
            }
        };
    }

    @Test
    void aStartNearTheWantedEigenvectorsEndsBeforeTheBasisIsFull() {
        int n = 200;
        ArnoldiPairs cold = ThickRestartArnoldi.largest(similarToDiagonal(), n, 4, 24, 1e-10, 200, new double[0][], 1);
        ArnoldiPairs warm = ThickRestartArnoldi.largest(similarToDiagonal(), n, 4, 24, 1e-10, 200, cold.vectorReal(), 1);
        for (int k = 0; k < 4; k++) {
            double exact = 1.0 / ((1.0 + k) * (1.0 + k));
            assertEquals(exact, cold.valueReal()[k], 1e-9 * exact, "cold value " + k);
            assertEquals(exact, warm.valueReal()[k], 1e-9 * exact, "warm value " + k);
        }
        // convergence is tested after every step from 2·4 + 2 = 10 vectors on; measured: cold 16, warm 13
        // applications, both before the basis of 24 is full
        assertTrue(cold.applications() < 24 && warm.applications() < cold.applications(),
                "applications cold " + cold.applications() + ", warm " + warm.applications());
    }
}
