package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.physics.Caution;

/**
 * {@code solve --freq/--band} on the built-in WR-90 (22.86 × 10.16 mm, air, copper 5.813e7 S/m) at
 * 60 cells across, against the closed forms for TE10 (Pozar, Microwave Engineering, 4th ed., §3.3):
 * β = √(k² − (π/a)²); α_c = Rs (2bπ² + a³k²) / (a³ b β k η), eq. (3.96) (number from memory), with
 * Rs = √(ωμ0/(2σ)) (§1.7); and Z_PV = |V|²/(2P) = 2 (b/a) Z_TE with V = E0 b and P = E0² ab/(4 Z_TE).
 * Measured errors at 60 cells: β 8.6e-5, α_c 1.1e-3, Z_PV 2.6e-3 (all fall 4× per halving of the cell,
 * 120 and 240 cells measured); the bounds below leave about 2× headroom.
 */
class SolveAtFrequencyEndToEndTest {

    private static final double C = 299_792_458.0;
    private static final double ETA = 376.730313668;
    private static final double MU0 = 1.25663706212e-6;
    private static final double A = 0.02286;
    private static final double B = 0.01016;
    private static final double F = 10e9;
    private static final String[] SMALL = {"--cells", "60", "--family", "te", "-n", "3", "--no-estimate"};

    @TempDir
    Path folder;

    private static String[] args(String... more) {
        String[] all = new String[1 + SMALL.length + more.length];
        all[0] = "solve";
        System.arraycopy(SMALL, 0, all, 1, SMALL.length);
        System.arraycopy(more, 0, all, 1 + SMALL.length, more.length);
        return all;
    }

    @Test
    void te10OfWr90At10GhzMatchesTheClosedFormsForBetaCopperLossAndPowerVoltageImpedance() throws IOException {
        CapturedRun run = CapturedRun.of(args("--freq", "10GHz", "--format", "json"));
        assertEquals(0, run.exitCode(), run.err());
        JsonNode te10 = new ObjectMapper().readTree(run.out()).get("frequencies").get(0).get("modes").get(0);
        double k = 2 * Math.PI * F / C;
        double beta = Math.sqrt(k * k - Math.pow(Math.PI / A, 2));
        double rs = Math.sqrt(2 * Math.PI * F * MU0 / (2 * 5.813e7));
        double alphaC = rs * (2 * B * Math.PI * Math.PI + A * A * A * k * k) / (A * A * A * B * beta * k * ETA);
        double zpv = 2 * B / A * k * ETA / beta;
        assertEquals("TE10", te10.get("name").asText());
        assertEquals(beta, te10.get("phase_constant_rad_per_m").asDouble(), 2e-4 * beta);
        assertEquals(alphaC, te10.get("conductor_loss_np_per_m").asDouble(), 2.5e-3 * alphaC);
        assertEquals(zpv, te10.get("impedance_pv_ohm").asDouble(), 5e-3 * zpv);
        assertEquals(zpv, te10.get("characteristic_impedance_ohm").asDouble(), 5e-3 * zpv, "pv is the default");
    }

    @Test
    void theTableSaysWhereTheTe10FieldPeaks() {
        // TE10: |E| ∝ sin(πx/a), largest on the centre line x = a/2 = 11.43 mm at every height (Pozar §3.3)
        CapturedRun run = CapturedRun.of(args("--freq", "10GHz"));
        assertEquals(0, run.exitCode(), run.err());
        String line = run.out().lines().filter(l -> l.startsWith("field peak: TE10,")).findFirst().orElse("");
        java.util.regex.Matcher at = java.util.regex.Pattern.compile("at \\(([-0-9.]+), ([-0-9.]+)\\) mm").matcher(line);
        assertTrue(at.find(), run.out());
        double x = Double.parseDouble(at.group(1));
        double y = Double.parseDouble(at.group(2));
        assertEquals(A / 2 * 1e3, x, 0.5 * A / 60 * 1e3, line); // within half a cell of the 60-cell grid
        assertTrue(y >= 0 && y <= B * 1e3, line);
    }

    @Test
    void theTableCarriesTheSkinDepthOnceTheSummaryAndTheCaution() {
        CapturedRun run = CapturedRun.of(args("--freq", "10GHz"));
        assertEquals(0, run.exitCode(), run.err());
        String out = run.out();
        assertTrue(out.startsWith("Modes of rectangle 22.86 × 10.16 mm at 10.000000 GHz\n"), out);
        // δs = √(2/(ωμ0σ)) = 0.6601 µm for copper at 10 GHz (Pozar §1.7, σ from Appendix F, from memory).
        assertTrue(out.contains("skin depth 0.6601 µm"), out);
        assertEquals(1, out.split("skin depth", -1).length - 1);
        assertTrue(out.contains("Guide summary"), out);
        assertTrue(out.contains(Caution.TEXT), out);
        assertTrue(out.lines().anyMatch(l -> l.startsWith("1  TE10") && l.contains("propagates")), out);
        assertTrue(out.lines().anyMatch(l -> l.startsWith("2  TE20") && l.contains("cut off")), out);
    }

    @Test
    void aBandRunWritesOneCsvRowPerFrequencyAndModeAndTheCautionOnTheErrorStream() {
        CapturedRun run = CapturedRun.of(args("--band", "8GHz:12GHz:5", "--format", "csv"));
        assertEquals(0, run.exitCode(), run.err());
        List<String> lines = run.out().lines().toList();
        assertEquals(1 + 5 * 3, lines.size(), run.out());
        assertTrue(lines.get(1).startsWith("8.0E9,1,TE,1,TE10,"), lines.get(1));
        assertTrue(lines.get(15).startsWith("1.2E10,3,TE,"), lines.get(15));
        assertTrue(run.err().contains(Caution.TEXT), run.err());
    }

    @Test
    void plotsWriteADispersionAndAnAttenuationChart() throws IOException {
        Path plots = folder.resolve("charts");
        CapturedRun run = CapturedRun.of(args("--band", "7GHz:14GHz:15", "--plots", plots.toString()));
        assertEquals(0, run.exitCode(), run.err());
        for (String name : List.of("dispersion.png", "attenuation.png")) {
            BufferedImage image = ImageIO.read(plots.resolve(name).toFile());
            assertEquals(900, image.getWidth(), name);
        }
    }

    @Test
    void withoutAFrequencyTheOutputIsThePlainModeTable() {
        CapturedRun run = CapturedRun.of(args());
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().lines().skip(2).findFirst().orElseThrow().startsWith("  #  family  index    cutoff (GHz)"),
                run.out());
        assertTrue(!run.out().contains("Caution"), run.out());
    }
}
