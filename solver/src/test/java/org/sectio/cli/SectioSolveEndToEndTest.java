package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line doing real (small) solves. Cutoffs are checked against the closed-form values of
 * the rectangular and circular guide: fc = (c / 2) √((m/a)² + (n/b)²), and fc = x' c / (2π r) with
 * x'₁₁ = 1.841184 (first zero of J₁').
 */
class SectioSolveEndToEndTest {

    private static final double C = 299_792_458.0;
    private static final double A = 0.02286;
    private static final double B = 0.01016;
    private static final Path CIRCLE_EXAMPLE = Path.of("..", "geometries", "examples", "corvel-rotary-joint.json");

    @TempDir
    Path folder;

    @Test
    void theBuiltInWr90GivesTe10AtTheTextbookCutoffAsJson() throws IOException {
        CapturedRun run = CapturedRun.of("solve", "--cells", "40", "--no-estimate", "--format", "json", "-n", "3");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode root = new ObjectMapper().readTree(run.out());
        assertTrue(root.get("section").asText().contains("22.86"), run.out());
        JsonNode first = root.get("modes").get(0);
        assertEquals("TE", first.get("family").asText());
        assertEquals(1, first.get("index").asInt());
        assertEquals(C / (2 * A), first.get("cutoff_frequency_hz").asDouble(), 0.005 * C / (2 * A));
        assertTrue(first.get("relative_error_estimate").isNull());
        assertEquals(3, root.get("modes").size());
    }

    @Test
    void tmOnlyStartsAtTm11() throws IOException {
        CapturedRun run = CapturedRun.of("solve", "--cells", "40", "--family", "tm", "--no-estimate", "--format", "json",
                "-n", "2");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode modes = new ObjectMapper().readTree(run.out()).get("modes");
        double tm11 = C / 2 * Math.hypot(1 / A, 1 / B);
        assertEquals("TM", modes.get(0).get("family").asText());
        assertEquals("TM", modes.get(1).get("family").asText());
        assertEquals(tm11, modes.get(0).get("cutoff_frequency_hz").asDouble(), 0.01 * tm11);
    }

    @Test
    void aCsvTableGoesToTheOutputFileAndNothingToStandardOutput() throws IOException {
        Path table = folder.resolve("modes.csv");
        CapturedRun run = CapturedRun.of("solve", "--cells", "40", "--no-estimate", "--format", "csv", "-n", "4",
                "-o", table.toString());
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.out());
        List<String> lines = Files.readAllLines(table);
        assertEquals("number,family,index,cutoff_frequency_hz,cutoff_wavenumber_per_m,relative_error_estimate,residual,"
                + "characteristic_impedance_ohm",
                lines.get(0));
        assertEquals(5, lines.size());
    }

    @Test
    void theFieldsFolderIsCreatedAndGetsACsvAndAPngPerMode() throws IOException {
        Path fields = folder.resolve("out").resolve("fields");
        CapturedRun run = CapturedRun.of("solve", "--cells", "40", "--no-estimate", "--family", "te", "-n", "2",
                "--fields", fields.toString());
        assertEquals(0, run.exitCode(), run.err());
        for (String stem : List.of("te-1", "te-2")) {
            assertEquals("x_m,y_m,value", Files.readAllLines(fields.resolve(stem + ".csv")).get(0));
            BufferedImage image = ImageIO.read(fields.resolve(stem + ".png").toFile());
            assertEquals(800, image.getWidth());
        }
        assertTrue(run.out().startsWith("Modes of "), run.out());
    }

    @Test
    void theCircularExampleFileGivesTe11AtTheBesselCutoff() throws IOException {
        CapturedRun run = CapturedRun.of("solve", CIRCLE_EXAMPLE.toString(), "--cells", "60", "--no-estimate",
                "--format", "json", "-n", "1");
        assertEquals(0, run.exitCode(), run.err());
        JsonNode first = new ObjectMapper().readTree(run.out()).get("modes").get(0);
        double te11 = 1.841184 * C / (2 * Math.PI * 0.0119);
        assertEquals("TE", first.get("family").asText());
        assertEquals(te11, first.get("cutoff_frequency_hz").asDouble(), 0.01 * te11);
    }

    @Test
    void pencilExportListsMatrixMarketFilesAndDoesNotSolve() throws IOException {
        Path matrices = folder.resolve("matrices");
        CapturedRun run = CapturedRun.of("solve", "--cells", "20", "--pencil", matrices.toString());
        assertEquals(0, run.exitCode(), run.err());
        List<String> written = run.out().lines().toList();
        assertFalse(written.isEmpty());
        for (String path : written) {
            assertTrue(Files.readString(Path.of(path)).startsWith("%%MatrixMarket"), path);
        }
        assertFalse(run.out().contains("Modes of"));
    }
}
