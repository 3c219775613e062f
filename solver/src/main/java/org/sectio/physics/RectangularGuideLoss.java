package org.sectio.physics;

/**
 * Closed-form conductor attenuation α_c of the modes of a rectangular guide a × b (a the broad
 * side), homogeneously filled, walls of surface resistance Rs. Reference values for the
 * field-based computation; all results in Np/m.
 *
 * <p>With F = (fc/f)², s = √(1 − F), η the filling's intrinsic impedance:
 * <ul>
 * <li>TE10 (Pozar, Microwave Engineering, 4th ed., §3.3, eq. (3.96), number from memory):
 *     α_c = Rs (2bπ² + a³k²) / (a³ b β k η);</li>
 * <li>TE_m0: α_c = Rs (1 + (2b/a) F) / (b η s); TE_0n: α_c = Rs (1 + (2a/b) F) / (a η s);</li>
 * <li>TE_mn, m, n ≥ 1: α_c = (2Rs / (b η s)) {(1 + b/a) F + (1 − F) (b/a)((b/a)m² + n²) / ((b/a)²m² + n²)};</li>
 * <li>TM_mn, m, n ≥ 1: α_c = (2Rs / (b η s)) (m²b³ + n²a³) / (m²b²a + n²a³).</li>
 * </ul>
 * The general TE_mn / TM_mn forms are the classic ones of S. Ramo, J. R. Whinnery and T. Van Duzer,
 * Fields and Waves in Communication Electronics, 3rd ed., ch. 8 (quoted from memory; the same forms are in R. E.
 * Collin, Foundations for Microwave Engineering, 2nd ed., ch. 3); the tests check every form against
 * the perturbation (power-loss) integral of the analytic fields (Pozar §2.7).
 */
public final class RectangularGuideLoss {

    private RectangularGuideLoss() {
    }

    /**
     * fc = (v/2) √((m/a)² + (n/b)²) (Pozar §3.3).
     *
     * @param m index across a, ≥ 0
     * @param n index across b, ≥ 0, not both zero
     * @param a broad side, &gt; 0, m
     * @param b narrow side, &gt; 0, m
     * @param filling the medium
     * @return the cutoff frequency, Hz
     * @throws IllegalArgumentException if an index or a side is out of range
     */
    public static double cutoffHz(int m, int n, double a, double b, Filling filling) {
        if (m < 0 || n < 0 || m + n == 0) {
            throw new IllegalArgumentException("mode indices must be ≥ 0 and not both 0, got m = " + m + ", n = " + n);
        }
        if (!(a > 0) || !(b > 0) || Double.isInfinite(a) || Double.isInfinite(b)) {
            throw new IllegalArgumentException("guide sides must be finite and > 0 m, got a = " + a + ", b = " + b);
        }
        return filling.waveSpeed() / 2 * Math.hypot(m / a, n / b);
    }

    /**
     * TE10 in the form of Pozar eq. (3.96): α_c = Rs (2bπ² + a³k²) / (a³ b β k η).
     *
     * @param a broad side, m
     * @param b narrow side, m
     * @param frequencyHz f above the TE10 cutoff, Hz
     * @param filling the medium
     * @param surfaceResistance Rs ≥ 0, Ω
     * @return α_c, Np/m
     * @throws IllegalArgumentException if a value is out of range or TE10 is cut off at f
     */
    public static double te10(double a, double b, double frequencyHz, Filling filling, double surfaceResistance) {
        Propagation p = propagating(1, 0, a, b, frequencyHz, filling, surfaceResistance);
        double k = p.wavenumber();
        return surfaceResistance * (2 * b * Math.PI * Math.PI + a * a * a * k * k)
                / (a * a * a * b * p.phaseConstant() * k * filling.intrinsicImpedance());
    }

    /**
     * TE_mn by the forms above (TE_m0, TE_0n or m, n ≥ 1).
     *
     * @param m index ≥ 0
     * @param n index ≥ 0, not both zero
     * @param a broad side, m
     * @param b narrow side, m
     * @param frequencyHz f above the mode's cutoff, Hz
     * @param filling the medium
     * @param surfaceResistance Rs ≥ 0, Ω
     * @return α_c, Np/m
     * @throws IllegalArgumentException if a value is out of range or the mode is cut off at f
     */
    public static double te(int m, int n, double a, double b, double frequencyHz, Filling filling,
                            double surfaceResistance) {
        Propagation p = propagating(m, n, a, b, frequencyHz, filling, surfaceResistance);
        double ratio = p.cutoffHz() / frequencyHz;
        double f2 = ratio * ratio;
        double s = Math.sqrt(1 - f2);
        double eta = filling.intrinsicImpedance();
        double rs = surfaceResistance;
        if (n == 0) {
            return rs * (1 + 2 * b / a * f2) / (b * eta * s);
        }
        if (m == 0) {
            return rs * (1 + 2 * a / b * f2) / (a * eta * s);
        }
        double q = b / a;
        return 2 * rs / (b * eta * s) * ((1 + q) * f2 + (1 - f2) * q * (q * m * m + n * n) / (q * q * m * m + n * n));
    }

    /**
     * TM_mn, m, n ≥ 1: α_c = (2Rs / (b η s)) (m²b³ + n²a³) / (m²b²a + n²a³).
     *
     * @param m index ≥ 1
     * @param n index ≥ 1
     * @param a broad side, m
     * @param b narrow side, m
     * @param frequencyHz f above the mode's cutoff, Hz
     * @param filling the medium
     * @param surfaceResistance Rs ≥ 0, Ω
     * @return α_c, Np/m
     * @throws IllegalArgumentException if a value is out of range or the mode is cut off at f
     */
    public static double tm(int m, int n, double a, double b, double frequencyHz, Filling filling,
                            double surfaceResistance) {
        if (m < 1 || n < 1) {
            throw new IllegalArgumentException("TM modes of a rectangle need m, n ≥ 1, got m = " + m + ", n = " + n);
        }
        Propagation p = propagating(m, n, a, b, frequencyHz, filling, surfaceResistance);
        double ratio = p.cutoffHz() / frequencyHz;
        double s = Math.sqrt(1 - ratio * ratio);
        double m2 = (double) m * m;
        double n2 = (double) n * n;
        return 2 * surfaceResistance / (b * filling.intrinsicImpedance() * s)
                * (m2 * b * b * b + n2 * a * a * a) / (m2 * b * b * a + n2 * a * a * a);
    }

    private static Propagation propagating(int m, int n, double a, double b, double frequencyHz, Filling filling,
                                           double surfaceResistance) {
        if (!(surfaceResistance >= 0) || Double.isInfinite(surfaceResistance)) {
            throw new IllegalArgumentException("surface resistance must be finite and ≥ 0 Ω, got " + surfaceResistance);
        }
        double fc = cutoffHz(m, n, a, b, filling);
        Propagation p = new Propagation(org.sectio.modes.ModeFamily.TE, fc, frequencyHz, filling);
        if (!p.propagating()) {
            throw new IllegalArgumentException("mode (" + m + "," + n + ") of a " + a + " × " + b
                    + " m guide is cut off at " + frequencyHz + " Hz (cutoff " + fc + " Hz)");
        }
        return p;
    }
}
