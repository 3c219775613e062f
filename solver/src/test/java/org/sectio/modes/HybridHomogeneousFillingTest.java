package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.mesh.TensorGrid;
import org.sectio.physics.DielectricLoss;
import org.sectio.physics.Filling;
import org.sectio.physics.Propagation;

/**
 * A homogeneously filled rectangle: the hybrid solver must give β² = k0² εr − kc² for every TE and TM
 * mode of the scalar pencils on the same grid (the exact discrete reduction of
 * {@link org.sectio.operator.TransverseFieldAssembler}), the closed form kc = π √((m/a)² + (n/b)²)
 * (Pozar, Microwave Engineering, 4th ed., §3.3) to the grid's accuracy, and, with a loss tangent, the
 * attenuation α_d = k² tan δ / (2β) of {@link DielectricLoss} (Pozar §3.1) from the complex eigenvalue.
 */
class HybridHomogeneousFillingTest {

    private static final double A = 0.02286;
    private static final double B = 0.01016;
    private static final double EPS = 2.25;
    private static final double F = 12e9;
    private static final int CELLS = 60;

    static CrossSection rectangle(Material fill) {
        Region inside = Region.of(Outline.startAt(0, 0).lineTo(A, 0).lineTo(A, B).lineTo(0, B).close());
        return new GuideSection("filled rectangle", inside, List.of(), fill);
    }

    private static HybridModeSet hybrid(CrossSection guide, int modes) {
        return HybridModeSolver.prepare(guide, TensorGrid.fitted(guide.bounds(), CELLS)).solveAt(F, modes, Double.NaN,
                List.of(), SolveProgress.SILENT);
    }

    private static ModeSet scalar(CrossSection guide) {
        return ModeSolver.solveOnGrid(guide, TensorGrid.fitted(guide.bounds(), CELLS),
                new SolveSettings(12, EnumSet.of(ModeFamily.TE, ModeFamily.TM), CELLS, Double.NaN, false, 1),
                SolveProgress.SILENT);
    }

    private static double k0() {
        return 2 * Math.PI * F / ModeSolver.SPEED_OF_LIGHT;
    }

    @Test
    void everyModeIsAScalarModeOfTheSameGridWithBetaSquaredK0SquaredEpsMinusKcSquared() {
        CrossSection guide = rectangle(new Material(EPS, 1, 0));
        HybridModeSet hybrid = hybrid(guide, 8);
        List<Double> expected = new ArrayList<>();
        for (Mode m : scalar(guide).modes()) {
            // the scalar cutoff wavenumber is k0 at cutoff = kc / √εr
            expected.add(EPS * (k0() * k0() - m.cutoffWavenumber() * m.cutoffWavenumber()));
        }
        expected.sort((x, y) -> Double.compare(y, x));
        for (int k = 0; k < 8; k++) {
            HybridMode m = hybrid.modes().get(k);
            // measured: agreement to 4e-16 of k0² εr (round-off); residuals ≤ 3.5e-12
            assertEquals(expected.get(k), m.betaSquaredReal(), 1e-11 * k0() * k0() * EPS, "mode " + (k + 1));
            assertTrue(m.relativeResidual() < 1e-10, "residual " + m.relativeResidual());
        }
        // TE10, TE20, TE30 (no Ez) and the TE11/TM11 pair: the first three are pure TE
        for (int k = 0; k < 3; k++) {
            assertEquals(1.0, hybrid.modes().get(k).longitudinalMagneticShare(), 1e-9);
        }
    }

    /**
     * TE10, TE20 and TE01 on the uniform fitted grid: the cell-centred Neumann difference operator has the
     * exact eigenvalues kc,h = (2/h) sin(mπh / (2a)) (a → b for TE01) (R. J. LeVeque, Finite Difference Methods for
     * Ordinary and Partial Differential Equations, SIAM 2007, §2.10, discrete eigenvalues, from memory),
     * so β must match √(k0² εr − kc,h²) to round-off, and the continuum β = √(k0² εr − (mπ/a)²) to the
     * grid's second-order error kc² (kc h)² / (24 β²).
     */
    @Test
    void propagatingModesMatchTheClosedFormOfTheGridAndOfTheGuide() {
        CrossSection guide = rectangle(new Material(EPS, 1, 0));
        HybridModeSet hybrid = hybrid(guide, 3);
        TensorGrid grid = TensorGrid.fitted(guide.bounds(), CELLS);
        // TE10, TE20 across a (grid step a / cellsX), TE01 across b (step b / cellsY)
        double[] side = {A, A, B};
        int[] order = {1, 2, 1};
        double[] step = {A / grid.cellsX(), A / grid.cellsX(), B / grid.cellsY()};
        for (int k = 0; k < 3; k++) {
            int m = order[k];
            double h = step[k];
            double kc = m * Math.PI / side[k];
            double kch = 2 / h * Math.sin(m * Math.PI * h / (2 * side[k]));
            double beta = hybrid.modes().get(k).phaseConstant();
            double discrete = Math.sqrt(k0() * k0() * EPS - kch * kch);
            double exact = Math.sqrt(k0() * k0() * EPS - kc * kc);
            String name = k < 2 ? "TE" + m + "0" : "TE01";
            assertEquals(discrete, beta, 1e-11 * beta, name + " on the grid");
            double predicted = kc * kc * (kc * h) * (kc * h) / (24 * exact * exact);
            // measured: TE10 1.74e-5, TE20 5.17e-4, TE01 of the same order, as predicted to within 2 %
            assertEquals(predicted, Math.abs(beta / exact - 1), 0.02 * predicted, name + " against the guide");
        }
    }

    @Test
    void aLossTangentGivesTheAttenuationOfTheDielectricLossFormula() {
        double tanDelta = 1e-4;
        CrossSection lossy = rectangle(new Material(EPS, 1, tanDelta));
        HybridModeSet hybrid = hybrid(lossy, 3);
        HybridModeSet lossless = hybrid(rectangle(new Material(EPS, 1, 0)), 3);
        List<Mode> te = scalar(lossy).modes().stream().filter(m -> m.family() == ModeFamily.TE).toList();
        Filling filling = new Filling(EPS, 1, tanDelta);
        for (int k = 0; k < 3; k++) {
            HybridMode m = hybrid.modes().get(k);
            double alphaD = DielectricLoss.attenuation(Propagation.of(te.get(k), F, filling));
            // first-order perturbation vs the complex root: they differ by O(tan² δ) ≈ 1e-8 relative; measured 4.5e-10 (TE10)
            assertEquals(alphaD, m.attenuation(), 1e-7 * alphaD, "mode " + (k + 1));
            assertEquals(lossless.modes().get(k).phaseConstant(), m.phaseConstant(), 1e-6 * m.phaseConstant());
            assertTrue(m.relativeResidual() < 1e-10, "residual " + m.relativeResidual());
        }
    }
}
