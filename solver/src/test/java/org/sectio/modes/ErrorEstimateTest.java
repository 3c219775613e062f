package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.TensorGrid;

/**
 * The reported relativeErrorEstimate against the true error on problems with closed-form cutoffs:
 * a circle (kc·R = j′11, j01, j′21, j′01; Pozar, Microwave Engineering, 4th ed., §3.4, zeros from
 * Abramowitz &amp; Stegun Table 9.5 via {@link CircularGuideCutoffTest}'s Commons Math root finder)
 * and a 20 × 9 mm rectangle, turned 30° and unturned (kc = π√((m/a)² + (n/b)²), Pozar §3.3). An
 * honest estimate is never below the true error and, to be useful, not more than ten times above it.
 * The estimator is 2|kc(h) − kc(2h)| / (3 kc), the coarse grid made of every second line, so for a
 * clean h² error the ratio should be about 2.
 */
class ErrorEstimateTest {

    private static final double R = 0.010;
    private static final double A = 0.020;
    private static final double B = 0.009;
    private static final int[] CELLS = {60, 120, 200};

    /** A mode to check: family, 1-based index in its family, exact kc in rad/m. */
    private record Expected(String name, ModeFamily family, int index, double kc) {
    }

    private static ModeSet solve(CrossSection section, TensorGrid grid, int count) {
        return ModeSolver.solveOnGrid(section, grid,
                new SolveSettings(count, EnumSet.allOf(ModeFamily.class), 100, Double.NaN, true, 2), SolveProgress.SILENT);
    }

    /** Collects the estimate/true ratio of each expected mode; returns one line per violation. */
    private static List<String> violations(String where, ModeSet set, List<Expected> expected) {
        List<String> bad = new ArrayList<>();
        for (Expected e : expected) {
            Mode m = set.modes().stream().filter(x -> x.family() == e.family() && x.index() == e.index())
                    .findFirst().orElseThrow(() -> new AssertionError(where + ": " + e.name() + " not among the modes"));
            double trueError = Math.abs(m.cutoffWavenumber() - e.kc()) / e.kc();
            double ratio = m.relativeErrorEstimate() / trueError;
            String line = String.format(Locale.ROOT, "%s %s: true %.3e, estimate %.3e, ratio %.2f", where, e.name(),
                    trueError, m.relativeErrorEstimate(), ratio);
            if (!(ratio >= 1 && ratio <= 10)) {
                bad.add(line);
            }
        }
        return bad;
    }

    private static List<Expected> rectangleModes() {
        return List.of(new Expected("TE10", ModeFamily.TE, 1, Math.PI / A),
                new Expected("TE20", ModeFamily.TE, 2, 2 * Math.PI / A),
                new Expected("TE01", ModeFamily.TE, 3, Math.PI / B),
                new Expected("TM11", ModeFamily.TM, 1, Math.PI * Math.hypot(1 / A, 1 / B)));
    }

    @Test
    @DisplayName("On a circle the error estimate of TE11, TM01, TE21 and TE01 lies between 1 and 10 times the true error")
    void circleEstimatesAreHonest() {
        // measured ratios at 60/120/200 cells: TE11 1.93–1.97, TM01 2.07–2.13, TE21 1.90–2.00, TE01 2.00–2.01
        CrossSection circle = Shapes.circle(R, 0.3e-3, -0.2e-3);
        double te11 = CircularGuideCutoffTest.besselDerivativeZero(1, 1) / R;
        double te21 = CircularGuideCutoffTest.besselDerivativeZero(2, 1) / R;
        List<Expected> expected = List.of(new Expected("TE11", ModeFamily.TE, 1, te11),
                new Expected("TE11'", ModeFamily.TE, 2, te11),
                new Expected("TM01", ModeFamily.TM, 1, CircularGuideCutoffTest.besselZero(0, 1) / R),
                new Expected("TE21", ModeFamily.TE, 3, te21),
                new Expected("TE21'", ModeFamily.TE, 4, te21),
                new Expected("TE01", ModeFamily.TE, 5, CircularGuideCutoffTest.besselDerivativeZero(0, 1) / R));
        List<String> bad = new ArrayList<>();
        for (int n : CELLS) {
            bad.addAll(violations("circle " + n, solve(circle, TensorGrid.shifted(circle.bounds(), n, 0.37, 0.61), 8),
                    expected));
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    @DisplayName("On a rectangle turned 30° the error estimate of TE10, TE20, TE01 and TM11 lies between 1 and 10 times the true error")
    void turnedRectangleEstimatesAreHonest() {
        // measured ratios at 60/120/200 cells: 1.98–2.04
        CrossSection turned = Shapes.rotatedRectangle(A, B, 0.4e-3, -0.3e-3, Math.toRadians(30));
        List<String> bad = new ArrayList<>();
        for (int n : CELLS) {
            bad.addAll(violations("turned rectangle " + n,
                    solve(turned, TensorGrid.shifted(turned.bounds(), n, 0.37, 0.61), 6), rectangleModes()));
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }

    @Test
    @DisplayName("On an unturned rectangle on its fitted grid the error estimate lies between 1 and 10 times the true error")
    void fittedRectangleEstimatesAreHonest() {
        // measured ratios at 60/120/200 cells: 2.00, except 1.71 for TE01 and TM11 at 60 cells, where the
        // 27 cells across b make the every-second-line grid end in one fine cell
        CrossSection rectangle = Shapes.rectangle(A, B);
        List<String> bad = new ArrayList<>();
        for (int n : CELLS) {
            bad.addAll(violations("fitted rectangle " + n, solve(rectangle, TensorGrid.fitted(rectangle.bounds(), n), 6),
                    rectangleModes()));
        }
        assertTrue(bad.isEmpty(), String.join("\n", bad));
    }
}
