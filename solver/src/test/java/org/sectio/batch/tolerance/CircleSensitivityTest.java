package org.sectio.batch.tolerance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.batch.size.GuidePoint;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;

/**
 * Sensitivities of a circular guide's cutoffs to its radius. Closed form (Pozar, Microwave Engineering,
 * 4th ed., §3.4): kc = p/R with p a Bessel zero (p'11 = 1.8412 for TE11, p01 = 2.4048 for TM01), so
 * dfc/dR = −fc/R exactly, for every mode. The finite difference and the boundary-perturbation
 * (Hadamard) formula (Harrington, Time-Harmonic Electromagnetic Fields, §7) are each checked against it
 * and against one another.
 */
class CircleSensitivityTest {

    private static SensitivityAnalysis.Result result;
    private static double radiusMm;

    @BeforeAll
    static void solve() throws Exception {
        GuideTemplate circle = GuideTemplate.of(GuideFamilies.byName("circular"));
        radiusMm = circle.parameters().values().get("radius");
        GuidePointSolver solver = new GuidePointSolver(circle, Map.of(),
                new SolveSettings(6, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 160, Double.NaN, true, 1));
        GuidePoint nominal = solver.solve(Map.of());
        QuantityPlan plan = QuantityPlan.of(nominal, 4, new double[0], AnalysisSettings.defaults());
        result = SensitivityAnalysis.run(solver, nominal, plan, List.of("radius"), 2);
    }

    private static int index(String name) {
        List<QuantityPlan.Quantity> qs = result.plan().quantities();
        for (int k = 0; k < qs.size(); k++) {
            if (qs.get(k).name().equals(name)) {
                return k;
            }
        }
        throw new AssertionError("no quantity " + name + " in " + qs);
    }

    private static void check(String name, double fdTolerance, double hadamardTolerance) {
        int k = index(name);
        SensitivityAnalysis.Parameter p = result.parameters().get(0);
        double exact = -result.nominalValues()[k] / radiusMm; // Hz per mm
        double fd = p.derivatives()[k];
        double hadamard = p.hadamard()[k];
        System.out.printf("%s: exact %.6e, FD %.6e (%.2e), Hadamard %.6e (%.2e), FD vs Hadamard %.2e, step %.4g mm,"
                + " signal/noise %.0f%n", name, exact, fd, Math.abs(fd / exact - 1), hadamard,
                Math.abs(hadamard / exact - 1), Math.abs(hadamard / fd - 1), p.step(), p.signalToNoise()[k]);
        assertEquals(exact, fd, fdTolerance * Math.abs(exact), name + " finite difference against −fc/R");
        assertEquals(exact, hadamard, hadamardTolerance * Math.abs(exact), name + " Hadamard against −fc/R");
        assertEquals(fd, hadamard, (fdTolerance + hadamardTolerance) * Math.abs(exact), name + " Hadamard against FD");
        assertTrue(p.signalToNoise()[k] >= SensitivityAnalysis.SIGNAL_TO_NOISE * 0.99, "the step moves the cutoff by"
                + " at least " + SensitivityAnalysis.SIGNAL_TO_NOISE + " times its error");
    }

    @Test
    @DisplayName("TE11: finite difference and Hadamard formula give dfc/dR = −fc/R (Pozar §3.4)")
    void te11() {
        check("fc TE 1", 1e-3, 1e-3);
    }

    @Test
    @DisplayName("TM01: finite difference and Hadamard formula give dfc/dR = −fc/R (Pozar §3.4)")
    void tm01() {
        check("fc TM 1", 1e-3, 1e-2);
    }
}
