package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Rectangular-guide conductor loss against (1) the perturbation method, α_c = P_loss / (2P) with
 * P_loss = (Rs/2) ∮ |H_tan|² dl and P = (Z_w/2) ∫ |H_t|² dS over the analytic TE/TM fields (Pozar,
 * Microwave Engineering, 4th ed., §2.7 and §3.3), integrated here by the midpoint rule, and (2)
 * worked numbers: Pozar Example 3.1 (from memory) and the WR-90 handbook figure.
 */
class RectangularGuideLossTest {

    private static final double C = 299_792_458.0;
    private static final double A = 0.02286;
    private static final double B = 0.01016;

    /** α_c of TE_mn or TM_mn of an air-filled a × b guide by the power-loss integral of its fields. */
    private static double perturbation(boolean te, int m, int n, double a, double b, double f, double rs) {
        double mu0 = 1.25663706212e-6;
        double eps0 = 1 / (mu0 * C * C);
        double kx = m * Math.PI / a;
        double ky = n * Math.PI / b;
        double kc2 = kx * kx + ky * ky;
        double w = 2 * Math.PI * f;
        double beta = Math.sqrt(w * w / (C * C) - kc2);
        // amplitudes of |Hx|, |Hy| (Pozar §3.3: TE Hz = cos cos; TM Ez = sin sin) and |Hz|
        double hx = te ? beta / kc2 * kx : w * eps0 / kc2 * ky;
        double hy = te ? beta / kc2 * ky : w * eps0 / kc2 * kx;
        double zw = te ? w * mu0 / beta : beta / (w * eps0);
        int steps = 400;
        double power = 0;
        double dx = a / steps;
        double dy = b / steps;
        for (int i = 0; i < steps; i++) {
            double x = (i + 0.5) * dx;
            for (int j = 0; j < steps; j++) {
                double y = (j + 0.5) * dy;
                double vx = hx * Math.sin(kx * x) * Math.cos(ky * y);
                double vy = hy * Math.cos(kx * x) * Math.sin(ky * y);
                power += (vx * vx + vy * vy) * dx * dy;
            }
        }
        power *= zw / 2;
        double wall = 0;
        for (int i = 0; i < steps; i++) { // walls y = 0 and y = b: Hx and Hz tangential
            double x = (i + 0.5) * dx;
            for (double y : new double[] {0, b}) {
                double vx = hx * Math.sin(kx * x) * Math.cos(ky * y);
                double vz = te ? Math.cos(kx * x) * Math.cos(ky * y) : 0;
                wall += (vx * vx + vz * vz) * dx;
            }
        }
        for (int j = 0; j < steps; j++) { // walls x = 0 and x = a: Hy and Hz tangential
            double y = (j + 0.5) * dy;
            for (double x : new double[] {0, a}) {
                double vy = hy * Math.cos(kx * x) * Math.sin(ky * y);
                double vz = te ? Math.cos(kx * x) * Math.cos(ky * y) : 0;
                wall += (vy * vy + vz * vz) * dy;
            }
        }
        return rs / 2 * wall / (2 * power);
    }

    @Test
    @DisplayName("Pozar's TE10 form Rs(2bπ² + a³k²)/(a³bβkη) equals Rs(1 + (2b/a)(fc/f)²)/(bη√(1 − (fc/f)²))")
    void te10FormsAgree() {
        Filling filling = new Filling(2.5, 1.2, 0);
        double eta = 376.730313668 * Math.sqrt(1.2 / 2.5);
        double fc = C / Math.sqrt(2.5 * 1.2) / (2 * A);
        for (double f = 1.05 * fc; f < 3 * fc; f *= 1.21) {
            double r = (fc / f) * (fc / f);
            double expected = 0.03 * (1 + 2 * B / A * r) / (B * eta * Math.sqrt(1 - r));
            // 1e-10: the CODATA literal of η0 above carries 12 significant digits
            assertEquals(expected, RectangularGuideLoss.te10(A, B, f, filling, 0.03), 1e-10 * expected, "f = " + f);
            assertEquals(expected, RectangularGuideLoss.te(1, 0, A, B, f, filling, 0.03), 1e-10 * expected, "f = " + f);
        }
    }

    @Test
    @DisplayName("Every TE_mn and TM_mn form matches the power-loss integral of the analytic fields within 1e-9")
    void generalFormsMatchThePerturbationIntegral() {
        double f = 40e9; // above the highest cutoff checked, TE12/TM12 at 30.2 GHz
        double rs = 0.026;
        int[][] te = {{1, 0}, {2, 0}, {0, 1}, {1, 1}, {2, 1}, {1, 2}, {3, 1}};
        for (int[] mn : te) {
            double expected = perturbation(true, mn[0], mn[1], A, B, f, rs);
            assertEquals(expected, RectangularGuideLoss.te(mn[0], mn[1], A, B, f, Filling.VACUUM, rs), 1e-9 * expected,
                    "TE" + mn[0] + mn[1]);
        }
        int[][] tm = {{1, 1}, {2, 1}, {3, 1}, {1, 2}};
        for (int[] mn : tm) {
            double expected = perturbation(false, mn[0], mn[1], A, B, f, rs);
            assertEquals(expected, RectangularGuideLoss.tm(mn[0], mn[1], A, B, f, Filling.VACUUM, rs), 1e-9 * expected,
                    "TM" + mn[0] + mn[1]);
        }
    }

    @Test
    @DisplayName("The Teflon-filled copper K-band guide at 15 GHz loses α_c = 0.050 Np/m with Rs = 0.0319 Ω (Pozar Example 3.1)")
    void pozarExampleConductorLoss() {
        // Pozar §3.3 Example 3.1 (from memory): a = 1.07 cm, b = 0.43 cm, εr = 2.08, copper, 15 GHz:
        // Rs = 0.0319 Ω, αc = 0.050 Np/m. Hand: Rs = √(π·15e9·μ0/5.813e7) = 0.03192 Ω;
        // αc = Rs(2bπ² + a³k²)/(a³bβkη) with k = 453.40, β = 345.50, η = 376.73/√2.08 = 261.21 Ω → 0.04986 Np/m
        double rs = Conductor.COPPER.surfaceResistance(15e9);
        assertEquals(0.0319, rs, 0.00005);
        double alpha = RectangularGuideLoss.te10(0.0107, 0.0043, 15e9, Filling.dielectric(2.08), rs);
        assertEquals(0.04986, alpha, 0.00001);
        assertEquals(0.050, alpha, 0.0005);
    }

    @Test
    @DisplayName("Copper WR-90 at 10 GHz loses 0.108 dB/m, the handbook figure of about 0.11 dB/m")
    void wr90CopperAttenuation() {
        // Handbook tables of WR-90 (from memory) give about 0.11 dB/m for copper at 10 GHz. Hand: Rs = 0.026060 Ω,
        // (fc/f)² = 0.65571² = 0.42996, √(1 − 0.42996) = 0.75501;
        // αc = 0.026060 · (1 + 2·0.44444·0.42996) / (0.01016 · 376.73 · 0.75501) = 0.026060 · 1.38219 / 2.88985
        //    = 0.012464 Np/m = 0.10826 dB/m
        double alpha = RectangularGuideLoss.te10(A, B, 10e9, Filling.VACUUM, Conductor.COPPER.surfaceResistance(10e9));
        assertEquals(0.012464, alpha, 0.000002);
        assertEquals(0.1083, Neper.toDecibels(alpha), 0.0001);
        assertEquals(0.11, Neper.toDecibels(alpha), 0.005);
    }

    @Test
    @DisplayName("TE10 loss rises steeply towards cutoff and again at high frequency, with a minimum between")
    void te10LossHasAMinimumAboveCutoff() {
        // Pozar §3.3, the TE10 attenuation curve: αc → ∞ at cutoff, and grows as √f (through Rs) far above it
        // with copper's Rs(f): the ratio of 6 fc to 2.5 fc is √(6/2.5)·(1.0247/0.9860)/(1.1422/0.9165) = 1.29
        double fc = C / (2 * A);
        double nearCutoff = copperTe10(1.01 * fc);
        double mid = copperTe10(2.5 * fc);
        double high = copperTe10(6 * fc);
        assertTrue(nearCutoff > 3 * mid, nearCutoff + " vs " + mid);
        assertTrue(high > 1.2 * mid, high + " vs " + mid);
    }

    private static double copperTe10(double f) {
        return RectangularGuideLoss.te10(A, B, f, Filling.VACUUM, Conductor.COPPER.surfaceResistance(f));
    }

    @Test
    @DisplayName("Below cutoff, with TM indices of zero, or a negative Rs, the loss is refused with the values")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RectangularGuideLoss.te10(A, B, 5e9, Filling.VACUUM, 0.03));
        assertTrue(e.getMessage().contains("5.0E9"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> RectangularGuideLoss.tm(1, 0, A, B, 30e9, Filling.VACUUM, 0.03));
        assertThrows(IllegalArgumentException.class, () -> RectangularGuideLoss.te(0, 0, A, B, 30e9, Filling.VACUUM, 0.03));
        assertThrows(IllegalArgumentException.class, () -> RectangularGuideLoss.te10(A, B, 10e9, Filling.VACUUM, -1));
    }
}
