package org.sectio.modes;

/**
 * The textbook indices (n, m) of a mode of a circular guide of radius R, found from its field. The
 * closed forms are Hz ∝ J_n(j′_nm r/R) cos n(φ − φ0) for TE_nm and Ez ∝ J_n(j_nm r/R) cos n(φ − φ0)
 * for TM_nm (Pozar, Microwave Engineering, 4th ed., §3.4).
 *
 * <p>Azimuthal order n: ψ is sampled on {@value #RINGS} rings r_k = (k + ½)/{@value #RINGS} · 0.95 R
 * at {@value #ANGLES} angles and Fourier-analysed; the power of each harmonic, a0² for n = 0 and
 * (a_n² + b_n²)/2 for n ≥ 1, is summed over the rings weighted by r (an approximation of the area
 * integral), and n is the harmonic with the most power. Many rings are used because a single ring
 * can sit on a nodal circle (TE01 has one at r = 0.628 R). The power is independent of φ0, so both
 * members of a degenerate pair get the same n whatever their orientation.
 *
 * <p>Radial index m: the orientation φ0 is read from the n-th harmonic on the ring where it is
 * strongest, and the radial profile f(r) = a_n(r) cos nφ0 + b_n(r) sin nφ0 (∝ J_n(kc r)) is sampled
 * at {@value #RADII} radii in (0, 0.96 R]. Its sign changes are counted with hysteresis (a change
 * counts only between samples above 5 % of max |f|, so the small values near r = 0 and, for TM, near
 * the wall add none). Counting rule: TM_nm has m zeros of J_n in (0, R], the last on the wall, so
 * m − 1 sign changes inside; TE_nm with n ≥ 1 has m zeros of J_n′ in (0, R] and, by the interlacing
 * j′_n1 &lt; j_n1 &lt; j′_n2 &lt; …, m − 1 zeros of J_n below j′_nm, so m − 1 sign changes; TE_0m has
 * J_0′ = −J_1 and j_01 &lt; j_11 &lt; j_02 &lt; …, so m sign changes. Hence m = changes + 1, except
 * m = changes for TE with n = 0 (Abramowitz &amp; Stegun 9.5.2 for the interlacing, from memory).
 */
final class CircleIndices {

    static final int RINGS = 24;
    static final int ANGLES = 256;
    static final int RADII = 96;
    static final int MAX_ORDER = 24;
    private static final double SIGNIFICANT = 0.05;

    private CircleIndices() {
    }

    /**
     * @param samples the field
     * @param cx centre x, m
     * @param cy centre y, m
     * @param radius R, m
     * @param transverseMagnetic true for TM, false for TE
     * @return {n, m, purity}: purity is the share of the summed ring power in harmonic n
     */
    static double[] of(FieldSamples samples, double cx, double cy, double radius, boolean transverseMagnetic) {
        double[] power = new double[MAX_ORDER + 1];
        double[] harmonic = new double[2 * (MAX_ORDER + 1)];
        double[][] ringHarmonics = new double[RINGS][];
        for (int k = 0; k < RINGS; k++) {
            double r = (k + 0.5) / RINGS * 0.95 * radius;
            harmonics(samples, cx, cy, r, harmonic);
            ringHarmonics[k] = harmonic.clone();
            for (int n = 0; n <= MAX_ORDER; n++) {
                double a = harmonic[2 * n];
                double b = harmonic[2 * n + 1];
                power[n] += r * (n == 0 ? a * a : 0.5 * (a * a + b * b));
            }
        }
        int order = 0;
        double total = 0;
        for (int n = 0; n <= MAX_ORDER; n++) {
            total += power[n];
            if (power[n] > power[order]) {
                order = n;
            }
        }
        int strongest = 0;
        for (int k = 0; k < RINGS; k++) {
            if (amplitude(ringHarmonics[k], order) > amplitude(ringHarmonics[strongest], order)) {
                strongest = k;
            }
        }
        double phase = Math.atan2(ringHarmonics[strongest][2 * order + 1], ringHarmonics[strongest][2 * order]);
        double[] profile = new double[RADII];
        double peak = 0;
        for (int q = 0; q < RADII; q++) {
            double r = (q + 1.0) / RADII * 0.96 * radius;
            harmonics(samples, cx, cy, r, harmonic);
            profile[q] = harmonic[2 * order] * Math.cos(phase) + harmonic[2 * order + 1] * Math.sin(phase);
            peak = Math.max(peak, Math.abs(profile[q]));
        }
        int changes = 0;
        int sign = 0;
        for (double f : profile) {
            if (Math.abs(f) > SIGNIFICANT * peak) {
                int s = f > 0 ? 1 : -1;
                if (sign != 0 && s != sign) {
                    changes++;
                }
                sign = s;
            }
        }
        int radial = transverseMagnetic || order > 0 ? changes + 1 : changes;
        return new double[] {order, radial, total > 0 ? power[order] / total : 0};
    }

    private static double amplitude(double[] h, int n) {
        return Math.hypot(h[2 * n], h[2 * n + 1]);
    }

    /**
     * Fourier coefficients on the ring of radius r: out[2n] = a_n, out[2n + 1] = b_n with
     * ψ(φ) ≈ a_0 + Σ (a_n cos nφ + b_n sin nφ); angles with no value are left out.
     */
    private static void harmonics(FieldSamples s, double cx, double cy, double r, double[] out) {
        java.util.Arrays.fill(out, 0);
        int used = 0;
        for (int q = 0; q < ANGLES; q++) {
            double phi = 2 * Math.PI * q / ANGLES;
            double value = s.interpolate(cx + r * Math.cos(phi), cy + r * Math.sin(phi));
            if (Double.isNaN(value)) {
                continue;
            }
            used++;
            for (int n = 0; n <= MAX_ORDER; n++) {
                out[2 * n] += value * Math.cos(n * phi);
                out[2 * n + 1] += value * Math.sin(n * phi);
            }
        }
        if (used == 0) {
            return;
        }
        for (int n = 0; n <= MAX_ORDER; n++) {
            double scale = (n == 0 ? 1.0 : 2.0) / used;
            out[2 * n] *= scale;
            out[2 * n + 1] *= scale;
        }
    }
}
