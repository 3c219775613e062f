package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.sectio.eigen.EjmlCholesky;
import org.sectio.eigen.IterationListener;
import org.sectio.eigen.LanczosSettings;
import org.sectio.eigen.ThickRestartLanczos;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The TE zero-eigenvalue check of {@link FamilySolver} on Neumann (free-end) second differences of chains
 * of cells, deflated by the constant as the TE solve does. A chain of n cells of width h has eigenvalues
 * {@code 4/h² sin²(kπ/(2n))}, k = 0..n−1 (G. Strang, "The discrete cosine transform", SIAM Review 41
 * (1999) 135–147); two chains without a shared face have one zero each.
 */
class FamilySolverZeroCheckTest {

    private static final double H = 1e-4;

    /** Free-end second differences of the chains {@code [0, n₁)}, {@code [n₁, n₁ + n₂)}, ..., spacing H. */
    private static DMatrixSparseCSC chains(int... lengths) {
        int n = Arrays.stream(lengths).sum();
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, 3 * n);
        double s = 1 / (H * H);
        int start = 0;
        for (int length : lengths) {
            for (int i = start; i < start + length; i++) {
                int neighbours = 0;
                for (int j : new int[] {i - 1, i + 1}) {
                    if (j >= start && j < start + length) {
                        t.addItem(i, j, -s);
                        neighbours++;
                    }
                }
                t.addItem(i, i, neighbours * s);
            }
            start += length;
        }
        return DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
    }

    /** The TE solve's Lanczos step: 4 pairs, the constant deflated, unit cell areas. */
    private static double[] deflatedValues(DMatrixSparseCSC a, double sigma) {
        int n = a.numRows;
        double[] m = new double[n];
        Arrays.fill(m, 1.0);
        DMatrixSparseCSC k = a.copy();
        for (int i = 0; i < n; i++) {
            k.set(i, i, a.get(i, i) - sigma);
        }
        return new ThickRestartLanczos(LanczosSettings.forCount(4)).solve(a, m, sigma, new EjmlCholesky(k, null),
                IterationListener.NONE, new double[][] {m.clone()}).values();
    }

    private static double chainEigenvalue(int n, int k) {
        return 4 / (H * H) * Math.pow(Math.sin(k * Math.PI / (2.0 * n)), 2);
    }

    @Test
    @DisplayName("two chains without a shared face leave a second zero after the constant is deflated, and the check refuses it in one line saying the cross-section falls apart")
    void twoSeparateRegionsAreRefusedInOneLine() {
        double sigma = -0.1 * chainEigenvalue(60, 1);
        double[] values = deflatedValues(chains(60, 40), sigma);
        assertTrue(Math.abs(values[0]) < 1e-9 * values[1], "second zero: " + Arrays.toString(values));
        SolveException failure = assertThrows(SolveException.class, () -> FamilySolver.requireOneZero(values, sigma));
        assertTrue(failure.getMessage().contains("falls apart into separate regions"), failure.getMessage());
        assertFalse(failure.getMessage().contains("\n"), "one line: " + failure.getMessage());
    }

    @Test
    @DisplayName("three chains leave two zeros, which the check refuses although neither is small against the other")
    void threeSeparateRegionsAreRefused() {
        double sigma = -0.1 * chainEigenvalue(50, 1);
        double[] values = deflatedValues(chains(50, 40, 30), sigma);
        assertThrows(SolveException.class, () -> FamilySolver.requireOneZero(values, sigma));
    }

    @Test
    @DisplayName("one chain with the constant deflated passes the check with the closed form 4/h² sin²(kπ/(2n)), k = 1..4 (Strang 1999)")
    void oneConnectedRegionPasses() {
        int n = 80;
        double sigma = -0.1 * chainEigenvalue(n, 1);
        double[] values = deflatedValues(chains(n), sigma);
        assertDoesNotThrow(() -> FamilySolver.requireOneZero(values, sigma));
        for (int k = 1; k <= 4; k++) {
            assertEquals(chainEigenvalue(n, k), values[k - 1], 1e-12 * chainEigenvalue(n, k), "eigenvalue " + k);
        }
    }
}
