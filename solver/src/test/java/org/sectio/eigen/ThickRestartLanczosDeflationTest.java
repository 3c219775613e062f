package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.sectio.eigen.SymmetricEigensolverContract.EIGENVALUE_TOLERANCE;
import static org.sectio.eigen.SymmetricEigensolverContract.RESIDUAL_TOLERANCE;
import static org.sectio.eigen.SymmetricEigensolverContract.assertAccuratePairs;
import static org.sectio.eigen.SymmetricEigensolverContract.assertValuesMatch;
import static org.sectio.eigen.SymmetricEigensolverContract.mInner;

import java.util.Arrays;
import java.util.Random;
import java.util.stream.DoubleStream;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.ejml.ops.DConvertMatrixStruct;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Deflation of known eigenvectors in {@link ThickRestartLanczos}, checked against the closed-form spectrum
 * of the Neumann 5-point Laplacian, {@code 4/h² [sin²(pπ/(2n)) + sin²(qπ/(2n))]}, p, q = 0..n−1, with
 * DCT-II eigenvectors (G. Strang, "The discrete cosine transform", SIAM Review 41 (1999) 135–147; the
 * constant is the (0,0) eigenvector), and against EJML's dense symmetric eigen-decomposition.
 */
class ThickRestartLanczosDeflationTest {

    private static Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, int count, double[]... deflated) {
        SymmetricFactorization factor = new EjmlCholesky(TestPencils.shifted(a, m, shift), null);
        return new ThickRestartLanczos(LanczosSettings.forCount(count)).solve(a, m, shift, factor,
                IterationListener.NONE, deflated);
    }

    private static double[] ones(int n) {
        return TestPencils.constantDiagonal(n, 1.0);
    }

    /** Largest {@code |⟨x_k, z⟩_M| / (‖x_k‖_M ‖z‖_M)} over the returned vectors. */
    private static double largestMCosine(Eigenpairs pairs, double[] m, double[] z) {
        double worst = 0;
        for (int k = 0; k < pairs.count(); k++) {
            double[] x = pairs.vector(k);
            worst = Math.max(worst, Math.abs(mInner(x, z, m)) / Math.sqrt(mInner(x, x, m) * mInner(z, z, m)));
        }
        return worst;
    }

    @Test
    @DisplayName("with the constant deflated the Neumann 2-D Laplacian returns its lowest non-zero eigenvalues 4/h²[sin²(pπ/(2n)) + sin²(qπ/(2n))] (Strang 1999), M-orthogonal to the constant")
    void deflatingTheConstantGivesTheNonZeroNeumannSpectrum() {
        int side = 30;
        double h = 1.0 / side;
        DMatrixSparseCSC a = TestPencils.laplacian2D(side, h, true);
        double[] m = TestPencils.constantDiagonal(side * side, h * h);
        double[] closedForm = TestPencils.laplacian2DEigenvalues(side, h, true);
        // M = h² I scales the pencil's eigenvalues by 1/h²
        double[] expected = Arrays.stream(closedForm, 1, 9).map(v -> v / (h * h)).toArray();
        Eigenpairs pairs = solve(a, m, -0.5 * expected[0], 8, ones(side * side));
        assertValuesMatch(expected, pairs.values(), EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, pairs);
        assertTrue(largestMCosine(pairs, m, ones(side * side)) <= RESIDUAL_TOLERANCE,
                "M-cosine to the constant " + largestMCosine(pairs, m, ones(side * side)));
    }

    @Test
    @DisplayName("with a random diagonal M and the constant deflated the pairs are the non-zero ones of EJML's dense decomposition of M^(-1/2) A M^(-1/2)")
    void deflatingTheConstantMatchesTheDenseSpectrumForARandomMass() {
        int side = 18;
        double h = 1.0 / side;
        int n = side * side;
        DMatrixSparseCSC a = TestPencils.laplacian2D(side, h, true);
        double[] m = TestPencils.randomDiagonal(n, 0.5, 1.5, 23L);
        DMatrixRMaj scaled = new DMatrixRMaj(n, n);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                scaled.set(i, j, a.get(i, j) / Math.sqrt(m[i] * m[j]));
            }
        }
        EigenDecomposition_F64<DMatrixRMaj> dense = DecompositionFactory_DDRM.eig(n, false, true);
        assertTrue(dense.decompose(scaled), "EJML dense decomposition");
        double[] reference = new double[n];
        for (int i = 0; i < n; i++) {
            reference[i] = dense.getEigenvalue(i).real;
        }
        Arrays.sort(reference);
        assertTrue(Math.abs(reference[0]) < 1e-10 * reference[1], "the dense spectrum has its zero: " + reference[0]);
        double[] expected = Arrays.copyOfRange(reference, 1, 7);
        Eigenpairs pairs = solve(a, m, -0.1 * expected[0], 6, ones(n));
        assertValuesMatch(expected, pairs.values(), EIGENVALUE_TOLERANCE);
        assertAccuratePairs(a, m, pairs);
        assertTrue(largestMCosine(pairs, m, ones(n)) <= RESIDUAL_TOLERANCE,
                "M-cosine to the constant " + largestMCosine(pairs, m, ones(n)));
    }

    @Test
    @DisplayName("two disconnected Neumann blocks deflated by the global constant return the second zero, constant on each block, as the lowest pair")
    void twoDisconnectedBlocksDeflatedByOneNullVectorReturnTheOtherZeroFirst() {
        int first = 12;
        int second = 9;
        double h = 0.1;
        DMatrixSparseCSC a = blockDiagonal(TestPencils.laplacian2D(first, h, true),
                TestPencils.laplacian2D(second, h, true));
        int n = first * first + second * second;
        double[] m = TestPencils.constantDiagonal(n, 1.0);
        double[] nonZero = DoubleStream.concat(
                Arrays.stream(TestPencils.laplacian2DEigenvalues(first, h, true)).skip(1),
                Arrays.stream(TestPencils.laplacian2DEigenvalues(second, h, true)).skip(1)).sorted().toArray();
        Eigenpairs pairs = solve(a, m, -0.1 * nonZero[0], 5, ones(n));
        double[] values = pairs.values();
        assertTrue(Math.abs(values[0]) < 1e-10 * values[1], "second zero: lambda0 = " + values[0] + ", lambda1 = "
                + values[1]);
        assertValuesMatch(Arrays.copyOf(nonZero, 4), Arrays.copyOfRange(values, 1, 5), EIGENVALUE_TOLERANCE);
        // the other null vector: c₁ on the first block, c₂ on the second, M-orthogonal to the constant
        double[] zero = pairs.vector(0);
        double c1 = zero[0];
        double c2 = zero[n - 1];
        for (int i = 0; i < n; i++) {
            assertEquals(i < first * first ? c1 : c2, zero[i], 1e-10 * Math.abs(c1), "null vector entry " + i);
        }
        assertEquals(0.0, first * first * c1 + second * second * c2, 1e-10 * Math.abs(c1), "orthogonal to the constant");
        // a relative residual is 1 for λ = 0 whatever the accuracy: the zero's is a normwise backward error
        double[] az = SymmetricEigensolverContract.multiply(a, zero);
        double backward = Math.sqrt(mInner(az, az, m)) / (PencilResiduals.norm1(a) * Math.sqrt(mInner(zero, zero, m)));
        assertTrue(backward <= RESIDUAL_TOLERANCE, "backward error of the zero " + backward);
        SymmetricEigensolverContract.assertMOrthonormal(m, pairs);
        for (int k = 1; k < pairs.count(); k++) {
            double residual = SymmetricEigensolverContract.relativeResidual(a, m, values[k], pairs.vector(k));
            assertTrue(residual <= RESIDUAL_TOLERANCE, "relative residual of pair " + k + " is " + residual);
        }
    }

    @Test
    @DisplayName("deflating no vector gives bit for bit the pairs and operator count of the solve without deflation")
    void deflatingNothingChangesNothing() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(20, 0.05, false);
        double[] m = TestPencils.randomDiagonal(400, 0.5, 1.5, 5L);
        SymmetricFactorization factor = new EjmlCholesky(a, null);
        ThickRestartLanczos solver = new ThickRestartLanczos(LanczosSettings.forCount(5));
        Eigenpairs plain = solver.solve(a, m, 0.0, factor);
        Eigenpairs deflated = solver.solve(a, m, 0.0, factor, IterationListener.NONE, new double[0][]);
        assertArrayEquals(plain.values(), deflated.values(), 0.0);
        assertEquals(plain.operatorApplications(), deflated.operatorApplications());
        for (int k = 0; k < plain.count(); k++) {
            assertArrayEquals(plain.vector(k), deflated.vector(k), 0.0, "vector " + k);
        }
    }

    @Test
    @DisplayName("a deflated vector that is no eigenvector is refused with its Rayleigh quotient and backward error")
    void aDeflatedVectorThatIsNoEigenvectorIsRefused() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(10, 0.1, true);
        double[] m = ones(100);
        double[] random = new Random(3L).doubles(100, -1, 1).toArray();
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> solve(a, m, -1.0, 3, ones(100), random));
        assertTrue(failure.getMessage().contains("deflated vector 1 is no finite eigenvector")
                && failure.getMessage().contains("backward error"), failure.getMessage());
    }

    @Test
    @DisplayName("a deflated vector in the span of the previous ones is refused with its M-norms")
    void aDependentDeflatedVectorIsRefused() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(10, 0.1, true);
        double[] twice = TestPencils.constantDiagonal(100, 2.0);
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> solve(a, ones(100), -1.0, 3, ones(100), twice));
        assertTrue(failure.getMessage().contains("deflated vector 1 lies in the span of the previous 1"),
                failure.getMessage());
    }

    @Test
    @DisplayName("asking for n − d pairs with d deflated vectors is rejected with both counts")
    void askingForTheWholeComplementIsRejected() {
        DMatrixSparseCSC a = TestPencils.laplacian2D(3, 1.0, true);
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> solve(a, ones(9), -1.0, 8, ones(9)));
        assertTrue(failure.getMessage().contains("count = 8") && failure.getMessage().contains("1 deflated")
                && failure.getMessage().contains("n - d - 1 = 7"), failure.getMessage());
    }

    /** {@code diag(first, second)}. */
    private static DMatrixSparseCSC blockDiagonal(DMatrixSparseCSC first, DMatrixSparseCSC second) {
        int n1 = first.numRows;
        int n = n1 + second.numRows;
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, first.nz_length + second.nz_length);
        for (DMatrixSparseCSC block : new DMatrixSparseCSC[] {first, second}) {
            int offset = block == first ? 0 : n1;
            for (int col = 0; col < block.numCols; col++) {
                for (int k = block.col_idx[col]; k < block.col_idx[col + 1]; k++) {
                    t.addItem(offset + block.nz_rows[k], offset + col, block.nz_values[k]);
                }
            }
        }
        return DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
    }
}
