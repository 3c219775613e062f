package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.modes.ModeFamily;

/**
 * Coaxial conductor loss (Pozar, Microwave Engineering, 4th ed., §2.7), dielectric loss of a filled
 * guide (Pozar §3.1, eq. (3.29) from memory) and the neper–decibel factor.
 */
class TemAndDielectricLossTest {

    private static final double C = 299_792_458.0;

    @Test
    @DisplayName("Coax loss equals R/(2 Z0) with R = Rs(1/a + 1/b)/(2π) and Z0 = η ln(b/a)/(2π)")
    void coaxLossIsSeriesResistanceOverTwiceImpedance() {
        // Pozar §2.1–2.2: R = (Rs/2π)(1/a + 1/b), Z0 = (η/2π) ln(b/a); low-loss line α = R/(2 Z0) (§2.7)
        Filling ptfe = Filling.dielectric(2.1);
        double eta = 376.730313668 / Math.sqrt(2.1);
        for (double[] ab : new double[][] {{0.5e-3, 1.75e-3}, {0.455e-3, 1.49e-3}, {1e-3, 10e-3}}) {
            double rs = 0.02;
            double r = rs / (2 * Math.PI) * (1 / ab[0] + 1 / ab[1]);
            double z0 = eta / (2 * Math.PI) * Math.log(ab[1] / ab[0]);
            double expected = r / (2 * z0);
            // 1e-10: the CODATA literal of η0 above carries 12 significant digits
            assertEquals(expected, CoaxialLineLoss.tem(ab[0], ab[1], ptfe, rs), 1e-10 * expected);
        }
    }

    @Test
    @DisplayName("An air coax of 0.5/1.75 mm radii in copper loses 0.02245 Np/m (0.195 dB/m) at 1 GHz (hand-worked)")
    void airCoaxHandWorked() {
        // Rs(Cu, 1 GHz) = √(π·1e9·μ0/5.813e7) = 0.0082410 Ω; ln(3.5) = 1.25276; 1/a + 1/b = 2000 + 571.43 = 2571.43 /m;
        // αc = 0.0082410 · 2571.43 / (2 · 376.73 · 1.25276) = 21.191 / 943.91 = 0.022450 Np/m = 0.19500 dB/m
        double alpha = CoaxialLineLoss.tem(0.5e-3, 1.75e-3, Filling.VACUUM, Conductor.COPPER.surfaceResistance(1e9));
        assertEquals(0.022450, alpha, 0.000002);
        assertEquals(0.1950, Neper.toDecibels(alpha), 0.0001);
    }

    @Test
    @DisplayName("Dielectric loss k²tanδ/(2β) equals (π tanδ/λ)(λg/λ) and reduces to k tanδ/2 for TEM")
    void dielectricLossForms() {
        Filling lossy = new Filling(2.55, 1.0, 0.002);
        double fc = 7e9;
        for (double f = 7.5e9; f < 30e9; f *= 1.4) {
            Propagation p = new Propagation(ModeFamily.TM, fc, f, lossy);
            double lambda = C / (f * Math.sqrt(2.55));
            double lambdaG = lambda / Math.sqrt(1 - (fc / f) * (fc / f));
            double expected = Math.PI * 0.002 / lambda * (lambdaG / lambda);
            assertEquals(expected, DielectricLoss.attenuation(p), 1e-9 * expected, "f = " + f);
        }
        double f = 3e9;
        double k = 2 * Math.PI * f * Math.sqrt(2.55) / C;
        assertEquals(k * 0.002 / 2, DielectricLoss.temAttenuation(f, lossy), 1e-15);
        assertEquals(k * 0.002 / 2, DielectricLoss.attenuation(new Propagation(ModeFamily.TEM, 0, f, lossy)), 1e-15);
    }

    @Test
    @DisplayName("The Teflon K-band guide at 15 GHz with tanδ = 0.0003 has α_d = 0.089 Np/m and total 1.2 dB/m (Pozar Example 3.1)")
    void pozarExampleDielectricLoss() {
        // Pozar §3.3 Example 3.1 (from memory): αd = k² tanδ/(2β) = 0.089 Np/m, αc = 0.050 Np/m,
        // α = 0.139 Np/m = 1.21 dB/m. Hand: 453.40² · 0.0003 / (2 · 345.50) = 61.672 / 691.0 = 0.08925 Np/m
        Filling teflon = new Filling(2.08, 1.0, 0.0003);
        double fc = RectangularGuideLoss.cutoffHz(1, 0, 0.0107, 0.0043, teflon);
        double alphaD = DielectricLoss.attenuation(new Propagation(ModeFamily.TE, fc, 15e9, teflon));
        assertEquals(0.08925, alphaD, 0.00001);
        double alphaC = RectangularGuideLoss.te10(0.0107, 0.0043, 15e9, teflon, Conductor.COPPER.surfaceResistance(15e9));
        assertEquals(0.139, alphaD + alphaC, 0.0005);
        assertEquals(1.21, Neper.toDecibels(alphaD + alphaC), 0.005);
    }

    @Test
    @DisplayName("One neper is 20 log10(e) = 8.6859 dB, and the conversion round-trips")
    void neperToDecibel() {
        // 20 log10(e) = 20 · 0.4342944819 = 8.685889638 dB
        assertEquals(8.685889638, Neper.DECIBELS_PER_NEPER, 1e-9);
        assertEquals(8.686, Neper.toDecibels(1), 0.0005);
        assertEquals(0.37, Neper.toNepers(Neper.toDecibels(0.37)), 1e-15);
    }

    @Test
    @DisplayName("Dielectric loss of an evanescent mode and a coax with b ≤ a are refused")
    void invalidInputsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> DielectricLoss.attenuation(
                new Propagation(ModeFamily.TE, 10e9, 9e9, new Filling(2, 1, 0.001))));
        assertThrows(IllegalArgumentException.class, () -> CoaxialLineLoss.tem(2e-3, 1e-3, Filling.VACUUM, 0.01));
    }
}
