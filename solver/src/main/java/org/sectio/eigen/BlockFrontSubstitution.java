package org.sectio.eigen;

/**
 * Per-front forward and back substitution for {@code k} right-hand sides at once, so that each
 * entry of {@code L} is read from memory once for all of them (the triangular solve with several
 * right-hand sides, Golub and Van Loan, "Matrix Computations", 4th ed., §3.1.5). The vectors are
 * interleaved: entry {@code p} of vector {@code j} is {@code work[p·k + j]}. Every vector goes
 * through exactly the operations, in exactly the order, of {@link FrontSubstitution} (same four-row
 * grouping of the boundary, same summation order), so each result is bitwise equal to a solve of
 * that vector alone (the forward {@code L11} solve is written column by column, which performs the
 * same subtractions in the same order as the row-oriented one). {@code scratch} needs {@code k}
 * times the boundary size.
 */
final class BlockFrontSubstitution {

    private BlockFrontSubstitution() {
    }

    /** {@code Y = L11⁻¹ W_own}; {@code W_boundary −= L21 Y} for the {@code k} interleaved vectors. */
    static void forward(FrontFactor front, double[] work, double[] scratch, int k) {
        double[] l = front.storage();
        int offset = front.offset();
        int start = front.columnStart();
        int width = front.width();
        int[] rows = front.boundary();
        for (int c = 0, diagonal = offset; c < width; diagonal += ++c + 1) {
            int source = (start + c) * k;
            double pivot = l[diagonal];
            for (int j = 0; j < k; j++) {
                work[source + j] /= pivot;
            }
            for (int r = c + 1, entry = diagonal + c + 1; r < width; entry += ++r) {
                double a = l[entry];
                int target = (start + r) * k;
                for (int j = 0; j < k; j++) {
                    work[target + j] -= a * work[source + j];
                }
            }
        }
        int count = rows.length;
        int base = start * k;
        for (int i = 0, position = offset + width * (width + 1) / 2; i < count; i++, position += width) {
            int sum = i * k;
            for (int j = 0; j < k; j++) {
                scratch[sum + j] = 0;
            }
            for (int c = 0; c < width; c++) {
                double a = l[position + c];
                int source = base + c * k;
                for (int j = 0; j < k; j++) {
                    scratch[sum + j] += a * work[source + j];
                }
            }
        }
        for (int b = 0; b < count; b++) {
            int target = rows[b] * k;
            for (int j = 0; j < k; j++) {
                work[target + j] -= scratch[b * k + j];
            }
        }
    }

    /** {@code W_own −= L21ᵀ W_boundary}; {@code X = L11⁻ᵀ W_own} for the {@code k} interleaved vectors. */
    static void backward(FrontFactor front, double[] work, double[] scratch, int k) {
        double[] l = front.storage();
        int offset = front.offset();
        int start = front.columnStart();
        int width = front.width();
        int[] rows = front.boundary();
        int count = rows.length;
        for (int b = 0; b < count; b++) {
            System.arraycopy(work, rows[b] * k, scratch, b * k, k);
        }
        int base = start * k;
        int i = 0;
        int position = offset + width * (width + 1) / 2;
        for (; i + 3 < count; i += 4, position += 4 * width) {
            int y0 = i * k, y1 = y0 + k, y2 = y1 + k, y3 = y2 + k;
            for (int c = 0; c < width; c++) {
                double a0 = l[position + c], a1 = l[position + width + c];
                double a2 = l[position + 2 * width + c], a3 = l[position + 3 * width + c];
                int target = base + c * k;
                for (int j = 0; j < k; j++) {
                    work[target + j] -= scratch[y0 + j] * a0 + scratch[y1 + j] * a1
                            + scratch[y2 + j] * a2 + scratch[y3 + j] * a3;
                }
            }
        }
        for (; i < count; i++, position += width) {
            int y = i * k;
            for (int c = 0; c < width; c++) {
                double a = l[position + c];
                int target = base + c * k;
                for (int j = 0; j < k; j++) {
                    work[target + j] -= scratch[y + j] * a;
                }
            }
        }
        for (int r = width - 1; r >= 0; r--) {
            int rowOffset = offset + r * (r + 1) / 2;
            double pivot = l[rowOffset + r];
            int source = (start + r) * k;
            for (int j = 0; j < k; j++) {
                work[source + j] /= pivot;
            }
            for (int c = 0; c < r; c++) {
                double a = l[rowOffset + c];
                int target = (start + c) * k;
                for (int j = 0; j < k; j++) {
                    work[target + j] -= work[source + j] * a;
                }
            }
        }
    }
}
