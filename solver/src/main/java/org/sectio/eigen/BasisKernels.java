package org.sectio.eigen;

/**
 * The two vector kernels of Gram–Schmidt against a Krylov basis, {@code c = Vᵀw} and
 * {@code x += V c}, four basis vectors per pass over memory. Every vector is cut at the same point
 * into two halves whose partial results are combined in a fixed order, so the halves can run on two
 * cores (long vectors, in the common fork-join pool) and the arithmetic is the same either way.
 */
final class BasisKernels {

    /** Vectors at least this long run their halves concurrently. */
    private static final int PARALLEL_LENGTH = 1 << 16;

    private BasisKernels() {
    }

    /** {@code c[i] = v[i]·w} for i &lt; count. */
    static void projections(double[][] v, int count, double[] w, double[] c) {
        int n = w.length;
        int half = n / 2;
        double[] low = new double[count];
        double[] high = new double[count];
        runHalves(n, () -> projections(v, count, w, low, 0, half), () -> projections(v, count, w, high, half, n));
        for (int i = 0; i < count; i++) {
            c[i] = low[i] + high[i];
        }
    }

    /** {@code x += Σ_{i < count} c[i] v[i]}. */
    static void addCombination(double[][] v, int count, double[] c, double[] x) {
        int n = x.length;
        int half = n / 2;
        runHalves(n, () -> addCombination(v, count, c, x, 0, half), () -> addCombination(v, count, c, x, half, n));
    }

    private static void projections(double[][] v, int count, double[] w, double[] c, int from, int to) {
        int i = 0;
        for (; i + 3 < count; i += 4) {
            double[] v0 = v[i], v1 = v[i + 1], v2 = v[i + 2], v3 = v[i + 3];
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            for (int k = from; k < to; k++) {
                double x = w[k];
                s0 += v0[k] * x;
                s1 += v1[k] * x;
                s2 += v2[k] * x;
                s3 += v3[k] * x;
            }
            c[i] = s0;
            c[i + 1] = s1;
            c[i + 2] = s2;
            c[i + 3] = s3;
        }
        for (; i < count; i++) {
            double[] vi = v[i];
            double s = 0;
            for (int k = from; k < to; k++) {
                s += vi[k] * w[k];
            }
            c[i] = s;
        }
    }

    private static void addCombination(double[][] v, int count, double[] c, double[] x, int from, int to) {
        int i = 0;
        for (; i + 3 < count; i += 4) {
            double[] v0 = v[i], v1 = v[i + 1], v2 = v[i + 2], v3 = v[i + 3];
            double c0 = c[i], c1 = c[i + 1], c2 = c[i + 2], c3 = c[i + 3];
            for (int k = from; k < to; k++) {
                x[k] += c0 * v0[k] + c1 * v1[k] + c2 * v2[k] + c3 * v3[k];
            }
        }
        for (; i < count; i++) {
            double[] vi = v[i];
            double ci = c[i];
            for (int k = from; k < to; k++) {
                x[k] += ci * vi[k];
            }
        }
    }

    private static void runHalves(int n, Runnable low, Runnable high) {
        TaskPair.run(n >= PARALLEL_LENGTH && Runtime.getRuntime().availableProcessors() > 1, low, high);
    }
}
