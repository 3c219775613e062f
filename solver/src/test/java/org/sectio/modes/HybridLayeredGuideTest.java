package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.mesh.TensorGrid;

/**
 * Partially filled rectangles whose modes are known exactly: a full-height slab parallel to the
 * narrow walls (the slab_loaded family's shape; LSE and LSM modes to x) and a layer on the broad wall
 * (the slab_on_broad_wall family's shape; LSM and LSE to y). β² comes from the transverse resonance
 * of {@link LayeredGuideModes} (Collin, Field Theory of Guided Waves, ch. 6; Harrington,
 * Time-Harmonic Electromagnetic Fields, ch. 4; section numbers from memory), solved with Commons
 * Math's BrentSolver. Slab faces lie on grid lines (cells across divisible by 4), where the scheme
 * is second order; the check is the two-grid Richardson value (4 β(h/2) − β(h)) / 3 of every
 * propagating mode over a band, against ≤ 1e-4 relative, with the measured order.
 */
class HybridLayeredGuideTest {

    private static final double A = 0.02;
    private static final double B = 0.01;
    private static final double EPS = 4.0;
    private static final double[] BAND_HZ = {9e9, 12e9, 15e9};
    private static final int COARSE = 40;
    private static final int FINE = 80;
    private static final int MODES = 6;

    private static CrossSection guide(Region slab, String name) {
        Region inside = Region.of(Outline.startAt(0, 0).lineTo(A, 0).lineTo(A, B).lineTo(0, B).close());
        return new GuideSection(name, inside, List.of(new Dielectric("slab", slab, new Material(EPS, 1, 0))),
                Material.AIR);
    }

    private static Region box(double x0, double y0, double x1, double y1) {
        return Region.of(Outline.startAt(x0, y0).lineTo(x1, y0).lineTo(x1, y1).lineTo(x0, y1).close());
    }

    /** Richardson β of the propagating exact modes and the errors of both grids, per frequency. */
    private static List<String> check(CrossSection guide, double other, double[] widths, double[] eps,
                                      double[] worst) {
        List<String> lines = new ArrayList<>();
        HybridModeSolver.Prepared coarse = HybridModeSolver.prepare(guide, TensorGrid.fitted(guide.bounds(), COARSE));
        HybridModeSolver.Prepared fine = HybridModeSolver.prepare(guide, TensorGrid.fitted(guide.bounds(), FINE));
        for (double f : BAND_HZ) {
            double k0 = 2 * Math.PI * f / ModeSolver.SPEED_OF_LIGHT;
            List<Double> exact = LayeredGuideModes.betaSquared(k0, other, widths, eps, -4 * k0 * k0, 6);
            List<HybridMode> c = coarse.solveAt(f, MODES, Double.NaN, List.of(), SolveProgress.SILENT).modes();
            List<HybridMode> h = fine.solveAt(f, MODES, Double.NaN, List.of(), SolveProgress.SILENT).modes();
            for (int k = 0; k < MODES && exact.get(k) > 0.02 * k0 * k0; k++) {
                double beta = Math.sqrt(exact.get(k));
                HybridMode mc = nearest(c, exact.get(k));
                HybridMode mh = nearest(h, exact.get(k));
                double ec = mc.phaseConstant() / beta - 1;
                double eh = mh.phaseConstant() / beta - 1;
                double extrapolated = (4 * mh.phaseConstant() - mc.phaseConstant()) / 3 / beta - 1;
                double order = Math.log(Math.abs(ec / eh)) / Math.log(2);
                worst[0] = Math.max(worst[0], Math.abs(extrapolated));
                worst[1] = Math.min(worst[1], order);
                worst[2] = Math.max(worst[2], order);
                worst[3] = Math.max(worst[3], Math.max(mc.relativeResidual(), mh.relativeResidual()));
                lines.add(String.format(Locale.ROOT, "%.0f GHz mode %d (%s): β %.6f rad/m, errors %.2e / %.2e,"
                        + " order %.2f, Richardson %.2e", f * 1e-9, k + 1, mh.label(), beta, ec, eh, order,
                        extrapolated));
            }
        }
        return lines;
    }

    private static HybridMode nearest(List<HybridMode> modes, double betaSquared) {
        HybridMode best = modes.get(0);
        for (HybridMode m : modes) {
            if (Math.abs(m.betaSquaredReal() - betaSquared) < Math.abs(best.betaSquaredReal() - betaSquared)) {
                best = m;
            }
        }
        return best;
    }

    @Test
    void fullHeightSlabParallelToTheNarrowWallsMatchesItsTranscendentalEquationOverABand() {
        double s1 = A / 4;
        double s2 = A / 2;
        double[] worst = {0, Double.POSITIVE_INFINITY, 0, 0};
        List<String> lines = check(guide(box(s1, 0, s2, B), "slab-loaded rectangle"), B,
                new double[] {s1, s2 - s1, A - s2}, new double[] {1, EPS, 1}, worst);
        String report = String.join("\n", lines);
        System.out.println(report);
        assertTrue(lines.size() >= 6, report);
        assertTrue(worst[0] <= 1e-4, "Richardson error " + worst[0] + "\n" + report);
        assertTrue(worst[1] > 1.8 && worst[2] < 2.2, "orders " + worst[1] + " … " + worst[2] + "\n" + report);
        assertTrue(worst[3] < 1e-10, "residual " + worst[3]);
    }

    @Test
    void layerOnTheBroadWallMatchesItsTranscendentalEquationOverABand() {
        double t = B / 4;
        double[] worst = {0, Double.POSITIVE_INFINITY, 0, 0};
        List<String> lines = check(guide(box(0, 0, A, t), "layer on the broad wall"), A,
                new double[] {t, B - t}, new double[] {EPS, 1}, worst);
        String report = String.join("\n", lines);
        System.out.println(report);
        assertTrue(lines.size() >= 6, report);
        assertTrue(worst[0] <= 1e-4, "Richardson error " + worst[0] + "\n" + report);
        assertTrue(worst[1] > 1.8 && worst[2] < 2.2, "orders " + worst[1] + " … " + worst[2] + "\n" + report);
        assertTrue(worst[3] < 1e-10, "residual " + worst[3]);
    }
}
