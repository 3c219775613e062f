package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.ejml.ops.DConvertMatrixStruct;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The multifrontal Cholesky on 9-point lattice matrices (couplings to the eight lattice points around
 * a point), against EJML's dense Cholesky. A separator line of the nested dissection still
 * disconnects the halves (George, SIAM J. Numer. Anal. 10 (1973) 345, dissects exactly this 9-point
 * mesh), so the solution must agree to round-off.
 */
class NinePointFactorizationTest {

    /** The bound of MultifrontalCholeskyTest (measured there 3.6e-16 .. 7.2e-16 on 5-point matrices); all pass it here. */
    private static final double AGREEMENT = 1e-14;

    /**
     * A = Σ_links w (e_k − e_l)(e_k − e_l)ᵀ + diag(d) over edge and diagonal links of the active points:
     * a weighted graph Laplacian plus a positive diagonal, hence SPD.
     */
    private static Object[] problem(int width, int height, double holes, long seed) {
        Random random = new Random(seed);
        int[][] index = new int[height][width];
        int n = 0;
        for (int r = 0; r < height; r++) {
            for (int c = 0; c < width; c++) {
                index[r][c] = random.nextDouble() >= holes ? n++ : -1;
            }
        }
        int[] column = new int[n];
        int[] row = new int[n];
        double[] diagonal = new double[n];
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, 9 * n);
        int[][] forward = {{0, 1}, {1, -1}, {1, 0}, {1, 1}};
        for (int r = 0; r < height; r++) {
            for (int c = 0; c < width; c++) {
                int k = index[r][c];
                if (k < 0) {
                    continue;
                }
                column[k] = c;
                row[k] = r;
                diagonal[k] += 0.1 + random.nextDouble();
                for (int[] step : forward) {
                    int rr = r + step[0];
                    int cc = c + step[1];
                    if (rr < height && cc >= 0 && cc < width && index[rr][cc] >= 0) {
                        int l = index[rr][cc];
                        double w = 0.2 + random.nextDouble();
                        t.addItem(k, l, -w);
                        t.addItem(l, k, -w);
                        diagonal[k] += w;
                        diagonal[l] += w;
                    }
                }
            }
        }
        for (int k = 0; k < n; k++) {
            t.addItem(k, k, diagonal[k]);
        }
        return new Object[] {DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null), column, row};
    }

    @ParameterizedTest(name = "{0} x {1}, holes {2}, leaf {3}, {4} thread(s)")
    @CsvSource({"3, 3, 0, 1, 1", "20, 13, 0, 1, 2", "40, 35, 0.25, 16, 2", "50, 40, 0, 8, 1", "120, 1, 0, 8, 1"})
    void solutionsOfNinePointMatricesAgreeWithTheDenseCholesky(int width, int height, double holes, int leaf,
                                                               int threads) {
        Object[] p = problem(width, height, holes, 31L * width + height);
        DMatrixSparseCSC a = (DMatrixSparseCSC) p[0];
        int n = a.numCols;
        MultifrontalCholesky factor = MultifrontalAnalysis.analyse(a, (int[]) p[1], (int[]) p[2], leaf)
                .factor(a, threads);
        Random random = new Random(n);
        double[] b = random.doubles(n, -1, 1).toArray();
        double[] x = new double[n];
        factor.solve(b, x);
        DMatrixRMaj dense = DConvertMatrixStruct.convert(a, (DMatrixRMaj) null);
        LinearSolverDense<DMatrixRMaj> reference = LinearSolverFactory_DDRM.chol(n);
        assertTrue(reference.setA(dense), "EJML accepts the matrix as SPD");
        DMatrixRMaj expected = new DMatrixRMaj(n, 1);
        reference.solve(new DMatrixRMaj(n, 1, true, b), expected);
        double difference = 0;
        double norm = 0;
        for (int k = 0; k < n; k++) {
            difference += (x[k] - expected.data[k]) * (x[k] - expected.data[k]);
            norm += expected.data[k] * expected.data[k];
        }
        double relative = Math.sqrt(difference / norm);
        assertTrue(relative < AGREEMENT, "relative difference to EJML dense Cholesky " + relative);
    }

    @Test
    void aCouplingTwoLatticeStepsAwayIsStillRejected() {
        DMatrixSparseCSC a = new DMatrixSparseCSC(2, 2, 4);
        a.set(0, 0, 4);
        a.set(0, 1, -1);
        a.set(1, 0, -1);
        a.set(1, 1, 4);
        assertThrows(IllegalArgumentException.class,
                () -> MultifrontalCholesky.factor(a, new int[] {0, 2}, new int[] {0, 2}, 1));
        // the diagonal neighbour (1, 1) is accepted
        assertTrue(MultifrontalCholesky.factor(a, new int[] {0, 1}, new int[] {0, 1}, 1).size() == 2);
    }
}
