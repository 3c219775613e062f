package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;

/**
 * Re-use between consecutive solves changes nothing it must not: with the symbolic analysis shared
 * every cutoff and error estimate is the same bit for bit as a solve on its own (the numeric factor
 * is a function of the analysis and the values only), and with the previous eigenvectors as the
 * Lanczos start the cutoffs agree with the solves on their own to the eigensolver's tolerance
 * ({@code LanczosSettings.DEFAULT_TOLERANCE} = 1e-12 on the shift-inverted values; SweepReuseBenchmark
 * measured 1.1e-15 on a circle sweep and 6.8e-16 on a rectangle sweep at 120 cells; the check allows 1e-10).
 */
class SolveSessionReuseTest {

    private static final SolveSettings SETTINGS = new SolveSettings(5, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 40,
            Double.NaN, true, 1);

    private static List<ModeSet> sweep(List<CrossSection> sections, SolveSession session) {
        return sections.stream().map(s -> ModeSolver.solve(s, SETTINGS, SolveProgress.SILENT, session)).toList();
    }

    @Test
    void aSharedAnalysisGivesTheSameBitsAsSolvesOnTheirOwn() {
        // a width sweep in small steps: the planned cell counts, hence the patterns, repeat for some points
        List<CrossSection> rectangles = List.of(0.0220, 0.0221, 0.0222, 0.0223, 0.0240).stream()
                .map(a -> Shapes.rectangle(a, 0.01016)).toList();
        SolveSession session = SolveSession.create();
        List<ModeSet> shared = sweep(rectangles, session);
        List<ModeSet> alone = sweep(rectangles, null);
        assertTrue(session.analysesReused() > 0, "the sweep must exercise re-use: " + session.analysesReused());
        assertTrue(session.analysesMade() > 4, "and must see more than one pattern per family and grid level");
        for (int p = 0; p < rectangles.size(); p++) {
            for (int k = 0; k < SETTINGS.modeCount(); k++) {
                Mode a = alone.get(p).modes().get(k);
                Mode b = shared.get(p).modes().get(k);
                assertEquals(a.cutoffWavenumber(), b.cutoffWavenumber(), 0.0, "point " + p + " mode " + k);
                assertEquals(a.relativeErrorEstimate(), b.relativeErrorEstimate(), 0.0, "point " + p + " mode " + k);
            }
        }
    }

    @Test
    void warmStartsAgreeWithSolvesOnTheirOwnToTheEigensolverTolerance() {
        // a circle scales its whole plan with R, so every point has the pattern of the first
        List<CrossSection> circles = List.of(0.009, 0.0095, 0.010, 0.0105, 0.011).stream()
                .map(r -> Shapes.circle(r, 0.0, 0.0)).toList();
        SolveSession session = SolveSession.createWarm();
        List<ModeSet> warm = sweep(circles, session);
        List<ModeSet> alone = sweep(circles, null);
        assertEquals(2 * 3 * (circles.size() - 1), session.warmStarts(), "two families on three grids (h, 2h, 4h), all but the first point");
        double worst = 0;
        for (int p = 0; p < circles.size(); p++) {
            for (int k = 0; k < SETTINGS.modeCount(); k++) {
                double a = alone.get(p).modes().get(k).cutoffWavenumber();
                double b = warm.get(p).modes().get(k).cutoffWavenumber();
                worst = Math.max(worst, Math.abs(a - b) / a);
            }
        }
        assertTrue(worst <= 1e-10, "largest relative difference " + worst);
    }
}
