package org.sectio.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;

/**
 * Reads back the files of {@link MatrixMarketWriter}: Matrix Market {@code coordinate real symmetric}
 * matrices (R. F. Boisvert, R. Pozo, K. Remington, NISTIR 5935, 1996), whose entries are the lower
 * triangle, 1-based. The banner is matched without regard to case as the format allows; comment lines
 * ({@code %}) and blank lines are skipped.
 */
public final class MatrixMarketReader {

    private MatrixMarketReader() {
    }

    /**
     * Reads a symmetric matrix and stores both triangles.
     *
     * @param file a {@code coordinate real symmetric} Matrix Market file
     * @return the matrix with both triangles, sorted row indices
     * @throws MatrixMarketFormatException naming the line if the banner, size line or an entry is malformed,
     *         an index is out of range or above the diagonal, an entry is repeated, or the entry count differs
     * @throws UncheckedIOException if the file cannot be read
     */
    public static DMatrixSparseCSC readSymmetric(Path file) {
        Entries entries = read(file);
        DMatrixSparseTriplet triplets = new DMatrixSparseTriplet(entries.order, entries.order, 2 * entries.rows.length);
        for (int k = 0; k < entries.rows.length; k++) {
            triplets.addItem(entries.rows[k], entries.columns[k], entries.values[k]);
            if (entries.rows[k] != entries.columns[k]) {
                triplets.addItem(entries.columns[k], entries.rows[k], entries.values[k]);
            }
        }
        DMatrixSparseCSC matrix = DConvertMatrixStruct.convert(triplets, (DMatrixSparseCSC) null);
        matrix.sortIndices(null);
        return matrix;
    }

    /**
     * Reads a diagonal matrix written by {@link MatrixMarketWriter#writeDiagonal}.
     *
     * @param file a {@code coordinate real symmetric} Matrix Market file with only diagonal entries
     * @return the diagonal, length n; a diagonal entry not in the file is 0
     * @throws MatrixMarketFormatException naming the line if the file is malformed (as for
     *         {@link #readSymmetric}) or has an entry off the diagonal
     * @throws UncheckedIOException if the file cannot be read
     */
    public static double[] readDiagonal(Path file) {
        Entries entries = read(file);
        double[] diagonal = new double[entries.order];
        for (int k = 0; k < entries.rows.length; k++) {
            if (entries.rows[k] != entries.columns[k]) {
                throw new MatrixMarketFormatException(file, entries.lines[k], "entry (" + (entries.rows[k] + 1) + ","
                        + (entries.columns[k] + 1) + ") is off the diagonal; expected a diagonal matrix");
            }
            diagonal[entries.rows[k]] = entries.values[k];
        }
        return diagonal;
    }

    private record Entries(int order, int[] rows, int[] columns, double[] values, int[] lines) {
    }

    private static Entries read(Path file) {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.US_ASCII)) {
            return parse(file, in);
        } catch (IOException failure) {
            throw new UncheckedIOException("could not read Matrix Market file " + file + ": " + failure.getMessage(),
                    failure);
        }
    }

    private static Entries parse(Path file, BufferedReader in) throws IOException {
        String banner = in.readLine();
        String expected = MatrixMarketWriter.HEADER.toLowerCase(Locale.ROOT);
        if (banner == null || !String.join(" ", banner.trim().split("\\s+")).toLowerCase(Locale.ROOT).equals(expected)) {
            throw new MatrixMarketFormatException(file, 1, "banner is \"" + banner + "\"; expected \""
                    + MatrixMarketWriter.HEADER + "\"");
        }
        int lineNumber = 1;
        String line;
        long[] size = null;
        while (size == null && (line = in.readLine()) != null) {
            lineNumber++;
            String trimmed = line.trim();
            if (trimmed.isEmpty() || trimmed.startsWith("%")) {
                continue;
            }
            size = integers(file, lineNumber, trimmed, "size line \"rows columns entries\"");
        }
        if (size == null) {
            throw new MatrixMarketFormatException(file, 0, "no size line; expected \"rows columns entries\"");
        }
        if (size[0] != size[1] || size[0] < 0 || size[0] > Integer.MAX_VALUE || size[2] < 0
                || size[2] > Math.min(Integer.MAX_VALUE - 8, size[0] * (size[0] + 1) / 2)) {
            throw new MatrixMarketFormatException(file, lineNumber, "size " + size[0] + " x " + size[1] + " with "
                    + size[2] + " entries is not a square symmetric matrix's lower triangle");
        }
        int order = (int) size[0];
        int count = (int) size[2];
        int[] rows = new int[count];
        int[] columns = new int[count];
        double[] values = new double[count];
        int[] lines = new int[count];
        java.util.Set<Long> seen = new java.util.HashSet<>();
        int k = 0;
        while ((line = in.readLine()) != null) {
            lineNumber++;
            String trimmed = line.trim();
            if (trimmed.isEmpty() || trimmed.startsWith("%")) {
                continue;
            }
            if (k == count) {
                throw new MatrixMarketFormatException(file, lineNumber, "more entries than the " + count
                        + " announced on the size line");
            }
            String[] fields = trimmed.split("\\s+");
            if (fields.length != 3) {
                throw new MatrixMarketFormatException(file, lineNumber, "\"" + trimmed
                        + "\" has " + fields.length + " fields; expected \"row column value\"");
            }
            long row = integer(file, lineNumber, fields[0]);
            long column = integer(file, lineNumber, fields[1]);
            if (row < 1 || row > order || column < 1 || column > row) {
                throw new MatrixMarketFormatException(file, lineNumber, "entry (" + row + "," + column
                        + ") is outside the lower triangle of a " + order + " x " + order + " matrix (1-based)");
            }
            if (!seen.add((row - 1) * order + (column - 1))) {
                throw new MatrixMarketFormatException(file, lineNumber, "entry (" + row + "," + column + ") repeated");
            }
            rows[k] = (int) row - 1;
            columns[k] = (int) column - 1;
            values[k] = real(file, lineNumber, fields[2]);
            lines[k] = lineNumber;
            k++;
        }
        if (k != count) {
            throw new MatrixMarketFormatException(file, 0, "found " + k + " entries but the size line announced "
                    + count);
        }
        return new Entries(order, rows, columns, values, lines);
    }

    private static long[] integers(Path file, int lineNumber, String text, String what) {
        String[] fields = text.split("\\s+");
        if (fields.length != 3) {
            throw new MatrixMarketFormatException(file, lineNumber, "\"" + text + "\" is not a " + what);
        }
        long[] numbers = new long[3];
        for (int i = 0; i < 3; i++) {
            numbers[i] = integer(file, lineNumber, fields[i]);
        }
        return numbers;
    }

    private static long integer(Path file, int lineNumber, String field) {
        try {
            return Long.parseLong(field);
        } catch (NumberFormatException notInteger) {
            throw new MatrixMarketFormatException(file, lineNumber, "\"" + field + "\" is not an integer");
        }
    }

    private static double real(Path file, int lineNumber, String field) {
        try {
            double value = Double.parseDouble(field);
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException notReal) {
            // reported below
        }
        throw new MatrixMarketFormatException(file, lineNumber, "\"" + field + "\" is not a finite real number");
    }
}
