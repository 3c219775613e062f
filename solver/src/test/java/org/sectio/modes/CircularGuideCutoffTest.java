package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.BesselJ;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.TensorGrid;

/**
 * Cutoffs of a circular guide against the closed form: TM_nm has kc·R = j_nm, the m-th zero of J_n,
 * and TE_nm has kc·R = j′_nm, the m-th zero of J_n′ (Pozar, Microwave Engineering, 4th ed., §3.4).
 * The zeros are found here with Commons Math's BesselJ and a bracketing Brent solver, and that root
 * finder is itself checked against Abramowitz &amp; Stegun, Handbook of Mathematical Functions,
 * Table 9.5. The circle is off-centre on a shifted grid so that no symmetry of the grid helps.
 * Checked: second-order convergence, the error at 200 cells, Richardson extrapolation, and that the
 * lowest ten modes are exactly the expected ones with their multiplicities (every n ≥ 1 mode is a
 * doublet).
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class CircularGuideCutoffTest {

    private static final double R = 0.010;
    private final CrossSection circle = Shapes.circle(R, 0.3e-3, -0.2e-3);
    private final Map<Integer, ModeSet> solves = new HashMap<>();
    private final Map<Integer, TensorGrid> grids = new HashMap<>();

    private TensorGrid grid(int cells) {
        return grids.computeIfAbsent(cells, n -> TensorGrid.shifted(circle.bounds(), n, 0.37, 0.61));
    }

    /** Ten lowest modes of both families on the shifted grid with {@code cells} across the diameter. */
    private ModeSet solve(int cells) {
        return solves.computeIfAbsent(cells, n -> ModeSolver.solveOnGrid(circle, grid(n),
                new SolveSettings(10, EnumSet.allOf(ModeFamily.class), n, Double.NaN, false, 2), SolveProgress.SILENT));
    }

    private static List<Mode> family(ModeSet set, ModeFamily family) {
        List<Mode> out = new ArrayList<>();
        for (Mode m : set.modes()) {
            if (m.family() == family) {
                out.add(m);
            }
        }
        return out;
    }

    /** kc·R of the {@code index}-th (1-based) mode of a family in the 10-mode solve. */
    private double kcR(int cells, ModeFamily f, int index) {
        return family(solve(cells), f).get(index - 1).cutoffWavenumber() * R;
    }

    /** The k-th positive root of f, bracketed by a scan in steps of 0.05 (zeros of J_n, J_n′ are ~π apart). */
    private static double positiveRoot(DoubleUnaryOperator f, int k) {
        BrentSolver brent = new BrentSolver(1e-15, 1e-14);
        double step = 0.05;
        int found = 0;
        for (double x = 0.5; x < 100; x += step) {
            if (f.applyAsDouble(x) * f.applyAsDouble(x + step) < 0 && ++found == k) {
                return brent.solve(200, f::applyAsDouble, x, x + step);
            }
        }
        throw new AssertionError("no root " + k + " below 100");
    }

    /** j_nm, the m-th positive zero of J_n. */
    static double besselZero(int n, int m) {
        return positiveRoot(x -> BesselJ.value(n, x), m);
    }

    /** j′_nm, the m-th positive zero of J_n′ = (J_{n−1} − J_{n+1}) / 2 (J_0′ = −J_1). */
    static double besselDerivativeZero(int n, int m) {
        return positiveRoot(x -> n == 0 ? -BesselJ.value(1, x) : 0.5 * (BesselJ.value(n - 1, x) - BesselJ.value(n + 1, x)), m);
    }

    /** Least-squares slope of log|error| against log h: the observed order of convergence. */
    private double observedOrder(ModeFamily f, int index, double exact, int... cells) {
        SimpleRegression fit = new SimpleRegression();
        for (int n : cells) {
            double error = Math.abs(kcR(n, f, index) - exact) / exact;
            fit.addData(Math.log(grid(n).largestStep()), Math.log(error));
        }
        return fit.getSlope();
    }

    @Test
    @DisplayName("The Bessel root finder reproduces j′11, j01 and j′01 of Abramowitz & Stegun Table 9.5 to 1e-7")
    void rootFinderReproducesTheHandbookTable() {
        assertEquals(1.8411838, besselDerivativeZero(1, 1), 1e-7);
        assertEquals(2.4048256, besselZero(0, 1), 1e-7);
        assertEquals(3.8317060, besselDerivativeZero(0, 1), 1e-7);
        // j11 = j′01: J_1 = −J_0′ (A&S 9.1.28)
        assertEquals(besselDerivativeZero(0, 1), besselZero(1, 1), 1e-12);
    }

    @Test
    @DisplayName("TE11, TM01 and TE01 converge at second order (least-squares fit over 50, 100, 200 cells)")
    void lowModesConvergeAtSecondOrder() {
        // measured fitted orders: TE11 2.004, TM01 1.990, TE01 2.001 (errors 2.0e-4 / 5.0e-5 / 1.24e-5 for TE11)
        double te11 = observedOrder(ModeFamily.TE, 1, besselDerivativeZero(1, 1), 50, 100, 200);
        double tm01 = observedOrder(ModeFamily.TM, 1, besselZero(0, 1), 50, 100, 200);
        double te01 = observedOrder(ModeFamily.TE, 5, besselDerivativeZero(0, 1), 50, 100, 200);
        assertTrue(te11 >= 1.9, "TE11 order " + te11);
        assertTrue(tm01 >= 1.9, "TM01 order " + tm01);
        assertTrue(te01 >= 1.9, "TE01 order " + te01);
    }

    @Test
    @DisplayName("At 200 cells across the diameter TE11 and TM01 are within 2e-5 of the Bessel zeros")
    void twoHundredCellsGiveTwoPartsIn1e5() {
        // measured relative errors at 200 cells: TE11 1.24e-5 (both of the doublet), TM01 1.37e-5;
        // over five grid shifts at most 1.42e-5
        double te11 = besselDerivativeZero(1, 1);
        double tm01 = besselZero(0, 1);
        assertEquals(te11, kcR(200, ModeFamily.TE, 1), 2e-5 * te11);
        assertEquals(te11, kcR(200, ModeFamily.TE, 2), 2e-5 * te11);
        assertEquals(tm01, kcR(200, ModeFamily.TM, 1), 2e-5 * tm01);
    }

    @Test
    @DisplayName("Richardson extrapolation of 100 and 200 cells (order 2) brings TE11 and TM01 within 5e-7")
    void richardsonExtrapolationRemovesTheLeadingError() {
        // measured extrapolated errors at this shift: TE11 4.0e-8 / 3.6e-8, TM01 9.5e-8, TE01 5.2e-8;
        // over five grid shifts the worst was 1.44e-7 (TM01), so the bound keeps 3x headroom
        double te11 = besselDerivativeZero(1, 1);
        double tm01 = besselZero(0, 1);
        double te01 = besselDerivativeZero(0, 1);
        assertEquals(te11, (4 * kcR(200, ModeFamily.TE, 1) - kcR(100, ModeFamily.TE, 1)) / 3, 5e-7 * te11);
        assertEquals(te11, (4 * kcR(200, ModeFamily.TE, 2) - kcR(100, ModeFamily.TE, 2)) / 3, 5e-7 * te11);
        assertEquals(tm01, (4 * kcR(200, ModeFamily.TM, 1) - kcR(100, ModeFamily.TM, 1)) / 3, 5e-7 * tm01);
        assertEquals(te01, (4 * kcR(200, ModeFamily.TE, 5) - kcR(100, ModeFamily.TE, 5)) / 3, 5e-7 * te01);
    }

    @Test
    @DisplayName("The TE11 doublet comes out as two modes whose fields are orthogonal in the cell-area inner product")
    void te11DoubletHasTwoOrthogonalFields() {
        List<Mode> te = family(solve(200), ModeFamily.TE);
        double[] u = te.get(0).field().values();
        double[] v = te.get(1).field().values();
        // TE fields sit at cell centres, so sample k is cell (k mod columns, k / columns); the discrete
        // eigenvectors are orthogonal in the mass matrix, diag(open cell area)
        CutCells cells = CutCells.of(circle, grid(200));
        int columns = te.get(0).field().columns();
        double uv = 0;
        double uu = 0;
        double vv = 0;
        int samples = 0;
        for (int k = 0; k < u.length; k++) {
            if (Double.isNaN(u[k]) || Double.isNaN(v[k])) {
                continue;
            }
            double w = cells.cellArea(k % columns, k / columns);
            uv += w * u[k] * v[k];
            uu += w * u[k] * u[k];
            vv += w * v[k] * v[k];
            samples++;
        }
        double cosine = uv / Math.sqrt(uu * vv);
        // measured: area-weighted cosine 2.7e-16; with equal weights it is 6.0e-5, because cut cells
        // have unequal areas, so equal weights are not the inner product the modes are orthogonal in
        assertTrue(Math.abs(cosine) < 1e-12, "area-weighted cosine between the TE11 pair " + cosine);
        assertTrue(samples > 25_000, "both fields cover the guide, " + samples + " samples");
    }

    @Test
    @DisplayName("The ten lowest modes are TE11×2, TM01, TE21×2, TE01, TM11×2, TE31×2: none missed, none doubled")
    void lowestTenModesAreTheExpectedOnesWithMultiplicity() {
        double[] expectedTe = {besselDerivativeZero(1, 1), besselDerivativeZero(1, 1), besselDerivativeZero(2, 1),
            besselDerivativeZero(2, 1), besselDerivativeZero(0, 1), besselDerivativeZero(3, 1), besselDerivativeZero(3, 1)};
        double[] expectedTm = {besselZero(0, 1), besselZero(1, 1), besselZero(1, 1)};
        // the next zeros are j21 = 5.1356 (TM21) and j′41 = 5.3176, well above j′31 = 4.2012
        assertTrue(besselZero(2, 1) > 1.2 * besselDerivativeZero(3, 1));
        List<Mode> te = family(solve(200), ModeFamily.TE);
        List<Mode> tm = family(solve(200), ModeFamily.TM);
        assertEquals(expectedTe.length, te.size(), "TE modes among the lowest ten");
        assertEquals(expectedTm.length, tm.size(), "TM modes among the lowest ten");
        // measured worst relative error at 200 cells among these: 6.0e-5 (TE31)
        for (int k = 0; k < expectedTe.length; k++) {
            assertEquals(expectedTe[k], te.get(k).cutoffWavenumber() * R, 1e-4 * expectedTe[k], "TE mode " + (k + 1));
        }
        for (int k = 0; k < expectedTm.length; k++) {
            assertEquals(expectedTm[k], tm.get(k).cutoffWavenumber() * R, 1e-4 * expectedTm[k], "TM mode " + (k + 1));
        }
    }
}
