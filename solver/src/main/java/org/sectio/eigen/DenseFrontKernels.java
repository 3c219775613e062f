package org.sectio.eigen;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ForkJoinTask;

/**
 * Dense kernel of a multifrontal step: partial Cholesky factorization of a front
 * <pre>
 *   F = [F11  .  ]   =  [L11  0] [L11ᵀ L21ᵀ]  +  [0 0]
 *       [F21  F22]      [L21  I] [ 0    I  ]     [0 U]
 * </pre>
 * with {@code L11 L11ᵀ = F11}, {@code L21 = F21 L11⁻ᵀ} and the update (Schur complement)
 * {@code U = F22 − L21 L21ᵀ}, by the right-looking blocked algorithm (Golub and Van Loan, "Matrix
 * Computations", 4th ed., §4.2, block Cholesky): per panel of {@link #PANEL} columns, factor the
 * diagonal block, solve the rows below it, then subtract the panel's outer product from the
 * trailing triangle.
 *
 * <p>The front is a jagged lower triangle, {@code front[i]} holding columns {@code 0..i} of row
 * {@code i}. The trailing update runs over contiguous row segments against a transposed copy of
 * the panel, so its innermost loop is an axpy on equal indices that the JIT vectorizes. Row ranges
 * are split over fork-join workers when the caller runs in a pool; every entry is computed by the
 * same sequence of operations whatever the split, so results do not depend on the thread count.
 */
final class DenseFrontKernels {

    /** Panel width (columns eliminated per blocked step). */
    static final int PANEL = 64;
    /** Column tile of the trailing update, sized so a panel tile (PANEL x TILE doubles) stays in L2. */
    static final int TILE = 512;
    /** Multiply-adds above which a step is split into parallel row ranges. */
    private static final long PARALLEL_WORK = 1L << 20;
    private static final int CHUNKS = 8;

    private DenseFrontKernels() {
    }

    /**
     * Eliminates the first {@code width} columns of the {@code size}-row front in place; rows
     * {@code width..size-1}, columns {@code width..} then hold {@code U}.
     *
     * @param transposed scratch of {@link #PANEL} rows of length {@code ≥ size}
     * @param permutation elimination order, for the message of a failed pivot
     * @param columnStart elimination position of local column 0
     * @throws NotPositiveDefiniteException if a pivot is {@code ≤ 0} or NaN
     */
    static void partialCholesky(double[][] front, double[][] transposed, int width, int size, boolean parallel,
                                int[] permutation, int columnStart) {
        for (int panelStart = 0; panelStart < width; panelStart += PANEL) {
            int k0 = panelStart;
            int k1 = Math.min(k0 + PANEL, width);
            factorDiagonalBlock(front, k0, k1, permutation, columnStart);
            if (k1 == size) {
                continue;
            }
            transposeDiagonalBlock(front, k0, k1, transposed);
            long solveWork = (long) (size - k1) * (k1 - k0) * (k1 - k0) / 2;
            forRows(k1, size, parallel && solveWork > PARALLEL_WORK, false,
                    (lo, hi) -> solvePanelRows(front, transposed, k0, k1, lo, hi));
            transposePanel(front, k0, k1, size, transposed);
            long updateWork = (long) (size - k1) * (size - k1) / 2 * (k1 - k0);
            forRows(k1, size, parallel && updateWork > PARALLEL_WORK, true,
                    (lo, hi) -> updateTrailing(front, transposed, k0, k1, size, lo, hi));
        }
    }

    /** Unblocked Cholesky of the diagonal block {@code [k0, k1)²} (row-oriented, Crout order). */
    private static void factorDiagonalBlock(double[][] front, int k0, int k1, int[] permutation, int columnStart) {
        for (int i = k0; i < k1; i++) {
            double[] rowI = front[i];
            for (int j = k0; j < i; j++) {
                double[] rowJ = front[j];
                double value = rowI[j];
                for (int t = k0; t < j; t++) {
                    value -= rowI[t] * rowJ[t];
                }
                rowI[j] = value / rowJ[j];
            }
            double pivot = rowI[i];
            for (int t = k0; t < i; t++) {
                pivot -= rowI[t] * rowI[t];
            }
            if (!(pivot > 0)) {
                throw new NotPositiveDefiniteException(columnStart + i, permutation[columnStart + i], pivot);
            }
            rowI[i] = Math.sqrt(pivot);
        }
    }

    /** {@code transposed[j - k0][t] = L[t][j]} for the diagonal block, plus reciprocal pivots in slot {@code j}. */
    private static void transposeDiagonalBlock(double[][] front, int k0, int k1, double[][] transposed) {
        for (int t = k0; t < k1; t++) {
            double[] rowT = front[t];
            for (int j = k0; j < t; j++) {
                transposed[j - k0][t] = rowT[j];
            }
            transposed[t - k0][t] = 1.0 / rowT[t];
        }
    }

    /** Rows {@code [lo, hi)}: {@code L[i][k0..k1) = F[i][k0..k1) L11⁻ᵀ} by column-oriented forward substitution. */
    private static void solvePanelRows(double[][] front, double[][] transposed, int k0, int k1, int lo, int hi) {
        for (int i = lo; i < hi; i++) {
            double[] rowI = front[i];
            for (int j = k0; j < k1; j++) {
                double[] column = transposed[j - k0];
                double x = rowI[j] * column[j];
                rowI[j] = x;
                for (int t = j + 1; t < k1; t++) {
                    rowI[t] -= x * column[t];
                }
            }
        }
    }

    /** {@code transposed[t - k0][j] = L[j][t]} for rows {@code j ≥ k1} of the panel. */
    private static void transposePanel(double[][] front, int k0, int k1, int size, double[][] transposed) {
        for (int j = k1; j < size; j++) {
            double[] rowJ = front[j];
            for (int t = k0; t < k1; t++) {
                transposed[t - k0][j] = rowJ[t];
            }
        }
    }

    /** Rows {@code [lo, hi)}: {@code F[i][j] −= Σ_t L[i][t] L[j][t]} for {@code k1 ≤ j ≤ i}, {@code t ∈ [k0, k1)}. */
    private static void updateTrailing(double[][] front, double[][] transposed, int k0, int k1, int size,
                                       int lo, int hi) {
        for (int j0 = k1; j0 < hi; j0 += TILE) {
            int j1 = Math.min(j0 + TILE, size);
            for (int i = Math.max(j0, lo); i < hi; i++) {
                updateRow(front[i], transposed, k0, k1, j0, Math.min(j1, i + 1));
            }
        }
    }

    /**
     * Columns {@code [j0, end)} of one row, four panel columns per pass: the inner loop is an axpy
     * over equal indices of distinct arrays, which C2 vectorizes (an 8-column or two-row variant
     * measured 2x slower on Java 17 because it was left scalar).
     */
    private static void updateRow(double[] row, double[][] transposed, int k0, int k1, int j0, int end) {
        int t = k0;
        for (; t + 3 < k1; t += 4) {
            double a0 = row[t], a1 = row[t + 1], a2 = row[t + 2], a3 = row[t + 3];
            double[] b0 = transposed[t - k0], b1 = transposed[t + 1 - k0];
            double[] b2 = transposed[t + 2 - k0], b3 = transposed[t + 3 - k0];
            for (int j = j0; j < end; j++) {
                row[j] -= a0 * b0[j] + a1 * b1[j] + a2 * b2[j] + a3 * b3[j];
            }
        }
        for (; t < k1; t++) {
            double a = row[t];
            double[] b = transposed[t - k0];
            for (int j = j0; j < end; j++) {
                row[j] -= a * b[j];
            }
        }
    }

    @FunctionalInterface
    interface RowRange {
        void run(int lo, int hi);
    }

    /**
     * Runs {@code body} over {@code [lo, hi)}, split into chunks of equal work when {@code split}
     * (rows of a triangle when {@code triangular}, since row {@code i} then costs {@code i − lo + 1}).
     */
    static void forRows(int lo, int hi, boolean split, boolean triangular, RowRange body) {
        if (!split || !ForkJoinTask.inForkJoinPool() || hi - lo < 2 * CHUNKS) {
            body.run(lo, hi);
            return;
        }
        List<ForkJoinTask<?>> tasks = new ArrayList<>(CHUNKS);
        int n = hi - lo;
        int previous = lo;
        for (int c = 1; c <= CHUNKS; c++) {
            int next = c == CHUNKS ? hi
                    : lo + (int) (triangular ? Math.round(n * Math.sqrt((double) c / CHUNKS)) : (long) n * c / CHUNKS);
            if (next > previous) {
                int from = previous, to = next;
                tasks.add(ForkJoinTask.adapt(() -> body.run(from, to)));
            }
            previous = Math.max(previous, next);
        }
        ForkJoinTask.invokeAll(tasks);
    }
}
