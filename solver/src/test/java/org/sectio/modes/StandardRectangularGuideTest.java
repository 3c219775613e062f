package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;

/**
 * Facts about the standard X-band guide WR-90 (inner 22.86 × 10.16 mm, EIA standard size) solved
 * through the public entry point on its fitted grid: the cutoff frequencies of its first modes from the
 * closed form fc = (c/2)√((m/a)² + (n/b)²) (Pozar, Microwave Engineering, 4th ed., §3.3), and the
 * trade fact (common practice) that WR-90 carries a single mode across the X band, 8–12 GHz.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class StandardRectangularGuideTest {

    private static final double A = 0.02286;
    private static final double B = 0.01016;
    private static final double C = 299_792_458.0; // m/s, exact (SI)

    /**
     * Relative accuracy of fc at 100 cells on the fitted grid. Measured: TE10 4.11e-5, TE20 1.65e-4,
     * TE01 2.12e-4, TE11/TM11 1.84e-4, all below the exact value.
     */
    private static final double ACCURACY_AT_100 = 3e-4;

    private final CrossSection wr90 = Shapes.rectangle(A, B);
    private List<Mode> modes;

    private List<Mode> modes() {
        if (modes == null) {
            modes = ModeSolver.solve(wr90, new SolveSettings(6, EnumSet.allOf(ModeFamily.class), 100, Double.NaN,
                    false, 2), SolveProgress.SILENT).modes();
        }
        return modes;
    }

    private Mode mode(ModeFamily family, int index) {
        return modes().stream().filter(m -> m.family() == family && m.index() == index).findFirst().orElseThrow();
    }

    private static double closedForm(int m, int n) {
        return C / 2 * Math.hypot(m / A, n / B);
    }

    @Test
    @DisplayName("The closed form gives WR-90 TE10 6.557, TE20 13.114, TE01 14.754, TE11/TM11 16.15 GHz")
    void closedFormGivesTheHandbookFrequencies() {
        assertEquals(6.557e9, closedForm(1, 0), 0.5e6);
        assertEquals(13.114e9, closedForm(2, 0), 0.5e6);
        assertEquals(14.754e9, closedForm(0, 1), 0.5e6);
        assertEquals(16.15e9, closedForm(1, 1), 5e6);
    }

    @Test
    @DisplayName("At 100 cells WR-90's TE10, TE20, TE01, TE11 and TM11 cutoffs match the closed form within 3e-4")
    void firstModesMatchTheClosedForm() {
        assertEquals(closedForm(1, 0), mode(ModeFamily.TE, 1).cutoffFrequencyHz(), ACCURACY_AT_100 * closedForm(1, 0));
        assertEquals(closedForm(2, 0), mode(ModeFamily.TE, 2).cutoffFrequencyHz(), ACCURACY_AT_100 * closedForm(2, 0));
        assertEquals(closedForm(0, 1), mode(ModeFamily.TE, 3).cutoffFrequencyHz(), ACCURACY_AT_100 * closedForm(0, 1));
        assertEquals(closedForm(1, 1), mode(ModeFamily.TE, 4).cutoffFrequencyHz(), ACCURACY_AT_100 * closedForm(1, 1));
        assertEquals(closedForm(1, 1), mode(ModeFamily.TM, 1).cutoffFrequencyHz(), ACCURACY_AT_100 * closedForm(1, 1));
    }

    @Test
    @DisplayName("WR-90 is single-mode across X band: TE10 cuts off below 8 GHz and the next mode, TE20 at 13.1 GHz, above 12 GHz")
    void singleModeAcrossXBand() {
        Mode first = modes().get(0);
        Mode second = modes().get(1);
        assertEquals(ModeFamily.TE, first.family());
        assertEquals(1, first.index());
        assertTrue(first.cutoffFrequencyHz() < 8e9, "TE10 cutoff " + first.cutoffFrequencyHz());
        assertTrue(second.cutoffFrequencyHz() > 12e9, "next cutoff " + second.cutoffFrequencyHz());
        assertEquals(ModeFamily.TE, second.family(), "the second mode is TE20");
        assertEquals(13.1e9, second.cutoffFrequencyHz(), 0.05e9);
    }
}
