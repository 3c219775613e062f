package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Circular-guide conductor loss (Pozar, Microwave Engineering, 4th ed., §3.4; Marcuvitz, Waveguide
 * Handbook, §2.3) against the perturbation method of Pozar §2.7 applied to the Bessel-function fields
 * (Commons Math BesselJ, Simpson's rule in ρ, the φ integrals ∫cos² nφ = ∫sin² nφ = π for n ≥ 1 and
 * ∫1 = 2π for n = 0 done by hand), and against the known behaviour of TE01.
 */
class CircularGuideLossTest {

    private static final double C = 299_792_458.0;
    private static final double MU0 = 1.25663706212e-6;
    private static final double EPS0 = 1 / (MU0 * C * C);
    private static final double RADIUS = 0.01;

    private static double j(int n, double x) {
        return n < 0 ? (n % 2 == 0 ? 1 : -1) * BesselJ.value(-n, x) : BesselJ.value(n, x);
    }

    private static double jPrime(int n, double x) {
        return 0.5 * (j(n - 1, x) - j(n + 1, x));
    }

    /** α_c of TE_nm (te) or TM_nm by P_loss / (2P) over the fields of Pozar §3.4 (air filling). */
    private static double perturbation(boolean te, int n, double p, double a, double f, double rs) {
        double kc = p / a;
        double w = 2 * Math.PI * f;
        double beta = Math.sqrt(w * w / (C * C) - kc * kc);
        double cos2 = n == 0 ? 2 * Math.PI : Math.PI; // ∫₀^2π cos² nφ dφ
        double sin2 = n == 0 ? 0 : Math.PI;           // ∫₀^2π sin² nφ dφ
        int steps = 4000;
        double h = a / steps;
        double sum = 0;
        for (int i = 0; i <= steps; i++) {
            double r = i * h;
            double weight = (i == 0 || i == steps) ? 1 : (i % 2 == 1 ? 4 : 2);
            double value;
            if (r == 0) {
                value = 0;
            } else if (te) { // Hρ = (β/kc) Jn'(kc ρ) cos nφ, Hφ = (β n/(kc² ρ)) Jn(kc ρ) sin nφ
                double hr = beta / kc * jPrime(n, kc * r);
                double hp = beta * n / (kc * kc * r) * j(n, kc * r);
                value = (hr * hr * cos2 + hp * hp * sin2) * r;
            } else { // Hρ = (ωε n/(kc² ρ)) Jn cos nφ, Hφ = (ωε/kc) Jn' sin nφ (magnitudes; Ez = Jn sin nφ)
                double hr = w * EPS0 * n / (kc * kc * r) * j(n, kc * r);
                double hp = w * EPS0 / kc * jPrime(n, kc * r);
                value = (hr * hr + hp * hp) * (n == 0 ? 2 * Math.PI : Math.PI) * r;
            }
            sum += weight * value;
        }
        double integral = sum * h / 3;
        double zw = te ? w * MU0 / beta : beta / (w * EPS0);
        double power = zw / 2 * integral;
        double wall; // ∮ |H_tan|² dl at ρ = a
        if (te) {
            double hz = j(n, p);
            double hp = beta * n / (kc * kc * a) * j(n, p);
            wall = a * (hz * hz * cos2 + hp * hp * sin2);
        } else {
            double hp = w * EPS0 / kc * jPrime(n, p);
            wall = a * hp * hp * (n == 0 ? 2 * Math.PI : Math.PI);
        }
        return rs / 2 * wall / (2 * power);
    }

    @Test
    @DisplayName("The TE11, TM01 and TE01 roots are zeros of J1', J0 and J0' to 1e-12 (Abramowitz & Stegun Table 9.5)")
    void rootsAreBesselZeros() {
        assertEquals(0.0, jPrime(1, CircularGuideLoss.TE11_ROOT), 1e-12);
        assertEquals(0.0, j(0, CircularGuideLoss.TM01_ROOT), 1e-12);
        assertEquals(0.0, jPrime(0, CircularGuideLoss.TE01_ROOT), 1e-12);
        // A&S Table 9.5 (from memory): j'11 = 1.84118, j01 = 2.40483, j'01 = 3.83171
        assertEquals(1.84118, CircularGuideLoss.TE11_ROOT, 1e-5);
        assertEquals(2.40483, CircularGuideLoss.TM01_ROOT, 1e-5);
        assertEquals(3.83171, CircularGuideLoss.TE01_ROOT, 1e-5);
    }

    @Test
    @DisplayName("TE11, TE21, TE01, TM01 and TM11 losses match the power-loss integral of their Bessel fields within 1e-8")
    void formsMatchThePerturbationIntegral() {
        double f = 40e9;
        double rs = 0.03;
        double te21 = 3.054236928227140; // first zero of J2' (A&S Table 9.5, from memory), checked next
        assertEquals(0.0, jPrime(2, te21), 1e-12);
        double tm11 = CircularGuideLoss.TE01_ROOT; // first zero of J1 = −J0'
        double[][] teCases = {{1, CircularGuideLoss.TE11_ROOT}, {2, te21}, {0, CircularGuideLoss.TE01_ROOT}};
        for (double[] c : teCases) {
            int n = (int) c[0];
            double expected = perturbation(true, n, c[1], RADIUS, f, rs);
            assertEquals(expected, CircularGuideLoss.te(n, c[1], RADIUS, f, Filling.VACUUM, rs), 1e-8 * expected,
                    "TE n = " + n);
        }
        double[][] tmCases = {{0, CircularGuideLoss.TM01_ROOT}, {1, tm11}};
        for (double[] c : tmCases) {
            double expected = perturbation(false, (int) c[0], c[1], RADIUS, f, rs);
            assertEquals(expected, CircularGuideLoss.tm(c[1], RADIUS, f, Filling.VACUUM, rs), 1e-8 * expected,
                    "TM n = " + (int) c[0]);
        }
    }

    @Test
    @DisplayName("TE11 equals Pozar's form Rs(kc² + k²/(p'² − 1))/(a k η β) and is 0.01723 Np/m for copper, a = 1 cm, 10 GHz")
    void te11MatchesPozarFormAndHandWorking() {
        // Pozar §3.4 eq. (3.133) form (number from memory). Hand: fc = 1.84118 c / (2π · 0.01) = 8.7849 GHz;
        // Rs(Cu, 10 GHz) = 0.026060 Ω; (fc/f)² = 0.77175; √(1 − 0.77175) = 0.47776; 1/(p'² − 1) = 1/2.38996 = 0.41842;
        // αc = 0.026060 · (0.77175 + 0.41842) / (0.01 · 376.73 · 0.47776) = 0.031016 / 1.79985 = 0.017233 Np/m
        double rs = Conductor.COPPER.surfaceResistance(10e9);
        double alpha = CircularGuideLoss.te(1, CircularGuideLoss.TE11_ROOT, RADIUS, 10e9, Filling.VACUUM, rs);
        double k = 2 * Math.PI * 10e9 / C;
        double kc = CircularGuideLoss.TE11_ROOT / RADIUS;
        double beta = Math.sqrt(k * k - kc * kc);
        double p2 = CircularGuideLoss.TE11_ROOT * CircularGuideLoss.TE11_ROOT;
        double pozar = rs * (kc * kc + k * k / (p2 - 1)) / (RADIUS * k * 376.730313668 * beta);
        assertEquals(pozar, alpha, 1e-9 * pozar);
        assertEquals(0.017233, alpha, 0.000002);
    }

    @Test
    @DisplayName("TE01 loss falls steadily with frequency while TE11 and TM01 losses rise again far above cutoff")
    void te01LossFallsWithFrequency() {
        // Pozar §3.4 and Marcuvitz §2.3: TE01's αc ∝ Rs (fc/f)² / √(1 − (fc/f)²) → 0 as f grows (the low-loss mode)
        double fc = CircularGuideLoss.cutoffHz(CircularGuideLoss.TE01_ROOT, RADIUS, Filling.VACUUM);
        double previous = Double.POSITIVE_INFINITY;
        for (double ratio = 1.2; ratio <= 50; ratio *= 1.3) {
            double f = ratio * fc;
            double alpha = CircularGuideLoss.te(0, CircularGuideLoss.TE01_ROOT, RADIUS, f, Filling.VACUUM,
                    Conductor.COPPER.surfaceResistance(f));
            assertTrue(alpha < previous, "at " + ratio + " fc: " + alpha + " ≥ " + previous);
            previous = alpha;
        }
        double f1 = 5 * fc;
        double f2 = 20 * fc;
        double te11At5 = CircularGuideLoss.te(1, CircularGuideLoss.TE11_ROOT, RADIUS, f1, Filling.VACUUM,
                Conductor.COPPER.surfaceResistance(f1));
        double te11At20 = CircularGuideLoss.te(1, CircularGuideLoss.TE11_ROOT, RADIUS, f2, Filling.VACUUM,
                Conductor.COPPER.surfaceResistance(f2));
        assertTrue(te11At20 > te11At5, te11At20 + " vs " + te11At5);
        double tm01At5 = CircularGuideLoss.tm(CircularGuideLoss.TM01_ROOT, RADIUS, f1, Filling.VACUUM,
                Conductor.COPPER.surfaceResistance(f1));
        double tm01At20 = CircularGuideLoss.tm(CircularGuideLoss.TM01_ROOT, RADIUS, f2, Filling.VACUUM,
                Conductor.COPPER.surfaceResistance(f2));
        assertTrue(tm01At20 > tm01At5, tm01At20 + " vs " + tm01At5);
    }

    @Test
    @DisplayName("A circular mode below its cutoff or with a root not above its order is refused")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CircularGuideLoss.te(1, CircularGuideLoss.TE11_ROOT, RADIUS, 5e9, Filling.VACUUM, 0.03));
        assertTrue(e.getMessage().contains("5.0E9"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> CircularGuideLoss.te(2, 1.5, RADIUS, 50e9, Filling.VACUUM, 0.03));
    }
}
