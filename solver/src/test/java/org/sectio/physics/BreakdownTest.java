package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.modes.ModeFamily;

/**
 * Breakdown-limited power: the square-law scaling (exact), the common-practice defaults, and the TE10
 * closed form P = E_max² a b / (4 Z_TE) (Pozar, Microwave Engineering, 4th ed., §3.3) against the
 * Poynting integral of the TE10 field and a hand-worked WR-90 figure.
 */
class BreakdownTest {

    private static final double A = 0.02286;
    private static final double B = 0.01016;

    @Test
    @DisplayName("The defaults are 3 MV/m for dry air at sea level and a field derating of 2, i.e. 4 in power")
    void defaultsAreCommonPractice() {
        Breakdown air = Breakdown.dryAir();
        assertEquals(3e6, air.breakdownField(), 0.0);
        assertEquals(2.0, air.fieldDerating(), 0.0);
        assertEquals(air.maximumPower(1, 1e3) / 4, air.ratedPower(1, 1e3), 1e-9);
    }

    @Test
    @DisplayName("A peak of 1 kV/m at 1 W scales to 9 MW at 3 MV/m, the square of the field ratio")
    void scalingIsSquareOfFieldRatio() {
        // (3e6 / 1e3)² · 1 W = 9e6 W
        assertEquals(9e6, Breakdown.dryAir().maximumPower(1.0, 1e3), 1e-6);
        // doubling the reference power at the same field ratio doubles the result
        assertEquals(18e6, Breakdown.dryAir().maximumPower(2.0, 1e3), 1e-6);
    }

    @Test
    @DisplayName("The TE10 closed form equals the Poynting integral (1/(2Z))∫∫ E0² sin²(πx/a) dx dy")
    void te10FormEqualsPoyntingIntegral() {
        double e0 = 1e5;
        double z = 498.97;
        int steps = 1000;
        double sum = 0;
        for (int i = 0; i < steps; i++) {
            double s = Math.sin(Math.PI * (i + 0.5) / steps);
            sum += s * s;
        }
        double integral = e0 * e0 * sum * (A / steps) * B / (2 * z);
        assertEquals(integral, Breakdown.rectangularTe10Power(e0, A, B, z), 1e-12 * integral);
    }

    @Test
    @DisplayName("WR-90 in TE10 at 10 GHz reaches 3 MV/m at 1.047 MW, rated 262 kW with the default derating")
    void wr90BreakdownPower() {
        // Z_TE = 498.974 Ω (see PropagationTest); P = (3e6)² · 0.02286 · 0.01016 / (4 · 498.974)
        //   = 9e12 · 2.32258e-4 / 1995.90 = 1.04731e6 W; /4 = 2.6183e5 W
        double fc = 299_792_458.0 / (2 * A);
        double z = new Propagation(ModeFamily.TE, fc, 10e9, Filling.VACUUM).waveImpedance().getReal();
        double pMax = Breakdown.rectangularTe10Power(3e6, A, B, z);
        assertEquals(1.0473e6, pMax, 0.0001e6);
        // the same through the scaling: at 1 W the peak is √(4 Z / (a b)) V/m
        double peakAtOneWatt = Math.sqrt(4 * z / (A * B));
        assertEquals(pMax, Breakdown.dryAir().maximumPower(1.0, peakAtOneWatt), 1e-9 * pMax);
        assertEquals(2.6183e5, Breakdown.dryAir().ratedPower(1.0, peakAtOneWatt), 0.0001e5);
    }

    @Test
    @DisplayName("Power-handling results carry the caution naming pressure, humidity, pulse length, altitude and multipaction")
    void powerHandlingCarriesCaution() {
        String caution = Breakdown.dryAir().caution();
        for (String word : new String[] {"injure", "pressure", "humidity", "surface finish", "pulse length", "altitude",
                "multipaction", "safety standards"}) {
            assertTrue(caution.contains(word), "caution lacks '" + word + "': " + caution);
        }
    }

    @Test
    @DisplayName("A derating below 1, a zero breakdown field or a zero reference power is refused with the value")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Breakdown(3e6, 0.5));
        assertTrue(e.getMessage().contains("0.5"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Breakdown(0, 2));
        assertThrows(IllegalArgumentException.class, () -> Breakdown.dryAir().maximumPower(0, 1e3));
        assertThrows(IllegalArgumentException.class, () -> Breakdown.rectangularTe10Power(3e6, A, B, -1));
    }
}
