package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Lengths on the command line; 1 mil = 0.001 in = 25.4 µm (the inch is 25.4 mm exactly, by definition). */
class LengthTextTest {

    @Test
    void micrometresMilsAndBareMetresAreReadAsMetres() {
        assertEquals(0.4e-6, LengthText.parse("--roughness", "0.4um"), 1e-21);
        assertEquals(0.4e-6, LengthText.parse("--roughness", "0.4 µm"), 1e-21);
        assertEquals(4e-7, LengthText.parse("--roughness", "4e-7"), 1e-21);
        assertEquals(25.4e-6, LengthText.parse("--roughness", "1mil"), 1e-21);
        assertEquals(0.0, LengthText.parse("--roughness", "0"), 0);
    }

    @Test
    void anUnknownUnitIsNamedInTheMessage() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LengthText.parse("--roughness", "3 furlongs"));
        assertTrue(e.getMessage().startsWith("--roughness 3 furlongs: unknown unit \"furlongs\""), e.getMessage());
    }

    @Test
    void aNegativeLengthIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> LengthText.parse("--roughness", "-1um"));
    }
}
