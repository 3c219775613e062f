package org.sectio.batch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The value lists of the range forms, exact small cases worked by hand (the definitions are those of
 * docs/sweep-files.md: ends included, no accumulated rounding; a logarithmic range is a geometric
 * progression, ratio (to/from)^(1/(count − 1))).
 */
class SweepAxisTest {

    @Test
    void aLinearRangeIncludesBothEnds() {
        assertArrayEquals(new double[] {1.0, 1.5, 2.0, 2.5, 3.0}, SweepAxis.linear(1, 3, 5), 0.0);
    }

    @Test
    void aSteppedRangeKeepsTheUpperEndWhenItFallsOnAStepDespiteRounding() {
        // 0.1 steps: 0.1 * 3 = 0.30000000000000004, so the end is set to 0.3 exactly
        assertArrayEquals(new double[] {0.0, 0.1, 0.2, 0.3}, SweepAxis.stepped(0.0, 0.3, 0.1), 1e-17);
        assertEquals(0.3, SweepAxis.stepped(0.0, 0.3, 0.1)[3], 0.0);
        assertArrayEquals(new double[] {2.0, 2.75, 3.5}, SweepAxis.stepped(2.0, 4.0, 0.75), 0.0);
    }

    @Test
    void aLogarithmicRangeIsAGeometricProgression() {
        assertArrayEquals(new double[] {1, 10, 100, 1000}, SweepAxis.logarithmic(1, 1000, 4), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> SweepAxis.logarithmic(0, 10, 3));
    }
}
