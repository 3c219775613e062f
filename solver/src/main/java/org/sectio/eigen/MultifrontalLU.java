package org.sectio.eigen;

import java.util.Arrays;
import org.ejml.data.DMatrixSparseCSC;

/**
 * Multifrontal LU factorization {@code P Q A Qᵀ = L U} of a square lattice matrix with a structurally
 * symmetric pattern and unsymmetric values, on the nested-dissection tree and front structure of
 * {@link MultifrontalAnalysis} (which depend on the pattern only, so one analysis serves every matrix
 * of a sweep). The fronts are dense and square: the front of node v holds its own columns and rows
 * and the boundary; its own columns are eliminated with partial pivoting among its own (fully summed)
 * rows, which keeps the tree's structure static (I. S. Duff and J. K. Reid, "The multifrontal solution
 * of unsymmetric sets of linear equations", SIAM J. Sci. Stat. Comput. 5 (1984) 633–641; J. W. H. Liu,
 * SIAM Review 34 (1992) 82–109). A pivot smaller than {@value #STATIC_PIVOT} times the largest entry
 * of the matrix is replaced by that size (static pivoting, X. S. Li and J. W. Demmel, ACM TOMS 29
 * (2003) 110–140), and every solve is then followed by iterative refinement against the original
 * matrix; {@link #perturbedPivots()} counts them.
 *
 * <p>The factor is immutable; {@link #solve} keeps its working storage local.
 */
public final class MultifrontalLU {

    /** Relative size of a static pivot. */
    static final double STATIC_PIVOT = 1e-10;
    private static final int REFINEMENT_STEPS = 3;

    private final MultifrontalAnalysis analysis;
    private final DMatrixSparseCSC matrix;
    private final Front[] fronts;
    private final int perturbed;

    /** One front's factor: own block (L unit lower and U, row-major w × w), L21 (b × w), U12 (w × b). */
    private record Front(int start, int width, int[] boundary, double[] own, double[] lower, double[] upper,
                         int[] pivots) {
    }

    private MultifrontalLU(MultifrontalAnalysis analysis, DMatrixSparseCSC matrix, Front[] fronts, int perturbed) {
        this.analysis = analysis;
        this.matrix = matrix;
        this.fronts = fronts;
        this.perturbed = perturbed;
    }

    /**
     * The pattern-only phase: nested-dissection tree, fronts and the map from matrix entries (both
     * triangles) into them.
     *
     * @param symbolic the multifrontal analysis of the pattern
     * @param transposeIndex for every stored entry (r, c) the index of the entry (c, r)
     */
    public record Analysis(MultifrontalAnalysis symbolic, int[] transposeIndex) {

        /**
         * @param pattern structurally symmetric lattice matrix (see {@link MultifrontalAnalysis#analyse}),
         *     rows sorted within columns
         * @param column lattice column of every unknown
         * @param row lattice row of every unknown
         * @return the analysis
         * @throws IllegalArgumentException as {@link MultifrontalAnalysis#analyse}, or if rows are not sorted
         */
        public static Analysis of(DMatrixSparseCSC pattern, int[] column, int[] row) {
            int n = pattern.numCols;
            for (int c = 0; c < n; c++) {
                for (int idx = pattern.col_idx[c] + 1; idx < pattern.col_idx[c + 1]; idx++) {
                    if (pattern.nz_rows[idx] <= pattern.nz_rows[idx - 1]) {
                        throw new IllegalArgumentException("multifrontal LU: rows of column " + c + " are not strictly"
                                + " ascending; sort the matrix (DMatrixSparseCSC.sortIndices) first");
                    }
                }
            }
            MultifrontalAnalysis symbolic = MultifrontalAnalysis.analyse(pattern, column, row);
            int[] next = Arrays.copyOf(pattern.col_idx, n);
            int[] transpose = new int[pattern.nz_length];
            for (int c = 0; c < n; c++) {
                for (int idx = pattern.col_idx[c]; idx < pattern.col_idx[c + 1]; idx++) {
                    transpose[idx] = next[pattern.nz_rows[idx]]++;
                }
            }
            return new Analysis(symbolic, transpose);
        }

        /**
         * @param a matrix with the analysed pattern, not modified (kept for refinement)
         * @return the factorization
         * @throws IllegalArgumentException if the pattern differs
         */
        public MultifrontalLU factor(DMatrixSparseCSC a) {
            return MultifrontalLU.factor(this, a);
        }
    }

    static MultifrontalLU factor(Analysis analysis, DMatrixSparseCSC a) {
        MultifrontalAnalysis symbolic = analysis.symbolic();
        int n = symbolic.size();
        if (a.numCols != n || a.numRows != n || a.nz_length != analysis.transposeIndex().length) {
            throw new IllegalArgumentException("multifrontal LU: matrix " + a.numRows + " × " + a.numCols + " with "
                    + a.nz_length + " entries does not have the analysed pattern of order " + n);
        }
        DissectionTree tree = symbolic.tree();
        int[] perm = tree.permutation();
        int[] position = new int[n];
        for (int p = 0; p < n; p++) {
            position[perm[p]] = p;
        }
        double largest = 0;
        for (int k = 0; k < a.nz_length; k++) {
            largest = Math.max(largest, Math.abs(a.nz_values[k]));
        }
        double tiny = STATIC_PIVOT * largest;
        int widest = symbolic.largestFront();
        double[][] f = new double[widest][widest];
        int[] local = new int[n];
        int nodes = tree.nodeCount();
        Front[] fronts = new Front[nodes];
        double[][] updates = new double[nodes][];
        int perturbed = 0;
        int[] transpose = analysis.transposeIndex();
        for (int v = 0; v < nodes; v++) {
            int start = tree.columnStart()[v];
            int end = tree.columnEnd()[v];
            int w = end - start;
            int[] boundary = symbolic.boundary(v);
            int s = w + boundary.length;
            for (int r = 0; r < s; r++) {
                Arrays.fill(f[r], 0, s, 0.0);
            }
            for (int p = start; p < end; p++) {
                local[p] = p - start;
            }
            for (int i = 0; i < boundary.length; i++) {
                local[boundary[i]] = w + i;
            }
            for (int p = start; p < end; p++) {
                int k = perm[p];
                for (int idx = a.col_idx[k]; idx < a.col_idx[k + 1]; idx++) {
                    int q = position[a.nz_rows[idx]];
                    if (q >= start) {
                        f[local[q]][p - start] += a.nz_values[idx];
                        if (q >= end) {
                            f[p - start][local[q]] += a.nz_values[transpose[idx]];
                        }
                    }
                }
            }
            for (int child : new int[] {tree.firstChild()[v], tree.secondChild()[v]}) {
                if (child >= 0) {
                    extendAdd(f, updates[child], symbolic.parentLocal(child));
                    updates[child] = null;
                }
            }
            int[] pivots = new int[w];
            perturbed += eliminate(f, w, s, pivots, tiny);
            double[] own = new double[w * w];
            double[] lower = new double[boundary.length * w];
            double[] upper = new double[w * boundary.length];
            for (int r = 0; r < w; r++) {
                System.arraycopy(f[r], 0, own, r * w, w);
                System.arraycopy(f[r], w, upper, r * boundary.length, boundary.length);
            }
            for (int i = 0; i < boundary.length; i++) {
                System.arraycopy(f[w + i], 0, lower, i * w, w);
            }
            double[] update = new double[boundary.length * boundary.length];
            for (int i = 0; i < boundary.length; i++) {
                System.arraycopy(f[w + i], w, update, i * boundary.length, boundary.length);
            }
            updates[v] = update;
            fronts[v] = new Front(start, w, boundary, own, lower, upper, pivots);
        }
        return new MultifrontalLU(symbolic, a, fronts, perturbed);
    }

    /** Adds a child's square update matrix into the front at rows and columns {@code map}. */
    private static void extendAdd(double[][] f, double[] update, int[] map) {
        int b = map.length;
        for (int i = 0; i < b; i++) {
            double[] target = f[map[i]];
            int offset = i * b;
            for (int j = 0; j < b; j++) {
                target[map[j]] += update[offset + j];
            }
        }
    }

    /**
     * Right-looking LU of the first w columns of the s × s front, row pivoting among rows 0 … w−1
     * (rows are swapped by reference); the trailing block becomes the Schur complement.
     *
     * @return the number of perturbed pivots
     */
    private static int eliminate(double[][] f, int w, int s, int[] pivots, double tiny) {
        int perturbed = 0;
        for (int c = 0; c < w; c++) {
            int best = c;
            double size = Math.abs(f[c][c]);
            for (int r = c + 1; r < w; r++) {
                double m = Math.abs(f[r][c]);
                if (m > size) {
                    size = m;
                    best = r;
                }
            }
            pivots[c] = best;
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
            for (int r = c + 1; r < s; r++) {
                double[] row = f[r];
                double l = row[c] * inverse;
                row[c] = l;
                if (l != 0) {
                    for (int j = c + 1; j < s; j++) {
                        row[j] -= l * pivotRow[j];
                    }
                }
            }
        }
        return perturbed;
    }

    /** @return the order n */
    public int size() {
        return analysis.size();
    }

    /** @return the number of pivots replaced by static pivoting (0 for a well-pivoted matrix) */
    public int perturbedPivots() {
        return perturbed;
    }

    /** @return stored entries of L and U */
    public long factorNonZeros() {
        long count = 0;
        for (Front front : fronts) {
            count += front.own().length + front.lower().length + front.upper().length;
        }
        return count;
    }

    /**
     * Solves {@code A x = b} (with iterative refinement if pivots were perturbed).
     *
     * @param rightHandSide b, length n, not modified
     * @param solution x, length n, overwritten; distinct from b
     */
    public void solve(double[] rightHandSide, double[] solution) {
        substitute(rightHandSide, solution);
        if (perturbed == 0) {
            return;
        }
        int n = size();
        double[] residual = new double[n];
        double[] correction = new double[n];
        for (int step = 0; step < REFINEMENT_STEPS; step++) {
            System.arraycopy(rightHandSide, 0, residual, 0, n);
            for (int c = 0; c < n; c++) {
                for (int idx = matrix.col_idx[c]; idx < matrix.col_idx[c + 1]; idx++) {
                    residual[matrix.nz_rows[idx]] -= matrix.nz_values[idx] * solution[c];
                }
            }
            substitute(residual, correction);
            for (int k = 0; k < n; k++) {
                solution[k] += correction[k];
            }
        }
    }

    private void substitute(double[] rightHandSide, double[] solution) {
        int n = size();
        int[] perm = analysis.tree().permutation();
        double[] work = new double[n];
        for (int p = 0; p < n; p++) {
            work[p] = rightHandSide[perm[p]];
        }
        for (Front front : fronts) {
            int start = front.start();
            int w = front.width();
            int[] pivots = front.pivots();
            for (int c = 0; c < w; c++) {
                int other = pivots[c];
                if (other != c) {
                    double t = work[start + c];
                    work[start + c] = work[start + other];
                    work[start + other] = t;
                }
            }
            double[] own = front.own();
            for (int r = 0; r < w; r++) {
                double value = work[start + r];
                int offset = r * w;
                for (int c = 0; c < r; c++) {
                    value -= own[offset + c] * work[start + c];
                }
                work[start + r] = value;
            }
            int[] boundary = front.boundary();
            double[] lower = front.lower();
            for (int i = 0; i < boundary.length; i++) {
                double sum = 0;
                int offset = i * w;
                for (int c = 0; c < w; c++) {
                    sum += lower[offset + c] * work[start + c];
                }
                work[boundary[i]] -= sum;
            }
        }
        for (int v = fronts.length - 1; v >= 0; v--) {
            Front front = fronts[v];
            int start = front.start();
            int w = front.width();
            int[] boundary = front.boundary();
            double[] upper = front.upper();
            double[] own = front.own();
            for (int r = w - 1; r >= 0; r--) {
                double value = work[start + r];
                int offset = r * boundary.length;
                for (int i = 0; i < boundary.length; i++) {
                    value -= upper[offset + i] * work[boundary[i]];
                }
                int rowOffset = r * w;
                for (int c = r + 1; c < w; c++) {
                    value -= own[rowOffset + c] * work[start + c];
                }
                work[start + r] = value / own[rowOffset + r];
            }
        }
        for (int p = 0; p < n; p++) {
            solution[perm[p]] = work[p];
        }
    }
}
