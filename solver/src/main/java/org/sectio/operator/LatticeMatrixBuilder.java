package org.sectio.operator;

import org.ejml.data.DMatrixSparseCSC;

/**
 * Builds a symmetric 5-point or 9-point lattice matrix column by column in compressed sparse column
 * form. Unknowns are numbered row by row, so the neighbours of a column come in the order down, left,
 * self, right, up (with diagonal neighbours: down-left, down, down-right, left, self, right, up-left,
 * up, up-right), which is already the sorted row order CSC wants: no triplet sort is needed.
 */
final class LatticeMatrixBuilder {

    private final int[] columnStart;
    private final int[] rowIndex;
    private final double[] value;
    private int entries;
    private int column;

    /** A builder for at most 5 entries per column (5-point stencil). */
    LatticeMatrixBuilder(int size) {
        this(size, 5);
    }

    /** A builder for at most {@code perColumn} entries per column (5 or 9 for the lattice stencils). */
    LatticeMatrixBuilder(int size, int perColumn) {
        columnStart = new int[size + 1];
        rowIndex = new int[perColumn * size];
        value = new double[perColumn * size];
    }

    /** Adds entry (row, current column); rows must come in ascending order within a column. */
    void add(int row, double v) {
        rowIndex[entries] = row;
        value[entries] = v;
        entries++;
    }

    /** Ends the current column. */
    void endColumn() {
        column++;
        columnStart[column] = entries;
    }

    DMatrixSparseCSC build() {
        int n = columnStart.length - 1;
        if (column != n) {
            throw new IllegalStateException("built " + column + " of " + n + " columns");
        }
        DMatrixSparseCSC m = new DMatrixSparseCSC(n, n, entries);
        System.arraycopy(columnStart, 0, m.col_idx, 0, n + 1);
        System.arraycopy(rowIndex, 0, m.nz_rows, 0, entries);
        System.arraycopy(value, 0, m.nz_values, 0, entries);
        m.nz_length = entries;
        m.indicesSorted = true;
        return m;
    }
}
