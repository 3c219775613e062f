package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FieldCsvWriterTest {

    @TempDir
    Path folder;

    private static final String EXPECTED = """
            x_m,y_m,value
            0.0,0.0,0.25
            0.005,0.0,-1.0
            0.01,0.0,0.5
            0.0,0.002,1.0
            0.01,0.002,-0.125
            """;

    @Test
    void writesOneRowPerInsideSampleRowByRowAndSkipsOutsidePoints() throws IOException {
        StringWriter out = new StringWriter();
        FieldCsvWriter.write(SampleModes.smallField(), out);
        assertEquals(EXPECTED, out.toString());
    }

    @Test
    void writesTheSameTextToAFileInPlaceOfAnOlderOne() throws IOException {
        Path file = folder.resolve("te-1.csv");
        Files.writeString(file, "stale");
        FieldCsvWriter.write(SampleModes.smallField(), file);
        assertEquals(EXPECTED, Files.readString(file));
    }
}
