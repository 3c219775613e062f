package org.sectio.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.family.GuideFamilies;

/**
 * The built-in wall metals against Pozar, Microwave Engineering, 4th ed., Appendix F, "Conductivity of
 * some materials" (from memory), their validation, and guides carrying a metal per conductor.
 */
class WallMetalTest {

    @Test
    void theBuiltInMetalsHaveTheConductivitiesOfPozarAppendixF() {
        // Pozar App. F (from memory): Cu 5.813e7, Ag 6.173e7, Au 4.098e7, Al 3.816e7, brass 2.564e7 S/m.
        assertEquals(5.813e7, WallMetal.named("copper").conductivity(), 0.0);
        assertEquals(6.173e7, WallMetal.named("silver").conductivity(), 0.0);
        assertEquals(4.098e7, WallMetal.named("gold").conductivity(), 0.0);
        assertEquals(3.816e7, WallMetal.named("aluminium").conductivity(), 0.0);
        assertEquals(2.564e7, WallMetal.named("brass").conductivity(), 0.0);
        assertEquals(List.of("copper", "silver", "gold", "aluminium", "brass"),
                WallMetal.builtIn().stream().map(WallMetal::name).toList());
        assertTrue(WallMetal.builtIn().stream().allMatch(m -> m.relativePermeability() == 1.0));
    }

    @Test
    void namesIgnoreCaseAndBlanksAndAnUnknownNameListsTheKnownOnes() {
        assertSame(WallMetal.BRASS, WallMetal.named(" Brass "));
        assertSame(WallMetal.ALUMINIUM, WallMetal.named("aluminum"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> WallMetal.named("bronze"));
        assertEquals("unknown conductor \"bronze\"; known: copper, silver, gold, aluminium, brass", e.getMessage());
    }

    @Test
    void aConductivityThatIsNotFiniteAndPositiveOrAPermeabilityNotPositiveIsRefused() {
        for (double sigma : new double[] {0, -1e7, Double.NaN, Double.POSITIVE_INFINITY}) {
            assertThrows(IllegalArgumentException.class, () -> new WallMetal("m", sigma, 1), "σ = " + sigma);
        }
        for (double mu : new double[] {0, -1, Double.NaN}) {
            assertThrows(IllegalArgumentException.class, () -> new WallMetal("m", 1e7, mu), "μr = " + mu);
        }
        assertThrows(IllegalArgumentException.class, () -> new WallMetal(" ", 1e7, 1));
    }

    @Test
    void aGuideCarriesAMetalPerConductorAndNoneWhenNotGiven() {
        GuideSection plain = GuideFamilies.byName("coaxial").build(Map.of());
        assertEquals(2, plain.conductors().size());
        assertTrue(plain.wallMetal(0).isEmpty() && plain.wallMetal(1).isEmpty());
        GuideSection pinned = plain.withWallMetals(Map.of(1, WallMetal.BRASS));
        assertTrue(pinned.wallMetal(0).isEmpty());
        assertSame(WallMetal.BRASS, pinned.wallMetal(1).orElseThrow());
        assertSame(WallMetal.BRASS, pinned.named("other").wallMetal(1).orElseThrow(), "a new name keeps the metals");
        assertThrows(IllegalArgumentException.class, () -> plain.withWallMetals(Map.of(2, WallMetal.GOLD)));
        assertThrows(IllegalArgumentException.class, () -> plain.wallMetal(-1));
    }
}
