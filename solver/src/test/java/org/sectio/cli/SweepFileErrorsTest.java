package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Bad sweep files are refused before anything is solved or written: one line {@code sectio:
 * file:line:column: $.path: problem}, exit 2, no output file created and an existing one untouched
 * (the house rule for bad input).
 */
class SweepFileErrorsTest {

    @TempDir
    Path dir;

    /** A valid sweep of the rectangle family with one replaceable axis and record block. */
    private static String sweep(String axis, String record) {
        return "{\n  \"family\": \"rectangular\",\n  \"solve\": {\"modes\": 2, \"cells\": 16},\n  \"vary\": [\n    "
                + axis + "\n  ],\n  \"record\": " + record + "\n}\n";
    }

    private static final String AXIS = "{\"parameter\": \"width\", \"from\": 20, \"to\": 24, \"count\": 3}";
    private static final String RECORD = "{\"cutoffs\": 2}";

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "unknown parameter|{\"parameter\": \"depth\", \"values\": [1, 2]}|" + RECORD + "|5:19|$.vary[0].parameter|unknown parameter \"depth\"",
        "empty list|{\"parameter\": \"width\", \"values\": []}|" + RECORD + "|5:38|$.vary[0].values|empty",
        "reversed bounds|{\"parameter\": \"width\", \"from\": 24, \"to\": 20, \"count\": 3}|" + RECORD + "|5:46|$.vary[0].to|must be above",
        "equal bounds|{\"parameter\": \"width\", \"from\": 20, \"to\": 20, \"count\": 3}|" + RECORD + "|5:46|$.vary[0].to|must be above",
        "zero count|{\"parameter\": \"width\", \"from\": 20, \"to\": 24, \"count\": 0}|" + RECORD + "|5:59|$.vary[0].count|at least 2",
        "zero step|{\"parameter\": \"width\", \"from\": 20, \"to\": 24, \"step\": 0}|" + RECORD + "|5:58|$.vary[0].step|above 0",
        "log range through zero|{\"parameter\": \"width\", \"from\": 0, \"to\": 24, \"count\": 3, \"scale\": \"log\"}|" + RECORD + "|5:36|$.vary[0].from|above 0",
        "unknown record quantity|" + AXIS + "|{\"cutoffs\": 2, \"group_delay\": true}|7:28|$.record.group_delay|unknown key \"group_delay\"",
        "mode beyond those solved|" + AXIS + "|{\"cutoffs\": 3}|7:25|$.record.cutoffs|the 2 modes solved",
        "empty vary|XX|" + RECORD + "|4:11|$.vary|empty"
    })
    void aBadSweepFileIsOneLocatedLineExitTwoAndWritesNothing(String what, String axis, String record, String place,
                                                              String path, String words) throws IOException {
        String text = sweep(axis.equals("XX") ? "" : axis, record);
        Path file = dir.resolve("bad.json");
        Files.writeString(file, text, StandardCharsets.UTF_8);
        Path fresh = dir.resolve("fresh.csv");
        CapturedRun run = CapturedRun.of("sweep", file.toString(), "-o", fresh.toString());
        assertEquals(ErrorReporter.USAGE, run.exitCode(), run.err());
        String line = run.err().strip();
        assertFalse(line.contains("\n"), line);
        assertTrue(line.startsWith("sectio: " + file + ":" + place + ": " + path + ": "), line);
        assertTrue(line.contains(words), line);
        assertFalse(Files.exists(fresh), "no output may be created");

        Path existing = dir.resolve("existing.csv");
        Files.writeString(existing, "earlier results\n", StandardCharsets.UTF_8);
        CapturedRun again = CapturedRun.of("sweep", file.toString(), "-o", existing.toString());
        assertEquals(ErrorReporter.USAGE, again.exitCode());
        assertEquals("earlier results\n", Files.readString(existing), "an existing output stays untouched");
    }

    @Test
    void anOutputOfAnotherSweepIsRefusedAndLeftAsItWas() throws IOException {
        Path file = dir.resolve("ok.json");
        Files.writeString(file, sweep(AXIS, RECORD), StandardCharsets.UTF_8);
        Path other = dir.resolve("other.csv");
        String foreign = "point,points_total,status,height,reason\n0,1,ok,10.0,\n";
        Files.writeString(other, foreign, StandardCharsets.UTF_8);
        CapturedRun run = CapturedRun.of("sweep", file.toString(), "-o", other.toString(), "--threads", "1");
        assertEquals(ErrorReporter.USAGE, run.exitCode(), run.err());
        assertTrue(run.err().contains("another sweep"), run.err());
        assertEquals(foreign, Files.readString(other));
    }
}
