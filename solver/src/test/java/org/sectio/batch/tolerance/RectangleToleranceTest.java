package org.sectio.batch.tolerance;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.batch.size.GuidePoint;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;

/**
 * Sensitivities, worst case and Monte Carlo on the WR-90 rectangle (a = 22.86 mm, b = 10.16 mm, EIA),
 * whose TE10 cutoff fc = c/(2a) is independent of b (Pozar, Microwave Engineering, 4th ed., §3.3), so
 * dfc/da = −c/(2a²) and dfc/db = 0. Coarse grid (80 cells across): its TE10 estimate is 1.7e-4.
 */
class RectangleToleranceTest {

    private static final double A_MM = 22.86;
    private static GuidePointSolver solver;
    private static SensitivityAnalysis.Result sensitivities;
    private static final List<ParameterTolerance> TOLERANCES = List.of(
            new ParameterTolerance("width", 0.05, ParameterTolerance.Distribution.NORMAL),
            new ParameterTolerance("height", 0.05, ParameterTolerance.Distribution.UNIFORM));

    @BeforeAll
    static void solve() throws Exception {
        solver = new GuidePointSolver(GuideTemplate.of(GuideFamilies.byName("rectangular")), Map.of(),
                new SolveSettings(6, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 80, Double.NaN, true, 1));
        GuidePoint nominal = solver.solve(Map.of());
        QuantityPlan plan = QuantityPlan.of(nominal, 4, new double[0], AnalysisSettings.defaults());
        sensitivities = SensitivityAnalysis.run(solver, nominal, plan, List.of("width", "height"), 2);
    }

    @Test
    @DisplayName("TE10 cutoff against width: dfc/da = −c/(2a²) (Pozar §3.3), by finite difference and Hadamard formula")
    void te10AgainstWidth() {
        double exact = -ModeSolver.SPEED_OF_LIGHT / (2 * A_MM * A_MM * 1e-3); // Hz per mm
        SensitivityAnalysis.Parameter width = sensitivities.parameters().get(0);
        double fd = width.derivatives()[0];
        double hadamard = width.hadamard()[0];
        System.out.printf("TE10 vs width: exact %.6e Hz/mm, FD %.6e (%.2e), Hadamard %.6e (%.2e), step %.4g mm%n", exact,
                fd, Math.abs(fd / exact - 1), hadamard, Math.abs(hadamard / exact - 1), width.step());
        // measured at 80 cells: FD 6.6e-5, Hadamard 6.5e-5. Both carry the grid's relative error of fc (with
        // h ∝ a that error is the same at every width, so it scales the derivative), which the estimate bounds
        double estimate = sensitivities.nominalErrors()[0] / sensitivities.nominalValues()[0];
        assertEquals(exact, fd, estimate * Math.abs(exact));
        assertEquals(exact, hadamard, estimate * Math.abs(exact));
    }

    @Test
    @DisplayName("TE10 cutoff does not depend on the height (Pozar §3.3): FD below its noise, Hadamard zero")
    void te10AgainstHeight() {
        SensitivityAnalysis.Parameter height = sensitivities.parameters().get(1);
        double noiseBound = sensitivities.nominalErrors()[0] / (2 * height.step());
        assertTrue(Math.abs(height.derivatives()[0]) <= noiseBound, "dfc/db = " + height.derivatives()[0]
                + " Hz/mm against the noise bound " + noiseBound);
        // on the broad walls Hz = cos(πx/a): ∫ (|∂Hz/∂x|² − kc² Hz²) dx = 0 over the wall; the wall fits leave
        // a residue, measured 1.4e-3 of the width's derivative
        assertEquals(0, height.hadamard()[0], 3e-3 * Math.abs(sensitivities.parameters().get(0).hadamard()[0]));
    }

    @Test
    @DisplayName("Worst case by corner enumeration equals the extremes over the separately solved corners, and fc = c/2a there (Pozar §3.3)")
    void cornersAreTheExtremes() throws Exception {
        WorstCase.Result w = WorstCase.of(solver, sensitivities, TOLERANCES, 2);
        assertTrue(w.byCorners());
        assertEquals(4, w.corners().size());
        double low = Double.POSITIVE_INFINITY;
        double high = Double.NEGATIVE_INFINITY;
        for (double da : new double[] {-0.05, 0.05}) {
            for (double db : new double[] {-0.05, 0.05}) {
                double fc = solver.solve(Map.of("width", A_MM + da, "height", 10.16 + db)).summary().singleModeLowHz();
                low = Math.min(low, fc);
                high = Math.max(high, fc);
            }
        }
        int fc1 = sensitivities.plan().quantities().size() - 2;
        assertEquals(low, w.low()[fc1], 0.0, "the smallest corner value, bit for bit");
        assertEquals(high, w.high()[fc1], 0.0, "the largest corner value, bit for bit");
        assertEquals(1, w.lowCorner()[fc1][0], "the lowest fc1 is at the widest guide");
        assertEquals(-1, w.highCorner()[fc1][0], "the highest fc1 is at the narrowest guide");
        double closedLow = ModeSolver.SPEED_OF_LIGHT / (2 * (A_MM + 0.05) * 1e-3);
        double closedHigh = ModeSolver.SPEED_OF_LIGHT / (2 * (A_MM - 0.05) * 1e-3);
        double err = 3 * sensitivities.nominalErrors()[fc1];
        assertEquals(closedLow, w.low()[fc1], err);
        assertEquals(closedHigh, w.high()[fc1], err);
        // the linear estimate leaves out the curvature of c/2a: fc (t/a)² = 31 kHz at t = 0.05 mm
        double curvature = closedLow * Math.pow(0.05 / A_MM, 2);
        assertEquals(w.low()[fc1], w.linearLow()[fc1], 2 * curvature, "the linear estimate agrees to second order");
        assertEquals(w.high()[fc1], w.linearHigh()[fc1], 2 * curvature, "the linear estimate agrees to second order");
    }

    @Test
    @DisplayName("Monte Carlo with a fixed seed is reproducible, and the linearised run agrees with full solves for small tolerances")
    void monteCarloIsReproducibleAndLinearAgrees() {
        MonteCarlo.Result lin1 = MonteCarlo.run(solver, sensitivities, TOLERANCES, 2000, 7, false, 8.2e9, 12.4e9, 2);
        MonteCarlo.Result lin2 = MonteCarlo.run(solver, sensitivities, TOLERANCES, 2000, 7, false, 8.2e9, 12.4e9, 1);
        for (int s = 0; s < lin1.values().size(); s++) {
            assertArrayEquals(lin1.values().get(s), lin2.values().get(s), 0.0);
        }
        MonteCarlo.Result full1 = MonteCarlo.run(solver, sensitivities, TOLERANCES, 24, 11, true, 8.2e9, 12.4e9, 2);
        MonteCarlo.Result full2 = MonteCarlo.run(solver, sensitivities, TOLERANCES, 24, 11, true, 8.2e9, 12.4e9, 1);
        MonteCarlo.Result linSame = MonteCarlo.run(solver, sensitivities, TOLERANCES, 24, 11, false, 8.2e9, 12.4e9, 1);
        List<Double> gaps = new ArrayList<>();
        for (int s = 0; s < 24; s++) {
            assertArrayEquals(full1.values().get(s), full2.values().get(s), 0.0, "same seed, other thread count");
            for (int k = 0; k < full1.values().get(s).length; k++) {
                double full = full1.values().get(s)[k];
                double lin = linSame.values().get(s)[k];
                gaps.add(Math.abs(full - lin) / full);
            }
        }
        double worst = gaps.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
        System.out.printf("linear vs full Monte Carlo, ±0.05 mm: worst relative gap %.2e over %d values%n", worst,
                gaps.size());
        // the quadratic term of fc = c/2a over δa ≤ 0.05 mm is (δa/a)² ≈ 5e-6; the solver noise adds about
        // a tenth of its 1.7e-4 estimate
        assertTrue(worst < 5e-5, "worst gap " + worst);
        // the share covering 8.2 … 12.4 GHz in closed form: 1.25 fc1 ≤ 8.2 GHz and 0.95 fc2 ≥ 12.4 GHz hold for
        // a_low ≤ a ≤ a_high with fc1 = c/2a, fc2 = c/a (Pozar §3.3), each scaled by the grid's own bias, and
        // a normal with σ = 0.05/3 mm; the binomial spread of 2000 parts is √(p(1 − p)/2000)
        double c = ModeSolver.SPEED_OF_LIGHT * 1e3; // mm/s
        double[] q0 = sensitivities.nominalValues();
        int fc1 = q0.length - 2;
        double bias1 = q0[fc1] / (c / (2 * A_MM));
        double bias2 = q0[fc1 + 1] / (c / A_MM);
        double aLow = bias1 * 1.25 * c / (2 * 8.2e9);
        double aHigh = bias2 * 0.95 * c / 12.4e9;
        NormalDistribution width = new NormalDistribution(A_MM, 0.05 / 3);
        double expected = width.cumulativeProbability(aHigh) - width.cumulativeProbability(aLow);
        double spread = Math.sqrt(expected * (1 - expected) / 2000);
        System.out.printf("covering share %.4f, closed form %.4f ± %.4f%n", lin1.coveringShare(), expected, spread);
        assertEquals(expected, lin1.coveringShare(), 4 * spread);
    }
}
