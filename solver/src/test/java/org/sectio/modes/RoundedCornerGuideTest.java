package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.fitting.PolynomialCurveFitter;
import org.apache.commons.math3.fitting.WeightedObservedPoints;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;
import org.sectio.operator.LatticePencil;

/**
 * The "rounded_rectangular" family on WR-90's inner size (a = 22.86 mm, b = 10.16 mm), from the plain
 * rectangle (radius 0) to the stadium (radius b/2). Outside references:
 * <ul>
 *   <li>radius 0: the "rectangular" family itself, on the same grid, bit for bit;</li>
 *   <li>small radii: the cavity shape perturbation (Pozar, Microwave Engineering, 4th ed., §6.8, from
 *       memory): Δω/ω = ∫ΔV (μ|H|² − ε|E|²) / ∫V (μ|H|² + ε|E|²). TE10 at cutoff has Hz ∝ sin(πx/a),
 *       largest and with Ey = 0 in the corners, so metal filling the four corner pieces, each of area
 *       (1 − π/4) r², raises the cutoff by Δkc/kc = 4 (1 − π/4) r² / (a b) to first order;</li>
 *   <li>the stadium: its lowest Dirichlet eigenvalue (TM1) between those of the enclosing and the
 *       inscribed rectangle (domain monotonicity; Courant &amp; Hilbert, Methods of Mathematical
 *       Physics I, §VI.2), and its value by the method of particular solutions (Betcke &amp; Trefethen,
 *       SIAM Review 47, 2005), see {@link StadiumParticularSolutions}.</li>
 * </ul>
 */
class RoundedCornerGuideTest {

    private static final double A = 22.86e-3;
    private static final double B = 10.16e-3;

    private static GuideSection rounded(double radius) {
        return GuideFamilies.byName("rounded_rectangular").build(Map.of("corner_radius", radius));
    }

    private static SolveSettings settings(int modes, EnumSet<ModeFamily> families, boolean estimate) {
        return new SolveSettings(modes, families, 200, Double.NaN, estimate, 2);
    }

    private static Mode find(ModeSet set, ModeFamily family, int index) {
        return set.modes().stream().filter(m -> m.family() == family && m.index() == index).findFirst().orElseThrow();
    }

    @Test
    @DisplayName("A corner radius of 0 gives the rectangle's grid, pencils and cutoffs bit for bit")
    void aZeroRadiusIsTheRectangleBitForBit() {
        GuideSection rectangle = GuideFamilies.byName("rectangular").buildDefault();
        GuideSection zero = rounded(0);
        TensorGrid grid = GridPlanner.plan(rectangle, 200);
        TensorGrid zeroGrid = GridPlanner.plan(zero, 200);
        assertArrayEquals(grid.xLines(), zeroGrid.xLines(), 0.0);
        assertArrayEquals(grid.yLines(), zeroGrid.yLines(), 0.0);
        for (ModeFamily family : List.of(ModeFamily.TE, ModeFamily.TM)) {
            LatticePencil p = FamilySolver.pencil(family, CutCells.of(rectangle, grid));
            LatticePencil q = FamilySolver.pencil(family, CutCells.of(zero, grid));
            assertArrayEquals(p.mass(), q.mass(), 0.0, family + " mass");
            int nz = p.stiffness().nz_length;
            assertEquals(nz, q.stiffness().nz_length, family + " stiffness entries");
            assertArrayEquals(Arrays.copyOf(p.stiffness().nz_values, nz), Arrays.copyOf(q.stiffness().nz_values, nz), 0.0);
            assertArrayEquals(Arrays.copyOf(p.stiffness().nz_rows, nz), Arrays.copyOf(q.stiffness().nz_rows, nz));
            assertArrayEquals(p.stiffness().col_idx, q.stiffness().col_idx);
        }
        SolveSettings six = settings(6, EnumSet.of(ModeFamily.TE, ModeFamily.TM), false);
        List<Mode> plain = ModeSolver.solveOnGrid(rectangle, grid, six, SolveProgress.SILENT).modes();
        List<Mode> round = ModeSolver.solveOnGrid(zero, grid, six, SolveProgress.SILENT).modes();
        for (int k = 0; k < 6; k++) {
            assertEquals(plain.get(k).label(), round.get(k).label());
            assertEquals(plain.get(k).cutoffWavenumber(), round.get(k).cutoffWavenumber(), 0.0, plain.get(k).label());
        }
    }

    @Test
    @DisplayName("TE10's cutoff rises strictly and smoothly with the corner radius, 0 … 2 mm in 0.05 mm steps, as the shape perturbation says")
    void te10RisesStrictlyAndSmoothlyWithTheRadius() {
        int steps = 40;
        double step = 0.05e-3;
        double[] radius = new double[steps + 1];
        double[] kc = new double[steps + 1];
        for (int i = 0; i <= steps; i++) {
            radius[i] = i * step;
            kc[i] = ModeSolver.solve(rounded(radius[i]), settings(1, EnumSet.of(ModeFamily.TE), false),
                    SolveProgress.SILENT).modes().get(0).cutoffWavenumber();
        }
        WeightedObservedPoints points = new WeightedObservedPoints();
        double smallestStep = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= steps; i++) {
            points.add(radius[i] * 1e3, kc[i] / kc[0] - 1);
            if (i > 0) {
                double change = (kc[i] - kc[i - 1]) / kc[0];
                assertTrue(change > 0, String.format(Locale.ROOT, "TE10 falls from r = %.2f to %.2f mm: %.10f → %.10f",
                        radius[i - 1] * 1e3, radius[i] * 1e3, kc[i - 1], kc[i]));
                smallestStep = Math.min(smallestStep, change);
            }
        }
        // measured at 200 cells: smallest step change 9.24e-6 (0 → 0.05 mm), largest 7.3e-4; the
        // residual of a degree-5 fit is 2.3e-8, 0.25 % of the smallest step: no jitter from where the arcs
        // fall on the grid (the brief's requirement is ≤ 10 %)
        PolynomialFunction fit = new PolynomialFunction(PolynomialCurveFitter.create(5).fit(points.toList()));
        double worstResidual = 0;
        for (int i = 0; i <= steps; i++) {
            worstResidual = Math.max(worstResidual, Math.abs(kc[i] / kc[0] - 1 - fit.value(radius[i] * 1e3)));
        }
        assertTrue(worstResidual <= 0.01 * smallestStep, String.format(Locale.ROOT,
                "jitter: fit residual %.3e against the smallest step %.3e", worstResidual, smallestStep));
        // first-order shape perturbation Δkc/kc = 4 (1 − π/4) r² / (a b); measured deviation of the
        // solver's change from it: 0.03 % at 0.05 mm growing to 0.27 % at 2 mm (the next order, ∝ r⁴)
        for (int i = 1; i <= steps; i++) {
            double perturbation = 4 * (1 - Math.PI / 4) * radius[i] * radius[i] / (A * B);
            double change = kc[i] / kc[0] - 1;
            assertEquals(perturbation, change, 0.005 * perturbation, String.format(Locale.ROOT, "r = %.2f mm", radius[i] * 1e3));
        }
    }

    @Test
    @DisplayName("The stadium's TM1 cutoff lies between its rectangles' and agrees with the method of particular solutions")
    void theStadiumTm1AgreesWithParticularSolutions() {
        double outer = Math.PI * Math.hypot(1 / A, 1 / B);
        double inner = Math.PI * Math.hypot(1 / (A - B), 1 / B);
        double fewer = new StadiumParticularSolutions((A - B) / 2, B / 2, 30).lowestDirichletWavenumber(outer, inner);
        double reference = new StadiumParticularSolutions((A - B) / 2, B / 2, 40).lowestDirichletWavenumber(outer, inner);
        // measured: 30 and 40 terms give 342.53808 and 342.53819 rad/m, 3.3e-7 apart
        assertEquals(reference, fewer, 2e-6 * reference, "particular solutions not settled");
        GuideSection stadium = rounded(B / 2);
        EnumSet<ModeFamily> tm = EnumSet.of(ModeFamily.TM);
        Mode at200 = ModeSolver.solve(stadium, settings(1, tm, true), SolveProgress.SILENT).modes().get(0);
        Mode at400 = ModeSolver.solve(stadium, settings(1, tm, true).withCellsAcross(400), SolveProgress.SILENT)
                .modes().get(0);
        assertTrue(at200.cutoffWavenumber() > outer && at200.cutoffWavenumber() < inner, "outside the rectangles' bracket");
        double error200 = Math.abs(at200.cutoffWavenumber() / reference - 1);
        double error400 = Math.abs(at400.cutoffWavenumber() / reference - 1);
        double extrapolated = at400.cutoffWavenumber() + (at400.cutoffWavenumber() - at200.cutoffWavenumber()) / 3;
        // measured: errors 4.8e-5 (200 cells) and 1.2e-5 (400 cells), order 2.0; the two-grid
        // extrapolation lies 4e-7 from the particular solutions; estimate/true 2.0 on both grids
        assertTrue(error200 < 6e-5 && error400 < 1.5e-5, "errors " + error200 + ", " + error400);
        assertEquals(reference, extrapolated, 1.5e-6 * reference, "extrapolated");
        for (Mode m : List.of(at200, at400)) {
            double trueError = Math.abs(m.cutoffWavenumber() / reference - 1);
            double ratio = m.relativeErrorEstimate() / trueError;
            assertTrue(ratio >= 1 && ratio <= 10, "estimate/true " + ratio);
        }
    }

    @Test
    @DisplayName("On a guide with 2 mm corners the error estimate of the four lowest modes lies between 1 and 10 times the true error")
    void theEstimateBoundsTheErrorWithRoundedCorners() {
        GuideSection section = rounded(2e-3);
        EnumSet<ModeFamily> both = EnumSet.of(ModeFamily.TE, ModeFamily.TM);
        ModeSet coarse = ModeSolver.solve(section, settings(4, both, true).withCellsAcross(100), SolveProgress.SILENT);
        ModeSet middle = ModeSolver.solve(section, settings(4, both, true), SolveProgress.SILENT);
        // self-convergence reference: order-2 extrapolation of 400 and 800 cells (not an outside value;
        // the stadium test above is the outside check). Its own estimate: ≤ 1.2e-5 at 800 cells.
        ModeSet fine = ModeSolver.solve(section, settings(4, both, false).withCellsAcross(400), SolveProgress.SILENT);
        ModeSet finest = ModeSolver.solve(section, settings(4, both, false).withCellsAcross(800), SolveProgress.SILENT);
        StringBuilder bad = new StringBuilder();
        for (Mode m : finest.modes()) {
            double k4 = find(fine, m.family(), m.index()).cutoffWavenumber();
            double reference = m.cutoffWavenumber() + (m.cutoffWavenumber() - k4) / 3;
            for (ModeSet set : List.of(coarse, middle)) {
                Mode x = find(set, m.family(), m.index());
                double trueError = Math.abs(x.cutoffWavenumber() / reference - 1);
                double ratio = x.relativeErrorEstimate() / trueError;
                if (!(ratio >= 1 && ratio <= 10)) {
                    bad.append(String.format(Locale.ROOT, "%s at %d cells: true %.2e, estimate %.2e%n", m.label(),
                            set.grid().cellsX(), trueError, x.relativeErrorEstimate()));
                }
            }
        }
        assertTrue(bad.isEmpty(), bad.toString());
    }
}
