package org.sectio.physics;

import org.sectio.modes.ModeFamily;

/**
 * Closed-form conductor attenuation α_c of the modes of a homogeneously filled circular guide of
 * radius a with walls of surface resistance Rs, in Np/m. Reference values for the field-based
 * computation.
 *
 * <p>A mode is given by its azimuthal order n and its root p: TE_nm has kc a = p′_nm (the m-th zero
 * of J_n′), TM_nm has kc a = p_nm (the m-th zero of J_n). With F = (fc/f)², s = √(1 − F) and η the
 * filling's intrinsic impedance (Pozar, Microwave Engineering, 4th ed., §3.4, eqs. (3.133) for TE11
 * and the TM01 form in its problems, numbers from memory; N. Marcuvitz, Waveguide Handbook, §2.3):
 * <ul>
 * <li>TE_nm: α_c = (Rs / (a η s)) (F + n² / (p′² − n²)) — for TE11, Rs (kc² + k²/(p′² − 1)) / (a k η β);</li>
 * <li>TE_0m: α_c = Rs F / (a η s), which falls without end as f rises (the low-loss TE01 mode);</li>
 * <li>TM_nm: α_c = Rs / (a η s).</li>
 * </ul>
 * The tests check each against the perturbation (power-loss) integral of the Bessel-function fields.
 */
public final class CircularGuideLoss {

    /** p′11 = 1.841183781, first zero of J1′: TE11 (Abramowitz &amp; Stegun Table 9.5, from memory). */
    public static final double TE11_ROOT = 1.841183781340659;
    /** p01 = 2.404825558, first zero of J0: TM01 (Abramowitz &amp; Stegun Table 9.5, from memory). */
    public static final double TM01_ROOT = 2.404825557695773;
    /** p′01 = 3.831705970, first non-zero zero of J0′ = −J1: TE01 (Abramowitz &amp; Stegun Table 9.5, from memory). */
    public static final double TE01_ROOT = 3.831705970207512;

    private CircularGuideLoss() {
    }

    /**
     * fc = p v / (2π a) (Pozar §3.4).
     *
     * @param root p′_nm (TE) or p_nm (TM), finite and &gt; 0
     * @param radius a, finite and &gt; 0, m
     * @param filling the medium
     * @return the cutoff frequency, Hz
     * @throws IllegalArgumentException if a value is out of range
     */
    public static double cutoffHz(double root, double radius, Filling filling) {
        if (!(root > 0) || Double.isInfinite(root) || !(radius > 0) || Double.isInfinite(radius)) {
            throw new IllegalArgumentException("root and radius must be finite and > 0, got p = " + root
                    + ", a = " + radius + " m");
        }
        return root * filling.waveSpeed() / (2 * Math.PI * radius);
    }

    /**
     * TE_nm: α_c = (Rs / (a η s)) (F + n² / (p′² − n²)).
     *
     * @param n azimuthal order ≥ 0
     * @param root p′_nm, a zero of J_n′ (necessarily &gt; n for a true mode)
     * @param radius a, m
     * @param frequencyHz f above cutoff, Hz
     * @param filling the medium
     * @param surfaceResistance Rs ≥ 0, Ω
     * @return α_c, Np/m
     * @throws IllegalArgumentException if a value is out of range or the mode is cut off at f
     */
    public static double te(int n, double root, double radius, double frequencyHz, Filling filling,
                            double surfaceResistance) {
        if (n < 0 || !(root > n)) {
            throw new IllegalArgumentException("TE_nm needs n ≥ 0 and a root p' > n, got n = " + n + ", p' = " + root);
        }
        double f2 = cutoffRatioSquared(root, radius, frequencyHz, filling, surfaceResistance);
        return surfaceResistance / (radius * filling.intrinsicImpedance() * Math.sqrt(1 - f2))
                * (f2 + (double) n * n / (root * root - (double) n * n));
    }

    /**
     * TM_nm: α_c = Rs / (a η s), the same for every n.
     *
     * @param root p_nm, a zero of J_n
     * @param radius a, m
     * @param frequencyHz f above cutoff, Hz
     * @param filling the medium
     * @param surfaceResistance Rs ≥ 0, Ω
     * @return α_c, Np/m
     * @throws IllegalArgumentException if a value is out of range or the mode is cut off at f
     */
    public static double tm(double root, double radius, double frequencyHz, Filling filling,
                            double surfaceResistance) {
        double f2 = cutoffRatioSquared(root, radius, frequencyHz, filling, surfaceResistance);
        return surfaceResistance / (radius * filling.intrinsicImpedance() * Math.sqrt(1 - f2));
    }

    private static double cutoffRatioSquared(double root, double radius, double frequencyHz, Filling filling,
                                             double surfaceResistance) {
        if (!(surfaceResistance >= 0) || Double.isInfinite(surfaceResistance)) {
            throw new IllegalArgumentException("surface resistance must be finite and ≥ 0 Ω, got " + surfaceResistance);
        }
        double fc = cutoffHz(root, radius, filling);
        if (!new Propagation(ModeFamily.TE, fc, frequencyHz, filling).propagating()) {
            throw new IllegalArgumentException("mode with root " + root + " of a guide of radius " + radius
                    + " m is cut off at " + frequencyHz + " Hz (cutoff " + fc + " Hz)");
        }
        double ratio = fc / frequencyHz;
        return ratio * ratio;
    }
}
