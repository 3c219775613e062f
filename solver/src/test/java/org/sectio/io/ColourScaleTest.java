package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ColourScaleTest {

    @Test
    void theEndsAndTheMiddleAreTheControlColours() {
        assertEquals(0x1A3A80, ColourScale.rgb(-1.0));
        assertEquals(0xF6F3EC, ColourScale.rgb(0.0));
        assertEquals(0x66300A, ColourScale.rgb(1.0));
    }

    @Test
    void valuesBeyondPlusMinusOneAreClampedToTheEnds() {
        assertEquals(ColourScale.rgb(1.0), ColourScale.rgb(7.5));
        assertEquals(ColourScale.rgb(-1.0), ColourScale.rgb(Double.NEGATIVE_INFINITY));
    }

    @Test
    void notANumberIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> ColourScale.rgb(Double.NaN));
    }

    @Test
    void lightnessRisesTowardZeroFromBothSidesAndMatchesForOppositeValues() {
        double previous = -1;
        for (int k = 0; k <= 100; k++) {
            double v = k / 100.0;
            double up = lightness(v);
            double down = lightness(-v);
            assertTrue(Math.abs(up - down) < 0.02, "lightness of ±" + v + ": " + up + " vs " + down);
            if (k > 0) {
                assertTrue(up < previous + 1e-3, "lightness falls from 0 to +1 at " + v);
            }
            previous = up;
        }
    }

    @Test
    void neighbouringValuesHaveNearbyColoursSoTheScaleHasNoJumps() {
        for (int k = -200; k < 200; k++) {
            double[] a = ColourScale.toOklab(ColourScale.rgb(k / 200.0));
            double[] b = ColourScale.toOklab(ColourScale.rgb((k + 1) / 200.0));
            double step = Math.sqrt(Math.pow(a[0] - b[0], 2) + Math.pow(a[1] - b[1], 2) + Math.pow(a[2] - b[2], 2));
            assertTrue(step < 0.01, "OKLab step " + step + " at " + k / 200.0);
        }
    }

    @Test
    void oklabOfWhiteIsFullLightnessWithoutColour() {
        double[] white = ColourScale.toOklab(0xFFFFFF);
        assertEquals(1.0, white[0], 1e-4);
        assertEquals(0.0, white[1], 1e-4);
        assertEquals(0.0, white[2], 1e-4);
    }

    private static double lightness(double value) {
        return ColourScale.toOklab(ColourScale.rgb(value))[0];
    }
}
