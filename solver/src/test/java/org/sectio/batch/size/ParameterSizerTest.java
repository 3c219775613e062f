package org.sectio.batch.size;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSolver;

/**
 * Sizing against closed forms: the TE10 cutoff of a rectangle is fc = c / (2a) (Pozar, Microwave
 * Engineering, 4th ed., §3.3), so the broad wall for a cutoff f is a = c / (2f); WR-90 has a = 22.86 mm
 * inside (EIA standard sizes; 6.557 GHz is its TE10 cutoff rounded to four digits, so a = 22.8605 mm).
 */
class ParameterSizerTest {

    private static final GuideTemplate RECTANGLE = GuideTemplate.of(GuideFamilies.byName("rectangular"));

    @Test
    @DisplayName("size finds the WR-90 broad wall from a 6.557 GHz TE10 cutoff to 1e-5 relative (a = c/2fc, Pozar §3.3)")
    void findsTheWr90BroadWall() throws Exception {
        double f = 6.557e9;
        ParameterSizer.Result r = ParameterSizer.size(new ParameterSizer.Request(RECTANGLE, Map.of("height", 10.16),
                "width", 15, 30, new SizeTarget.Cutoff(ModeFamily.TE, 1, f), 1e-5, 0, 2));
        double exactMm = ModeSolver.SPEED_OF_LIGHT / (2 * f) * 1e3;
        double relative = Math.abs(r.value() - exactMm) / exactMm;
        // measured: 3.8e-6 at the 330 cells chosen for 1e-5
        assertTrue(relative < 1e-5, "width " + r.value() + " mm against " + exactMm + " mm: " + relative);
        assertTrue(Math.abs(r.value() - exactMm) <= r.uncertainty(), "the reported uncertainty " + r.uncertainty()
                + " mm should cover the true error " + Math.abs(r.value() - exactMm) + " mm");
        assertEquals(22.86, r.value(), 1e-3, "EIA WR-90 broad wall 22.86 mm");
        assertTrue(Math.abs(r.quantity() - f) <= r.quantityError(), "the cutoff at the result is within its error");
    }

    @Test
    @DisplayName("A target outside the range is refused with the values reached at both ends (fc = c/2a, Pozar §3.3)")
    void aTargetOutOfReachNamesTheEnds() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ParameterSizer.size(
                new ParameterSizer.Request(RECTANGLE, Map.of(), "width", 15, 16,
                        new SizeTarget.Cutoff(ModeFamily.TE, 1, 6.557e9), 1e-3, 40, 2)));
        // c/(2 · 15 mm) = 9.993 GHz, c/(2 · 16 mm) = 9.368 GHz, to the grid's error at 40 cells
        assertTrue(e.getMessage().matches(".*cannot be bracketed in width 15\\.0000 … 16\\.0000: cutoff of TE 1"
                + " reaches 9\\.9\\d+ GHz at 15\\.0000 and 9\\.3\\d+ GHz at 16\\.0000.*"), e.getMessage());
        assertTrue(!e.getMessage().contains("\n"), "one line");
    }

    @Test
    @DisplayName("Unknown parameters, reversed and empty ranges are refused before any solve")
    void badRequestsAreRefused() {
        SizeTarget t = new SizeTarget.Cutoff(null, 1, 6.557e9);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ParameterSizer.Request(RECTANGLE, Map.of(),
                "depth", 15, 30, t, 1e-4, 0, 1)).getMessage().contains("no parameter 'depth'; its parameters are width, height"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ParameterSizer.Request(RECTANGLE, Map.of(),
                "width", 30, 15, t, 1e-4, 0, 1)).getMessage().contains("is reversed"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ParameterSizer.Request(RECTANGLE, Map.of(),
                "width", 15, 15, t, 1e-4, 0, 1)).getMessage().contains("is empty"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ParameterSizer.Request(RECTANGLE,
                Map.of("depth", 1.0), "width", 15, 30, t, 1e-4, 0, 1)).getMessage().contains("no parameter 'depth'"));
        assertThrows(IllegalArgumentException.class, () -> new SizeTarget.BandRatio(0.9));
        assertThrows(IllegalArgumentException.class, () -> new SizeTarget.Coverage(12e9, 8e9));
    }

    @Test
    @DisplayName("A single-mode ratio of 1.8 sizes a rectangle with b < a < 2b to a = 1.8 b, fc(TE01)/fc(TE10) = a/b (Pozar §3.3)")
    void sizesTheSingleModeRatio() throws Exception {
        // with b = 10.16 mm and b < a < 2b the first higher mode is TE01 (fc = c/2b), so fc2/fc1 = a/b
        ParameterSizer.Result r = ParameterSizer.size(new ParameterSizer.Request(RECTANGLE, Map.of("height", 10.16),
                "width", 12, 19, new SizeTarget.BandRatio(1.8), 1e-4, 0, 2));
        double exact = 1.8 * 10.16;
        // measured: 2e-6 relative; the search stops at a tenth of the error over the slope
        assertEquals(exact, r.value(), Math.max(r.uncertainty(), 2e-4 * exact));
    }
}
