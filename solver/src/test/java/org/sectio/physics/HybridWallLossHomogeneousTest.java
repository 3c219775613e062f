package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.HybridMode;
import org.sectio.modes.HybridModeSolver;
import org.sectio.modes.SolveProgress;

/**
 * Wall loss and impedances of hybrid-solver modes of homogeneously filled guides (εr = 2.25, copper),
 * where the closed forms hold, with k = k0 √εr and η = η0 / √εr of the filling:
 * <ul>
 * <li>rectangle 22.86 × 10.16 mm, TE10 at 6 GHz: α_c = Rs (2bπ² + a³k²) / (a³ b β k η) (Pozar,
 *     Microwave Engineering, 4th ed., §3.3, eq. (3.96), from memory); Z_PV = 2b Z_TE / a,
 *     Z_PI = π² b Z_TE / (8a), Z_VI = π b Z_TE / (2a), Z_TE = kη/β (N. Marcuvitz, Waveguide Handbook,
 *     §2.2, from memory);</li>
 * <li>circle of radius 10 mm at 9 GHz, on the cut cells of a curved wall: TE11
 *     α_c = Rs (kc² + k²/(p′11² − 1)) / (a k η β) and TM01 α_c = Rs k / (a η β) (Pozar §3.4, eq. (3.133)
 *     and the TM form of its problems, from memory; p′11 = 1.841184, p01 = 2.404826, Abramowitz &amp;
 *     Stegun Table 9.5, from memory).</li>
 * </ul>
 * The hybrid solver is given the filling directly (no dielectric regions), which it treats like any
 * other permittivity map.
 */
class HybridWallLossHomogeneousTest {

    private static final double EPS = 2.25;
    private static final double C = 299_792_458.0;
    private static final double ETA = 376.730313668 / Math.sqrt(EPS);

    private static List<HybridMode> solve(CrossSection guide, int cells, double f, int count) {
        return HybridModeSolver.prepare(guide, TensorGrid.fitted(guide.bounds(), cells)).solveAt(f, count, Double.NaN,
                List.of(), SolveProgress.SILENT).modes();
    }

    @Test
    void filledRectangleTe10MatchesPozarsWallLossAndTheImpedanceClosedFormsAtSecondOrder() {
        double a = 0.02286;
        double b = 0.01016;
        double f = 6e9;
        Region inside = Region.of(Outline.startAt(0, 0).lineTo(a, 0).lineTo(a, b).lineTo(0, b).close());
        CrossSection guide = new GuideSection("filled rectangle", inside, List.of(), new Material(EPS, 1, 0));
        double rs = Conductor.COPPER.surfaceResistance(f);
        double k = 2 * Math.PI * f * Math.sqrt(EPS) / C;
        double beta = Math.sqrt(k * k - Math.pow(Math.PI / a, 2));
        double zte = k * ETA / beta;
        double[] ref = {rs * (2 * b * Math.PI * Math.PI + a * a * a * k * k) / (a * a * a * b * beta * k * ETA),
            2 * b * zte / a, Math.PI * Math.PI * b * zte / (8 * a), Math.PI * b * zte / (2 * a)};
        int[] cells = {40, 80, 160};
        double[][] errors = new double[4][cells.length];
        StringBuilder text = new StringBuilder("filled WR-90 TE10 (α_c, Z_PV, Z_PI, Z_VI):");
        for (int c = 0; c < cells.length; c++) {
            ModeAtFrequency r = HybridFigures.at(guide, solve(guide, cells[c], f, 1).get(0), "TE10", f, 0,
                    AnalysisSettings.defaults());
            double[] got = {r.conductorAttenuation(), r.impedancePowerVoltage(), r.impedancePowerCurrent(),
                r.impedanceVoltageCurrent()};
            text.append(String.format(Locale.ROOT, "%n  %d cells:", cells[c]));
            for (int q = 0; q < 4; q++) {
                errors[q][c] = Math.abs(got[q] / ref[q] - 1);
                text.append(String.format(Locale.ROOT, " %.2e", got[q] / ref[q] - 1));
            }
            assertTrue(Double.isNaN(r.waveImpedanceOhms()));
            assertTrue(r.limitation().contains("no wave impedance (E_t/H_t varies over the section)"), r.limitation());
        }
        System.out.println(text);
        // measured: α_c −4.6e-4 / −1.14e-4 / −2.85e-5; Z_PV −3.0e-4 / −7.3e-5 / −1.8e-5; Z_PI −2.5e-4 /
        // −7.0e-5 / −1.8e-5; Z_VI −2.7e-4 / −7.2e-5 / −1.8e-5 at 40 / 80 / 160 cells; orders 2.0
        for (int q = 0; q < 4; q++) {
            double order = Math.log(errors[q][1] / errors[q][2]) / Math.log(2);
            assertTrue(errors[q][1] < 1.5e-4, "figure " + q + "\n" + text);
            assertTrue(errors[q][2] < 4e-5, "figure " + q + "\n" + text);
            assertTrue(order > 1.9 && order < 2.1, "figure " + q + " order " + order + "\n" + text);
        }
    }

    @Test
    void filledCircleTe11AndTm01FollowPozarsWallLossOnCurvedCutCells() {
        double radius = 0.01;
        double f = 9e9;
        CrossSection guide = new GuideSection("filled circle", Region.of(Shapes.circle(radius, 0, 0).wallPieces()),
                List.of(), new Material(EPS, 1, 0));
        double rs = Conductor.COPPER.surfaceResistance(f);
        double k = 2 * Math.PI * f * Math.sqrt(EPS) / C;
        double p11 = 1.841183781340659;
        double p01 = 2.404825557695773;
        double b11 = Math.sqrt(k * k - Math.pow(p11 / radius, 2));
        double b01 = Math.sqrt(k * k - Math.pow(p01 / radius, 2));
        double te11 = rs * (Math.pow(p11 / radius, 2) + k * k / (p11 * p11 - 1)) / (radius * k * ETA * b11);
        double tm01 = rs * k / (radius * ETA * b01);
        int[] cells = {80, 160};
        double[][] errors = new double[2][cells.length];
        for (int c = 0; c < cells.length; c++) {
            // the TE11 pair first (largest β), then TM01
            List<HybridMode> modes = solve(guide, cells[c], f, 3);
            HybridMode h = modes.get(0);
            HybridMode e = modes.get(2);
            assertTrue(h.longitudinalMagneticShare() > 0.999 && e.longitudinalMagneticShare() < 1e-3);
            ModeAtFrequency rh = HybridFigures.at(guide, h, "TE11", f, 0, AnalysisSettings.defaults());
            ModeAtFrequency re = HybridFigures.at(guide, e, "TM01", f, 0, AnalysisSettings.defaults());
            errors[0][c] = rh.conductorAttenuation() / te11 - 1;
            errors[1][c] = re.conductorAttenuation() / tm01 - 1;
            assertEquals(ImpedanceDefinition.POWER_CURRENT, re.chosenDefinition(), "an E-like mode reports pi");
            assertEquals(re.impedancePowerCurrent(), re.chosenImpedance(), 0.0);
            assertTrue(re.limitation().contains("E-like: power-current impedance reported"), re.limitation());
        }
        String text = String.format(Locale.ROOT, "filled circle α_c: TE11 %.2e / %.2e, TM01 %.2e / %.2e at %d / %d"
                + " cells", errors[0][0], errors[0][1], errors[1][0], errors[1][1], cells[0], cells[1]);
        System.out.println(text);
        // measured: TE11 −1.7e-4 / −1.4e-4 (−4.2e-5 at 320), TM01 −4.8e-4 / −4.5e-4 (−1.4e-4 at 320, where β
        // is 7e-5 off; the scalar TM path: 1.6e-3 at 200 cells): irregular, order ≈ 1.4 from 40 to 320 cells
        assertTrue(Math.abs(errors[0][0]) < 3e-4 && Math.abs(errors[0][1]) < 2.5e-4, text);
        assertTrue(Math.abs(errors[1][0]) < 8e-4 && Math.abs(errors[1][1]) < 7e-4, text);
    }
}
