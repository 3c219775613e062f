package org.sectio.eigen;

import java.util.Arrays;
import org.ejml.data.DMatrixSparseCSC;

/**
 * The complex counterpart of {@link MultifrontalLU}: {@code P Q Z Qᵀ = L U} for Z = X + jY with X and Y
 * sharing one structurally symmetric lattice pattern, on the same {@link MultifrontalLU.Analysis}
 * (nested dissection and fronts depend on the pattern only), with partial pivoting by modulus among
 * each front's own rows (Duff and Reid 1984, as cited there). No static pivoting: a pivot of modulus
 * below 1e-300 is refused. Used for the lossy (complex) operators of the vector mode solver.
 */
public final class ComplexMultifrontalLU {

    private final MultifrontalAnalysis analysis;
    private final Front[] fronts;

    private record Front(int start, int width, int[] boundary, double[] ownRe, double[] ownIm, double[] lowerRe,
                         double[] lowerIm, double[] upperRe, double[] upperIm, int[] pivots) {
    }

    private ComplexMultifrontalLU(MultifrontalAnalysis analysis, Front[] fronts) {
        this.analysis = analysis;
        this.fronts = fronts;
    }

    /**
     * @param symbolic the analysis of the common pattern
     * @param real X, not modified
     * @param imaginary Y, same pattern as X, not modified
     * @return the factorization
     * @throws IllegalArgumentException if a pattern differs from the analysed one
     * @throws EigenSolverException if a pivot vanishes
     */
    public static ComplexMultifrontalLU factor(MultifrontalLU.Analysis symbolic, DMatrixSparseCSC real,
                                               DMatrixSparseCSC imaginary) {
        MultifrontalAnalysis an = symbolic.symbolic();
        int n = an.size();
        if (real.nz_length != symbolic.transposeIndex().length || imaginary.nz_length != real.nz_length
                || real.numCols != n || imaginary.numCols != n) {
            throw new IllegalArgumentException("complex multifrontal LU: matrices of order " + real.numCols + "/"
                    + imaginary.numCols + " with " + real.nz_length + "/" + imaginary.nz_length
                    + " entries do not have the analysed pattern of order " + n);
        }
        DissectionTree tree = an.tree();
        int[] perm = tree.permutation();
        int[] position = new int[n];
        for (int p = 0; p < n; p++) {
            position[perm[p]] = p;
        }
        int widest = an.largestFront();
        double[][] fr = new double[widest][widest];
        double[][] fi = new double[widest][widest];
        int[] local = new int[n];
        int nodes = tree.nodeCount();
        Front[] fronts = new Front[nodes];
        double[][] updRe = new double[nodes][];
        double[][] updIm = new double[nodes][];
        int[] transpose = symbolic.transposeIndex();
        for (int v = 0; v < nodes; v++) {
            int start = tree.columnStart()[v];
            int end = tree.columnEnd()[v];
            int w = end - start;
            int[] boundary = an.boundary(v);
            int s = w + boundary.length;
            for (int r = 0; r < s; r++) {
                Arrays.fill(fr[r], 0, s, 0.0);
                Arrays.fill(fi[r], 0, s, 0.0);
            }
            for (int p = start; p < end; p++) {
                local[p] = p - start;
            }
            for (int i = 0; i < boundary.length; i++) {
                local[boundary[i]] = w + i;
            }
            for (int p = start; p < end; p++) {
                int k = perm[p];
                for (int idx = real.col_idx[k]; idx < real.col_idx[k + 1]; idx++) {
                    int q = position[real.nz_rows[idx]];
                    if (q >= start) {
                        fr[local[q]][p - start] += real.nz_values[idx];
                        fi[local[q]][p - start] += imaginary.nz_values[idx];
                        if (q >= end) {
                            fr[p - start][local[q]] += real.nz_values[transpose[idx]];
                            fi[p - start][local[q]] += imaginary.nz_values[transpose[idx]];
                        }
                    }
                }
            }
            for (int child : new int[] {tree.firstChild()[v], tree.secondChild()[v]}) {
                if (child >= 0) {
                    int[] map = an.parentLocal(child);
                    int b = map.length;
                    for (int i = 0; i < b; i++) {
                        for (int j = 0; j < b; j++) {
                            fr[map[i]][map[j]] += updRe[child][i * b + j];
                            fi[map[i]][map[j]] += updIm[child][i * b + j];
                        }
                    }
                    updRe[child] = null;
                    updIm[child] = null;
                }
            }
            int[] pivots = new int[w];
            eliminate(fr, fi, w, s, pivots);
            int b = boundary.length;
            double[] ownRe = new double[w * w];
            double[] ownIm = new double[w * w];
            double[] lowerRe = new double[b * w];
            double[] lowerIm = new double[b * w];
            double[] upperRe = new double[w * b];
            double[] upperIm = new double[w * b];
            for (int r = 0; r < w; r++) {
                System.arraycopy(fr[r], 0, ownRe, r * w, w);
                System.arraycopy(fi[r], 0, ownIm, r * w, w);
                System.arraycopy(fr[r], w, upperRe, r * b, b);
                System.arraycopy(fi[r], w, upperIm, r * b, b);
            }
            double[] ur = new double[b * b];
            double[] ui = new double[b * b];
            for (int i = 0; i < b; i++) {
                System.arraycopy(fr[w + i], 0, lowerRe, i * w, w);
                System.arraycopy(fi[w + i], 0, lowerIm, i * w, w);
                System.arraycopy(fr[w + i], w, ur, i * b, b);
                System.arraycopy(fi[w + i], w, ui, i * b, b);
            }
            updRe[v] = ur;
            updIm[v] = ui;
            fronts[v] = new Front(start, w, boundary, ownRe, ownIm, lowerRe, lowerIm, upperRe, upperIm, pivots);
        }
        return new ComplexMultifrontalLU(an, fronts);
    }

    private static void eliminate(double[][] fr, double[][] fi, int w, int s, int[] pivots) {
        for (int c = 0; c < w; c++) {
            int best = c;
            double size = fr[c][c] * fr[c][c] + fi[c][c] * fi[c][c];
            for (int r = c + 1; r < w; r++) {
                double m = fr[r][c] * fr[r][c] + fi[r][c] * fi[r][c];
                if (m > size) {
                    size = m;
                    best = r;
                }
            }
            pivots[c] = best;
            if (best != c) {
                double[] t = fr[c];
                fr[c] = fr[best];
                fr[best] = t;
                t = fi[c];
                fi[c] = fi[best];
                fi[best] = t;
            }
            if (!(size > 1e-300)) {
                throw new EigenSolverException("complex multifrontal LU: zero pivot at column " + c + " of a front;"
                        + " the matrix is singular; choose another shift", 0, 0, 0, 0);
            }
            double[] pr = fr[c];
            double[] pi = fi[c];
            double invRe = pr[c] / size;
            double invIm = -pi[c] / size;
            for (int r = c + 1; r < s; r++) {
                double[] rr = fr[r];
                double[] ri = fi[r];
                double lr = rr[c] * invRe - ri[c] * invIm;
                double li = rr[c] * invIm + ri[c] * invRe;
                rr[c] = lr;
                ri[c] = li;
                if (lr != 0 || li != 0) {
                    for (int j = c + 1; j < s; j++) {
                        rr[j] -= lr * pr[j] - li * pi[j];
                        ri[j] -= lr * pi[j] + li * pr[j];
                    }
                }
            }
        }
    }

    /**
     * Solves Z x = b.
     *
     * @param bRe Re b, not modified
     * @param bIm Im b, not modified
     * @param xRe Re x, overwritten
     * @param xIm Im x, overwritten
     */
    public void solve(double[] bRe, double[] bIm, double[] xRe, double[] xIm) {
        int n = analysis.size();
        int[] perm = analysis.tree().permutation();
        double[] wr = new double[n];
        double[] wi = new double[n];
        for (int p = 0; p < n; p++) {
            wr[p] = bRe[perm[p]];
            wi[p] = bIm[perm[p]];
        }
        for (Front f : fronts) {
            int st = f.start();
            int w = f.width();
            for (int c = 0; c < w; c++) {
                int o = f.pivots()[c];
                if (o != c) {
                    double t = wr[st + c];
                    wr[st + c] = wr[st + o];
                    wr[st + o] = t;
                    t = wi[st + c];
                    wi[st + c] = wi[st + o];
                    wi[st + o] = t;
                }
            }
            for (int r = 0; r < w; r++) {
                double vr = wr[st + r];
                double vi = wi[st + r];
                for (int c = 0; c < r; c++) {
                    double ar = f.ownRe()[r * w + c];
                    double ai = f.ownIm()[r * w + c];
                    vr -= ar * wr[st + c] - ai * wi[st + c];
                    vi -= ar * wi[st + c] + ai * wr[st + c];
                }
                wr[st + r] = vr;
                wi[st + r] = vi;
            }
            int[] bd = f.boundary();
            for (int i = 0; i < bd.length; i++) {
                double sr = 0;
                double si = 0;
                for (int c = 0; c < w; c++) {
                    double ar = f.lowerRe()[i * w + c];
                    double ai = f.lowerIm()[i * w + c];
                    sr += ar * wr[st + c] - ai * wi[st + c];
                    si += ar * wi[st + c] + ai * wr[st + c];
                }
                wr[bd[i]] -= sr;
                wi[bd[i]] -= si;
            }
        }
        for (int v = fronts.length - 1; v >= 0; v--) {
            Front f = fronts[v];
            int st = f.start();
            int w = f.width();
            int[] bd = f.boundary();
            for (int r = w - 1; r >= 0; r--) {
                double vr = wr[st + r];
                double vi = wi[st + r];
                for (int i = 0; i < bd.length; i++) {
                    double ar = f.upperRe()[r * bd.length + i];
                    double ai = f.upperIm()[r * bd.length + i];
                    vr -= ar * wr[bd[i]] - ai * wi[bd[i]];
                    vi -= ar * wi[bd[i]] + ai * wr[bd[i]];
                }
                for (int c = r + 1; c < w; c++) {
                    double ar = f.ownRe()[r * w + c];
                    double ai = f.ownIm()[r * w + c];
                    vr -= ar * wr[st + c] - ai * wi[st + c];
                    vi -= ar * wi[st + c] + ai * wr[st + c];
                }
                double dr = f.ownRe()[r * w + r];
                double di = f.ownIm()[r * w + r];
                double d2 = dr * dr + di * di;
                wr[st + r] = (vr * dr + vi * di) / d2;
                wi[st + r] = (vi * dr - vr * di) / d2;
            }
        }
        for (int p = 0; p < n; p++) {
            xRe[perm[p]] = wr[p];
            xIm[perm[p]] = wi[p];
        }
    }
}
