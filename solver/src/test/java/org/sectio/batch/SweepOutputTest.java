package org.sectio.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The output file's safety rules (docs/sweep-files.md, "Outputs and resuming"), on hand-written files
 * with no solve: a torn last line or header is cut off, a record of another sweep or a repeated point
 * is refused without touching the file, and a second writer of the same file is refused.
 */
class SweepOutputTest {

    @TempDir
    Path dir;

    private SweepDefinition sweep() throws Exception {
        return SweepFileReader.parse("s.json", """
                {"family": "rectangular", "solve": {"modes": 1, "cells": 16},
                 "vary": [{"parameter": "width", "values": [20.0, 21.0, 22.0]}], "record": {"cutoffs": 1}}
                """, dir);
    }

    private static final String HEADER = "point,points_total,status,width,mode1,mode1_cutoff_hz,reason\n";

    @Test
    void aTornLastLineIsCutOffAndItsPointCountsAsMissing() throws Exception {
        Path file = dir.resolve("o.csv");
        Files.writeString(file, HEADER + "1,3,ok,21.0,TE 1,7.1E9,\n2,3,ok,22.0,TE", StandardCharsets.UTF_8);
        try (SweepOutput out = SweepOutput.open(file, RecordFormat.CSV, sweep())) {
            assertTrue(out.has(1));
            assertFalse(out.has(2));
            assertEquals(1, out.count());
        }
        assertEquals(HEADER + "1,3,ok,21.0,TE 1,7.1E9,\n", Files.readString(file));
    }

    @Test
    void aTornHeaderIsWrittenAgain() throws Exception {
        Path file = dir.resolve("h.csv");
        Files.writeString(file, "point,points_to", StandardCharsets.UTF_8);
        try (SweepOutput out = SweepOutput.open(file, RecordFormat.CSV, sweep())) {
            assertEquals(0, out.count());
        }
        assertEquals(HEADER, Files.readString(file));
    }

    @Test
    void recordsOfAnotherSweepOrRepeatedPointsAreRefusedAndTheFileKept() throws Exception {
        for (String body : List.of("1,3,ok,21.5,TE 1,7.1E9,\n", "1,4,ok,21.0,TE 1,7.1E9,\n",
                "1,3,ok,21.0,TE 1,7.1E9,\n1,3,ok,21.0,TE 1,7.1E9,\n")) {
            Path file = dir.resolve("x.csv");
            Files.writeString(file, HEADER + body + "2,3,ok,2", StandardCharsets.UTF_8);
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> SweepOutput.open(file, RecordFormat.CSV, sweep()));
            assertTrue(e.getMessage().contains("line "), e.getMessage());
            assertEquals(HEADER + body + "2,3,ok,2", Files.readString(file), "left as it was");
        }
    }

    @Test
    void aSecondWriterOfTheSameFileIsRefused() throws Exception {
        Path file = dir.resolve("w.jsonl");
        try (SweepOutput first = SweepOutput.open(file, RecordFormat.JSONL, sweep())) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> SweepOutput.open(file, RecordFormat.JSONL, sweep()));
            assertTrue(e.getMessage().contains("another running sweep"), e.getMessage());
            assertEquals(0, first.count());
        }
    }
}
