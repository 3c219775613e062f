package org.sectio.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.file.SectionFileException;

/**
 * The example sweep files read, describe the Corvel Ridge observatory, and the double-ridge gap sweep
 * that docs/sweep-files.md shows has the points it says: 3 ridge widths × 9 gaps, 2.0 … 6.0 mm in
 * steps of 0.5 with both ends included, the last axis varying fastest.
 */
class ExampleSweepFilesTest {

    private static final Path EXAMPLES = Path.of("..", "examples", "sweeps");

    @Test
    void everyExampleSweepFileReadsAndNamesTheScenario() throws IOException, SectionFileException {
        List<Path> files;
        try (Stream<Path> listing = Files.list(EXAMPLES)) {
            files = listing.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertFalse(files.isEmpty(), "examples found in " + EXAMPLES.toAbsolutePath());
        for (Path file : files) {
            SweepDefinition sweep = SweepFileReader.read(file);
            assertTrue(sweep.pointCount() > 1, file.toString());
            assertTrue(Files.readString(file).contains("Corvel Ridge observatory"), file + " names the scenario");
        }
    }

    @Test
    void theRidgeGapExampleHasTheGridItsDocumentDescribes() throws IOException, SectionFileException {
        SweepDefinition sweep = SweepFileReader.read(EXAMPLES.resolve("corvel-double-ridge-gap.json"));
        assertEquals(27, sweep.pointCount());
        assertEquals(List.of("ridge_width", "gap"), sweep.parameterNames());
        assertEquals(2.0, sweep.point(0).values().get("gap"));
        assertEquals(6.0, sweep.point(8).values().get("gap"));
        assertEquals(5.0, sweep.point(8).values().get("ridge_width"));
        assertEquals(5.715, sweep.point(9).values().get("ridge_width"));
        assertEquals(2.0, sweep.point(9).values().get("gap"));
        assertEquals(4, sweep.chainCount(), "chains of 8: 0-7, 8-15, 16-23, 24-26");
    }
}
