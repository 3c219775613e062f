package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.TensorGrid;

/**
 * Every returned mode is a converged eigenpair of its discrete pencil, and the one eigenpair that is
 * not a mode, the constant TE field with kc = 0 (the Neumann problem's null space), never appears.
 * The lowest TE mode of a circle must therefore be TE11, kc·R = j′11 = 1.8411838 (Abramowitz &amp;
 * Stegun, Handbook of Mathematical Functions, Table 9.5), and the lowest of a rectangle TE10, kc = π/a
 * (Pozar, Microwave Engineering, 4th ed., §3.3).
 */
class ResidualAndSpectrumTest {

    /**
     * Bound on the relative residual ‖Ax − λMx‖ / (‖Ax‖ + |λ|‖Mx‖). Measured worst over the solves
     * below: 3.5e-12 (circle, 200 cells; 6.6e-13 at 100, 2.8e-12 turned and 2.5e-12 unturned rectangle at 200); it grows with the grid (9e-12 for a turned rectangle at 400).
     */
    private static final double RESIDUAL_BOUND = 2e-11;

    private static ModeSet solve(CrossSection section, TensorGrid grid) {
        return ModeSolver.solveOnGrid(section, grid,
                new SolveSettings(12, EnumSet.allOf(ModeFamily.class), 100, Double.NaN, false, 2), SolveProgress.SILENT);
    }

    private static void assertConverged(ModeSet set) {
        for (Mode m : set.modes()) {
            assertTrue(m.relativeResidual() <= RESIDUAL_BOUND, m.label() + " residual " + m.relativeResidual());
        }
    }

    @Test
    @DisplayName("Every mode of a circle at 100 and 200 cells has relative residual below 2e-11 and the lowest TE mode is TE11, not the constant")
    void circleModesAreConvergedAndStartAtTe11() {
        double r = 0.010;
        CrossSection circle = Shapes.circle(r, 0.3e-3, -0.2e-3);
        for (int n : new int[] {100, 200}) {
            ModeSet set = solve(circle, TensorGrid.shifted(circle.bounds(), n, 0.37, 0.61));
            assertConverged(set);
            Mode lowestTe = set.modes().stream().filter(m -> m.family() == ModeFamily.TE).findFirst().orElseThrow();
            // measured error of TE11 at 100 cells 5.0e-5
            assertEquals(1.8411838, lowestTe.cutoffWavenumber() * r, 1e-4 * 1.8411838, "lowest TE mode at " + n);
            assertEquals(set.modes().get(0), lowestTe, "the lowest mode overall is TE11");
        }
    }

    @Test
    @DisplayName("Every mode of a turned and an unturned rectangle has relative residual below 2e-11 and the lowest is TE10, not the constant")
    void rectangleModesAreConvergedAndStartAtTe10() {
        double a = 0.020;
        CrossSection turned = Shapes.rotatedRectangle(a, 0.009, 0.4e-3, -0.3e-3, Math.toRadians(30));
        CrossSection straight = Shapes.rectangle(a, 0.009);
        for (ModeSet set : new ModeSet[] {solve(turned, TensorGrid.shifted(turned.bounds(), 200, 0.37, 0.61)),
            solve(straight, TensorGrid.fitted(straight.bounds(), 200))}) {
            assertConverged(set);
            Mode lowest = set.modes().get(0);
            assertEquals(ModeFamily.TE, lowest.family());
            // measured error of TE10 at 200 cells: 7.7e-6 turned, 1.0e-5 unturned
            assertEquals(Math.PI / a, lowest.cutoffWavenumber(), 3e-5 * Math.PI / a, set.sectionName());
        }
    }
}
