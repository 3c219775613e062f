package org.sectio.modes;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * The TE10 cutoff of ridge guide by transverse resonance (Cohn, "Properties of ridge wave guide",
 * Proc. IRE 35, 1947): across the guide at cutoff, the ridge region is a parallel-plate line of height
 * d, open (a magnetic wall) at the centre x = 0, and each side region one of height b, shorted by the
 * side wall at x = a/2; they meet at the ridge's edge x = s/2 across the step susceptance B. Resonance:
 *
 * <pre>  (b/d) tan(kc s/2) + B/Y₀ − cot(kc (a − s)/2) = 0,  Y ∝ 1/height.</pre>
 *
 * B/Y₀ of the symmetric E-plane step b → d (α = d/b), quasi-static leading term (Marcuvitz, Waveguide
 * Handbook, §5.26, from memory; the correction terms there are dropped):
 *
 * <pre>  B/Y₀ = (2b/λc) ln[ ((1 − α²)/(4α)) ((1 + α)/(1 − α))^((α + 1/α)/2) ],  λc = 2π/kc.</pre>
 *
 * A single ridge of gap d in height b is, by the image in the bottom wall (an electric wall for Ey),
 * the double ridge of gap 2d in height 2b. The method is known good to about 1–2 % (Cohn 1947, from
 * memory; it neglects the higher-mode coupling between the step and the side wall).
 */
final class RidgeTransverseResonance {

    private RidgeTransverseResonance() {
    }

    /** F(α) = ln[((1 − α²)/(4α)) ((1 + α)/(1 − α))^((α + 1/α)/2)], 0 &lt; α &lt; 1: zero at α = 1. */
    static double stepLogarithm(double alpha) {
        return Math.log((1 - alpha * alpha) / (4 * alpha) * Math.pow((1 + alpha) / (1 - alpha), 0.5 * (alpha + 1 / alpha)));
    }

    /**
     * @param width a, m
     * @param height b, m
     * @param ridgeWidth s, m
     * @param gap d between the two tips, m
     * @param withStep false drops the step susceptance (the bare parallel-plate lines)
     * @return the TE10 cutoff wavenumber of the double-ridge guide, rad/m
     */
    static double doubleRidge(double width, double height, double ridgeWidth, double gap, boolean withStep) {
        double side = (width - ridgeWidth) / 2;
        double step = withStep ? stepLogarithm(gap / height) : 0;
        DoubleUnaryOperator resonance = k -> height / gap * Math.tan(k * ridgeWidth / 2) + height * k / Math.PI * step
                - 1 / Math.tan(k * side);
        double upper = Math.min(Math.PI / (2 * side), Math.PI / ridgeWidth) * (1 - 1e-12);
        return new BrentSolver(1e-14, 1e-13).solve(500, resonance::applyAsDouble, 1e-9 / side, upper);
    }

    /** The single-ridge guide (gap d between tip and bottom wall) as the double ridge of 2b, 2d. */
    static double singleRidge(double width, double height, double ridgeWidth, double gap, boolean withStep) {
        return doubleRidge(width, 2 * height, ridgeWidth, 2 * gap, withStep);
    }
}
