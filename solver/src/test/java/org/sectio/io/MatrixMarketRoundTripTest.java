package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.data.DMatrixSparseTriplet;
import org.ejml.ops.DConvertMatrixStruct;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Round trips and format errors of the Matrix Market coordinate format (NISTIR 5935, 1996). */
class MatrixMarketRoundTripTest {

    @TempDir
    Path directory;

    private static DMatrixSparseCSC randomSymmetric(int n, long seed) {
        Random random = new Random(seed);
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(n, n, 4 * n);
        for (int i = 0; i < n; i++) {
            t.addItem(i, i, random.nextGaussian() * Math.pow(10, random.nextInt(40) - 20));
            int j = random.nextInt(n);
            if (j < i) {
                double value = -random.nextDouble() / 3;
                t.addItem(i, j, value);
                t.addItem(j, i, value);
            }
        }
        return DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
    }

    @Test
    @DisplayName("a symmetric matrix reads back bit for bit, both triangles")
    void symmetricMatrixRoundTripsExactly() {
        DMatrixSparseCSC matrix = randomSymmetric(120, 4L);
        Path file = directory.resolve("stiffness.mtx");
        MatrixMarketWriter.writeSymmetric(file, matrix, "Sectio stiffness matrix A of the TE pencil A x = lambda M x");
        DMatrixSparseCSC back = MatrixMarketReader.readSymmetric(file);
        assertEquals(matrix.numRows, back.numRows);
        assertEquals(matrix.nz_length, back.nz_length);
        for (int i = 0; i < matrix.numRows; i++) {
            for (int j = 0; j < matrix.numCols; j++) {
                assertEquals(Double.doubleToLongBits(matrix.get(i, j)), Double.doubleToLongBits(back.get(i, j)),
                        "entry (" + i + "," + j + ")");
            }
        }
    }

    @Test
    @DisplayName("a diagonal reads back bit for bit and is written as n diagonal entries under the NIST banner")
    void diagonalRoundTripsExactly() throws IOException {
        double[] diagonal = {1.0, 1e-300, Math.PI, 0.1 + 0.2, 6.02214076e23};
        Path file = directory.resolve("mass.mtx");
        MatrixMarketWriter.writeDiagonal(file, diagonal, "Sectio diagonal mass matrix M\nof the TE pencil");
        List<String> lines = Files.readAllLines(file);
        assertEquals("%%MatrixMarket matrix coordinate real symmetric", lines.get(0));
        assertEquals("% Sectio diagonal mass matrix M", lines.get(1));
        assertEquals("% of the TE pencil", lines.get(2));
        assertEquals("5 5 5", lines.get(3));
        assertEquals("3 3 " + Math.PI, lines.get(6));
        assertArrayEquals(diagonal, MatrixMarketReader.readDiagonal(file), 0.0);
        try (var listing = Files.list(directory)) {
            assertEquals(1, listing.count(), "no temporary file left behind");
        }
    }

    @Test
    @DisplayName("a malformed entry is reported with its 1-based line number")
    void malformedEntryNamesItsLine() throws IOException {
        Path file = directory.resolve("broken.mtx");
        Files.writeString(file, "%%MatrixMarket matrix coordinate real symmetric\n% comment\n3 3 3\n1 1 2.0\n"
                + "2 1 oops\n3 3 1.0\n");
        MatrixMarketFormatException failure = assertThrows(MatrixMarketFormatException.class,
                () -> MatrixMarketReader.readSymmetric(file));
        assertEquals(5, failure.lineNumber());
        assertTrue(failure.getMessage().contains("line 5") && failure.getMessage().contains("oops"), failure.getMessage());
    }

    @Test
    @DisplayName("an entry above the diagonal of a symmetric file is reported with its line number")
    void upperTriangleEntryNamesItsLine() throws IOException {
        Path file = directory.resolve("upper.mtx");
        Files.writeString(file, "%%MatrixMarket matrix coordinate real symmetric\n2 2 2\n1 1 2.0\n1 2 -1.0\n");
        MatrixMarketFormatException failure = assertThrows(MatrixMarketFormatException.class,
                () -> MatrixMarketReader.readSymmetric(file));
        assertEquals(4, failure.lineNumber());
    }

    @Test
    @DisplayName("a general (non-symmetric) banner is refused on line 1")
    void generalBannerIsRefused() throws IOException {
        Path file = directory.resolve("general.mtx");
        Files.writeString(file, "%%MatrixMarket matrix coordinate real general\n1 1 1\n1 1 2.0\n");
        MatrixMarketFormatException failure = assertThrows(MatrixMarketFormatException.class,
                () -> MatrixMarketReader.readSymmetric(file));
        assertEquals(1, failure.lineNumber());
    }

    @Test
    @DisplayName("an off-diagonal entry in a diagonal file is refused with its line number")
    void offDiagonalEntryInADiagonalFileIsRefused() {
        DMatrixSparseCSC matrix = randomSymmetric(10, 8L);
        Path file = directory.resolve("notdiagonal.mtx");
        MatrixMarketWriter.writeSymmetric(file, matrix, "not diagonal");
        MatrixMarketFormatException failure = assertThrows(MatrixMarketFormatException.class,
                () -> MatrixMarketReader.readDiagonal(file));
        assertTrue(failure.lineNumber() > 3, failure.getMessage());
    }

    @Test
    @DisplayName("a non-symmetric matrix is refused before anything is written")
    void nonSymmetricMatrixIsRefused() {
        DMatrixSparseTriplet t = new DMatrixSparseTriplet(2, 2, 3);
        t.addItem(0, 0, 1.0);
        t.addItem(1, 0, 2.0);
        t.addItem(1, 1, 1.0);
        DMatrixSparseCSC lowerOnly = DConvertMatrixStruct.convert(t, (DMatrixSparseCSC) null);
        Path file = directory.resolve("asym.mtx");
        IllegalArgumentException failure = assertThrows(IllegalArgumentException.class,
                () -> MatrixMarketWriter.writeSymmetric(file, lowerOnly, "asymmetric"));
        assertTrue(failure.getMessage().contains("a(2,1) = 2.0"), failure.getMessage());
        assertTrue(Files.notExists(file));
    }

    @Test
    @DisplayName("writing into a missing directory fails without leaving a file and keeps no partial output")
    void failedWriteLeavesNothing() {
        Path file = directory.resolve("missing").resolve("m.mtx");
        assertThrows(UncheckedIOException.class,
                () -> MatrixMarketWriter.writeDiagonal(file, new double[] {1.0}, "mass"));
        assertTrue(Files.notExists(file));
    }
}
