package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * `solve --freq` on a partly filled guide gives the hybrid solver's β, not "not available": the
 * slab_loaded family (20 × 10 mm, εr = 4 slab 5 mm thick from x = 5 mm) at 12 GHz, whose dominant
 * LSE10 mode satisfies Ey″ + (k0² εr − β²) Ey = 0 across the layers with Ey = 0 on the narrow walls
 * (transverse resonance, Collin, Field Theory of Guided Waves, ch. 6, from memory), solved here with
 * Commons Math's BrentSolver.
 */
class HybridFrequencyEndToEndTest {

    private static final double C = 299_792_458.0;

    /** Ey at the far wall for β², through air (5 mm), slab (5 mm), air (10 mm), from Ey = 0, Ey′ = 1. */
    private static double farWall(double b2, double k0) {
        double[] widths = {0.005, 0.005, 0.010};
        double[] eps = {1, 4, 1};
        double x = 0;
        double d = 1;
        for (int l = 0; l < 3; l++) {
            double q2 = k0 * k0 * eps[l] - b2;
            double q = Math.sqrt(Math.abs(q2));
            double t = widths[l];
            double nx = q2 > 0 ? x * Math.cos(q * t) + d / q * Math.sin(q * t) : x * Math.cosh(q * t) + d / q * Math.sinh(q * t);
            double nd = q2 > 0 ? -q * x * Math.sin(q * t) + d * Math.cos(q * t) : q * x * Math.sinh(q * t) + d * Math.cosh(q * t);
            x = nx;
            d = nd;
        }
        return x;
    }

    @Test
    void theDominantModeOfASlabLoadedGuideGetsItsHybridPhaseConstant(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("slab.json");
        Files.writeString(file, "{\"name\": \"Corvel Ridge observatory, test slab\", \"units\": \"mm\", \"family\":"
                + " {\"slab_loaded\": {\"width\": 20, \"height\": 10, \"slab_width\": 5, \"slab_centre\": -2.5,"
                + " \"permittivity\": 4, \"loss_tangent\": 0}}}");
        CapturedRun run = CapturedRun.of("solve", file.toString(), "--cells", "80", "-n", "3", "--freq", "12GHz",
                "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode first = new ObjectMapper().readTree(run.out()).get("frequencies").get(0).get("modes").get(0);
        double k0 = 2 * Math.PI * 12e9 / C;
        // the dominant root lies between 1.5 k0² and k0² εr (bracket checked by Brent's sign test)
        double b2 = new BrentSolver(1e-12, 1e-9).solve(200, x -> farWall(x, k0), k0 * k0 * 1.5, k0 * k0 * 3.99);
        double beta = Math.sqrt(b2);
        double printed = first.get("phase_constant_rad_per_m").asDouble();
        // measured at 80 cells: −5.3e-4 (second order; see HybridLayeredGuideTest)
        assertEquals(beta, printed, 1e-3 * beta, run.out());
        assertTrue(first.get("propagating").asBoolean());
        assertTrue(first.get("limitation").asText().contains("hybrid"), first.toString());
        assertTrue(first.get("group_velocity_m_per_s").asDouble() > 0 && first.get("group_velocity_m_per_s").asDouble() < C);
    }
}
