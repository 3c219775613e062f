package org.sectio.eigen;

/**
 * Dense kernel of a multifrontal LU step: the partial LU factorization of a square front
 * <pre>
 *   P F = [F11  F12]  =  [L11  0] [U11  U12]  +  [0  0]
 *         [F21  F22]     [L21  I] [ 0    I ]     [0  S]
 * </pre>
 * whose first {@code width} columns are eliminated with partial pivoting among the first
 * {@code width} (fully summed) rows, leaving the Schur complement {@code S = F22 − L21 U12} for the
 * parent, by the right-looking blocked algorithm of LAPACK's getrf (Golub and Van Loan, "Matrix
 * Computations", 4th ed., §3.4.4, block LU with partial pivoting): per panel of
 * {@link DenseFrontKernels#PANEL} columns,
 * <ol>
 *   <li>factor the panel column by column on the candidate rows, choosing each pivot among them;</li>
 *   <li>solve the boundary rows' panel entries with the panel's {@code U11} (rows independent);</li>
 *   <li>solve the panel's rows of {@code U} to the right of it with its unit {@code L11};</li>
 *   <li>subtract the panel's outer product {@code L21 U12} from the trailing rows.</li>
 * </ol>
 * Rows are swapped by reference, so a swap moves the whole row (LAPACK's convention); pivot
 * {@code c} records the row swapped with row {@code c}. Steps 2–4 split their rows (or columns)
 * over fork-join workers when run in a pool; each entry sees the same operations in the same order
 * whatever the split, so the factor does not depend on the thread count.
 */
final class LuFrontKernels {

    private static final int PANEL = DenseFrontKernels.PANEL;
    private static final int TILE = DenseFrontKernels.TILE;
    /** Multiply-adds above which a step is split over workers. */
    private static final long PARALLEL_WORK = 1L << 19;

    private LuFrontKernels() {
    }

    /**
     * Eliminates the first {@code width} columns of the {@code size} × {@code size} front in place.
     *
     * @param f rows of the front (each of length ≥ size); rows 0 … width−1 are permuted by reference
     * @param pivots receives at {@code pivotStart + c}, for each eliminated column c, the row swapped with row c
     * @param tiny a pivot smaller in magnitude is replaced by ±tiny (static pivoting)
     * @return the number of replaced pivots
     */
    static int partialLu(double[][] f, int width, int size, int[] pivots, int pivotStart, double tiny,
                         boolean parallel) {
        int perturbed = 0;
        for (int panelStart = 0; panelStart < width; panelStart += PANEL) {
            int k0 = panelStart;
            int k1 = Math.min(k0 + PANEL, width);
            perturbed += factorPanel(f, k0, k1, width, pivots, pivotStart, tiny);
            int p = k1 - k0;
            long boundaryWork = (long) (size - width) * p * p / 2;
            DenseFrontKernels.forRows(width, size, parallel && boundaryWork > PARALLEL_WORK, false,
                    (lo, hi) -> solveBoundaryPanel(f, k0, k1, lo, hi));
            if (k1 == size) {
                continue;
            }
            long rowWork = (long) (size - k1) * p * p / 2;
            DenseFrontKernels.forRows(k1, size, parallel && rowWork > PARALLEL_WORK, false,
                    (lo, hi) -> solvePanelRowsOfU(f, k0, k1, lo, hi));
            long updateWork = (long) (size - k1) * (size - k1) * p;
            DenseFrontKernels.forRows(k1, size, parallel && updateWork > PARALLEL_WORK, false,
                    (lo, hi) -> updateTrailing(f, k0, k1, size, lo, hi));
        }
        return perturbed;
    }

    /** Step 1: columns [k0, k1) on the candidate rows k0 … width−1, pivoting among them. */
    private static int factorPanel(double[][] f, int k0, int k1, int width, int[] pivots, int pivotStart,
                                   double tiny) {
        int perturbed = 0;
        for (int c = k0; c < k1; c++) {
            int best = c;
            double size = Math.abs(f[c][c]);
            for (int r = c + 1; r < width; r++) {
                double m = Math.abs(f[r][c]);
                if (m > size) {
                    size = m;
                    best = r;
                }
            }
            pivots[pivotStart + c] = best;
            if (best != c) {
                double[] swap = f[c];
                f[c] = f[best];
                f[best] = swap;
            }
            double[] pivotRow = f[c];
            double d = pivotRow[c];
            if (Math.abs(d) < tiny) {
                d = d < 0 ? -tiny : tiny;
                pivotRow[c] = d;
                perturbed++;
            }
            double inverse = 1.0 / d;
            for (int r = c + 1; r < width; r++) {
                double[] row = f[r];
                double l = row[c] * inverse;
                row[c] = l;
                if (l != 0) {
                    for (int j = c + 1; j < k1; j++) {
                        row[j] -= l * pivotRow[j];
                    }
                }
            }
        }
        return perturbed;
    }

    /** Step 2: boundary rows [lo, hi): {@code L[i][k0..k1) = F[i][k0..k1) U11⁻¹} column by column. */
    private static void solveBoundaryPanel(double[][] f, int k0, int k1, int lo, int hi) {
        for (int i = lo; i < hi; i++) {
            double[] row = f[i];
            for (int c = k0; c < k1; c++) {
                double[] pivotRow = f[c];
                double l = row[c] / pivotRow[c];
                row[c] = l;
                if (l != 0) {
                    for (int j = c + 1; j < k1; j++) {
                        row[j] -= l * pivotRow[j];
                    }
                }
            }
        }
    }

    /**
     * Step 3: columns [lo, hi) of the panel rows: {@code U[r][j] −= Σ_{k0 ≤ t < r} L[r][t] U[t][j]}.
     * The range is of columns here, so workers write disjoint parts of the same rows.
     */
    private static void solvePanelRowsOfU(double[][] f, int k0, int k1, int lo, int hi) {
        for (int r = k0 + 1; r < k1; r++) {
            subtractCombination(f[r], f, k0, r, lo, hi);
        }
    }

    /** Step 4: rows [lo, hi): {@code F[i][j] −= Σ_t L[i][t] U[t][j]} over the panel, by column tiles. */
    private static void updateTrailing(double[][] f, int k0, int k1, int size, int lo, int hi) {
        for (int j0 = k1; j0 < size; j0 += TILE) {
            int j1 = Math.min(j0 + TILE, size);
            for (int i = lo; i < hi; i++) {
                subtractCombination(f[i], f, k0, k1, j0, j1);
            }
        }
    }

    /**
     * {@code row[j] −= Σ_{t0 ≤ t < t1} row[t] · f[t][j]} for j in [j0, j1), four rows t per pass so the
     * inner loop is an axpy over equal indices that C2 vectorizes.
     */
    private static void subtractCombination(double[] row, double[][] f, int t0, int t1, int j0, int j1) {
        int t = t0;
        for (; t + 3 < t1; t += 4) {
            double a0 = row[t], a1 = row[t + 1], a2 = row[t + 2], a3 = row[t + 3];
            double[] b0 = f[t], b1 = f[t + 1], b2 = f[t + 2], b3 = f[t + 3];
            for (int j = j0; j < j1; j++) {
                row[j] -= a0 * b0[j] + a1 * b1[j] + a2 * b2[j] + a3 * b3[j];
            }
        }
        for (; t < t1; t++) {
            double a = row[t];
            double[] b = f[t];
            for (int j = j0; j < j1; j++) {
                row[j] -= a * b[j];
            }
        }
    }
}
