package org.sectio.operator;

import org.ejml.data.DMatrixSparseCSC;

/**
 * Sums (row, column, value) contributions into compressed sparse columns without a general sort:
 * entries are bucketed by column (counting sort), then each short column is sorted by row and its
 * duplicates are added. Optionally carries an imaginary part with the same pattern.
 */
final class PairAccumulator {

    private final int size;
    private final int[] rows;
    private final int[] columns;
    private final double[] real;
    private final double[] imaginary;
    private int count;

    PairAccumulator(int size, int capacity, boolean complex) {
        this.size = size;
        this.rows = new int[capacity];
        this.columns = new int[capacity];
        this.real = new double[capacity];
        this.imaginary = complex ? new double[capacity] : null;
    }

    void add(int row, int column, double re, double im) {
        rows[count] = row;
        columns[count] = column;
        real[count] = re;
        if (imaginary != null) {
            imaginary[count] = im;
        }
        count++;
    }

    /** @return the real part and the imaginary part (null when not complex), same pattern */
    DMatrixSparseCSC[] build() {
        int[] start = new int[size + 1];
        for (int k = 0; k < count; k++) {
            start[columns[k] + 1]++;
        }
        for (int c = 0; c < size; c++) {
            start[c + 1] += start[c];
        }
        int[] next = start.clone();
        int[] order = new int[count];
        for (int k = 0; k < count; k++) {
            order[next[columns[k]]++] = k;
        }
        DMatrixSparseCSC re = new DMatrixSparseCSC(size, size, count);
        DMatrixSparseCSC im = imaginary == null ? null : new DMatrixSparseCSC(size, size, count);
        int out = 0;
        for (int c = 0; c < size; c++) {
            re.col_idx[c] = out;
            int from = start[c];
            int to = start[c + 1];
            for (int a = from + 1; a < to; a++) {
                int key = order[a];
                int b = a - 1;
                while (b >= from && rows[order[b]] > rows[key]) {
                    order[b + 1] = order[b];
                    b--;
                }
                order[b + 1] = key;
            }
            for (int a = from; a < to; a++) {
                int k = order[a];
                if (out > re.col_idx[c] && re.nz_rows[out - 1] == rows[k]) {
                    re.nz_values[out - 1] += real[k];
                    if (im != null) {
                        im.nz_values[out - 1] += imaginary[k];
                    }
                } else {
                    re.nz_rows[out] = rows[k];
                    re.nz_values[out] = real[k];
                    if (im != null) {
                        im.nz_rows[out] = rows[k];
                        im.nz_values[out] = imaginary[k];
                    }
                    out++;
                }
            }
        }
        re.col_idx[size] = out;
        re.nz_length = out;
        re.indicesSorted = true;
        if (im != null) {
            System.arraycopy(re.col_idx, 0, im.col_idx, 0, size + 1);
            im.nz_length = out;
            im.indicesSorted = true;
        }
        return new DMatrixSparseCSC[] {re, im};
    }
}
