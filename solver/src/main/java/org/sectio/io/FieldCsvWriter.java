package org.sectio.io;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.sectio.modes.FieldMap;

/**
 * Writes a mode's field samples as CSV with the header {@code x_m,y_m,value}: one row per sample inside
 * the guide (samples outside, NaN in the map, are left out), row by row from the lowest y, x ascending
 * within a row. Coordinates in metres; the value is the normalized longitudinal field (largest
 * magnitude 1). Numbers print the shortest decimal that reads back to the same double.
 */
public final class FieldCsvWriter {

    /** The header row. */
    public static final String HEADER = "x_m,y_m,value";

    private FieldCsvWriter() {
    }

    /**
     * @param field the samples
     * @param out where to write; flushed, not closed
     * @throws IOException if writing fails
     */
    public static void write(FieldMap field, Writer out) throws IOException {
        double[] xs = field.xCoordinates();
        double[] ys = field.yCoordinates();
        double[] values = field.values();
        StringBuilder row = new StringBuilder(64);
        out.write(HEADER);
        out.write('\n');
        for (int j = 0; j < ys.length; j++) {
            for (int i = 0; i < xs.length; i++) {
                double value = values[j * xs.length + i];
                if (Double.isFinite(value)) {
                    row.setLength(0);
                    row.append(xs[i]).append(',').append(ys[j]).append(',').append(value).append('\n');
                    out.append(row);
                }
            }
        }
        out.flush();
    }

    /**
     * Writes the samples to a file atomically (see {@link AtomicFile}).
     *
     * @param field the samples
     * @param file the file to create or replace; its folder must exist
     * @throws IOException if the file cannot be written; an earlier file of that name is then kept
     */
    public static void write(FieldMap field, Path file) throws IOException {
        AtomicFile.write(file, out -> write(field, new OutputStreamWriter(out, StandardCharsets.UTF_8)));
    }
}
