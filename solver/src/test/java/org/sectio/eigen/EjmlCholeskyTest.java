package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.dense.row.CommonOps_DDRM;
import org.ejml.ops.DConvertMatrixStruct;
import org.ejml.sparse.csc.decomposition.chol.CholeskyUpLooking_DSCC;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class EjmlCholeskyTest {

    @ParameterizedTest(name = "order {0}")
    @ValueSource(ints = {1, 2, 7, 60, 250})
    @DisplayName("solves under a random permutation match EJML's dense LU solve (CommonOps_DDRM.solve)")
    void permutedSolvesMatchDenseSolves(int n) {
        DMatrixSparseCSC k = TestPencils.randomSpd(n, 3, 100L + n);
        int[] permutation = TestPencils.randomPermutation(n, 200L + n);
        EjmlCholesky factor = new EjmlCholesky(k, permutation);
        Random random = new Random(n);
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = 2 * random.nextDouble() - 1;
        }
        double[] x = new double[n];
        factor.solve(b, x);
        DMatrixRMaj dense = DConvertMatrixStruct.convert(k, (DMatrixRMaj) null);
        DMatrixRMaj reference = new DMatrixRMaj(n, 1);
        assertTrue(CommonOps_DDRM.solve(dense, DMatrixRMaj.wrap(n, 1, b.clone()), reference));
        double scale = CommonOps_DDRM.elementMaxAbs(reference);
        for (int i = 0; i < n; i++) {
            // diagonally dominant, well conditioned: measured differences at most 1.2e-15 of max |x|
            assertEquals(reference.data[i], x[i], 1e-12 * scale, "x[" + i + "]");
        }
    }

    @Test
    @DisplayName("the identity permutation and null give the same solution")
    void nullMeansTheNaturalOrder() {
        int n = 40;
        DMatrixSparseCSC k = TestPencils.randomSpd(n, 2, 5L);
        int[] identity = new int[n];
        for (int i = 0; i < n; i++) {
            identity[i] = i;
        }
        double[] b = TestPencils.randomDiagonal(n, -1, 1, 6L);
        double[] x = new double[n];
        double[] y = new double[n];
        new EjmlCholesky(k, null).solve(b, x);
        new EjmlCholesky(k, identity).solve(b, y);
        org.junit.jupiter.api.Assertions.assertArrayEquals(x, y, 0.0);
    }

    @Test
    @DisplayName("a tridiagonal matrix factors without fill: L has 2n − 1 entries (Golub & Van Loan §4.3)")
    void tridiagonalFactorHasNoFill() {
        int n = 50;
        EjmlCholesky factor = new EjmlCholesky(TestPencils.dirichlet1D(n, 1.0), null);
        assertEquals(2L * n - 1, factor.factorNonZeros());
        assertEquals(n, factor.size());
    }

    @Test
    @DisplayName("EJML's up-looking Cholesky reads only the upper triangle, as documented on EjmlCholesky")
    void ejmlReadsOnlyTheUpperTriangle() {
        int n = 30;
        DMatrixSparseCSC full = TestPencils.randomSpd(n, 3, 9L);
        DMatrixSparseCSC upperOnly = full.copy();
        DMatrixSparseCSC garbledLower = full.copy();
        for (int column = 0; column < n; column++) {
            for (int p = full.col_idx[column]; p < full.col_idx[column + 1]; p++) {
                if (full.nz_rows[p] > column) {
                    upperOnly.nz_values[p] = 0;
                    garbledLower.nz_values[p] = 1e6;
                }
            }
        }
        CholeskyUpLooking_DSCC reference = new CholeskyUpLooking_DSCC();
        assertTrue(reference.decompose(upperOnly.copy()));
        CholeskyUpLooking_DSCC garbled = new CholeskyUpLooking_DSCC();
        assertTrue(garbled.decompose(garbledLower.copy()));
        DMatrixRMaj a = DConvertMatrixStruct.convert(reference.getL(), (DMatrixRMaj) null);
        DMatrixRMaj b = DConvertMatrixStruct.convert(garbled.getL(), (DMatrixRMaj) null);
        for (int i = 0; i < a.data.length; i++) {
            assertEquals(a.data[i], b.data[i], 0.0, "L entry " + i);
        }
    }

    @Test
    @DisplayName("an indefinite matrix is refused with advice about the shift")
    void indefiniteMatrixIsRefused() {
        DMatrixSparseCSC a = TestPencils.dirichlet1D(10, 1.0);
        DMatrixSparseCSC indefinite = TestPencils.shifted(a, TestPencils.constantDiagonal(10, 1.0), 1.0);
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> new EjmlCholesky(indefinite, null));
        assertTrue(failure.getMessage().contains("not positive definite"), failure.getMessage());
    }

    @Test
    @DisplayName("a permutation with a repeated index is refused, naming the entry")
    void repeatedPermutationIndexIsRefused() {
        DMatrixSparseCSC a = TestPencils.dirichlet1D(4, 1.0);
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> new EjmlCholesky(a, new int[] {0, 1, 1, 3}));
        assertTrue(failure.getMessage().contains("perm[2] = 1"), failure.getMessage());
    }
}
