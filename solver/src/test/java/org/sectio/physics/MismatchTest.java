package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The impedance-step reflection against Pozar, Microwave Engineering, 4th ed., §2.3 (Γ, SWR, return
 * loss) and hand values.
 */
class MismatchTest {

    @Test
    @DisplayName("A matched step reflects nothing: Γ = 0, VSWR 1, infinite return loss, all power through")
    void matchedStep() {
        Mismatch m = Mismatch.between(377, 377);
        assertEquals(0.0, m.reflection(), 0.0);
        assertEquals(1.0, m.vswr(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, m.returnLossDb());
        assertEquals(1.0, m.transmittedFraction(), 0.0);
    }

    @Test
    @DisplayName("A 2:1 step has Γ = 1/3, VSWR 2, return loss 9.54 dB and reflects 11.1 % of the power")
    void twoToOneStep() {
        // Γ = (100 − 50)/(100 + 50) = 1/3; VSWR = (4/3)/(2/3) = 2; RL = 20 log10 3 = 9.5424 dB; |Γ|² = 1/9 = 0.1111
        Mismatch up = Mismatch.between(50, 100);
        assertEquals(1.0 / 3, up.reflection(), 1e-15);
        assertEquals(2.0, up.vswr(), 1e-12);
        assertEquals(9.5424, up.returnLossDb(), 1e-4);
        assertEquals(0.1111, up.reflectedFraction(), 1e-4);
        assertEquals(0.8889, up.transmittedFraction(), 1e-4);
        Mismatch down = Mismatch.between(100, 50);
        assertEquals(-1.0 / 3, down.reflection(), 1e-15);
        assertEquals(2.0, down.vswr(), 1e-12);
    }

    @Test
    @DisplayName("For real impedances the VSWR equals the larger-to-smaller impedance ratio")
    void vswrIsImpedanceRatio() {
        // Pozar §2.3: for a real load on a lossless line, SWR = ZL/Z0 when ZL > Z0 and Z0/ZL otherwise
        for (double[] z : new double[][] {{50, 75}, {75, 50}, {400, 523.7}, {500, 12.5}}) {
            double ratio = Math.max(z[0], z[1]) / Math.min(z[0], z[1]);
            assertEquals(ratio, Mismatch.between(z[0], z[1]).vswr(), 1e-12 * ratio);
        }
    }

    @Test
    @DisplayName("A short reflects everything with Γ = −1 and an open with Γ = +1; both have 0 dB return loss")
    void shortAndOpen() {
        Mismatch shorted = Mismatch.between(50, 0);
        assertEquals(-1.0, shorted.reflection(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, shorted.vswr());
        assertEquals(0.0, shorted.returnLossDb(), 0.0);
        assertEquals(1.0, shorted.reflectedFraction(), 0.0);
        assertEquals(1.0, Mismatch.between(50, Double.POSITIVE_INFINITY).reflection(), 0.0);
        assertTrue(Mismatch.between(50, 1e-6).reflection() > -1, "a near-short is not quite −1");
    }

    @Test
    @DisplayName("Mismatch results carry the caution about reflected power")
    void mismatchCarriesCaution() {
        String caution = Mismatch.between(50, 75).caution();
        assertTrue(caution.contains("reflected power can destroy sources"), caution);
        assertTrue(caution.contains("high-power RF can injure people"), caution);
    }

    @Test
    @DisplayName("A non-positive reference impedance, a negative load and |Γ| > 1 are refused with the value")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Mismatch.between(0, 50));
        assertTrue(e.getMessage().contains("0.0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Mismatch.between(50, -1));
        assertThrows(IllegalArgumentException.class, () -> new Mismatch(1.5));
    }
}
