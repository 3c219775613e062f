package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.io.JunctionWriter;
import org.sectio.physics.Caution;
import org.sectio.physics.Mismatch;

/**
 * {@code sectio junction} on rectangles of one width, 22.86 mm, and different heights. The TE10 power–
 * voltage impedance is Z_PV = 2 (b/a) Z_TE (Pozar, Microwave Engineering, 4th ed., §3.3, from P =
 * E0² ab/(4 Z_TE) and V = E0 b), and Z_TE does not depend on b, so a height step b → b' gives
 * Γ = (b' − b)/(b' + b) (Pozar §2.3 for Γ, VSWR and return loss). Measured at 80 cells: the 2:1 step
 * gives Γ = 0.3333368 (3.5e-6 from 1/3), the 1:10 step Γ = −0.818204 (2.2e-5 from −9/11); the bounds
 * leave 3 to 5× headroom.
 */
class JunctionCommandTest {

    private static final String CELLS = "80";

    @TempDir
    Path folder;

    private Path rectangle(String name, double heightMm) throws IOException {
        Path file = folder.resolve(name + ".json");
        Files.writeString(file, String.format(Locale.ROOT, "{\"name\": \"Corvel Ridge %s\", \"units\": \"mm\","
                + " \"family\": {\"rectangular\": {\"width\": 22.86, \"height\": %s}}}", name, heightMm));
        return file;
    }

    private static JsonNode junction(Path a, Path b) throws IOException {
        CapturedRun run = CapturedRun.of("junction", a.toString(), b.toString(), "--freq", "10GHz", "--cells", CELLS,
                "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out());
    }

    @Test
    void aGuideJoinedToItselfIsMatchedWithVswrOneAndAnInfiniteReturnLoss() throws IOException {
        Path wr90 = rectangle("wr90", 10.16);
        CapturedRun run = CapturedRun.of("junction", wr90.toString(), wr90.toString(), "--freq", "10GHz", "--cells",
                CELLS);
        assertEquals(0, run.exitCode(), run.err());
        String row = run.out().lines().filter(l -> l.strip().startsWith("10.000000")).findFirst().orElseThrow();
        String[] cells = row.strip().split("\\s+");
        assertEquals("0.0000", cells[3], row);
        assertEquals(JunctionWriter.INFINITE, cells[4], row);
        assertEquals("1.0000", cells[5], row);
        assertTrue(run.out().contains("impedance-step estimate"), run.out());
        assertTrue(run.out().contains(Caution.TEXT), run.out());
    }

    @Test
    void doublingTheHeightGivesGammaOneThirdVswrTwoAndReturnLoss9point54Db() throws IOException {
        JsonNode step = junction(rectangle("b", 10.16), rectangle("2b", 20.32)).get("steps").get(0);
        // Pozar §2.3 by hand: Γ = 1/3, VSWR = 2, RL = 20 log10 3 = 9.542 dB, |Γ|² = 11.1 %.
        assertEquals(1.0 / 3, step.get("reflection_coefficient").asDouble(), 2e-5);
        assertEquals(2.0, step.get("vswr").asDouble(), 1.5e-4);
        assertEquals(9.5424, step.get("return_loss_db").asDouble(), 1e-3);
        assertEquals(1.0 / 9, step.get("reflected_power_fraction").asDouble(), 1e-5);
    }

    @Test
    void aMuchLowerGuideActsNearlyLikeAShort() throws IOException {
        JsonNode step = junction(rectangle("b", 10.16), rectangle("b-over-10", 1.016)).get("steps").get(0);
        // Z_B = Z_A / 10: Γ = (1 − 10)/(1 + 10) = −9/11, VSWR = 10 (Pozar §2.3).
        assertEquals(-9.0 / 11, step.get("reflection_coefficient").asDouble(), 1e-4);
        assertEquals(10.0, step.get("vswr").asDouble(), 0.01);
    }

    @Test
    void theJunctionGammaEqualsTheMismatchOfTheImpedancesSolvePrintsForEachGuide() throws IOException {
        Path a = rectangle("b", 10.16);
        Path b = rectangle("2b", 20.32);
        double za = solvedImpedance(a);
        double zb = solvedImpedance(b);
        double gamma = junction(a, b).get("steps").get(0).get("reflection_coefficient").asDouble();
        assertEquals(Mismatch.between(za, zb).reflection(), gamma, 1e-12);
    }

    @Test
    void aFrequencyBelowOneGuidesCutoffNamesThatGuideAndItsCutoff() throws IOException {
        Path wide = rectangle("wide", 10.16);
        Path narrow = folder.resolve("narrow.json");
        Files.writeString(narrow, "{\"name\": \"narrow\", \"units\": \"mm\", \"family\": {\"rectangular\":"
                + " {\"width\": 15.8, \"height\": 7.9}}}");
        // TE10 of a 15.8 mm guide: fc = c/(2a) = 9.4871 GHz (Pozar §3.3); 8 GHz is below it.
        CapturedRun run = CapturedRun.of("junction", wide.toString(), narrow.toString(), "--freq", "8GHz", "--cells",
                CELLS);
        assertEquals(2, run.exitCode(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().startsWith("sectio: at 8 GHz the dominant mode TE10 of guide B '" + narrow
                + "' is cut off (fc 9.48"), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
    }

    private static double solvedImpedance(Path file) throws IOException {
        CapturedRun run = CapturedRun.of("solve", file.toString(), "--freq", "10GHz", "--cells", CELLS, "-n", "2",
                "--family", "te", "--no-estimate", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        return new ObjectMapper().readTree(run.out()).get("frequencies").get(0).get("modes").get(0)
                .get("characteristic_impedance_ohm").asDouble();
    }
}
