package org.sectio.eigen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LanczosSettingsTest {

    @Test
    @DisplayName("defaults follow ncv = max(2 count + 1, count + 8) and tolerance 1e-12")
    void defaultsFollowTheStatedRule() {
        assertEquals(9, LanczosSettings.forCount(1).lanczosVectors());
        assertEquals(21, LanczosSettings.forCount(10).lanczosVectors());
        assertEquals(1e-12, LanczosSettings.forCount(3).relativeTolerance());
    }

    @Test
    @DisplayName("a basis no larger than the count is rejected with both numbers in the message")
    void tooSmallBasisIsRejected() {
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> new LanczosSettings(6, 6, 1e-12, 10, 1L));
        assertTrue(failure.getMessage().contains("lanczosVectors = 6") && failure.getMessage().contains("count = 6"),
                failure.getMessage());
    }

    @Test
    @DisplayName("counts below one, tolerances outside (0, 0.1] and restart limits below one are rejected")
    void outOfRangeValuesAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> new LanczosSettings(0, 9, 1e-12, 10, 1L));
        assertThrows(IllegalArgumentException.class, () -> new LanczosSettings(2, 9, 0.0, 10, 1L));
        assertThrows(IllegalArgumentException.class, () -> new LanczosSettings(2, 9, Double.NaN, 10, 1L));
        assertThrows(IllegalArgumentException.class, () -> new LanczosSettings(2, 9, 0.5, 10, 1L));
        assertThrows(IllegalArgumentException.class, () -> new LanczosSettings(2, 9, 1e-12, 0, 1L));
    }
}
