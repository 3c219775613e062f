package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The size, tolerance and corner-study commands: every bad request is one line starting "sectio:",
 * with a non-zero exit, and leaves no output file behind. The one value checked is the rectangle's
 * TE10 cutoff fc = c/(2a) (Pozar, Microwave Engineering, 4th ed., §3.3): c/(2 · 15 mm) = 9.993 GHz and
 * c/(2 · 16 mm) = 9.369 GHz at the ends of an unreachable range.
 */
class BatchCommandsTest {

    private static void assertOneLineError(CapturedRun run, int code, String fragment) {
        assertEquals(code, run.exitCode(), run.err());
        assertEquals("", run.out());
        String[] lines = run.err().strip().split("\n");
        assertEquals(1, lines.length, run.err());
        assertTrue(lines[0].startsWith("sectio: "), lines[0]);
        assertTrue(lines[0].contains(fragment), "expected '" + fragment + "' in: " + lines[0]);
    }

    @Test
    @DisplayName("size: a target outside the range names the values at both ends (fc = c/2a, Pozar §3.3)")
    void sizeTargetOutOfReach(@TempDir Path dir) {
        Path out = dir.resolve("size.txt");
        CapturedRun run = CapturedRun.of("size", "--shape", "rectangular", "--vary", "width", "--range", "15:16",
                "--cutoff", "te1=6.557GHz", "--cells", "40", "--threads", "1", "-o", out.toString());
        assertOneLineError(run, 2, "cannot be bracketed in width 15.0000 … 16.0000: cutoff of TE 1 reaches 9.9");
        assertTrue(run.err().contains("GHz at 15.0000 and 9.3"), run.err());
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    @DisplayName("size: unknown parameter, reversed or empty range, bad target and bad source are refused before any solve")
    void sizeBadRequests() {
        String[] base = {"size", "--shape", "rectangular", "--cutoff", "te1=6.557GHz"};
        assertOneLineError(CapturedRun.of(concat(base, "--vary", "depth", "--range", "15:30")), 2,
                "no parameter 'depth'; its parameters are width, height");
        assertOneLineError(CapturedRun.of(concat(base, "--vary", "width", "--range", "30:15")), 2, "is reversed");
        assertOneLineError(CapturedRun.of(concat(base, "--vary", "width", "--range", "15:15")), 2, "is empty");
        assertOneLineError(CapturedRun.of(concat(base, "--vary", "width", "--range", "15")), 2, "expected LOW:HIGH");
        assertOneLineError(CapturedRun.of("size", "--shape", "rectangular", "--vary", "width", "--range", "15:30",
                "--cutoff", "te1=fast"), 2, "bad frequency");
        assertOneLineError(CapturedRun.of("size", "--shape", "rectangular", "--vary", "width", "--range", "15:30",
                "--ratio", "0.5"), 2, "must be > 1");
        assertOneLineError(CapturedRun.of("size", "--shape", "nosuch", "--vary", "width", "--range", "15:30",
                "--ratio", "1.5"), 2, "unknown guide family 'nosuch'");
        assertOneLineError(CapturedRun.of("size", "--vary", "width", "--range", "15:30", "--ratio", "1.5"), 2,
                "give either a geometry FILE or --shape NAME");
        assertOneLineError(CapturedRun.of("size", "--shape", "rectangular", "--vary", "width", "--range", "15:30"), 2,
                "Missing required argument");
    }

    @Test
    @DisplayName("tolerance: zero or negative tolerance, bad distribution, unknown parameter and reversed band are refused")
    void toleranceBadRequests(@TempDir Path dir) {
        Path out = dir.resolve("tol.txt");
        String[] base = {"tolerance", "--shape", "rectangular", "-o", out.toString()};
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "width=0")), 2,
                "tolerance of width must be a finite value > 0, got 0.0");
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "width=-0.05")), 2, "must be a finite value > 0");
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "width=0.05:lognormal")), 2,
                "unknown distribution 'lognormal'; use normal");
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "width=0.05", "--distribution", "flat")), 2,
                "unknown distribution 'flat'");
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "depth=0.05")), 2, "no parameter 'depth'");
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "width=0.05", "--require", "12GHz:8GHz")), 2,
                "the band is reversed");
        assertOneLineError(CapturedRun.of(concat(base, "--tol", "width=0.05", "--tol", "width=0.1")), 2, "given twice");
        assertOneLineError(CapturedRun.of(concat(base, "--params", "width,depth")), 2, "no parameter 'depth'");
        assertFalse(Files.exists(out), "nothing written");
    }

    @Test
    @DisplayName("tolerance: a coarse run writes nominal, sensitivities, worst case and Monte Carlo into the output file")
    void toleranceRunWritesTheReport(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("tol.txt");
        CapturedRun run = CapturedRun.of("tolerance", "--shape", "rectangular", "--tol", "width=0.05", "--tol",
                "height=0.05:uniform", "--cells", "40", "--parts", "200", "--seed", "3", "--require", "8.2GHz:12.4GHz",
                "--threads", "2", "-o", out.toString());
        assertEquals(0, run.exitCode(), run.err());
        String report = Files.readString(out);
        for (String part : List.of("Nominal", "Sensitivities per mm", "Worst case over width ± 0.05000 height ± 0.05000"
                + " (all 4 corners solved", "Monte Carlo: 200 parts, seed 3", "linearised from the sensitivities",
                "of the parts")) {
            assertTrue(report.contains(part), "missing '" + part + "' in\n" + report);
        }
        assertEquals(List.of(out), Files.list(dir).toList(), "no temporary file left");
    }

    @Test
    @DisplayName("corner-study: a radius over half the short side and a bad size are refused in one line")
    void cornerStudyBadRequests() {
        assertOneLineError(CapturedRun.of("corner-study", "--standard", "WR-90", "--max-radius", "6"), 2,
                "≤ half the shorter side (5.08000 mm), got 6.00000 mm");
        assertOneLineError(CapturedRun.of("corner-study", "--size", "22.86"), 2, "expected WxH in mm");
        assertOneLineError(CapturedRun.of("corner-study", "--standard", "WR-9999"), 2, "unknown standard");
        assertOneLineError(CapturedRun.of("corner-study", "--points", "1"), 2, "--points 1: must be 2 … 1000");
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = new String[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
