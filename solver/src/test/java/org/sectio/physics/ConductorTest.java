package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Wall conductors: the table of Pozar, Microwave Engineering, 4th ed., Appendix F (values from
 * memory), skin depth (§1.4) and surface resistance (§1.7; section numbers from memory), and the Hammerstad–Bekkadal roughness factor
 * (Microstrip Handbook, ELAB report STF44 A74169, 1975, from memory).
 */
class ConductorTest {

    private static final double MU0 = 4e-7 * Math.PI * (1 + 5.5e-10); // CODATA 2018 μ0 written as 4π×10⁻⁷ (1 + 5.5e-10)

    @Test
    @DisplayName("The built-in conductivities are those of Pozar Appendix F: Cu 5.813e7, Ag 6.173e7, Au 4.098e7, Al 3.816e7, brass 2.564e7 S/m")
    void tableMatchesPozarAppendixF() {
        assertEquals(5.813e7, Conductor.named("copper").conductivity(), 0.0);
        assertEquals(6.173e7, Conductor.named("silver").conductivity(), 0.0);
        assertEquals(4.098e7, Conductor.named("gold").conductivity(), 0.0);
        assertEquals(3.816e7, Conductor.named("aluminium").conductivity(), 0.0);
        assertEquals(2.564e7, Conductor.named("brass").conductivity(), 0.0);
        assertEquals(5, Conductor.builtIn().size());
    }

    @Test
    @DisplayName("Lookup ignores case and blanks, accepts 'aluminum', and an unknown name lists every known one on one line")
    void lookupByName() {
        assertSame(Conductor.COPPER, Conductor.named("  CoPPer "));
        assertSame(Conductor.ALUMINIUM, Conductor.named("Aluminum"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Conductor.named("unobtainium"));
        assertEquals("unknown conductor \"unobtainium\"; known: copper, silver, gold, aluminium, brass", e.getMessage());
    }

    @Test
    @DisplayName("Copper at 10 GHz has skin depth 0.660 µm and surface resistance 0.0261 Ω (Pozar §1.4/§1.7; hand-worked)")
    void copperAtTenGigahertz() {
        // ω μ0 σ = 6.2832e10 · 1.25664e-6 · 5.813e7 = 4.5898e12; δs = √(2 / 4.5898e12) = 6.601e-7 m
        // (Pozar §1.4 quotes about 0.66 µm for copper at 10 GHz, from memory); Rs = 1/(σ δs) = 0.02606 Ω
        assertEquals(6.601e-7, Conductor.COPPER.skinDepth(10e9), 0.001e-7);
        assertEquals(0.02606, Conductor.COPPER.surfaceResistance(10e9), 0.00001);
    }

    @Test
    @DisplayName("Rs equals 1/(σ δs), grows as √f and as √μr, and a user conductivity gives the same relations")
    void surfaceResistanceIsConductivityTimesSkinDepthInverse() {
        for (Conductor c : new Conductor[] {Conductor.SILVER, Conductor.BRASS, Conductor.user(1.1e6),
                new Conductor("nickel-like", 1.449e7, 600)}) {
            for (double f = 1e8; f < 1e12; f *= 7.3) {
                double rs = c.surfaceResistance(f);
                assertEquals(1.0 / (c.conductivity() * c.skinDepth(f)), rs, 1e-12 * rs, c.name() + " at " + f);
                // Pozar §1.7: Rs = √(π f μ / σ), written with an independently built μ0
                assertEquals(Math.sqrt(Math.PI * f * MU0 * c.relativePermeability() / c.conductivity()), rs,
                        1e-9 * rs, c.name() + " at " + f);
            }
            assertEquals(2.0, c.surfaceResistance(4e9) / c.surfaceResistance(1e9), 1e-12);
        }
    }

    @Test
    @DisplayName("The roughness factor is 1 for a smooth wall, 1.605 when Δ = δs, and tends to 2 for a very rough wall")
    void hammerstadFactorLimits() {
        assertEquals(1.0, RoughnessFactor.hammerstad(0, 1e-6), 0.0);
        // 1 + (2/π) arctan(1.4) = 1 + 0.63662 · 0.95055 = 1.60514
        assertEquals(1.60514, RoughnessFactor.hammerstad(1e-6, 1e-6), 1e-5);
        assertEquals(2.0, RoughnessFactor.hammerstad(1e-3, 1e-6), 1e-6);
        assertTrue(RoughnessFactor.hammerstad(0.5e-6, 1e-6) < RoughnessFactor.hammerstad(0.6e-6, 1e-6));
    }

    @Test
    @DisplayName("Copper with 1 µm rms roughness at 10 GHz has Rs·K with K = 1.808 (hand-worked)")
    void roughWallSurfaceResistance() {
        // Δ/δs = 1e-6 / 6.6012e-7 = 1.5149; 1.4 · 1.5149² = 3.2129; arctan = 1.2698; K = 1 + 0.63662 · 1.2698 = 1.8084
        double smooth = Conductor.COPPER.surfaceResistance(10e9);
        assertEquals(1.808 * smooth, Conductor.COPPER.surfaceResistance(10e9, 1e-6), 0.001 * smooth);
    }

    @Test
    @DisplayName("A non-positive conductivity or frequency is refused with the value in the message")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Conductor.user(-3));
        assertTrue(e.getMessage().contains("-3.0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Conductor.COPPER.skinDepth(0));
        assertThrows(IllegalArgumentException.class, () -> RoughnessFactor.hammerstad(-1e-6, 1e-6));
    }
}
