package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.junit.jupiter.api.Test;

/**
 * The multifrontal LU (real and complex) against EJML's sparse LU (LuUpLooking_DSCC, an independent
 * implementation of Gilbert–Peierls partial pivoting; T. Davis, Direct Methods for Sparse Linear
 * Systems, SIAM 2006, §6.3) on random non-symmetric 9-point lattice matrices, including one with
 * small diagonal entries that needs pivoting within fronts.
 */
class MultifrontalLUTest {

    private static final int NX = 23;
    private static final int NY = 17;

    /** A 9-point lattice matrix with random couplings; diagonal = weight × (row sum) + offset. */
    static DMatrixSparseCSC lattice(long seed, double diagonalWeight, int[] column, int[] row) {
        return lattice(NX, NY, seed, diagonalWeight, column, row);
    }

    static DMatrixSparseCSC lattice(int nx, int ny, long seed, double diagonalWeight, int[] column, int[] row) {
        Random random = new Random(seed);
        int n = nx * ny;
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, 9 * n);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int k = j * nx + i;
                column[k] = i;
                row[k] = j;
                double sum = 0;
                for (int dj = -1; dj <= 1; dj++) {
                    for (int di = -1; di <= 1; di++) {
                        int ii = i + di;
                        int jj = j + dj;
                        if ((di != 0 || dj != 0) && ii >= 0 && jj >= 0 && ii < nx && jj < ny) {
                            double v = random.nextDouble() - 0.5;
                            t.addItem(jj * nx + ii, k, v);
                            sum += Math.abs(v);
                        }
                    }
                }
                t.addItem(k, k, diagonalWeight * sum + 0.01 * (random.nextDouble() - 0.5));
            }
        }
        DMatrixSparseCSC a = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        a.sortIndices(null);
        return a;
    }

    /** ‖b − A x‖∞ / (‖A‖∞ ‖x‖∞ + ‖b‖∞). */
    private static double backwardError(DMatrixSparseCSC a, double[] x, double[] b) {
        double[] residual = b.clone();
        double[] rows = new double[b.length];
        for (int c = 0; c < a.numCols; c++) {
            for (int p = a.col_idx[c]; p < a.col_idx[c + 1]; p++) {
                residual[a.nz_rows[p]] -= a.nz_values[p] * x[c];
                rows[a.nz_rows[p]] += Math.abs(a.nz_values[p]);
            }
        }
        return maxAbs(residual) / (maxAbs(rows) * maxAbs(x) + maxAbs(b));
    }

    private static double maxAbs(double[] x) {
        double m = 0;
        for (double v : x) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    private static double[] rightHandSide(int n, long seed) {
        Random random = new Random(seed);
        double[] b = new double[n];
        for (int k = 0; k < n; k++) {
            b[k] = random.nextGaussian();
        }
        return b;
    }

    @Test
    void realSolvesAgreeWithEjmlsSparseLuWithAndWithoutDiagonalDominance() {
        int n = NX * NY;
        for (double weight : new double[] {1.5, 0.05}) {
            int[] column = new int[n];
            int[] row = new int[n];
            DMatrixSparseCSC a = lattice(7, weight, column, row);
            double[] b = rightHandSide(n, 11);
            double[] ours = new double[n];
            double[] reference = new double[n];
            MultifrontalLU.Analysis.of(a, column, row).factor(a).solve(b, ours);
            SparseLU.factor(a, SparseLU.latticeOrder(column, row)).solve(b, reference);
            double diff = 0;
            double size = 0;
            for (int k = 0; k < n; k++) {
                diff = Math.max(diff, Math.abs(ours[k] - reference[k]));
                size = Math.max(size, Math.abs(reference[k]));
            }
            // measured: 1e-15 (dominant) and 1e-13 (weak diagonal) of max |x|
            assertTrue(diff < 1e-10 * size, "weight " + weight + ": max difference " + diff + " of " + size);
        }
    }

    /**
     * A lattice large enough for the blocked front kernel (fronts wider than two panels), the split
     * solve sweeps (subtrees over 10 000 unknowns) and the parallel elimination: checked against EJML's
     * sparse LU like the small case, and one thread against two bit for bit.
     */
    @Test
    void blockedKernelsAndSplitSweepsAgreeWithEjmlAndDoNotDependOnThreads() {
        int nx = 150;
        int ny = 140;
        int n = nx * ny;
        int[] column = new int[n];
        int[] row = new int[n];
        DMatrixSparseCSC a = lattice(nx, ny, 19, 0.05, column, row);
        double[] b = rightHandSide(n, 23);
        MultifrontalLU.Analysis analysis = MultifrontalLU.Analysis.of(a, column, row);
        assertTrue(analysis.symbolic().largestFront() > 2 * DenseFrontKernels.PANEL,
                "largest front " + analysis.symbolic().largestFront());
        double[] one = new double[n];
        double[] two = new double[n];
        double[] reference = new double[n];
        analysis.factor(a, 1).solve(b, one);
        analysis.factor(a, 2).solve(b, two);
        SparseLU.factor(a, SparseLU.latticeOrder(column, row)).solve(b, reference);
        double diff = 0;
        double size = 0;
        for (int k = 0; k < n; k++) {
            assertEquals(Double.doubleToLongBits(one[k]), Double.doubleToLongBits(two[k]), "entry " + k);
            diff = Math.max(diff, Math.abs(one[k] - reference[k]));
            size = Math.max(size, Math.abs(reference[k]));
        }
        // measured: 1.3e-11 of max |x| (weak diagonal: the two factorizations pivot differently)
        assertTrue(diff < 1e-10 * size, "max difference " + diff + " of " + size);
        double ours = backwardError(a, one, b);
        double ejml = backwardError(a, reference, b);
        // measured: 8.4e-14 against EJML's 3.8e-16 (and 9.8e-14 for the earlier unblocked kernel): pivots are
        // chosen only among a front's fully summed rows, which lets entries grow on this weak diagonal
        assertTrue(ejml < 1e-14, "EJML's normwise backward error " + ejml);
        assertTrue(ours < 1e-12, "normwise backward error " + ours);
    }

    @Test
    void complexSolveAgreesWithTheRealFormSolvedByEjml() {
        int n = NX * NY;
        int[] column = new int[n];
        int[] row = new int[n];
        DMatrixSparseCSC x = lattice(3, 0.3, column, row);
        DMatrixSparseCSC y = x.copy();
        Random random = new Random(5);
        for (int p = 0; p < y.nz_length; p++) {
            y.nz_values[p] = random.nextDouble() - 0.5;
        }
        double[] br = rightHandSide(n, 1);
        double[] bi = rightHandSide(n, 2);
        double[] xr = new double[n];
        double[] xi = new double[n];
        ComplexMultifrontalLU.factor(MultifrontalLU.Analysis.of(x, column, row), x, y).solve(br, bi, xr, xi);
        // residual of Z z = b with complex arithmetic from the matrices themselves
        double worst = 0;
        double[] rr = br.clone();
        double[] ri = bi.clone();
        for (int c = 0; c < n; c++) {
            for (int p = x.col_idx[c]; p < x.col_idx[c + 1]; p++) {
                int r = x.nz_rows[p];
                rr[r] -= x.nz_values[p] * xr[c] - y.nz_values[p] * xi[c];
                ri[r] -= x.nz_values[p] * xi[c] + y.nz_values[p] * xr[c];
            }
        }
        for (int k = 0; k < n; k++) {
            worst = Math.max(worst, Math.hypot(rr[k], ri[k]));
        }
        assertTrue(worst < 1e-11, "complex residual " + worst);
        // and the real 2n form [[X, −Y], [Y, X]] by EJML gives the same solution
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(2 * n, 2 * n, 4 * x.nz_length);
        for (int c = 0; c < n; c++) {
            for (int p = x.col_idx[c]; p < x.col_idx[c + 1]; p++) {
                int r = x.nz_rows[p];
                t.addItem(r, c, x.nz_values[p]);
                t.addItem(r, c + n, -y.nz_values[p]);
                t.addItem(r + n, c, y.nz_values[p]);
                t.addItem(r + n, c + n, x.nz_values[p]);
            }
        }
        DMatrixSparseCSC big = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        big.sortIndices(null);
        int[] identity = new int[2 * n];
        for (int k = 0; k < identity.length; k++) {
            identity[k] = k;
        }
        double[] b2 = new double[2 * n];
        System.arraycopy(br, 0, b2, 0, n);
        System.arraycopy(bi, 0, b2, n, n);
        double[] z = new double[2 * n];
        SparseLU.factor(big, identity).solve(b2, z);
        for (int k = 0; k < n; k++) {
            assertEquals(z[k], xr[k], 1e-9 * (1 + Math.abs(z[k])));
            assertEquals(z[k + n], xi[k], 1e-9 * (1 + Math.abs(z[k + n])));
        }
    }
}
