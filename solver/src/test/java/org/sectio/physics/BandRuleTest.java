package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.modes.GridSummary;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.SolveTiming;

/**
 * The single-mode band and the usable-band rule 1.25 fc1 … 0.95 fc2 (common practice), checked on
 * WR-90 against the EIA recommended band 8.2–12.4 GHz (from memory), and the text bar drawn exactly.
 */
class BandRuleTest {

    private static ModeSet set(double... cutoffs) {
        Mode[] modes = new Mode[cutoffs.length];
        for (int i = 0; i < cutoffs.length; i++) {
            modes[i] = new Mode(ModeFamily.TE, i + 1, 2 * Math.PI * cutoffs[i] / 299_792_458.0, cutoffs[i], 1e-13,
                    Double.NaN, null);
        }
        return new ModeSet("test guide", List.of(modes), new GridSummary(10, 10, 1e-3, 1e-3, 100, 81),
                new SolveTiming(0, 0, 0, 0));
    }

    @Test
    @DisplayName("WR-90 with fc10 = 6.557 and fc20 = 13.114 GHz is usable from 8.20 to 12.46 GHz, close to the EIA 8.2–12.4 GHz")
    void wr90UsableBand() {
        // 1.25 · 6.557 = 8.19625 GHz; 0.95 · 13.114 = 12.4583 GHz
        BandRule wr90 = new BandRule(6.557e9, 13.114e9);
        assertEquals(8.19625e9, wr90.usableLowHz(), 1);
        assertEquals(12.4583e9, wr90.usableHighHz(), 1);
        assertTrue(wr90.hasUsableBand());
        assertEquals(2.0, wr90.bandRatio(), 1e-12);
        // EIA recommended band for WR-90 (from memory): 8.2–12.4 GHz; the rule lands within 0.5 %
        assertEquals(8.2e9, wr90.usableLowHz(), 0.005 * 8.2e9);
        assertEquals(12.4e9, wr90.usableHighHz(), 0.005 * 12.4e9);
    }

    @Test
    @DisplayName("A guide whose next cutoff is less than 1.316 times the first has no usable band by the rule")
    void narrowSpacingHasNoUsableBand() {
        // 1.25 / 0.95 = 1.31579: at fc2/fc1 = 1.3 the edges cross (1.25 vs 1.235)
        assertFalse(new BandRule(10e9, 13e9).hasUsableBand());
        assertTrue(new BandRule(10e9, 13.2e9).hasUsableBand());
    }

    @Test
    @DisplayName("From a solved set the next cutoff skips a degenerate doublet of the dominant mode")
    void bandFromModeSetSkipsDoublets() {
        // a circle's TE11 is a doublet; the next distinct mode (TM01 at 1.3062 fc11, A&S Table 9.5 ratio 2.40483/1.84118)
        BandRule band = BandRule.of(set(8.7849e9, 8.7849e9 * (1 + 1e-9), 11.4747e9, 11.4747e9));
        assertEquals(8.7849e9, band.dominantCutoffHz(), 0.0);
        assertEquals(11.4747e9, band.nextCutoffHz(), 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> BandRule.of(set(5e9, 5e9)));
        assertTrue(e.getMessage().contains("more modes"), e.getMessage());
    }

    @Test
    @DisplayName("The bar of fc1 = 10, fc2 = 20 GHz over 0–30 GHz in 30 columns is drawn column by column")
    void barOverSimpleAxis() {
        // columns 1 GHz wide; centres 0.5, 1.5, …; cols 0–9 below fc1 '.', col 10 holds 10 GHz '|', col 11 (11.5)
        // below 12.5 '-', cols 12–18 (12.5 … 18.5) usable '=', col 19 (19.5 > 19.0) '-', col 20 holds 20 GHz '|',
        // cols 21–29 '~'. Scale: "0.00 GHz" (8) + 13 spaces + "30.00 GHz" (9) = 30
        String expected = "..........|-=======-|~~~~~~~~~\n0.00 GHz             30.00 GHz";
        assertEquals(expected, BandBar.render(new BandRule(10e9, 20e9), 0, 30e9, 30));
    }

    @Test
    @DisplayName("The WR-90 bar over 5–15 GHz in 60 columns puts the cutoffs in columns 9 and 48 and the usable band in 19–44")
    void wr90Bar() {
        // Δ = 10/60 GHz; fc10: (6.557 − 5)/Δ = 9.34 → col 9; fc20: (13.114 − 5)/Δ = 48.68 → col 48;
        // centre 5 + (i + 0.5)Δ ≥ 8.19625 ⇔ i ≥ 18.68 → 19; ≤ 12.4583 ⇔ i ≤ 44.25 → 44
        String bar = "." .repeat(9) + "|" + "-".repeat(9) + "=".repeat(26) + "-".repeat(3) + "|" + "~".repeat(11);
        String scale = "5.00 GHz" + " ".repeat(60 - 8 - 9) + "15.00 GHz";
        assertEquals(bar + "\n" + scale, BandBar.render(new BandRule(6.557e9, 13.114e9), 5e9, 15e9, 60));
    }

    @Test
    @DisplayName("Cutoffs in the wrong order, a reversed axis or a too-narrow bar are refused with the values")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new BandRule(13e9, 6e9));
        assertTrue(e.getMessage().contains("1.3E10"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> BandBar.render(new BandRule(1, 2), 5, 1, 60));
        assertThrows(IllegalArgumentException.class, () -> BandBar.render(new BandRule(1, 2), 0, 3, 5));
    }
}
