package org.sectio.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A point whose value the shape refuses is recorded as failed with the shape's one-line reason, and
 * the points after it are still solved: a double-ridge gap of 12 mm in a 10.16 mm high guide breaks
 * the family's rule gap &lt; height (docs/geometry-files.md, double_ridge table).
 */
class FailedPointTest {

    @TempDir
    Path dir;

    @Test
    void aRefusedValueIsAFailedRecordWithItsReasonAndTheRestGoOn() throws Exception {
        String text = """
                {"family": "double_ridge", "solve": {"modes": 3, "cells": 40},
                 "vary": [{"parameter": "gap", "values": [3.0, 12.0, 4.0]}],
                 "record": {"cutoffs": 2}, "chain_length": 3}
                """;
        SweepDefinition sweep = SweepFileReader.parse("gap.json", text, dir);
        Path out = dir.resolve("gap.jsonl");
        SweepRunner.Summary summary = SweepRunner.run(sweep, List.of(new SweepRunner.Output(out, RecordFormat.JSONL)),
                Shard.ALL, 1, SweepListener.SILENT);
        assertEquals(3, summary.solved());
        assertEquals(1, summary.failed());
        ObjectMapper json = new ObjectMapper();
        TreeMap<Integer, JsonNode> byPoint = new TreeMap<>();
        for (String line : Files.readAllLines(out)) {
            JsonNode r = json.readTree(line);
            byPoint.put(r.get("point").intValue(), r);
        }
        JsonNode bad = byPoint.get(1);
        assertEquals("failed", bad.get("status").textValue());
        assertEquals("double_ridge: gap must be > 0 and < height (10.16 mm), got 12 mm", bad.get("reason").textValue());
        assertTrue(bad.get("values").get("mode1_cutoff_hz").isNull());
        for (int ok : new int[] {0, 2}) {
            JsonNode r = byPoint.get(ok);
            assertEquals("ok", r.get("status").textValue());
            assertTrue(r.get("values").get("mode1_cutoff_hz").doubleValue() > 1e9);
            assertFalse(r.get("reason").textValue().contains("gap"));
        }
        // a narrower gap lowers the dominant cutoff (ridge loading; S. B. Cohn, Proc. IRE 35 (1947) 783, from memory)
        assertTrue(byPoint.get(0).get("values").get("mode1_cutoff_hz").doubleValue()
                < byPoint.get(2).get("values").get("mode1_cutoff_hz").doubleValue());
    }
}
