package org.sectio.benchmarks;

import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.sectio.eigen.MultifrontalAnalysis;
import org.sectio.eigen.MultifrontalCholesky;
import org.sectio.eigen.NestedDissection;

/**
 * Prints timings of the nested-dissection multifrontal Cholesky factorization on the 5-point
 * Laplacian (plus a small positive diagonal shift) of a disc clipped from an {@code n x n} lattice.
 * Arguments: optional list of lattice sizes (default 250 500 707 1000). Columns: ordering time,
 * symbolic analysis time (ordering included), numeric factor time with 1 and 2 threads (best of 2
 * and 3), entries of L, one solve (best of 5) with the 1- and 2-thread factor, peak heap (sum of
 * the heap pools' peaks, an upper bound), and {@code ‖Ax − b‖/‖b‖}. A second line per size gives
 * the time of one block solve for {@code k} = 2, 4, 8 right-hand sides with the 2-thread factor
 * (best of 3), as a multiple of {@code k} single 2-thread solves.
 */
public final class FactorizationBenchmark {

    private static final double SHIFT = 1e-3;

    private FactorizationBenchmark() {
    }

    /** Disc of lattice cells whose centres lie within radius {@code n/2} of the centre, with its Laplacian. */
    record Disc(int[] column, int[] row, DMatrixSparseCSC matrix) {
    }

    static Disc disc(int n) {
        int[] index = new int[n * n];
        int count = 0;
        double centre = n / 2.0, radius2 = centre * centre;
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                double dx = c + 0.5 - centre, dy = r + 0.5 - centre;
                index[r * n + c] = dx * dx + dy * dy <= radius2 ? count++ : -1;
            }
        }
        int[] column = new int[count];
        int[] row = new int[count];
        DMatrixSparseCSC a = new DMatrixSparseCSC(count, count, 5 * count);
        int nz = 0;
        int[] neighbours = new int[5];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                int k = index[r * n + c];
                if (k < 0) {
                    continue;
                }
                column[k] = c;
                row[k] = r;
                a.col_idx[k] = nz;
                int m = 0;
                if (r > 0 && index[(r - 1) * n + c] >= 0) neighbours[m++] = index[(r - 1) * n + c];
                if (c > 0 && index[r * n + c - 1] >= 0) neighbours[m++] = index[r * n + c - 1];
                neighbours[m++] = k;
                if (c + 1 < n && index[r * n + c + 1] >= 0) neighbours[m++] = index[r * n + c + 1];
                if (r + 1 < n && index[(r + 1) * n + c] >= 0) neighbours[m++] = index[(r + 1) * n + c];
                for (int e = 0; e < m; e++) {
                    a.nz_rows[nz] = neighbours[e];
                    a.nz_values[nz] = neighbours[e] == k ? 4 + SHIFT : -1;
                    nz++;
                }
            }
        }
        a.col_idx[count] = nz;
        a.nz_length = nz;
        a.indicesSorted = true;
        return new Disc(column, row, a);
    }

    /**
     * Runs the benchmark and prints one table row per lattice size.
     *
     * @param args lattice sizes {@code n}
     */
    public static void main(String[] args) {
        int[] sizes = args.length == 0 ? new int[] {250, 500, 707, 1000} : new int[args.length];
        for (int i = 0; i < args.length; i++) {
            sizes[i] = Integer.parseInt(args[i]);
        }
        run(disc(200), false);
        run(disc(200), false);
        System.out.printf("%6s %9s %8s %8s %9s %9s %11s %9s %9s %8s %10s%n", "n", "unknowns", "order_s",
                "analyse_s", "fact1T_s", "fact2T_s", "nnz(L)", "solve1T_s", "solve2T_s", "heap_MB", "residual");
        double[] logN = new double[sizes.length];
        double[] logT = new double[sizes.length];
        for (int i = 0; i < sizes.length; i++) {
            Disc disc = disc(sizes[i]);
            double[] row = run(disc, true);
            logN[i] = Math.log(disc.column().length);
            logT[i] = Math.log(row[1]);
            System.out.printf("%6d %9d %8.3f %9.3f %9.3f %9.3f %11d %9.4f %9.4f %8.0f %10.2e%n", sizes[i],
                    disc.column().length, row[4], row[5], row[0], row[1], (long) row[2], row[7], row[3], row[6],
                    row[8]);
            System.out.printf("%6s block solve, 2 threads: k=2 %.4f s (%.2f x 2 singles), k=4 %.4f s (%.2f x 4), "
                    + "k=8 %.4f s (%.2f x 8)%n", "", row[9], row[9] / (2 * row[3]), row[10], row[10] / (4 * row[3]),
                    row[11], row[11] / (8 * row[3]));
        }
        if (sizes.length > 1) {
            System.out.printf("fitted exponent of 2-thread factor time vs unknowns: %.2f%n", Measures.slope(java.util.stream.IntStream.range(0, logN.length)
                    .mapToObj(i -> new double[] {logN[i], logT[i]}).toList()));
        }
    }

    /**
     * @return {factor1, factor2, nnz, solve, ordering, analysis, peakHeapMB, solve(1-thread factor), residual};
     *     factor times best of 2 (1 thread) and 3 (2 threads), solve times best of 5
     */
    private static double[] run(Disc disc, boolean oneThreadToo) {
        System.gc();
        Measures.resetPeaks();
        long t0 = System.nanoTime();
        NestedDissection.latticeOrdering(disc.column(), disc.row());
        long t1 = System.nanoTime();
        MultifrontalAnalysis analysis = MultifrontalAnalysis.analyse(disc.matrix(), disc.column(), disc.row());
        long t2 = System.nanoTime();
        int n = analysis.size();
        double[] b = new Random(1).doubles(n, -1, 1).toArray();
        double[] x = new double[n];
        double factorOne = Double.NaN;
        double solveOne = Double.NaN;
        if (oneThreadToo) {
            factorOne = Double.MAX_VALUE;
            for (int repeat = 0; repeat < 2; repeat++) {
                long s = System.nanoTime();
                MultifrontalCholesky one = analysis.factor(disc.matrix(), 1);
                factorOne = Math.min(factorOne, (System.nanoTime() - s) * 1e-9);
                solveOne = bestSolve(one, b, x);
            }
        }
        double factorTwo = Double.MAX_VALUE;
        MultifrontalCholesky factor = null;
        for (int repeat = 0; repeat < 3; repeat++) {
            factor = null;
            long s = System.nanoTime();
            factor = analysis.factor(disc.matrix(), 2);
            factorTwo = Math.min(factorTwo, (System.nanoTime() - s) * 1e-9);
        }
        double solveTwo = bestSolve(factor, b, x);
        double[] ax = new double[n];
        DMatrixSparseCSC a = disc.matrix();
        for (int k = 0; k < n; k++) {
            for (int idx = a.col_idx[k]; idx < a.col_idx[k + 1]; idx++) {
                ax[a.nz_rows[idx]] += a.nz_values[idx] * x[k];
            }
        }
        double r2 = 0, b2 = 0;
        for (int k = 0; k < n; k++) {
            r2 += (ax[k] - b[k]) * (ax[k] - b[k]);
            b2 += b[k] * b[k];
        }
        double[] block = new double[3];
        for (int i = 0; i < block.length && oneThreadToo; i++) {
            block[i] = bestBlockSolve(factor, 2 << i);
        }
        return new double[] {factorOne, factorTwo, factor.factorNonZeros(), solveTwo, (t1 - t0) * 1e-9,
            (t2 - t1) * 1e-9, Measures.peakHeapBytes() / 1048576.0, solveOne, Math.sqrt(r2 / b2), block[0], block[1], block[2]};
    }

    private static double bestSolve(MultifrontalCholesky factor, double[] b, double[] x) {
        double best = Double.MAX_VALUE;
        for (int repeat = 0; repeat < 5; repeat++) {
            long s = System.nanoTime();
            factor.solve(b, x);
            best = Math.min(best, (System.nanoTime() - s) * 1e-9);
        }
        return best;
    }

    private static double bestBlockSolve(MultifrontalCholesky factor, int k) {
        int n = factor.size();
        double[][] b = new double[k][];
        double[][] x = new double[k][n];
        for (int j = 0; j < k; j++) {
            b[j] = new Random(2 + j).doubles(n, -1, 1).toArray();
        }
        double best = Double.MAX_VALUE;
        for (int repeat = 0; repeat < 3; repeat++) {
            long s = System.nanoTime();
            factor.solve(b, x);
            best = Math.min(best, (System.nanoTime() - s) * 1e-9);
        }
        return best;
    }



}
