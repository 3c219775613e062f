package org.sectio.eigen;

/**
 * Per-front forward and back substitution of the multifrontal LU solve (row-oriented triangular
 * solves, Golub and Van Loan, "Matrix Computations", 4th ed., §3.1), on the layout of {@link LuFactor}.
 * {@code L21} is held by columns, so its product is a sum of four columns per pass over the boundary
 * (an axpy the JIT vectorizes); {@code U12} is held by rows and its product takes four rows per pass
 * against the gathered boundary values; every dot product keeps four partial sums. So the loops are
 * bound by memory rather than by the latency of one running sum.
 * {@code scratch} needs at least the front's size.
 */
final class LuFrontSubstitution {

    private LuFrontSubstitution() {
    }

    /** Front v: row swaps, {@code y = L11⁻¹ w_own}, then {@code w_boundary −= L21 y}. */
    static void forward(LuFactor factor, int v, double[] work, double[] scratch) {
        int start = factor.start(v);
        int w = factor.width(v);
        int[] pivots = factor.pivots();
        for (int c = 0; c < w; c++) {
            int other = pivots[start + c];
            if (other != c) {
                double t = work[start + c];
                work[start + c] = work[start + other];
                work[start + other] = t;
            }
        }
        double[] storage = factor.storage(v);
        int own = factor.offset(v);
        for (int r = 1; r < w; r++) {
            work[start + r] -= dot(storage, own + r * w, work, start, r);
        }
        int b = factor.boundaryCount(v);
        if (b == 0) {
            return;
        }
        int lower = own + w * w;
        java.util.Arrays.fill(scratch, 0, b, 0.0);
        int c = 0;
        for (; c + 3 < w; c += 4) {
            double y0 = work[start + c], y1 = work[start + c + 1], y2 = work[start + c + 2], y3 = work[start + c + 3];
            int o0 = lower + c * b, o1 = o0 + b, o2 = o1 + b, o3 = o2 + b;
            for (int i = 0; i < b; i++) {
                scratch[i] += y0 * storage[o0 + i] + y1 * storage[o1 + i] + y2 * storage[o2 + i]
                        + y3 * storage[o3 + i];
            }
        }
        for (; c < w; c++) {
            double y = work[start + c];
            int o = lower + c * b;
            for (int i = 0; i < b; i++) {
                scratch[i] += y * storage[o + i];
            }
        }
        int[] rows = factor.boundaryRows();
        int from = factor.boundaryStart(v);
        for (int i = 0; i < b; i++) {
            work[rows[from + i]] -= scratch[i];
        }
    }

    /**
     * Front v: {@code w_own −= U12 x_boundary}, then {@code x_own = U11⁻¹ w_own}; {@code gathered} as
     * long as {@code scratch}.
     */
    static void backward(LuFactor factor, int v, double[] work, double[] scratch, double[] gathered) {
        int start = factor.start(v);
        int w = factor.width(v);
        int b = factor.boundaryCount(v);
        double[] storage = factor.storage(v);
        int own = factor.offset(v);
        if (b > 0) {
            int[] rows = factor.boundaryRows();
            int from = factor.boundaryStart(v);
            for (int i = 0; i < b; i++) {
                gathered[i] = work[rows[from + i]];
            }
            multiply(storage, own + w * w + w * b, w, b, gathered, scratch);
            for (int r = 0; r < w; r++) {
                work[start + r] -= scratch[r];
            }
        }
        for (int r = w - 1; r >= 0; r--) {
            int offset = own + r * w;
            double value = work[start + r] - dot(storage, offset + r + 1, work, start + r + 1, w - r - 1);
            work[start + r] = value / storage[offset + r];
        }
    }

    /** {@code out[i] = Σ_c m[at + i·cols + c] x[c]} for the rows × cols row-major block at {@code at}, four rows per pass. */
    private static void multiply(double[] m, int at, int rows, int cols, double[] x, double[] out) {
        int i = 0;
        for (; i + 3 < rows; i += 4) {
            int o0 = at + i * cols, o1 = o0 + cols, o2 = o1 + cols, o3 = o2 + cols;
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            for (int c = 0; c < cols; c++) {
                double y = x[c];
                s0 += m[o0 + c] * y;
                s1 += m[o1 + c] * y;
                s2 += m[o2 + c] * y;
                s3 += m[o3 + c] * y;
            }
            out[i] = s0;
            out[i + 1] = s1;
            out[i + 2] = s2;
            out[i + 3] = s3;
        }
        for (; i < rows; i++) {
            out[i] = dot(m, at + i * cols, x, 0, cols);
        }
    }

    /** {@code Σ_{c < length} a[aFrom + c] x[xFrom + c]} with four partial sums. */
    static double dot(double[] a, int aFrom, double[] x, int xFrom, int length) {
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
        int c = 0;
        for (; c + 3 < length; c += 4) {
            s0 += a[aFrom + c] * x[xFrom + c];
            s1 += a[aFrom + c + 1] * x[xFrom + c + 1];
            s2 += a[aFrom + c + 2] * x[xFrom + c + 2];
            s3 += a[aFrom + c + 3] * x[xFrom + c + 3];
        }
        for (; c < length; c++) {
            s0 += a[aFrom + c] * x[xFrom + c];
        }
        return (s0 + s1) + (s2 + s3);
    }
}
