package org.sectio.eigen;

/**
 * The factor held by one front of a multifrontal LU: its own block with {@code L11} (unit lower,
 * diagonal not stored) and {@code U11} together, {@code width} × {@code width} row-major; {@code L21}
 * of the boundary rows by columns ({@code L21[i][c]} at {@code c · boundary.length + i}); {@code U12}
 * ({@code width} × {@code boundary.length}, row-major); and the row swaps of its partial pivoting
 * ({@code pivots[c]} was swapped with row c, applied in order c = 0, 1, …).
 *
 * @param start elimination position of the first own column
 * @param width own columns
 * @param boundary elimination positions of the boundary rows and columns, ascending, all after the front's own
 * @param own L11 and U11
 * @param lower L21
 * @param upper U12
 * @param pivots row swaps
 */
record LuFront(int start, int width, int[] boundary, double[] own, double[] lower, double[] upper, int[] pivots) {

    /** @return stored entries of L and U */
    long entries() {
        return (long) own.length + lower.length + upper.length;
    }
}
