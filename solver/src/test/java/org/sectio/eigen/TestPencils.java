package org.sectio.eigen;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;

/**
 * Small pencils with known spectra for eigensolver tests.
 *
 * <p>Closed forms: the Dirichlet second-difference matrix {@code tridiag(−1, 2, −1)/h²} of order n has
 * eigenvalues {@code 4/h² sin²(kπ/(2(n+1)))}, k = 1..n (G. Strang, <i>Introduction to Applied
 * Mathematics</i>, Wellesley-Cambridge 1986, §1.5 and §5.4); its Kronecker sum, the 5-point Laplacian on an
 * n × n lattice, has {@code 4/h² [sin²(pπ/(2(n+1))) + sin²(qπ/(2(n+1)))]}, exactly degenerate under p ↔ q.
 * The Neumann (free-end) second-difference matrix, the Laplacian of a path graph, has eigenvalues
 * {@code 4/h² sin²(kπ/(2n))}, k = 0..n−1, with DCT-II eigenvectors (G. Strang, "The discrete cosine
 * transform", SIAM Review 41 (1999) 135–147), and its Kronecker sum likewise.
 */
final class TestPencils {

    private TestPencils() {
    }

    /** {@code tridiag(−1, 2, −1)/h²} of order n (Dirichlet ends). */
    static DMatrixSparseCSC dirichlet1D(int n, double h) {
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, 3 * n);
        double s = 1 / (h * h);
        for (int i = 0; i < n; i++) {
            t.addItem(i, i, 2 * s);
            if (i > 0) {
                t.addItem(i, i - 1, -s);
                t.addItem(i - 1, i, -s);
            }
        }
        return DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
    }

    /** The 5-point Laplacian on an n × n lattice of spacing h, Dirichlet (neumann = false) or Neumann ends. */
    static DMatrixSparseCSC laplacian2D(int n, double h, boolean neumann) {
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n * n, n * n, 5 * n * n);
        double s = 1 / (h * h);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                int node = i * n + j;
                int neighbours = 0;
                int[][] steps = {{1, 0}, {-1, 0}, {0, 1}, {0, -1}};
                for (int[] step : steps) {
                    int ni = i + step[0];
                    int nj = j + step[1];
                    if (ni >= 0 && ni < n && nj >= 0 && nj < n) {
                        t.addItem(node, ni * n + nj, -s);
                        neighbours++;
                    }
                }
                t.addItem(node, node, (neumann ? neighbours : 4) * s);
            }
        }
        return DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
    }

    /** The sorted closed-form eigenvalues {@code 4/h² sin²(kπ/(2(n+1)))}, k = 1..n. */
    static double[] dirichlet1DEigenvalues(int n, double h) {
        double[] values = new double[n];
        for (int k = 1; k <= n; k++) {
            values[k - 1] = 4 / (h * h) * sq(Math.sin(k * Math.PI / (2.0 * (n + 1))));
        }
        return values;
    }

    /** The sorted closed-form eigenvalues of {@link #laplacian2D}, with multiplicities. */
    static double[] laplacian2DEigenvalues(int n, double h, boolean neumann) {
        List<Double> values = new ArrayList<>();
        int first = neumann ? 0 : 1;
        int last = neumann ? n - 1 : n;
        double denominator = neumann ? 2.0 * n : 2.0 * (n + 1);
        for (int p = first; p <= last; p++) {
            for (int q = first; q <= last; q++) {
                values.add(4 / (h * h) * (sq(Math.sin(p * Math.PI / denominator))
                        + sq(Math.sin(q * Math.PI / denominator))));
            }
        }
        return values.stream().mapToDouble(Double::doubleValue).sorted().toArray();
    }

    /** A diagonal with entries uniform in [low, high). */
    static double[] randomDiagonal(int n, double low, double high, long seed) {
        Random random = new Random(seed);
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = low + (high - low) * random.nextDouble();
        }
        return d;
    }

    /** A constant diagonal. */
    static double[] constantDiagonal(int n, double value) {
        double[] d = new double[n];
        java.util.Arrays.fill(d, value);
        return d;
    }

    /**
     * A random sparse symmetric positive definite matrix: about {@code perRow} random off-diagonal pairs
     * per row in (−1, 1), and a diagonal exceeding each absolute row sum by 0.1 to 1.1 (strict diagonal
     * dominance with positive diagonal gives positive definiteness, Gershgorin).
     */
    static DMatrixSparseCSC randomSpd(int n, int perRow, long seed) {
        Random random = new Random(seed);
        double[][] dense = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int e = 0; e < perRow; e++) {
                int j = random.nextInt(n);
                if (j != i) {
                    double value = 2 * random.nextDouble() - 1;
                    dense[i][j] = value;
                    dense[j][i] = value;
                }
            }
        }
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, n * (2 * perRow + 1));
        for (int i = 0; i < n; i++) {
            double rowSum = 0;
            for (int j = 0; j < n; j++) {
                if (j != i && dense[i][j] != 0) {
                    t.addItem(i, j, dense[i][j]);
                    rowSum += Math.abs(dense[i][j]);
                }
            }
            t.addItem(i, i, rowSum + 0.1 + random.nextDouble());
        }
        return DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
    }

    /** {@code A − σ diag(m)}. */
    static DMatrixSparseCSC shifted(DMatrixSparseCSC a, double[] m, double shift) {
        DMatrixSparseCSC k = a.copy();
        for (int i = 0; i < m.length; i++) {
            k.set(i, i, a.get(i, i) - shift * m[i]);
        }
        return k;
    }

    /** A uniformly random permutation of 0..n−1 (Fisher–Yates). */
    static int[] randomPermutation(int n, long seed) {
        Random random = new Random(seed);
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int swap = p[i];
            p[i] = p[j];
            p[j] = swap;
        }
        return p;
    }

    private static double sq(double x) {
        return x * x;
    }
}
