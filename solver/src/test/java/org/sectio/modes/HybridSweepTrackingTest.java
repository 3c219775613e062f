package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.mesh.TensorGrid;

/**
 * Mode tracking over a band on the slab-loaded rectangle of {@link SlabLoadedGuideTest} (εr = 4 over
 * a/4 … a/2): every tracked curve must stay on one family of the transverse-resonance roots of
 * {@link LayeredGuideModes} (Collin, Field Theory of Guided Waves, ch. 6, from memory) at every
 * frequency, although the order of the roots by β changes within the band (curves cross), so a
 * curve made by sorting β would jump between families.
 */
class HybridSweepTrackingTest {

    @Test
    void everyTrackedCurveFollowsOneExactModeThroughTheCrossings() {
        double a = 0.02;
        double b = 0.01;
        CrossSection guide = SlabLoadedGuideTest.slabGuide(a / 4, a / 2);
        double[] band = new double[12];
        for (int i = 0; i < band.length; i++) {
            band[i] = 10e9 + 8e9 * i / (band.length - 1);
        }
        HybridModeSolver.Prepared prepared = HybridModeSolver.prepare(guide, TensorGrid.fitted(guide.bounds(), 80));
        HybridSweep.Result sweep = HybridSweep.run(() -> prepared, band, 6, true, SolveProgress.SILENT);
        double[] widths = {a / 4, a / 4, a / 2};
        double[] eps = {1, 4, 1};
        int crossings = 0;
        String previousOrder = null;
        StringBuilder report = new StringBuilder();
        for (int i = 0; i < band.length; i++) {
            double k0 = 2 * Math.PI * band[i] / ModeSolver.SPEED_OF_LIGHT;
            Map<String, Double> exact = LayeredGuideModes.typedBetaSquared(k0, b, widths, eps, -4 * k0 * k0, 4);
            String order = exact.entrySet().stream().sorted((p, q) -> Double.compare(q.getValue(), p.getValue()))
                    .limit(4).map(Map.Entry::getKey).toList().toString();
            if (previousOrder != null && !order.equals(previousOrder)) {
                crossings++;
            }
            previousOrder = order;
        }
        for (HybridSweep.Curve curve : sweep.curves()) {
            Set<String> families = new HashSet<>();
            int points = 0;
            for (int i = 0; i < band.length; i++) {
                HybridMode m = curve.modes().get(i);
                if (m == null || !m.propagating()) {
                    continue;
                }
                double k0 = 2 * Math.PI * band[i] / ModeSolver.SPEED_OF_LIGHT;
                Map<String, Double> exact = LayeredGuideModes.typedBetaSquared(k0, b, widths, eps, -4 * k0 * k0, 4);
                String nearest = null;
                for (Map.Entry<String, Double> e : exact.entrySet()) {
                    if (nearest == null || Math.abs(e.getValue() - m.betaSquaredReal())
                            < Math.abs(exact.get(nearest) - m.betaSquaredReal())) {
                        nearest = e.getKey();
                    }
                }
                families.add(nearest);
                points++;
            }
            report.append(curve.label()).append(": ").append(families).append(" over ").append(points).append(" points\n");
            assertTrue(families.size() <= 1, "curve " + curve.label() + " jumps between " + families + "\n" + report);
        }
        System.out.print(report);
        // the exact ordering of the four largest roots changes within the band (measured: at least once)
        assertTrue(crossings >= 1, "no crossing in the band; the check would be empty\n" + report);
    }
}
