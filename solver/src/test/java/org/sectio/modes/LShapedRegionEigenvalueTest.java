package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.mesh.CornerShapes;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;

/**
 * The lowest Dirichlet eigenvalue of the L-shaped region of three unit squares, λ1 = 9.6397238440
 * (Fox, Henrici &amp; Moler, SIAM J. Numer. Anal. 4 (1967) 89–102, their bounds for the L-shaped
 * membrane; to 13 digits 9.6397238440219 in Betcke &amp; Trefethen, SIAM Review 47 (2005) 469–491, the
 * L-shaped region example),
 * solved as the TM family (Ez = 0 on the wall; kc² = λ1 with lengths in metres). Its eigenfunction
 * goes like r^(2/3) at the 270° corner, so on a uniform grid the eigenvalue converges only as
 * h^(4/3); on the planned grid, graded toward the corner, it converges as h² again, and the error
 * estimate, which assumes h², becomes honest. The L is turned by 90° and moved off the origin.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class LShapedRegionEigenvalueTest {

    /** λ1 of the L-shaped region of unit squares, m⁻². */
    private static final double LAMBDA_1 = 9.6397238440;

    private static final int[] CELLS = {80, 160, 320};

    private final CrossSection l = CornerShapes.lShape();
    private final Map<Integer, Mode> graded = new HashMap<>();
    private final Map<Integer, Mode> uniform = new HashMap<>();

    private Mode lowestTm(TensorGrid grid, boolean estimate) {
        return ModeSolver.solveOnGrid(l, grid, new SolveSettings(1, EnumSet.of(ModeFamily.TM), 100, Double.NaN,
                estimate, 2), SolveProgress.SILENT).modes().get(0);
    }

    /** On the planned grid, with the error estimate (which also solves on the coarse plan). */
    private Mode graded(int cells) {
        return graded.computeIfAbsent(cells, n -> lowestTm(GridPlanner.plan(l, n), true));
    }

    /** On the uniform grid fitted to the box: the corner lies on grid lines, but cells are not graded. */
    private Mode uniform(int cells) {
        return uniform.computeIfAbsent(cells, n -> lowestTm(TensorGrid.fitted(l.bounds(), n), false));
    }

    private static double eigenvalueError(Mode m) {
        double kc = m.cutoffWavenumber();
        return Math.abs(kc * kc - LAMBDA_1) / LAMBDA_1;
    }

    /** Least-squares slope of log(error) against log(h), h = 2 m / cells. */
    private static double order(Map<Integer, Mode> solves) {
        SimpleRegression fit = new SimpleRegression();
        for (int n : CELLS) {
            fit.addData(Math.log(2.0 / n), Math.log(eigenvalueError(solves.get(n))));
        }
        return fit.getSlope();
    }

    @Test
    @DisplayName("On the graded grid of 320 base cells across, λ1 is within 1e-5 of the published value")
    void gradedGridGivesFiveDigits() {
        // measured: relative error of λ1 4.74e-6 (484 × 484 lines, 175 k unknowns); the uniform 320-cell
        // grid is at 2.41e-4
        assertEquals(LAMBDA_1, Math.pow(graded(320).cutoffWavenumber(), 2), 1e-5 * LAMBDA_1);
    }

    @Test
    @DisplayName("Grading restores second order: fitted order about 2 graded, about 4/3 uniform (80, 160, 320 cells)")
    void gradingRestoresSecondOrder() {
        for (int n : CELLS) {
            graded(n);
            uniform(n);
        }
        double gradedOrder = order(graded);
        double uniformOrder = order(uniform);
        // measured: graded 2.09 (errors 8.63e-5, 1.99e-5, 4.74e-6), uniform 1.23 (1.32e-3, 5.76e-4,
        // 2.41e-4; local orders 1.20 and 1.26, rising toward the theoretical 2λ = 4/3)
        assertTrue(gradedOrder >= 1.9, String.format(Locale.ROOT, "graded order %.3f", gradedOrder));
        assertTrue(uniformOrder >= 1.1 && uniformOrder <= 1.45,
                String.format(Locale.ROOT, "uniform order %.3f, expected near 4/3", uniformOrder));
    }

    @Test
    @DisplayName("On the graded grids the error estimate of kc lies between 1 and 10 times the true error")
    void errorEstimateIsHonestOnGradedGrids() {
        // measured ratios estimate / true error of kc at 80, 160, 320: 2.20, 2.13, 2.09
        for (int n : CELLS) {
            Mode m = graded(n);
            double trueError = Math.abs(m.cutoffWavenumber() - Math.sqrt(LAMBDA_1)) / Math.sqrt(LAMBDA_1);
            double ratio = m.relativeErrorEstimate() / trueError;
            assertTrue(ratio >= 1 && ratio <= 10, String.format(Locale.ROOT,
                    "%d cells: true %.3e, estimate %.3e, ratio %.2f", n, trueError, m.relativeErrorEstimate(), ratio));
        }
    }
}
