package org.sectio.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.ejml.data.DMatrixSparseCSC;

/**
 * Writes the matrices of a symmetric pencil {@code A x = λ M x} in the Matrix Market coordinate format
 * ({@code %%MatrixMarket matrix coordinate real symmetric}) of R. F. Boisvert, R. Pozo and K. Remington,
 * "The Matrix Market Exchange Formats: Initial Design", NISTIR 5935, NIST 1996: a header line, comment
 * lines starting with {@code %}, a size line {@code rows columns entries}, then one {@code row column value}
 * line per stored entry, 1-based, of the lower triangle only (row ≥ column), as the symmetric variant requires.
 *
 * <p>Values are written with {@link Double#toString(double)}, the shortest decimal that reads back to the
 * same double, so a round trip is exact. Each file is written to a temporary file in the target directory
 * and then moved into place atomically, so a reader never sees a half-written file and a failure leaves
 * any earlier file untouched.
 */
public final class MatrixMarketWriter {

    static final String HEADER = "%%MatrixMarket matrix coordinate real symmetric";

    private MatrixMarketWriter() {
    }

    /**
     * Writes a sparse symmetric matrix (both triangles stored) by its lower triangle.
     *
     * @param file where to write; its parent directory must exist
     * @param matrix square and exactly symmetric ({@code a(i,j) == a(j,i)} bit for bit); not modified
     * @param description comment text put after the header, one {@code %} line per line of text, e.g.
     *        "Sectio stiffness matrix A of the TE pencil A x = lambda M x"
     * @throws IllegalArgumentException if the matrix is not square or not exactly symmetric
     * @throws UncheckedIOException if the file cannot be written (nothing is left at {@code file} then
     *         but what was there before)
     */
    public static void writeSymmetric(Path file, DMatrixSparseCSC matrix, String description) {
        int n = matrix.numRows;
        if (matrix.numCols != n) {
            throw new IllegalArgumentException("Matrix Market symmetric needs a square matrix, got " + n + " x "
                    + matrix.numCols);
        }
        int lowerEntries = 0;
        for (int column = 0; column < n; column++) {
            for (int p = matrix.col_idx[column]; p < matrix.col_idx[column + 1]; p++) {
                int row = matrix.nz_rows[p];
                double value = matrix.nz_values[p];
                double mirror = matrix.get(column, row);
                if (Double.doubleToLongBits(value) != Double.doubleToLongBits(mirror)) {
                    throw new IllegalArgumentException("matrix is not symmetric: a(" + (row + 1) + "," + (column + 1)
                            + ") = " + value + " but a(" + (column + 1) + "," + (row + 1) + ") = " + mirror
                            + " (1-based); symmetrize it before writing");
                }
                if (row >= column) {
                    lowerEntries++;
                }
            }
        }
        int entries = lowerEntries;
        writeAtomically(file, out -> {
            writeHead(out, description, n, entries);
            for (int column = 0; column < n; column++) {
                for (int p = matrix.col_idx[column]; p < matrix.col_idx[column + 1]; p++) {
                    int row = matrix.nz_rows[p];
                    if (row >= column) {
                        writeEntry(out, row, column, matrix.nz_values[p]);
                    }
                }
            }
        });
    }

    /**
     * Writes a diagonal matrix {@code diag(d)} as n diagonal entries of a symmetric coordinate matrix.
     *
     * @param file where to write; its parent directory must exist
     * @param diagonal the diagonal entries, finite
     * @param description comment text put after the header, e.g. "Sectio diagonal mass matrix M of the TE
     *        pencil A x = lambda M x"
     * @throws IllegalArgumentException if an entry is not finite
     * @throws UncheckedIOException if the file cannot be written
     */
    public static void writeDiagonal(Path file, double[] diagonal, String description) {
        for (int i = 0; i < diagonal.length; i++) {
            if (!Double.isFinite(diagonal[i])) {
                throw new IllegalArgumentException("diagonal entry " + (i + 1) + " (1-based) is " + diagonal[i]
                        + "; Matrix Market real entries must be finite");
            }
        }
        writeAtomically(file, out -> {
            writeHead(out, description, diagonal.length, diagonal.length);
            for (int i = 0; i < diagonal.length; i++) {
                writeEntry(out, i, i, diagonal[i]);
            }
        });
    }

    @FunctionalInterface
    private interface Body {
        void write(BufferedWriter out) throws IOException;
    }

    private static void writeHead(BufferedWriter out, String description, int n, int entries) throws IOException {
        out.write(HEADER);
        out.newLine();
        for (String line : description.split("\\R", -1)) {
            out.write("% ");
            out.write(asciiComment(line));
            out.newLine();
        }
        out.write(n + " " + n + " " + entries);
        out.newLine();
    }

    /** Matrix Market files are ASCII: the few non-ASCII signs of our names become ASCII, others '?'. */
    static String asciiComment(String text) {
        StringBuilder b = new StringBuilder(text.length());
        for (char ch : text.replace("×", "x").replace("°", " deg").replace("…", "...").toCharArray()) {
            b.append(ch < 128 ? ch : '?');
        }
        return b.toString();
    }

    private static void writeEntry(BufferedWriter out, int row, int column, double value) throws IOException {
        out.write(Integer.toString(row + 1));
        out.write(' ');
        out.write(Integer.toString(column + 1));
        out.write(' ');
        out.write(Double.toString(value));
        out.newLine();
    }

    private static void writeAtomically(Path file, Body body) {
        Path target = file.toAbsolutePath();
        try {
            AtomicFile.write(target, stream -> {
                BufferedWriter out = new BufferedWriter(new OutputStreamWriter(stream, StandardCharsets.US_ASCII));
                body.write(out);
                out.flush();
            });
        } catch (IOException failure) {
            throw new UncheckedIOException("could not write Matrix Market file " + target + ": " + failure.getMessage()
                    + "; check that the directory exists and is writable", failure);
        }
    }
}
