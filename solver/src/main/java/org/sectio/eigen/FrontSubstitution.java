package org.sectio.eigen;

/**
 * Per-front forward and back substitution of the multifrontal solve (row- and column-oriented
 * triangular solves, Golub and Van Loan, "Matrix Computations", 4th ed., §3.1), with {@code L11}
 * packed by rows and {@code L21} row-major as laid out by {@link FrontFactor}. Boundary rows are
 * processed four at a time so that each pass over the front's columns serves four independent sums
 * (measured faster than row by row even for the narrowest leaf fronts). The scattered boundary
 * entries of the work vector are read or updated in a separate loop through {@code scratch}
 * (length at least the boundary size).
 */
final class FrontSubstitution {

    private FrontSubstitution() {
    }

    /** {@code y = L11⁻¹ w_own}; {@code w_boundary −= L21 y}. */
    static void forward(FrontFactor front, double[] work, double[] scratch) {
        int start = front.columnStart();
        int width = front.width();
        double[] l = front.storage();
        for (int r = 0, offset = front.offset(); r < width; offset += ++r) {
            double value = work[start + r];
            for (int c = 0; c < r; c++) {
                value -= l[offset + c] * work[start + c];
            }
            work[start + r] = value / l[offset + r];
        }
        int[] boundary = front.boundary();
        int i = 0;
        int offset = front.boundaryOffset();
        for (; i + 3 < boundary.length; i += 4, offset += 4 * width) {
            double sum0 = 0, sum1 = 0, sum2 = 0, sum3 = 0;
            for (int c = 0; c < width; c++) {
                double y = work[start + c];
                sum0 += l[offset + c] * y;
                sum1 += l[offset + width + c] * y;
                sum2 += l[offset + 2 * width + c] * y;
                sum3 += l[offset + 3 * width + c] * y;
            }
            scratch[i] = sum0;
            scratch[i + 1] = sum1;
            scratch[i + 2] = sum2;
            scratch[i + 3] = sum3;
        }
        for (; i < boundary.length; i++, offset += width) {
            double sum = 0;
            for (int c = 0; c < width; c++) {
                sum += l[offset + c] * work[start + c];
            }
            scratch[i] = sum;
        }
        for (int b = 0; b < boundary.length; b++) {
            work[boundary[b]] -= scratch[b];
        }
    }

    /** {@code w_own −= L21ᵀ w_boundary}; {@code x = L11⁻ᵀ w_own}. */
    static void backward(FrontFactor front, double[] work, double[] scratch) {
        int start = front.columnStart();
        int width = front.width();
        double[] l = front.storage();
        int[] boundary = front.boundary();
        for (int b = 0; b < boundary.length; b++) {
            scratch[b] = work[boundary[b]];
        }
        int i = 0;
        int offset = front.boundaryOffset();
        for (; i + 3 < boundary.length; i += 4, offset += 4 * width) {
            double y0 = scratch[i], y1 = scratch[i + 1], y2 = scratch[i + 2], y3 = scratch[i + 3];
            for (int c = 0; c < width; c++) {
                work[start + c] -= y0 * l[offset + c] + y1 * l[offset + width + c]
                        + y2 * l[offset + 2 * width + c] + y3 * l[offset + 3 * width + c];
            }
        }
        for (; i < boundary.length; i++, offset += width) {
            double y = scratch[i];
            for (int c = 0; c < width; c++) {
                work[start + c] -= y * l[offset + c];
            }
        }
        for (int r = width - 1; r >= 0; r--) {
            int rowOffset = front.offset() + r * (r + 1) / 2;
            double x = work[start + r] / l[rowOffset + r];
            work[start + r] = x;
            for (int c = 0; c < r; c++) {
                work[start + c] -= x * l[rowOffset + c];
            }
        }
    }
}
