package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.geometry.Shapes;
import org.sectio.geometry.WallPiece;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * Field-based figures of WR-90 (22.86 × 10.16 mm) TE10 against closed forms:
 * β and λg (Pozar, Microwave Engineering, 4th ed., §3.3, fc = c/2a, through {@link Propagation}),
 * α_c (Pozar §3.3, eq. (3.96) from memory, {@link RectangularGuideLoss#te10}), the peak-field power
 * P = E_max² a b / (4 Z_TE) (Pozar §3.3, {@link Breakdown#rectangularTe10Power}), the impedances
 * Z_PV = 2 b Z_TE / a, Z_PI = π² b Z_TE / (8a), Z_VI = π b Z_TE / (2a) (N. Marcuvitz, Waveguide
 * Handbook, §2.2, from memory), and α_d = k² tanδ / (2β) (Pozar §3.1, {@link DielectricLoss}).
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ModeAnalysisRectangularTest {

    private static final double A = 0.02286;
    private static final double B = 0.01016;
    private static final double F = 10e9;
    private static final int[] CELLS = {100, 200, 400};

    private final CrossSection wr90 = Shapes.rectangle(A, B);
    private final Map<Integer, ModeAnalysis> prepared = new HashMap<>();

    private static Mode te10(CrossSection section, int cells) {
        return ModeSolver.solve(section, new SolveSettings(1, EnumSet.of(ModeFamily.TE), cells, Double.NaN, false, 2),
                SolveProgress.SILENT).modes().get(0);
    }

    private ModeAnalysis analysis(int cells) {
        return prepared.computeIfAbsent(cells, c -> ModeAnalysis.prepare(wr90, te10(wr90, c)));
    }

    private static Propagation exact(double f) {
        return new Propagation(ModeFamily.TE, RectangularGuideLoss.cutoffHz(1, 0, A, B, Filling.VACUUM), f,
                Filling.VACUUM);
    }

    /** Least-squares slope of −log(error) against log(cells). */
    private static double order(double[] errors) {
        SimpleRegression fit = new SimpleRegression();
        for (int k = 0; k < CELLS.length; k++) {
            fit.addData(Math.log(CELLS[k]), -Math.log(errors[k]));
        }
        return fit.getSlope();
    }

    @Test
    void te10PhaseConstantAndGuideWavelengthMatchTheClosedForm() {
        ModeAtFrequency r = analysis(200).at(F, AnalysisSettings.defaults());
        // measured: β and λg 3.1e-5 (100 cells), 7.8e-6 (200), 1.9e-6 (400) relative
        assertEquals(exact(F).phaseConstant(), r.phaseConstant(), 3e-5 * exact(F).phaseConstant());
        assertEquals(exact(F).guideWavelength(), r.guideWavelength(), 3e-5 * exact(F).guideWavelength());
        assertTrue(r.propagating());
        assertEquals("", r.limitation());
    }

    @Test
    void te10ConductorLossConvergesAtSecondOrderToPozarsClosedForm() {
        double rs = Conductor.COPPER.surfaceResistance(F);
        double reference = RectangularGuideLoss.te10(A, B, F, Filling.VACUUM, rs);
        double[] errors = new double[CELLS.length];
        for (int k = 0; k < CELLS.length; k++) {
            errors[k] = Math.abs(analysis(CELLS[k]).at(F, AnalysisSettings.defaults()).conductorAttenuation()
                    / reference - 1);
        }
        // measured: 4.7e-4 (100 cells), 1.2e-4 (200, the default grid), 2.9e-5 (400); order 2.01
        assertTrue(errors[1] < 1e-3 && errors[1] < 2e-4, "α_c error at 200 cells " + errors[1]);
        assertTrue(errors[2] < 5e-5, "α_c error at 400 cells " + errors[2]);
        assertTrue(order(errors) > 1.8, "α_c order " + order(errors));
        ModeAtFrequency r = analysis(200).at(F, AnalysisSettings.defaults());
        assertEquals(Neper.toDecibels(r.conductorAttenuation()), r.conductorAttenuationDbPerMetre(), 1e-15);
    }

    @Test
    void theConductorLossMinimumLiesWhereTheClosedFormPutsIt() {
        double fc = exact(F).cutoffHz();
        ModeAnalysis computed = analysis(200);
        AnalysisSettings copper = AnalysisSettings.defaults();
        BrentOptimizer brent = new BrentOptimizer(1e-10, 1.0);
        double closedForm = brent.optimize(new MaxEval(200), GoalType.MINIMIZE, new SearchInterval(1.2 * fc, 5 * fc),
                new UnivariateObjectiveFunction(f -> RectangularGuideLoss.te10(A, B, f, Filling.VACUUM,
                        Conductor.COPPER.surfaceResistance(f)))).getPoint();
        double found = brent.optimize(new MaxEval(200), GoalType.MINIMIZE, new SearchInterval(1.2 * fc, 5 * fc),
                new UnivariateObjectiveFunction(f -> computed.at(f, copper).conductorAttenuation())).getPoint();
        // the minimum is flat, so a relative error ε in the ratio of wall integrals moves it by about ε:
        // measured 3.8e-4, 9.4e-5, 2.3e-5 relative at 100, 200, 400 cells (order 2; α_c itself 1.2e-4 at 200);
        // the closed-form minimum is at 2.346 fc
        assertEquals(closedForm, found, 3e-4 * closedForm);
        assertTrue(closedForm > 2 * fc && closedForm < 3 * fc, "minimum at " + closedForm / fc + " fc");
    }

    @Test
    void te10PeakFieldGivesPozarsPowerForTheSameMaximum() {
        ModeAtFrequency r = analysis(200).at(F, AnalysisSettings.defaults());
        double zte = exact(F).waveImpedance().getReal();
        // 1 W = E_max² a b / (4 Z_TE) for the peak field at 1 W
        double power = Breakdown.rectangularTe10Power(r.peakFieldPerRootWatt(), A, B, zte);
        // measured: 9.1e-4, 2.2e-4, 5.4e-5 at 100, 200, 400 cells (power ∝ E², E to 1.1e-4 at 200)
        assertEquals(1.0, power, 1e-3);
        assertEquals(A / 2, r.peakX(), 0.02 * A, "TE10 peaks on the centre line");
        double breakdown = Breakdown.rectangularTe10Power(Breakdown.DRY_AIR_SEA_LEVEL, A, B, zte);
        assertEquals(breakdown, r.breakdownPowerWatts(), 1e-3 * breakdown);
        assertEquals(breakdown / 4, r.ratedPowerWatts(), 1e-3 * breakdown / 4);
        assertEquals(Caution.TEXT, r.caution());
    }

    @Test
    void te10ImpedancesMatchTheirTextbookClosedForms() {
        double zte = exact(F).waveImpedance().getReal();
        double[] reference = {2 * B * zte / A, Math.PI * Math.PI * B * zte / (8 * A), Math.PI * B * zte / (2 * A)};
        double[][] errors = new double[3][CELLS.length];
        for (int k = 0; k < CELLS.length; k++) {
            ModeAtFrequency r = analysis(CELLS[k]).at(F, AnalysisSettings.defaults());
            double[] z = {r.impedancePowerVoltage(), r.impedancePowerCurrent(), r.impedanceVoltageCurrent()};
            for (int d = 0; d < 3; d++) {
                errors[d][k] = Math.abs(z[d] / reference[d] - 1);
            }
            assertEquals(ImpedanceDefinition.POWER_VOLTAGE, r.chosenDefinition());
            assertEquals(r.impedancePowerVoltage(), r.chosenImpedance(), 0.0);
        }
        // measured at 100 / 200 / 400 cells: Z_PV 8.9e-4 / 2.2e-4 / 5.3e-5, Z_PI 8.1e-4 / 2.0e-4 / 4.9e-5,
        // Z_VI 3.9e-5 / 9.2e-6 / 2.1e-6; orders 2.0
        for (int d = 0; d < 3; d++) {
            assertTrue(errors[d][1] < 1e-3, "definition " + d + " error " + errors[d][1]);
            assertTrue(order(errors[d]) > 1.7, "definition " + d + " order " + order(errors[d]));
        }
    }

    @Test
    void aHomogeneousLossyFillingGivesTheDielectricLossOfTheClosedForm() {
        Material lossy = new Material(2.2, 1, 9e-4);
        List<WallPiece> wall = Outline.startAt(0, 0).lineTo(A, 0).lineTo(A, B).lineTo(0, B).close();
        CrossSection filled = new GuideSection("filled WR-90", Region.of(wall), List.of(), lossy);
        Mode mode = te10(filled, 100);
        ModeAtFrequency r = ModeAnalysis.at(filled, mode, F, AnalysisSettings.defaults());
        Filling filling = new Filling(2.2, 1, 9e-4);
        Propagation p = new Propagation(ModeFamily.TE, RectangularGuideLoss.cutoffHz(1, 0, A, B, filling), F, filling);
        // measured: 1.0e-5 relative against the closed-form β at 100 cells (the cutoff error), and 2e-16
        // against k² tanδ/(2β) with the computed cutoff, to which the field integral reduces exactly
        double reference = DielectricLoss.attenuation(p);
        assertEquals(reference, r.dielectricAttenuation(), 3e-5 * reference);
        double sameCutoff = DielectricLoss.attenuation(Propagation.of(mode, F, filling));
        assertEquals(sameCutoff, r.dielectricAttenuation(), 1e-12 * sameCutoff);
    }

    @Test
    void aPartlyFilledGuideGivesItsCutoffButNoPhaseConstant() {
        List<WallPiece> wall = Outline.startAt(0, 0).lineTo(A, 0).lineTo(A, B).lineTo(0, B).close();
        List<WallPiece> slab = Outline.startAt(0.4 * A, 0).lineTo(0.6 * A, 0).lineTo(0.6 * A, B).lineTo(0.4 * A, B)
                .close();
        CrossSection loaded = new GuideSection("slab-loaded", Region.of(wall),
                List.of(new Dielectric("slab", Region.of(slab), new Material(4, 1, 0))), Material.AIR);
        Mode mode = te10(loaded, 60);
        ModeAtFrequency r = ModeAnalysis.at(loaded, mode, F, AnalysisSettings.defaults());
        assertEquals(mode.cutoffFrequencyHz(), r.cutoffFrequencyHz(), 0.0);
        assertTrue(Double.isNaN(r.phaseConstant()) && Double.isNaN(r.conductorAttenuation())
                && Double.isNaN(r.chosenImpedance()), "β etc. must be NaN for a partly filled guide");
        assertFalse(r.limitation().isEmpty());
    }

    @Test
    void belowCutoffTheModeIsEvanescentWithTheClosedFormDecay() {
        double f = 5e9;
        ModeAtFrequency r = analysis(200).at(f, AnalysisSettings.defaults());
        assertFalse(r.propagating());
        double alpha = exact(f).attenuationConstant();
        // measured: 9.8e-5 (100 cells), 2.5e-5 (200) relative: the cutoff error magnified by kc²/α²
        assertEquals(alpha, r.evanescentAttenuation(), 1e-4 * alpha);
        assertTrue(Double.isNaN(r.conductorAttenuation()));
    }

    @Test
    void badSettingsAndPathsAreRefusedWithOneLineMessages() {
        var e = assertThrows(IllegalArgumentException.class, () -> new AnalysisSettings(Conductor.COPPER, -1e-6,
                Breakdown.dryAir(), ImpedanceDefinition.POWER_VOLTAGE, null));
        assertTrue(e.getMessage().contains("roughness") && !e.getMessage().contains("\n"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new AnalysisSettings(null, 0, Breakdown.dryAir(),
                ImpedanceDefinition.POWER_VOLTAGE, null));
        assertThrows(IllegalArgumentException.class, () -> new VoltagePath(0, 0, 0, 0));
        AnalysisSettings outside = AnalysisSettings.defaults().withPath(new VoltagePath(A / 2, -0.01, A / 2, B));
        var p = assertThrows(IllegalArgumentException.class, () -> analysis(100).at(F, outside));
        assertTrue(p.getMessage().contains("leaves the guide"), p.getMessage());
        assertThrows(IllegalArgumentException.class, () -> analysis(100).at(-1, AnalysisSettings.defaults()));
    }
}
