package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.TensorGrid;

/**
 * Rectangular-guide cutoffs against the closed form kc = π√((m/a)² + (n/b)²) (Pozar, Microwave
 * Engineering, 4th ed., §3.3), in two settings: a 20 × 9 mm rectangle of our own turned 30° to the
 * grid, so that every wall is oblique and every corner sits in a cut cell, and WR-90 (22.86 × 10.16 mm,
 * EIA standard size) unturned on the fitted grid, walls on grid lines. Checked: the observed order of
 * convergence, fitted by least squares to log error against log h, for TE10, TE20, TE01 and TM11.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class RotatedRectangleCutoffTest {

    private static final double A = 0.020;
    private static final double B = 0.009;
    private static final double WR90_A = 0.02286;
    private static final double WR90_B = 0.01016;

    private final CrossSection turned = Shapes.rotatedRectangle(A, B, 0.4e-3, -0.3e-3, Math.toRadians(30));
    private final CrossSection wr90 = Shapes.rectangle(WR90_A, WR90_B);
    private final Map<String, ModeSet> solves = new HashMap<>();

    private static double closedForm(double a, double b, int m, int n) {
        return Math.PI * Math.hypot(m / a, n / b);
    }

    private ModeSet solve(CrossSection section, TensorGrid grid, String key) {
        return solves.computeIfAbsent(key, k -> ModeSolver.solveOnGrid(section, grid,
                new SolveSettings(6, EnumSet.allOf(ModeFamily.class), 100, Double.NaN, false, 2), SolveProgress.SILENT));
    }

    private static double kc(ModeSet set, ModeFamily family, int index) {
        return set.modes().stream().filter(m -> m.family() == family).skip(index - 1).findFirst().orElseThrow()
                .cutoffWavenumber();
    }

    /** Fitted order for the {@code index}-th mode of {@code family}, h being the larger cell side. */
    private static double order(ModeSet[] sets, ModeFamily family, int index, double exact) {
        SimpleRegression fit = new SimpleRegression();
        for (ModeSet s : sets) {
            double h = Math.max(s.grid().cellWidth(), s.grid().cellHeight());
            fit.addData(Math.log(h), Math.log(Math.abs(kc(s, family, index) - exact) / exact));
        }
        return fit.getSlope();
    }

    private void assertSecondOrder(ModeSet[] sets, double a, double b) {
        // TE family in ascending order: TE10, TE20, TE01 (both rectangles have 2a/b > 2 > a/b); TM: TM11 first
        double te10 = order(sets, ModeFamily.TE, 1, closedForm(a, b, 1, 0));
        double te20 = order(sets, ModeFamily.TE, 2, closedForm(a, b, 2, 0));
        double te01 = order(sets, ModeFamily.TE, 3, closedForm(a, b, 0, 1));
        double tm11 = order(sets, ModeFamily.TM, 1, closedForm(a, b, 1, 1));
        assertTrue(te10 >= 1.9, "TE10 order " + te10);
        assertTrue(te20 >= 1.9, "TE20 order " + te20);
        assertTrue(te01 >= 1.9, "TE01 order " + te01);
        assertTrue(tm11 >= 1.9, "TM11 order " + tm11);
    }

    @Test
    @DisplayName("A rectangle turned 30° to the grid converges at second order in TE10, TE20, TE01 and TM11")
    void turnedRectangleConvergesAtSecondOrder() {
        // measured relative errors at 50/100/200/400 cells: TE10 1.24e-4/3.08e-5/7.68e-6/1.91e-6,
        // TE20 4.98e-4/1.23e-4/3.07e-5/7.66e-6, TE01 6.17e-4/1.53e-4/3.80e-5/9.47e-6,
        // TM11 8.79e-4/2.21e-4/5.54e-5/1.39e-5, all below the exact value; fitted orders 1.995 (TM11) to 2.009.
        // Corner cut cells show no erratic behaviour: successive ratios are 3.98–4.03.
        int[] cells = {50, 100, 200, 400};
        ModeSet[] sets = new ModeSet[cells.length];
        for (int k = 0; k < cells.length; k++) {
            sets[k] = solve(turned, TensorGrid.shifted(turned.bounds(), cells[k], 0.37, 0.61), "turned " + cells[k]);
        }
        assertSecondOrder(sets, A, B);
    }

    @Test
    @DisplayName("WR-90 on the fitted grid, walls on grid lines, converges at second order in TE10, TE20, TE01 and TM11")
    void wr90OnGridLinesConvergesAtSecondOrder() {
        // b/a = 10.16/22.86 = 4/9 exactly, so multiples of 9 cells give square cells that halve exactly
        // measured fitted orders over 45/90/180 cells: TE10, TE20, TE01, TM11 all 2.00
        int[] cells = {45, 90, 180};
        ModeSet[] sets = new ModeSet[cells.length];
        for (int k = 0; k < cells.length; k++) {
            sets[k] = solve(wr90, TensorGrid.fitted(wr90.bounds(), cells[k]), "wr90 " + cells[k]);
        }
        assertSecondOrder(sets, WR90_A, WR90_B);
    }
}
