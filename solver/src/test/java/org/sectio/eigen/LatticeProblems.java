package org.sectio.eigen;

import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;

/** Lattice regions and SPD 5-point matrices on them, for the factorization tests. */
final class LatticeProblems {

    /** Active lattice points and a symmetric matrix coupling lattice neighbours. */
    record Problem(int[] column, int[] row, DMatrixSparseCSC matrix) {
        int size() {
            return column.length;
        }
    }

    private LatticeProblems() {
    }

    /** Cells of a {@code width x height} rectangle, each dropped with probability {@code holes}. */
    static boolean[][] rectangle(int width, int height, double holes, Random random) {
        boolean[][] active = new boolean[height][width];
        for (int r = 0; r < height; r++) {
            for (int c = 0; c < width; c++) {
                active[r][c] = random.nextDouble() >= holes;
            }
        }
        return active;
    }

    /** Cells of an {@code n x n} lattice whose centres lie within {@code n/2} of the centre. */
    static boolean[][] disc(int n) {
        boolean[][] active = new boolean[n][n];
        double centre = n / 2.0;
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                double dx = c + 0.5 - centre, dy = r + 0.5 - centre;
                active[r][c] = dx * dx + dy * dy <= centre * centre;
            }
        }
        return active;
    }

    /**
     * {@code A = Σ_edges w (e_k − e_l)(e_k − e_l)ᵀ + diag(d)}: a weighted graph Laplacian of the
     * lattice edges plus a positive diagonal, hence SPD; {@code w ∈ [0.5, 1.5]},
     * {@code d ∈ [dMin, dMin + 1]}; with {@code random == null}, {@code w = 1}, {@code d = dMin}
     * (and no Laplacian boundary terms, i.e. the plain 5-point stencil with diagonal {@code 4 + dMin}).
     */
    static Problem matrix(boolean[][] active, double dMin, Random random) {
        int height = active.length, width = active[0].length;
        int[][] index = new int[height][width];
        int n = 0;
        for (int r = 0; r < height; r++) {
            for (int c = 0; c < width; c++) {
                index[r][c] = active[r][c] ? n++ : -1;
            }
        }
        int[] column = new int[n];
        int[] row = new int[n];
        DMatrixSparseTriplet triplets = new DMatrixSparseTriplet(n, n, 5 * n);
        double[] diagonal = new double[n];
        for (int r = 0; r < height; r++) {
            for (int c = 0; c < width; c++) {
                int k = index[r][c];
                if (k < 0) {
                    continue;
                }
                column[k] = c;
                row[k] = r;
                diagonal[k] += random == null ? 4 + dMin : dMin + random.nextDouble();
                int[][] forward = {{r, c + 1}, {r + 1, c}};
                for (int[] other : forward) {
                    if (other[0] < height && other[1] < width && index[other[0]][other[1]] >= 0) {
                        int l = index[other[0]][other[1]];
                        double w = random == null ? 1 : 0.5 + random.nextDouble();
                        triplets.addItem(k, l, -w);
                        triplets.addItem(l, k, -w);
                        if (random != null) {
                            diagonal[k] += w;
                            diagonal[l] += w;
                        }
                    }
                }
            }
        }
        for (int k = 0; k < n; k++) {
            triplets.addItem(k, k, diagonal[k]);
        }
        return new Problem(column, row, DConvertMatrixStruct.convert(triplets, (DMatrixSparseCSC) null));
    }

    /** {@code y = A x} for a sparse matrix in full storage. */
    static double[] multiply(DMatrixSparseCSC a, double[] x) {
        double[] y = new double[a.numRows];
        for (int k = 0; k < a.numCols; k++) {
            for (int idx = a.col_idx[k]; idx < a.col_idx[k + 1]; idx++) {
                y[a.nz_rows[idx]] += a.nz_values[idx] * x[k];
            }
        }
        return y;
    }

    static double norm(double[] x) {
        double sum = 0;
        for (double v : x) {
            sum += v * v;
        }
        return Math.sqrt(sum);
    }
}
