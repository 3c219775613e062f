package org.sectio.modes;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Exact β² of a rectangular guide filled with dielectric layers stacked along one axis (a slab or
 * layers touching two opposite walls), by transverse resonance: Collin, Field Theory of Guided Waves,
 * 2nd ed., ch. 6 (partially filled waveguides; section number from memory), and Harrington,
 * Time-Harmonic Electromagnetic Fields, §4 (modal expansions of the slab-loaded guide, from memory).
 * The equations are derived here from Maxwell's equations with μr = 1.
 *
 * <p>Let u be the coordinate across the layers (0 … width), w the other transverse coordinate with
 * the field ∝ cos or sin(k_w w), k_w = nπ / height, and in each layer q² = k0² εr − k_w² − β².
 * <ul>
 *   <li><b>LSE</b> (no E along u; from an electric vector potential along u, ψ ∝ ε u(u)): u = 0 on
 *       both walls, u and u′ continuous. With k_w = 0 these are the TE_m0 modes across the layers.</li>
 *   <li><b>LSM</b> (no H along u; from a magnetic vector potential along u): ψ′ = 0 on both walls,
 *       ψ and ψ′/εr continuous; k_w ≥ π/height.</li>
 * </ul>
 * A layer maps (u, u′) by the cos/sin matrix of q (cosh/sinh when q² &lt; 0). The roots in β² of the
 * far-wall value are bracketed by a fine scan and refined with Commons Math's BrentSolver.
 */
final class LayeredGuideModes {

    private LayeredGuideModes() {
    }

    /** Far-wall residual: LSE u(width) from (0, 1); LSM ψ′/ε(width) from (1, 0). */
    static double farWall(boolean lse, double betaSquared, double k0, double kw, double[] widths, double[] eps) {
        double x = lse ? 0 : 1;
        double d = lse ? 1 : 0;
        for (int l = 0; l < widths.length; l++) {
            double q2 = k0 * k0 * eps[l] - kw * kw - betaSquared;
            double t = widths[l];
            // LSM carries F = ψ′/ε, so ψ′ = ε F; LSE carries u′ itself
            double e = lse ? 1 : eps[l];
            double nx;
            double nd;
            if (q2 > 0) {
                double q = Math.sqrt(q2);
                nx = x * Math.cos(q * t) + e * d / q * Math.sin(q * t);
                nd = -q / e * x * Math.sin(q * t) + d * Math.cos(q * t);
            } else if (q2 < 0) {
                double p = Math.sqrt(-q2);
                nx = x * Math.cosh(p * t) + e * d / p * Math.sinh(p * t);
                nd = p / e * x * Math.sinh(p * t) + d * Math.cosh(p * t);
            } else {
                nx = x + e * d * t;
                nd = d;
            }
            // rescale against overflow of cosh in evanescent layers (roots are unchanged)
            double s = Math.max(1e-300, Math.hypot(nx, nd * t));
            x = nx / s;
            d = nd / s;
        }
        return lse ? x : d;
    }

    /**
     * All β² in (lowest, k0² max εr) of LSE (k_w = n π / height, n ≥ 0) and LSM (n ≥ 1) modes for n up
     * to maxN, descending.
     */
    static List<Double> betaSquared(double k0, double height, double[] widths, double[] eps, double lowest, int maxN) {
        double top = 0;
        for (double e : eps) {
            top = Math.max(top, k0 * k0 * e);
        }
        List<Double> roots = new ArrayList<>();
        for (int n = 0; n <= maxN; n++) {
            double kw = n * Math.PI / height;
            roots.addAll(roots(b2 -> farWall(true, b2, k0, kw, widths, eps), lowest, top));
            if (n >= 1) {
                roots.addAll(roots(b2 -> farWall(false, b2, k0, kw, widths, eps), lowest, top));
            }
        }
        roots.sort((p, q) -> Double.compare(q, p));
        return roots;
    }

    /** As {@link #betaSquared}, each root with a key naming its family: "LSE n=0 #1" (descending β² within the family). */
    static java.util.Map<String, Double> typedBetaSquared(double k0, double height, double[] widths, double[] eps,
                                                          double lowest, int maxN) {
        double top = 0;
        for (double e : eps) {
            top = Math.max(top, k0 * k0 * e);
        }
        java.util.Map<String, Double> out = new java.util.LinkedHashMap<>();
        for (int n = 0; n <= maxN; n++) {
            double kw = n * Math.PI / height;
            List<Double> lse = roots(b2 -> farWall(true, b2, k0, kw, widths, eps), lowest, top);
            for (int r = 0; r < lse.size(); r++) {
                out.put("LSE n=" + n + " #" + (r + 1), lse.get(r));
            }
            if (n >= 1) {
                List<Double> lsm = roots(b2 -> farWall(false, b2, k0, kw, widths, eps), lowest, top);
                for (int r = 0; r < lsm.size(); r++) {
                    out.put("LSM n=" + n + " #" + (r + 1), lsm.get(r));
                }
            }
        }
        return out;
    }

    private static List<Double> roots(DoubleUnaryOperator g, double from, double to) {
        List<Double> out = new ArrayList<>();
        BrentSolver brent = new BrentSolver(1e-15, 1e-14);
        int steps = 20000;
        double prevX = to * (1 - 1e-12);
        double prev = g.applyAsDouble(prevX);
        for (int s = 1; s <= steps; s++) {
            double x = to - (to - from) * s / steps;
            double v = g.applyAsDouble(x);
            if (prev == 0 || Math.signum(v) != Math.signum(prev)) {
                out.add(brent.solve(200, g::applyAsDouble, x, prevX));
            }
            prevX = x;
            prev = v;
        }
        return out;
    }
}
