package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Nothing of a sweep is lost or changed by how it is run: a sweep killed midway (a separate JVM,
 * killed with SIGKILL once some records are on disk, then given a torn last line) and started again
 * with the same command, and a sweep run as three shards and merged, both give the same bytes as one
 * uninterrupted run on one thread, once sorted by point (the merge sorts). Merge refuses a missing and
 * a repeated point, naming it. The reference for "the same" is the uninterrupted run itself (common
 * practice for checkpoint/restart tests); the numbers it holds are checked against closed forms in
 * {@code org.sectio.batch.RectangleWidthSweepTest}.
 */
class SweepResumeAndShardTest {

    @TempDir
    static Path dir;

    private static Path sweepFile;
    private static byte[] referenceCsv;
    private static byte[] referenceJsonl;

    /** 16 widths of a rectangle in chains of 3, so that chains straddle any kill point and shard boundary. */
    private static final String SWEEP = """
            {"name": "Corvel Ridge observatory, WR-90 broad-wall tolerance band",
             "family": "rectangular", "set": {"height": 10.16},
             "solve": {"modes": 4, "families": "both", "cells": 90},
             "vary": [{"parameter": "width", "from": 16.0, "to": 31.0, "count": 16}],
             "record": {"cutoffs": 3, "error_estimates": true, "single_mode_band": true},
             "chain_length": 3}
            """;

    @BeforeAll
    static void runOnceUninterrupted() throws IOException {
        sweepFile = dir.resolve("band.json");
        Files.writeString(sweepFile, SWEEP, StandardCharsets.UTF_8);
        Path whole = dir.resolve("whole.csv");
        CapturedRun run = CapturedRun.of("sweep", sweepFile.toString(), "-o", whole.toString(), "--format", "both",
                "--threads", "1");
        assertEquals(0, run.exitCode(), run.err());
        referenceCsv = merged("ref.csv", dir.resolve("whole.csv"));
        referenceJsonl = merged("ref.jsonl", dir.resolve("whole.jsonl"));
        assertEquals(17, new String(referenceCsv, StandardCharsets.UTF_8).split("\n").length, "header + 16 points");
    }

    private static byte[] merged(String name, Path... shards) throws IOException {
        List<String> args = new ArrayList<>(List.of("merge", dir.resolve(name).toString()));
        for (Path s : shards) {
            args.add(s.toString());
        }
        CapturedRun run = CapturedRun.of(args.toArray(String[]::new));
        assertEquals(0, run.exitCode(), run.err());
        return Files.readAllBytes(dir.resolve(name));
    }

    private static Process startSweep(Path out) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder builder = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                "org.sectio.cli.SectioMain", "sweep", sweepFile.toString(), "-o", out.toString(), "--format", "both",
                "--threads", "2");
        builder.redirectErrorStream(true);
        builder.redirectOutput(dir.resolve(out.getFileName() + ".log").toFile());
        return builder.start();
    }

    private static int lines(Path file) throws IOException {
        return Files.exists(file) ? (int) Files.readString(file, StandardCharsets.ISO_8859_1).chars()
                .filter(c -> c == '\n').count() : 0;
    }

    @Test
    void aSweepKilledMidwayAndRunAgainRecordsTheSameBytesAsOneUninterruptedRun() throws Exception {
        Path out = dir.resolve("killed.csv");
        Process first = startSweep(out);
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (lines(out) < 1 + 3 && first.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        first.destroyForcibly(); // SIGKILL: no shutdown hook, no flush
        first.waitFor(30, TimeUnit.SECONDS);
        int kept = lines(out) - 1;
        assertTrue(kept >= 3 && kept < 16, "the kill came midway: " + kept + " of 16 points recorded");
        // a write cut short by the kill: the last line has no newline
        Files.writeString(out, "12,16,ok,28.0,TE 1,5.3", StandardCharsets.UTF_8, StandardOpenOption.APPEND);
        Files.writeString(dir.resolve("killed.jsonl"), "{\"point\": 12, \"points_tot", StandardCharsets.UTF_8,
                StandardOpenOption.APPEND);

        Process second = startSweep(out);
        assertTrue(second.waitFor(120, TimeUnit.SECONDS), "the resumed sweep finishes");
        String log = Files.readString(dir.resolve("killed.csv.log"));
        assertEquals(0, second.exitValue(), log);
        assertTrue(log.contains("recorded before") && !log.contains(" 0 recorded before"), log);
        assertEquals(17, lines(out), "header + 16 records, the torn line dropped");

        assertArrayEquals(referenceCsv, merged("resumed.csv", out), "CSV after kill and resume");
        assertArrayEquals(referenceJsonl, merged("resumed.jsonl", dir.resolve("killed.jsonl")),
                "JSON Lines after kill and resume");
    }

    @Test
    void threeShardsMergedAreTheSameBytesAsOneRunAndMergeRefusesMissingOrRepeatedPoints() throws IOException {
        Path[] shards = new Path[3];
        for (int i = 0; i < 3; i++) {
            shards[i] = dir.resolve("part-" + i + ".csv");
            CapturedRun run = CapturedRun.of("sweep", sweepFile.toString(), "--shard", i + "/3", "-o",
                    shards[i].toString(), "--threads", i == 0 ? "4" : "2"); // 4 threads, 2 chains: 2 solver threads a point
            assertEquals(0, run.exitCode(), run.err());
            assertTrue(lines(shards[i]) > 1 && lines(shards[i]) < 17, "a shard holds a share");
        }
        assertArrayEquals(referenceCsv, merged("sharded.csv", shards));

        Path target = dir.resolve("bad-merge.csv");
        CapturedRun missing = CapturedRun.of("merge", target.toString(), shards[0].toString(), shards[2].toString());
        assertEquals(ErrorReporter.USAGE, missing.exitCode());
        assertTrue(missing.err().matches("sectio: point \\d+ of 16 is missing from the shards \\(\\d+ missing in all\\);"
                + " run its shard again\\R"), missing.err());
        // shard 1 holds chain 1 (points 3, 4, 5) and chain 4; point 3 is the first missing
        assertTrue(missing.err().startsWith("sectio: point 3 of 16"), missing.err());

        CapturedRun repeated = CapturedRun.of("merge", target.toString(), shards[0].toString(), shards[1].toString(),
                shards[2].toString(), shards[1].toString());
        assertEquals(ErrorReporter.USAGE, repeated.exitCode());
        assertTrue(repeated.err().startsWith("sectio: point ") && repeated.err().contains(" is repeated: "),
                repeated.err());
        assertFalse(Files.exists(target), "a refused merge writes nothing");
    }
}
