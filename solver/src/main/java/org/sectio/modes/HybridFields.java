package org.sectio.modes;

import java.util.Arrays;
import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;
import org.sectio.operator.YeeEdges;
import org.sectio.operator.YeePencil;

/**
 * Rebuilds the six field components of a mode from its transverse H on the edges, with the same
 * discrete operators as the eigenproblem ({@link org.sectio.operator.TransverseFieldAssembler}):
 *
 * <pre>
 *   Hz = D h / (jβ),   Ez = C h / (jω ε0 N),
 *   Ex = (∂y Hz + jβ Hy) / (jω ε0 εr),   Ey = (−jβ Hx − ∂x Hz) / (jω ε0 εr),
 * </pre>
 *
 * with ∂ the difference of the two cell values across an edge over d_f. Ex sits on the Hy edges and
 * Ey on the Hx edges, so the power P = ½ Re Σ_f W_f (Ex Hy* − Ey Hx*) needs no interpolation. β is
 * the root of β² with Im β ≤ 0 (decaying along +z). Complex numbers are pairs {re, im}.
 */
final class HybridFields {

    /** ε0, F/m (CODATA 2018). */
    static final double EPSILON_0 = 8.8541878128e-12;
    /** η0 = 1/(ε0 c), Ω. */
    static final double ETA_0 = 1.0 / (EPSILON_0 * ModeSolver.SPEED_OF_LIGHT);

    /** A rebuilt field with the share of Hz in the longitudinal field. */
    record Rebuilt(HybridField field, double magneticShare) {
    }

    private HybridFields() {
    }

    /** @return β = √(β²) with Im β ≤ 0, as {re, im} */
    static double[] beta(double b2re, double b2im) {
        double r = Math.hypot(b2re, b2im);
        double re = Math.sqrt(Math.max(0, 0.5 * (r + b2re)));
        double im = Math.sqrt(Math.max(0, 0.5 * (r - b2re)));
        // the principal root has the sign of Im β²; the decaying root has Im β ≤ 0
        return b2im > 0 ? new double[] {-re, -im} : new double[] {re, -im};
    }

    static Rebuilt of(YeePencil pencil, double[] hr, double[] hi, double b2re, double b2im, double k0) {
        YeeEdges edges = pencil.edges();
        TensorGrid grid = edges.grid();
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        int n = edges.size();
        double omegaEps0 = k0 * ModeSolver.SPEED_OF_LIGHT * EPSILON_0;
        double[] b = beta(b2re, b2im);
        double[] jbeta = {-b[1], b[0]};
        // cell divergence D h, then Hz = D h / (jβ)
        double[] divRe = new double[edges.cellCount()];
        double[] divIm = new double[edges.cellCount()];
        int[][] cellsOf = new int[n][2];
        for (int f = 0; f < n; f++) {
            int i = edges.faceColumn(f);
            int j = edges.faceRow(f);
            int low = edges.kind(f) == YeeEdges.HX ? edges.cellUnknown(i - 1, j) : edges.cellUnknown(i, j - 1);
            int high = edges.cellUnknown(i, j);
            cellsOf[f][0] = low;
            cellsOf[f][1] = high;
            double l = edges.openLength(f);
            divRe[low] += l * hr[f];
            divIm[low] += l * hi[f];
            divRe[high] -= l * hr[f];
            divIm[high] -= l * hi[f];
        }
        double[] hzRe = new double[divRe.length];
        double[] hzIm = new double[divRe.length];
        double[] cellArea = pencil.cellArea();
        for (int c = 0; c < divRe.length; c++) {
            double[] q = divide(divRe[c] / cellArea[c], divIm[c] / cellArea[c], jbeta[0], jbeta[1]);
            hzRe[c] = q[0];
            hzIm[c] = q[1];
        }
        // node circulation C h, then Ez = C h / (jω ε0 N)
        NodeLinks links = edges.nodes();
        double[] curlRe = new double[links.unknowns()];
        double[] curlIm = new double[links.unknowns()];
        for (int f = 0; f < n; f++) {
            int i = edges.faceColumn(f);
            int j = edges.faceRow(f);
            boolean hx = edges.kind(f) == YeeEdges.HX;
            // Hx edge: node below +d, node above −d; Hy edge: left node +d, right node −d
            int first = links.unknownAt(i, j);
            int second = hx ? links.unknownAt(i, j + 1) : links.unknownAt(i + 1, j);
            double d = edges.dualLength(f);
            double s1 = d;
            if (first >= 0) {
                curlRe[first] += (hx ? -s1 : s1) * hr[f];
                curlIm[first] += (hx ? -s1 : s1) * hi[f];
            }
            if (second >= 0) {
                curlRe[second] += (hx ? s1 : -s1) * hr[f];
                curlIm[second] += (hx ? s1 : -s1) * hi[f];
            }
        }
        double[] ezRe = new double[curlRe.length];
        double[] ezIm = new double[curlRe.length];
        double[] nodeEpsIm = pencil.nodePermittivityImaginary();
        for (int k = 0; k < curlRe.length; k++) {
            double er = pencil.nodePermittivityReal()[k];
            double ei = nodeEpsIm == null ? 0 : nodeEpsIm[k];
            // jω ε0 εr = ω ε0 (−ei + j er)
            double[] q = divide(curlRe[k] / pencil.nodeArea()[k], curlIm[k] / pencil.nodeArea()[k],
                    -omegaEps0 * ei, omegaEps0 * er);
            ezRe[k] = q[0];
            ezIm[k] = q[1];
        }
        // transverse E on the edges
        double[] etRe = new double[n];
        double[] etIm = new double[n];
        double[] edgeEpsIm = pencil.edgePermittivityImaginary();
        double powerSum = 0;
        for (int f = 0; f < n; f++) {
            double d = edges.dualLength(f);
            double gRe = (hzRe[cellsOf[f][1]] - hzRe[cellsOf[f][0]]) / d;
            double gIm = (hzIm[cellsOf[f][1]] - hzIm[cellsOf[f][0]]) / d;
            double jbhRe = jbeta[0] * hr[f] - jbeta[1] * hi[f];
            double jbhIm = jbeta[0] * hi[f] + jbeta[1] * hr[f];
            double sign = edges.kind(f) == YeeEdges.HY ? 1 : -1;
            // Hy edge: Ex = (∂yHz + jβHy)/(jωε0ε); Hx edge: Ey = −(jβHx + ∂xHz)/(jωε0ε)
            double numRe = edges.kind(f) == YeeEdges.HY ? gRe + jbhRe : -(jbhRe + gRe);
            double numIm = edges.kind(f) == YeeEdges.HY ? gIm + jbhIm : -(jbhIm + gIm);
            double er = pencil.edgePermittivityReal()[f];
            double ei = edgeEpsIm == null ? 0 : edgeEpsIm[f];
            double[] q = divide(numRe, numIm, -omegaEps0 * ei, omegaEps0 * er);
            etRe[f] = q[0];
            etIm[f] = q[1];
            // Hy edge: + Ex Hy*; Hx edge: − Ey Hx*
            powerSum += sign * pencil.edgeWeight()[f] * (q[0] * hr[f] + q[1] * hi[f]);
        }
        double power = 0.5 * powerSum;
        double peakH = 0;
        for (int f = 0; f < n; f++) {
            peakH = Math.max(peakH, Math.hypot(hr[f], hi[f]));
        }
        double scale = power > 1e-12 * peakH * peakH * totalWeight(pencil) * ETA_0 ? 1.0 / Math.sqrt(power) : 1.0 / peakH;
        double hzEnergy = 0;
        double ezEnergy = 0;
        for (int c = 0; c < hzRe.length; c++) {
            hzEnergy += cellArea[c] * (hzRe[c] * hzRe[c] + hzIm[c] * hzIm[c]);
        }
        for (int k = 0; k < ezRe.length; k++) {
            ezEnergy += pencil.nodeArea()[k] * (ezRe[k] * ezRe[k] + ezIm[k] * ezIm[k]) / (ETA_0 * ETA_0);
        }
        double share = hzEnergy + ezEnergy > 0 ? hzEnergy / (hzEnergy + ezEnergy) : 0.5;
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        double[] xc = centres(xs);
        double[] yc = centres(ys);
        double[][] hxS = blank(xs.length * yc.length);
        double[][] eyS = blank(xs.length * yc.length);
        double[][] hyS = blank(xc.length * ys.length);
        double[][] exS = blank(xc.length * ys.length);
        for (int f = 0; f < n; f++) {
            int i = edges.faceColumn(f);
            int j = edges.faceRow(f);
            boolean hx = edges.kind(f) == YeeEdges.HX;
            int at = hx ? j * xs.length + i : j * xc.length + i;
            double[][] h = hx ? hxS : hyS;
            double[][] e = hx ? eyS : exS;
            h[0][at] = scale * hr[f];
            h[1][at] = scale * hi[f];
            e[0][at] = scale * etRe[f];
            e[1][at] = scale * etIm[f];
        }
        double[][] hzS = blank(xc.length * yc.length);
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int c = edges.cellUnknown(i, j);
                if (c >= 0) {
                    hzS[0][j * xc.length + i] = scale * hzRe[c];
                    hzS[1][j * xc.length + i] = scale * hzIm[c];
                }
            }
        }
        double[][] ezS = blank(xs.length * ys.length);
        for (int k = 0; k < ezRe.length; k++) {
            int node = links.nodeOf(k);
            ezS[0][node] = scale * ezRe[k];
            ezS[1][node] = scale * ezIm[k];
        }
        // stored energy ¼ Σ (ε0 εr′ |E|² + μ0 |H|²) over the control volumes, and the peak |E| at cell centres
        double mu0 = 1.0 / (EPSILON_0 * ModeSolver.SPEED_OF_LIGHT * ModeSolver.SPEED_OF_LIGHT);
        double energy = 0;
        for (int f = 0; f < n; f++) {
            energy += pencil.edgeWeight()[f] * (EPSILON_0 * pencil.edgePermittivityReal()[f]
                    * (etRe[f] * etRe[f] + etIm[f] * etIm[f]) + mu0 * (hr[f] * hr[f] + hi[f] * hi[f]));
        }
        for (int c = 0; c < hzRe.length; c++) {
            energy += cellArea[c] * mu0 * (hzRe[c] * hzRe[c] + hzIm[c] * hzIm[c]);
        }
        for (int k = 0; k < ezRe.length; k++) {
            energy += pencil.nodeArea()[k] * EPSILON_0 * pencil.nodePermittivityReal()[k]
                    * (ezRe[k] * ezRe[k] + ezIm[k] * ezIm[k]);
        }
        energy *= 0.25 * scale * scale;
        double peak = 0;
        double peakX = Double.NaN;
        double peakY = Double.NaN;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                if (edges.cellUnknown(i, j) < 0) {
                    continue;
                }
                double e2 = mean2(exS, j * xc.length + i, (j + 1) * xc.length + i)
                        + mean2(eyS, j * xs.length + i, j * xs.length + i + 1)
                        + mean4(ezS, j * xs.length + i, j * xs.length + i + 1, (j + 1) * xs.length + i,
                                (j + 1) * xs.length + i + 1);
                if (e2 > peak) {
                    peak = e2;
                    peakX = xc[i];
                    peakY = yc[j];
                }
            }
        }
        HybridField field = new HybridField(new HybridField.Samples(xs, yc, hxS[0], hxS[1]),
                new HybridField.Samples(xc, ys, hyS[0], hyS[1]), new HybridField.Samples(xc, yc, hzS[0], hzS[1]),
                new HybridField.Samples(xc, ys, exS[0], exS[1]), new HybridField.Samples(xs, yc, eyS[0], eyS[1]),
                new HybridField.Samples(xs, ys, ezS[0], ezS[1]), power * scale * scale, energy, Math.sqrt(peak), peakX,
                peakY);
        return new Rebuilt(field, share);
    }

    /** |mean of two complex samples|², a missing (NaN) sample counting as 0 (metal). */
    private static double mean2(double[][] s, int a, int b) {
        double re = 0.5 * (value(s[0], a) + value(s[0], b));
        double im = 0.5 * (value(s[1], a) + value(s[1], b));
        return re * re + im * im;
    }

    private static double mean4(double[][] s, int a, int b, int c, int d) {
        double re = 0.25 * (value(s[0], a) + value(s[0], b) + value(s[0], c) + value(s[0], d));
        double im = 0.25 * (value(s[1], a) + value(s[1], b) + value(s[1], c) + value(s[1], d));
        return re * re + im * im;
    }

    private static double value(double[] v, int at) {
        return Double.isNaN(v[at]) ? 0 : v[at];
    }

    private static double totalWeight(YeePencil pencil) {
        double s = 0;
        for (double w : pencil.edgeWeight()) {
            s += w;
        }
        return s;
    }

    private static double[] divide(double ar, double ai, double br, double bi) {
        double d = br * br + bi * bi;
        return new double[] {(ar * br + ai * bi) / d, (ai * br - ar * bi) / d};
    }

    private static double[][] blank(int size) {
        double[][] out = new double[2][size];
        Arrays.fill(out[0], Double.NaN);
        Arrays.fill(out[1], Double.NaN);
        return out;
    }

    private static double[] centres(double[] lines) {
        double[] c = new double[lines.length - 1];
        for (int k = 0; k < c.length; k++) {
            c[k] = 0.5 * (lines[k] + lines[k + 1]);
        }
        return c;
    }
}
