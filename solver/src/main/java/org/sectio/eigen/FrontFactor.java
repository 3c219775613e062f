package org.sectio.eigen;

/**
 * The columns of {@code L} owned by one front, held in a shared storage array: the dense lower
 * triangle {@code L11} of its {@code width} columns packed by rows ({@code L11[r][c]} at
 * {@code offset + r(r+1)/2 + c}), followed by the dense block {@code L21} of the boundary rows,
 * row-major ({@code L21[i][c]} at {@code offset + width(width+1)/2 + i·width + c}).
 *
 * @param columnStart elimination position of the first column
 * @param width number of columns
 * @param boundary elimination positions of the boundary rows, ascending, all after the front's columns
 * @param storage array holding this front's entries (shared with other fronts)
 * @param offset index of {@code L11[0][0]} in {@code storage}
 */
record FrontFactor(int columnStart, int width, int[] boundary, double[] storage, int offset) {

    FrontFactor {
        if (width < 0 || offset < 0 || offset + nonZeros(width, boundary.length) > storage.length) {
            throw new IllegalArgumentException("front factor: " + width + " columns and " + boundary.length
                    + " boundary rows at offset " + offset + " do not fit a storage of " + storage.length + " entries");
        }
    }

    private static long nonZeros(long width, long boundaryRows) {
        return width * (width + 1) / 2 + width * boundaryRows;
    }

    /** @return index of {@code L21[0][0]} in {@link #storage()} */
    int boundaryOffset() {
        return offset + width * (width + 1) / 2;
    }

    /** @return stored entries of {@code L} in this front */
    long nonZeros() {
        return nonZeros(width, boundary.length);
    }
}
