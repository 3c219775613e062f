package org.sectio.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.modes.ModeSolver;

/**
 * A sweep over the broad side a of a rectangular guide reproduces the TE10 cutoff kc = π/a, i.e.
 * fc = c / (2a), at every point (closed form: Pozar, Microwave Engineering, 4th ed., §3.3), within
 * the error the solver estimates for itself. Measured at 60 cells along a: the true error is 1.142e-4 at
 * every point, (π/60)²/24 as the three-point difference of sin(πx/a) predicts, and the estimate
 * 2.285e-4, twice it (the estimate's safety factor of 2).
 */
class RectangleWidthSweepTest {

    @TempDir
    Path dir;

    @Test
    void everyPointOfAWidthSweepHasTheClosedFormTe10CutoffWithinItsOwnEstimate() throws Exception {
        String text = """
                {"family": "rectangular", "set": {"height": 10.16},
                 "solve": {"modes": 2, "families": "te", "cells": 60},
                 "vary": [{"parameter": "width", "values": [12.0, 16.5, 22.86, 30.0]}],
                 "record": {"cutoffs": 1, "error_estimates": true}}
                """;
        SweepDefinition sweep = SweepFileReader.parse("width.json", text, dir);
        Path out = dir.resolve("width.jsonl");
        SweepRunner.Summary summary = SweepRunner.run(sweep, List.of(new SweepRunner.Output(out, RecordFormat.JSONL)),
                Shard.ALL, 2, SweepListener.SILENT);
        assertEquals(4, summary.solved());
        assertEquals(0, summary.failed());
        ObjectMapper json = new ObjectMapper();
        List<String> lines = Files.readAllLines(out);
        assertEquals(4, lines.size());
        for (String line : lines) {
            JsonNode record = json.readTree(line);
            double a = record.get("parameters").get("width").doubleValue() * 1e-3;
            JsonNode values = record.get("values");
            assertEquals("TE 1", values.get("mode1").textValue(), line);
            double fc = values.get("mode1_cutoff_hz").doubleValue();
            double estimate = values.get("mode1_error_estimate").doubleValue();
            double exact = ModeSolver.SPEED_OF_LIGHT / (2 * a); // Pozar §3.3: kc = π/a
            double error = Math.abs(fc - exact) / exact;
            assertTrue(error <= estimate, "a = " + a + " m: error " + error + " above the estimate " + estimate);
            assertTrue(estimate <= 3 * error, "a = " + a + " m: estimate " + estimate + " far above the error " + error);
        }
    }
}
