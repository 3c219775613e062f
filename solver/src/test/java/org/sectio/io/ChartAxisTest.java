package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The nice-number axis, against the worked example and the rule of P. S. Heckbert, "Nice numbers for
 * graph labels", Graphics Gems (1990) (example and thresholds from memory).
 */
class ChartAxisTest {

    @Test
    void heckbertsExampleRangeGetsTicksEveryHundredFromOneToSixHundred() {
        // Heckbert's example: data 105 … 543, 5 ticks → 100 … 600, step 100 (from memory).
        ChartAxis axis = ChartAxis.covering(105, 543, 5, 0, 500);
        assertEquals(100, axis.low(), 1e-12);
        assertEquals(600, axis.high(), 1e-12);
        assertEquals(100, axis.step(), 1e-12);
        assertArrayEquals(new double[] {100, 200, 300, 400, 500, 600}, axis.ticks(), 1e-12);
    }

    @Test
    void niceNumbersRoundUpOrToTheNearestOfOneTwoFiveAndTen() {
        assertEquals(500, ChartAxis.niceNumber(438, false), 1e-12);
        assertEquals(1000, ChartAxis.niceNumber(501, false), 1e-12);
        assertEquals(100, ChartAxis.niceNumber(125, true), 1e-12);
        assertEquals(0.002, ChartAxis.niceNumber(0.0026, true), 1e-15);
        assertEquals(5e9, ChartAxis.niceNumber(6.9e9, true), 1e-3);
        assertEquals(10, ChartAxis.niceNumber(7.2, true), 1e-12);
    }

    @Test
    void anXBandSweepGetsHalfGigahertzTicksLabelledWithOneDecimal() {
        ChartAxis axis = ChartAxis.covering(8.2, 12.4, 9, 78, 730);
        assertEquals(0.5, axis.step(), 1e-12);
        assertEquals(8.0, axis.low(), 1e-12);
        assertEquals(12.5, axis.high(), 1e-12);
        assertEquals("8.5", axis.tickLabel(axis.ticks()[1]));
        assertEquals(10, axis.ticks().length);
    }

    @Test
    void valuesMapLinearlyOntoPixelsAlsoWhenTheAxisRunsUpward() {
        ChartAxis y = new ChartAxis(0, 400, 100, 500, 40);
        assertEquals(500, y.toPixel(0), 1e-12);
        assertEquals(40, y.toPixel(400), 1e-12);
        assertEquals(500 - 0.25 * 460, y.toPixel(100), 1e-12);
    }

    @Test
    void aSingleValueStillGetsAnAxisAroundIt() {
        ChartAxis axis = ChartAxis.covering(3, 3, 5, 0, 100);
        assertEquals(true, axis.low() < 3 && axis.high() > 3, axis.toString());
    }

    @Test
    void aReversedDataRangeIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> ChartAxis.covering(2, 1, 5, 0, 100));
    }
}
