package org.sectio.eigen;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * The eigenvalues of largest magnitude of a real non-symmetric linear map (in practice a shift-invert
 * operator (τI − A)⁻¹, whose largest |θ| belong to the eigenvalues λ = τ − 1/θ of A nearest τ), by the
 * Arnoldi method with thick restarts in the form of G. W. Stewart's Krylov–Schur method, "A Krylov–Schur
 * algorithm for large eigenproblems", SIAM J. Matrix Anal. Appl. 23(3) (2001) 601–614: after m steps
 * {@code OP V = V H + v h eₘᵀ}; the k wanted (largest |θ|) Ritz values of H span an invariant subspace
 * with an orthonormal basis Q (here from the real block eigenvectors of H, {@link SmallEigen},
 * orthonormalized), and {@code OP (VQ) = (VQ)(QᵀHQ) + v (h eₘᵀQ)} is again a
 * Krylov decomposition from which the iteration continues. Complex pairs are kept together.
 *
 * <p>Vectors are orthogonalized by classical Gram–Schmidt twice (J. W. Daniel, W. B. Gragg, L. Kaufman
 * and G. W. Stewart, Math. Comp. 30 (1976) 772–795). A pair is accepted when its residual estimate
 * |h eₘᵀ y| is at most {@code relativeTolerance · |θ|} (ARPACK's criterion); the test runs at the end of
 * every cycle and, from a basis of 2·count + 2 vectors on, after every step, so a start vector that
 * already lies near the wanted subspace (the eigenvectors of a nearby frequency) ends the iteration
 * early. A single start vector sees
 * a second copy of an exactly double eigenvalue only through rounding, as in any single-vector Krylov
 * method; callers that need multiplets must restart from other vectors.
 */
public final class ThickRestartArnoldi {

    private ThickRestartArnoldi() {
    }

    /**
     * @param op the map, n → n
     * @param n the order, ≥ count + 3
     * @param count wanted pairs, ≥ 1 (a complex pair at the boundary adds one)
     * @param basisSize Krylov basis m, count + 2 ≤ m ≤ n − 1
     * @param relativeTolerance accepted residual estimate over |θ|, e.g. 1e-10
     * @param maxRestarts most restarts before giving up, ≥ 1
     * @param starts vectors to start from (e.g. eigenvectors of a nearby problem), may be empty; their sum
     *     with a small random part is the start vector
     * @param seed seed of the random part
     * @return the pairs, largest |θ| first
     * @throws IllegalArgumentException if the sizes are out of range
     * @throws EigenSolverException if the wanted pairs do not converge within maxRestarts
     */
    public static ArnoldiPairs largest(LinearMap op, int n, int count, int basisSize, double relativeTolerance,
                                       int maxRestarts, double[][] starts, long seed) {
        if (count < 1 || basisSize < count + 2 || basisSize > n - 1 || maxRestarts < 1) {
            throw new IllegalArgumentException("Arnoldi: need 1 ≤ count, count + 2 ≤ basis ≤ n − 1 and restarts ≥ 1; got"
                    + " count " + count + ", basis " + basisSize + ", n " + n + ", restarts " + maxRestarts);
        }
        int m = basisSize;
        double[][] v = new double[m + 1][];
        double[][] h = new double[m + 1][m];
        Random random = new Random(seed);
        v[0] = startVector(n, starts, random);
        int k = 0;
        int applications = 0;
        int earliest = Math.min(m, 2 * count + 2);
        for (int restart = 0; ; restart++) {
            for (int j = k; j < m; j++) {
                double[] w = new double[n];
                op.apply(v[j], w);
                applications++;
                double norm = orthogonalize(v, j + 1, w, h, j);
                if (norm < 1e-13 * columnNorm(h, j)) {
                    w = randomVector(n, random);
                    orthogonalize(v, j + 1, w, null, j);
                    norm = 0;
                    scale(w, 1.0 / Math.sqrt(dot(w, w)));
                } else {
                    scale(w, 1.0 / norm);
                }
                h[j + 1][j] = norm;
                v[j + 1] = w;
                int size = j + 1;
                if (size >= earliest && size < m) {
                    Ritz early = earlyRitz(h, size, count, relativeTolerance);
                    if (early != null && early.converged()) {
                        return ritzPairs(v, size, early, applications, restart);
                    }
                }
            }
            Ritz ritz = ritz(h, m, count, relativeTolerance);
            if (ritz.converged()) {
                return ritzPairs(v, m, ritz, applications, restart);
            }
            if (restart >= maxRestarts) {
                throw new EigenSolverException(String.format(java.util.Locale.ROOT, "Arnoldi: %d pairs did not converge"
                        + " in %d restarts (%d operator applications); largest residual estimate %.3g, tolerance %.3g;"
                        + " try a larger basis or a shift closer to the wanted eigenvalues", count, restart, applications,
                        ritz.worst(), relativeTolerance), 0, restart, relativeTolerance, 0);
            }
            int keep = Math.min(m - 2, count + (m - count) / 2);
            double[][] q = orthonormalColumns(ritz.blocks(), take(ritz.order(), keep), m);
            k = q.length;
            double[][] newV = new double[m + 1][];
            for (int c = 0; c < k; c++) {
                double[] x = new double[n];
                BasisKernels.addCombination(v, m, q[c], x);
                newV[c] = x;
            }
            newV[k] = v[m];
            double[][] newH = new double[m + 1][m];
            for (int a = 0; a < k; a++) {
                for (int b = 0; b < k; b++) {
                    double s = 0;
                    for (int r = 0; r < m; r++) {
                        double hq = 0;
                        for (int c = 0; c < m; c++) {
                            hq += h[r][c] * q[b][c];
                        }
                        s += q[a][r] * hq;
                    }
                    newH[a][b] = s;
                }
                newH[k][a] = ritz.last() * q[a][m - 1];
            }
            v = newV;
            h = newH;
        }
    }

    /** The Ritz values and block eigenvectors of the leading p × p part of H, and whether the wanted ones converged. */
    private record Ritz(double[] re, double[] im, RealMatrix blocks, List<int[]> order, List<int[]> wanted, double last,
                        boolean converged, double worst) {
    }

    /**
     * The Ritz pairs of {@code OP V_p = V_p H_p + h[p][p−1] v_p e_pᵀ} (valid after every expansion step,
     * also after a restart, since row p of H then holds only h[p][p−1]).
     */
    private static Ritz ritz(double[][] h, int p, int count, double relativeTolerance) {
        SmallEigen.Result eig = SmallEigen.of(h, p);
        double[] re = eig.re();
        double[] im = eig.im();
        RealMatrix blocks = eig.blocks();
        List<int[]> order = blocksByMagnitude(re, im);
        double last = h[p][p - 1];
        List<int[]> wanted = take(order, count);
        boolean converged = true;
        double worst = 0;
        for (int[] b : wanted) {
            double estimate = residualEstimate(blocks, b, p, last) / Math.hypot(re[b[0]], im[b[0]]);
            worst = Math.max(worst, estimate);
            converged &= estimate <= relativeTolerance;
        }
        return new Ritz(re, im, blocks, order, wanted, last, converged, worst);
    }

    /** {@link #ritz}, or null where the small eigenproblem fails; the iteration then goes on to the full basis. */
    private static Ritz earlyRitz(double[][] h, int p, int count, double relativeTolerance) {
        try {
            return ritz(h, p, count, relativeTolerance);
        } catch (EigenSolverException e) {
            return null;
        }
    }

    private static double[] startVector(int n, double[][] starts, Random random) {
        double[] x = randomVector(n, random);
        double noise = starts.length == 0 ? 1.0 : 1e-3 / Math.sqrt(dot(x, x));
        scale(x, noise);
        for (int s = 0; s < starts.length; s++) {
            double norm = Math.sqrt(dot(starts[s], starts[s]));
            if (norm > 0) {
                axpy((1.0 + 0.1 * s) / norm, starts[s], x);
            }
        }
        scale(x, 1.0 / Math.sqrt(dot(x, x)));
        return x;
    }

    private static double[] randomVector(int n, Random random) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = random.nextDouble() - 0.5;
        }
        return x;
    }

    /** Classical Gram–Schmidt twice against v[0 … count−1]; adds the coefficients to h[·][column] if given. */
    private static double orthogonalize(double[][] v, int count, double[] w, double[][] h, int column) {
        double[] c = new double[count];
        for (int pass = 0; pass < 2; pass++) {
            BasisKernels.projections(v, count, w, c);
            double[] negated = new double[count];
            for (int i = 0; i < count; i++) {
                negated[i] = -c[i];
                if (h != null) {
                    h[i][column] += c[i];
                }
            }
            BasisKernels.addCombination(v, count, negated, w);
        }
        return Math.sqrt(dot(w, w));
    }

    private static double columnNorm(double[][] h, int column) {
        double s = 0;
        for (double[] row : h) {
            s += row[column] * row[column];
        }
        return Math.sqrt(s);
    }

    /** Eigenvalue blocks ({i} real, {i, i+1} a complex pair) by descending |θ|, ties by index. */
    private static List<int[]> blocksByMagnitude(double[] re, double[] im) {
        List<int[]> blocks = new ArrayList<>();
        for (int i = 0; i < re.length; i++) {
            if (im[i] != 0 && i + 1 < re.length && im[i + 1] == -im[i]) {
                blocks.add(new int[] {i, i + 1});
                i++;
            } else {
                blocks.add(new int[] {i});
            }
        }
        blocks.sort(Comparator.comparingDouble((int[] b) -> -Math.hypot(re[b[0]], im[b[0]])).thenComparingInt(b -> b[0]));
        return blocks;
    }

    /** The leading blocks holding at least {@code values} eigenvalues. */
    private static List<int[]> take(List<int[]> blocks, int values) {
        List<int[]> out = new ArrayList<>();
        int held = 0;
        for (int[] b : blocks) {
            if (held >= values) {
                break;
            }
            out.add(b);
            held += b.length;
        }
        return out;
    }

    /** |last · eₘᵀ y| / ‖y‖ for the (real or complex) eigenvector y of H held in the block's columns. */
    private static double residualEstimate(RealMatrix blocks, int[] b, int m, double last) {
        double tail = 0;
        double norm = 0;
        for (int c : b) {
            tail += blocks.getEntry(m - 1, c) * blocks.getEntry(m - 1, c);
            for (int r = 0; r < m; r++) {
                norm += blocks.getEntry(r, c) * blocks.getEntry(r, c);
            }
        }
        return Math.abs(last) * Math.sqrt(tail / norm);
    }

    /** Orthonormal basis (as rows q[c][·]) of the block columns, by modified Gram–Schmidt twice; drops dependent ones. */
    private static double[][] orthonormalColumns(RealMatrix blocks, List<int[]> chosen, int m) {
        List<double[]> out = new ArrayList<>();
        for (int[] b : chosen) {
            for (int c : b) {
                double[] y = blocks.getColumn(c);
                double before = Math.sqrt(dot(y, y));
                for (int pass = 0; pass < 2; pass++) {
                    for (double[] q : out) {
                        axpy(-dot(q, y), q, y);
                    }
                }
                double after = Math.sqrt(dot(y, y));
                if (after > 1e-8 * before) {
                    scale(y, 1.0 / after);
                    out.add(y);
                }
            }
        }
        return out.toArray(new double[0][]);
    }

    private static ArnoldiPairs ritzPairs(double[][] v, int m, Ritz ritz, int applications, int restarts) {
        RealMatrix blocks = ritz.blocks();
        List<int[]> wanted = ritz.wanted();
        double[] re = ritz.re();
        double[] im = ritz.im();
        double last = ritz.last();
        int n = v[0].length;
        int total = 0;
        for (int[] b : wanted) {
            total += b.length;
        }
        double[] outRe = new double[total];
        double[] outIm = new double[total];
        double[][] xr = new double[total][];
        double[][] xi = new double[total][];
        double[] residual = new double[total];
        int at = 0;
        for (int[] b : wanted) {
            double[] real = new double[n];
            double[] imag = new double[n];
            BasisKernels.addCombination(v, m, blocks.getColumn(b[0]), real);
            if (b.length == 2) {
                BasisKernels.addCombination(v, m, blocks.getColumn(b[1]), imag);
            }
            double norm = Math.sqrt(dot(real, real) + dot(imag, imag));
            scale(real, 1.0 / norm);
            scale(imag, 1.0 / norm);
            double estimate = residualEstimate(blocks, b, m, last) / Math.hypot(re[b[0]], im[b[0]]);
            for (int c = 0; c < b.length; c++) {
                outRe[at] = re[b[c]];
                outIm[at] = im[b[c]];
                xr[at] = real.clone();
                xi[at] = c == 0 ? imag.clone() : negated(imag);
                residual[at] = estimate;
                at++;
            }
        }
        return new ArnoldiPairs(outRe, outIm, xr, xi, residual, applications, restarts);
    }

    private static double[] negated(double[] x) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = -x[i];
        }
        return y;
    }

    static double dot(double[] a, double[] b) {
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
        int n = a.length;
        int i = 0;
        for (; i + 3 < n; i += 4) {
            s0 += a[i] * b[i];
            s1 += a[i + 1] * b[i + 1];
            s2 += a[i + 2] * b[i + 2];
            s3 += a[i + 3] * b[i + 3];
        }
        for (; i < n; i++) {
            s0 += a[i] * b[i];
        }
        return (s0 + s1) + (s2 + s3);
    }

    static void axpy(double alpha, double[] x, double[] y) {
        for (int i = 0; i < x.length; i++) {
            y[i] += alpha * x[i];
        }
    }

    private static void scale(double[] x, double alpha) {
        for (int i = 0; i < x.length; i++) {
            x[i] *= alpha;
        }
    }
}
