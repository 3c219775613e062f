package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentifier;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * Guide summaries of solved guides against closed forms and rules of thumb: WR-90 (fc10 = c / 2a,
 * fc20 = c / a, Pozar, Microwave Engineering, 4th ed., §3.3; EIA recommended band 8.2–12.4 GHz, from
 * memory), a circle (TE11 then TM01, fc ratio j01 / j′11, Pozar §3.4), a double-ridge guide (a wider
 * single-mode band than the plain rectangle, common practice) and a coax (TEM dominant, then TE11 at
 * kc ≈ 2 / (a + b), Marcuvitz, Waveguide Handbook, §2.4, common practice).
 */
class GuideSummaryTest {

    private static final double C = ModeSolver.SPEED_OF_LIGHT;

    private static ModeSet solve(CrossSection section, int count, Set<ModeFamily> families) {
        return ModeSolver.solve(section, new SolveSettings(count, families, 100, Double.NaN, false, 2),
                SolveProgress.SILENT);
    }

    /** The lowest modes on a 100-cell grid shifted off the walls' extreme points (round guides). */
    private static ModeSet solveShifted(CrossSection section, int count) {
        return ModeSolver.solveOnGrid(section, TensorGrid.shifted(section.bounds(), 100, 0.37, 0.61),
                new SolveSettings(count, EnumSet.allOf(ModeFamily.class), 100, Double.NaN, false, 2),
                SolveProgress.SILENT);
    }

    /** The k-th positive root of f, bracketed by a scan in steps of 0.05. */
    private static double root(DoubleUnaryOperator f, int k) {
        int found = 0;
        for (double x = 0.5; x < 50; x += 0.05) {
            if (f.applyAsDouble(x) * f.applyAsDouble(x + 0.05) < 0 && ++found == k) {
                return new BrentSolver(1e-15, 1e-14).solve(200, f::applyAsDouble, x, x + 0.05);
            }
        }
        throw new AssertionError("no root");
    }

    @Test
    @DisplayName("WR-90 is single-mode from 6.557 to 13.114 GHz and usable from 8.20 to 12.46 GHz, with TE10 dominant and TE20 next")
    void wr90Summary() {
        double a = 22.86e-3;
        CrossSection wr90 = Shapes.rectangle(a, 10.16e-3);
        ModeSet set = solve(wr90, 3, EnumSet.of(ModeFamily.TE, ModeFamily.TM));
        GuideSummary s = GuideSummary.of(set, ModeIdentifier.identify(wr90, set));
        assertEquals("TE10", s.dominantLabel());
        assertEquals("TE20", s.nextLabel());
        // fc10 = c / 2a = 6.5571 GHz, fc20 = c / a; measured relative errors at 100 cells −4.1e-5 and −1.6e-4
        assertEquals(C / (2 * a), s.singleModeLowHz(), 1e-4 * C / (2 * a));
        assertEquals(C / a, s.singleModeHighHz(), 3e-4 * C / a);
        // common practice 1.25 fc1 … 0.95 fc2 against the EIA band 8.2–12.4 GHz (from memory), within 0.5 %
        assertEquals(8.2e9, s.usableLowHz(), 0.005 * 8.2e9);
        assertEquals(12.4e9, s.usableHighHz(), 0.005 * 12.4e9);
        assertTrue(s.hasUsableBand());
        String bar = s.bar(60).orElseThrow();
        assertTrue(bar.contains("" + BandBar.USABLE) && bar.chars().filter(ch -> ch == BandBar.CUTOFF).count() == 2, bar);
    }

    @Test
    @DisplayName("A circular guide has TE11 dominant and TM01 next, at j01 / j′11 = 1.306 times its cutoff")
    void circleSummary() {
        double r = 0.01;
        CrossSection circle = Shapes.circle(r, 0.3e-3, -0.2e-3);
        ModeSet set = solveShifted(circle, 3);
        double j11d = root(x -> 0.5 * (BesselJ.value(0, x) - BesselJ.value(2, x)), 1);
        double j01 = root(x -> BesselJ.value(0, x), 1);
        List<ModeIdentity> ids = ModeIdentifier.identify(circle, set);
        GuideSummary named = GuideSummary.of(set, ids);
        GuideSummary plain = GuideSummary.of(set);
        // the computed TE11 pair splits by 3.2e-8 here, inside the 1e-6 degeneracy spread of BandRule
        assertEquals("TE11 (circular)", named.dominantLabel());
        assertEquals("TM01 (circular)", named.nextLabel());
        assertEquals(ModeFamily.TM, plain.firstHigher().orElseThrow().family());
        assertEquals(1.306, j01 / j11d, 5e-4);
        // measured: band ratio within −4.9e-6 of j01 / j′11 = 1.30618 at 100 cells (the errors of TE11 and TM01,
        // 5.0e-5 and about the same, nearly cancel); TE11 itself is within 5.0e-5 (CircularGuideCutoffTest)
        assertEquals(j01 / j11d, named.band().orElseThrow().bandRatio(), 2e-5 * j01 / j11d);
        assertEquals(C * j11d / (2 * Math.PI * r), named.singleModeLowHz(), 1e-4 * named.singleModeLowHz());
    }

    @Test
    @DisplayName("A double-ridge guide's first higher mode is the lowest other mode of either family, and its band ratio beats the plain rectangle's 2")
    void doubleRidgeSummary() {
        CrossSection ridge = GuideFamilies.byName("double_ridge").buildDefault();
        ModeSet both = solve(ridge, 4, EnumSet.of(ModeFamily.TE, ModeFamily.TM));
        List<ModeIdentity> ids = ModeIdentifier.identify(ridge, both);
        GuideSummary s = GuideSummary.of(both, ids);
        // the TE10-like mode of a ridged guide keeps the TE10 symmetry: odd about the vertical centre line, even
        // about the horizontal one (common practice)
        assertEquals("TE #1, odd/even", s.dominantLabel());
        // independent solves of each family: the next mode is the lower of TE #2 and TM #1
        double te2 = solve(ridge, 2, EnumSet.of(ModeFamily.TE)).modes().get(1).cutoffFrequencyHz();
        double tm1 = solve(ridge, 1, EnumSet.of(ModeFamily.TM)).modes().get(0).cutoffFrequencyHz();
        assertEquals(Math.min(te2, tm1), s.singleModeHighHz(), 1e-9 * s.singleModeHighHz());
        // plain rectangle with a / b = 2.25 ≥ 2: fc20 / fc10 = 2 (Pozar §3.3); ridging widens the band (common practice)
        assertTrue(s.band().orElseThrow().bandRatio() > 2.0, "band ratio " + s.band().orElseThrow().bandRatio());
    }

    @Test
    @DisplayName("A coax has the TEM mode dominant from 0 Hz and TE11 next near kc = 2 / (a + b)")
    void coaxSummary() {
        double outer = 3.5e-3;
        double inner = 1.52e-3;
        CrossSection coax = GuideFamilies.byName("coaxial").buildDefault();
        ModeSet set = solveShifted(coax, 3);
        GuideSummary s = GuideSummary.of(set, ModeIdentifier.identify(coax, set));
        assertEquals(ModeFamily.TEM, s.dominant().family());
        assertEquals("TEM", s.dominantLabel());
        assertEquals(0.0, s.singleModeLowHz());
        assertEquals(0.0, s.usableLowHz());
        Mode next = s.firstHigher().orElseThrow();
        assertEquals(ModeFamily.TE, next.family());
        double thumb = C * 2 / (outer + inner) / (2 * Math.PI);
        // measured: the computed TE11 lies 2.1 % above the rule of thumb (the rule's own error at b / a = 2.3)
        assertEquals(thumb, next.cutoffFrequencyHz(), 0.03 * thumb);
        assertTrue(s.bar(40).orElseThrow().startsWith("|"));
    }

    @Test
    @DisplayName("With one mode solved the first higher mode is reported unknown, not guessed")
    void oneModeLeavesTheNextUnknown() {
        CrossSection wr90 = Shapes.rectangle(22.86e-3, 10.16e-3);
        GuideSummary s = GuideSummary.of(solve(wr90, 1, EnumSet.of(ModeFamily.TE, ModeFamily.TM)));
        assertFalse(s.firstHigher().isPresent());
        assertEquals(GuideSummary.UNKNOWN, s.nextLabel());
        assertTrue(Double.isNaN(s.usableHighHz()));
        assertFalse(s.hasUsableBand());
        assertTrue(s.bar(40).isEmpty());
    }
}
