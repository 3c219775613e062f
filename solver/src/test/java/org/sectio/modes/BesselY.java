package org.sectio.modes;

import org.apache.commons.math3.special.BesselJ;

/**
 * Bessel functions of the second kind Y0 and Y1 for the reference solutions of the tests (Commons Math
 * 3.6.1 has J only), from the ascending series of Abramowitz &amp; Stegun, Handbook of Mathematical
 * Functions, 9.1.13 (Y0) and 9.1.11 with n = 1 (Y1):
 *
 * <pre>
 *   Y0(x) = (2/π)(ln(x/2) + γ) J0(x) + (2/π) Σ_{k≥1} (−1)^{k+1} H_k (x²/4)^k / (k!)²
 *   Y1(x) = −2/(πx) + (2/π) ln(x/2) J1(x) − (x/2π) Σ_{k≥0} (ψ(k+1) + ψ(k+2)) (−x²/4)^k / (k! (k+1)!)
 * </pre>
 *
 * with H_k the harmonic numbers and ψ(m+1) = −γ + H_m. The terms grow like (x/2)^{2k} / (k!)² before
 * they fall, so the cancellation costs about e^x / 10^16 in absolute terms: good to 1e-11 for x ≤ 12,
 * the range these tests use ({@link BesselYTest} checks it against A&amp;S Table 9.1).
 */
final class BesselY {

    private static final double EULER_GAMMA = 0.57721566490153286061;

    private BesselY() {
    }

    static double y0(double x) {
        requireRange(x);
        double q = x * x / 4;
        double term = 1;
        double harmonic = 0;
        double sum = 0;
        for (int k = 1; k < 200; k++) {
            term *= q / ((double) k * k);
            harmonic += 1.0 / k;
            double add = ((k & 1) == 1 ? 1 : -1) * harmonic * term;
            sum += add;
            if (Math.abs(add) < 1e-18 * Math.abs(sum) && k > 2 * x) {
                break;
            }
        }
        return 2 / Math.PI * ((Math.log(x / 2) + EULER_GAMMA) * BesselJ.value(0, x) + sum);
    }

    static double y1(double x) {
        requireRange(x);
        double q = -x * x / 4;
        double term = 1; // (−x²/4)^k / (k! (k+1)!) at k = 0
        double harmonicK = 0; // H_k
        double sum = 0;
        for (int k = 0; k < 200; k++) {
            if (k > 0) {
                term *= q / ((double) k * (k + 1));
                harmonicK += 1.0 / k;
            }
            double psiSum = (-EULER_GAMMA + harmonicK) + (-EULER_GAMMA + harmonicK + 1.0 / (k + 1));
            double add = psiSum * term;
            sum += add;
            if (Math.abs(add) < 1e-18 * Math.abs(sum) && k > 2 * x) {
                break;
            }
        }
        return -2 / (Math.PI * x) + 2 / Math.PI * Math.log(x / 2) * BesselJ.value(1, x) - x / (2 * Math.PI) * sum;
    }

    /** Y1′(x) = Y0(x) − Y1(x) / x (A&amp;S 9.1.27). */
    static double y1Prime(double x) {
        return y0(x) - y1(x) / x;
    }

    private static void requireRange(double x) {
        if (!(x > 0 && x <= 12)) {
            throw new IllegalArgumentException("series used for 0 < x ≤ 12 only, got " + x);
        }
    }
}
