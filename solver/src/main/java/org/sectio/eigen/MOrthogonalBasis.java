package org.sectio.eigen;

import java.util.Random;
import java.util.stream.IntStream;

/**
 * A Krylov basis of n-vectors kept orthonormal in the inner product {@code ⟨x, y⟩ = xᵀ M y} of a
 * positive diagonal {@code M}, with the blocked kernels of a Lanczos iteration: classical Gram–Schmidt
 * run twice ("twice is enough": L. Giraud, J. Langou and M. Rozložník, Comput. Math. Appl. 50 (2005)
 * 1069–1075; the criterion for a third pass is that of J. W. Daniel, W. B. Gragg, L. Kaufman and
 * G. W. Stewart, Math. Comp. 30 (1976) 772–795) and the in-place change of basis {@code V ← V Y} of a
 * restart.
 *
 * <p>Every vector is one contiguous array. Rows are cut into fixed blocks of {@value #BLOCK}; a block is
 * one task of the common fork-join pool and keeps its own partial sums, which are added in block order
 * afterwards, so results do not depend on the thread count. Inside a block, rows go in sub-chunks of
 * {@value #SUB} so that the slices of all basis vectors stay in the core's cache between the update of a
 * pass and the inner products of the next; each sub-chunk is swept with four basis vectors at a time.
 * Kernels allocate no vector storage (only the small lambda and coefficient objects of a call).
 */
final class MOrthogonalBasis {

    /** Rows per task and per partial sum. */
    static final int BLOCK = 16_384;
    /** Rows per cache-resident sub-chunk. */
    static final int SUB = 512;
    /** A second Gram–Schmidt pass that keeps less than this fraction of the squared norm calls for a third. */
    private static final double REPEAT_FRACTION = 0.5;

    private final double[][] vectors;
    private final double[] mass;
    private final int n;
    private final int blocks;
    private final double[] partial;
    private final double[] scratch;
    private final double[] second;

    /**
     * @param mass the positive diagonal of M, length n
     * @param capacity how many vectors the basis can hold
     */
    MOrthogonalBasis(double[] mass, int capacity) {
        this.mass = mass;
        this.n = mass.length;
        this.vectors = new double[capacity][n];
        this.blocks = (n + BLOCK - 1) / BLOCK;
        this.partial = new double[blocks * (capacity + 1)];
        this.scratch = new double[blocks * capacity * Math.min(SUB, n)];
        this.second = new double[capacity + 1];
    }

    int capacity() {
        return vectors.length;
    }

    double[] vector(int i) {
        return vectors[i];
    }

    /** Exchanges the storage of two slots. */
    void swap(int i, int j) {
        double[] t = vectors[i];
        vectors[i] = vectors[j];
        vectors[j] = t;
    }

    /** Fills slot {@code i} with entries uniform in [−1, 1). */
    void fillRandom(int i, Random random) {
        double[] v = vectors[i];
        for (int r = 0; r < n; r++) {
            v[r] = 2 * random.nextDouble() - 1;
        }
    }

    /** {@code out = M v_i}. */
    void multiplyMass(int i, double[] out) {
        double[] v = vectors[i];
        for (int r = 0; r < n; r++) {
            out[r] = mass[r] * v[r];
        }
    }

    /** {@code v_target ← v_target + v_source}. */
    void addTo(int target, int source) {
        double[] w = vectors[target];
        double[] v = vectors[source];
        for (int r = 0; r < n; r++) {
            w[r] += v[r];
        }
    }

    /** {@code v_i ← factor · v_i}. */
    void scale(int i, double factor) {
        double[] v = vectors[i];
        for (int r = 0; r < n; r++) {
            v[r] *= factor;
        }
    }

    /**
     * Makes slot {@code target} M-orthogonal to slots {@code [0, count)} by classical Gram–Schmidt twice
     * (three times if the second pass still removes half of the squared norm).
     *
     * @param coefficients receives the removed components {@code ⟨v_i, w⟩}, summed over the passes, in
     *        {@code [0, count)}; length at least {@code count + 1}
     * @return {@code {‖w‖²_M before, ‖w‖²_M after}}
     */
    double[] orthogonalize(int target, int count, double[] coefficients) {
        double[] c = coefficients;
        innerProducts(target, count, c);
        double before = c[count];
        subtractThenInnerProducts(target, count, c, second);
        double afterFirst = second[count];
        double after = subtract(target, count, second);
        for (int i = 0; i < count; i++) {
            c[i] += second[i];
        }
        if (after < REPEAT_FRACTION * afterFirst && count > 0) {
            innerProducts(target, count, second);
            after = subtract(target, count, second);
            for (int i = 0; i < count; i++) {
                c[i] += second[i];
            }
        }
        return new double[] {before, after};
    }

    /** {@code out[i] = ⟨v_i, v_target⟩} for i &lt; count and {@code out[count] = ‖v_target‖²_M}. */
    void innerProducts(int target, int count, double[] out) {
        run(b -> dotBlock(b, target, count), count + 1, out);
    }

    /** {@code v_target −= Σ coefficient_i v_i}, then {@code out} as in {@link #innerProducts}. */
    private void subtractThenInnerProducts(int target, int count, double[] coefficients, double[] out) {
        run(b -> {
            java.util.Arrays.fill(partial, b * (count + 1), (b + 1) * (count + 1), 0.0);
            forEachSub(b, (s, e) -> {
                axpyChunk(target, count, coefficients, s, e);
                dotChunk(b, target, count, s, e);
            });
        }, count + 1, out);
    }

    /** {@code v_target −= Σ coefficient_i v_i}; returns the new {@code ‖v_target‖²_M}. */
    private double subtract(int target, int count, double[] coefficients) {
        run(b -> {
            int stride = count + 1;
            partial[b * stride + count] = 0;
            forEachSub(b, (s, e) -> {
                axpyChunk(target, count, coefficients, s, e);
                double[] w = vectors[target];
                double sum = 0;
                for (int r = s; r < e; r++) {
                    sum += mass[r] * w[r] * w[r];
                }
                partial[b * stride + count] += sum;
            });
        }, count + 1, null);
        double sum = 0;
        for (int b = 0; b < blocks; b++) {
            sum += partial[b * (count + 1) + count];
        }
        return sum;
    }

    /**
     * Replaces slots {@code [from, from + keep)} by {@code V Y}, {@code V} the slots
     * {@code [from, from + count)}, {@code Y} the count × keep matrix {@code y[i][j]}; other slots are
     * unchanged.
     */
    void combine(int from, int count, double[][] y, int keep) {
        run(b -> {
            int width = Math.min(SUB, n);
            int base = b * vectors.length * width;
            forEachSub(b, (s, e) -> {
                int len = e - s;
                for (int j = 0; j < keep; j++) {
                    int t = base + j * width;
                    java.util.Arrays.fill(scratch, t, t + len, 0.0);
                    int i = 0;
                    for (; i + 3 < count; i += 4) {
                        double a0 = y[i][j], a1 = y[i + 1][j], a2 = y[i + 2][j], a3 = y[i + 3][j];
                        double[] v0 = vectors[from + i], v1 = vectors[from + i + 1];
                        double[] v2 = vectors[from + i + 2], v3 = vectors[from + i + 3];
                        for (int r = s; r < e; r++) {
                            scratch[t + r - s] += a0 * v0[r] + a1 * v1[r] + a2 * v2[r] + a3 * v3[r];
                        }
                    }
                    for (; i < count; i++) {
                        double a = y[i][j];
                        double[] v = vectors[from + i];
                        for (int r = s; r < e; r++) {
                            scratch[t + r - s] += a * v[r];
                        }
                    }
                }
                for (int j = 0; j < keep; j++) {
                    System.arraycopy(scratch, base + j * width, vectors[from + j], s, len);
                }
            });
        }, 0, null);
    }

    private interface BlockTask {
        void run(int block);
    }

    private interface ChunkTask {
        void run(int start, int end);
    }

    /** Runs a task on every block, then adds the blocks' partial sums (stride {@code width}) in order. */
    private void run(BlockTask task, int width, double[] out) {
        if (blocks == 1) {
            task.run(0);
        } else {
            IntStream.range(0, blocks).parallel().forEach(task::run);
        }
        if (out != null) {
            for (int i = 0; i < width; i++) {
                double sum = 0;
                for (int b = 0; b < blocks; b++) {
                    sum += partial[b * width + i];
                }
                out[i] = sum;
            }
        }
    }

    private void forEachSub(int block, ChunkTask task) {
        int end = Math.min(n, (block + 1) * BLOCK);
        for (int s = block * BLOCK; s < end; s += SUB) {
            task.run(s, Math.min(end, s + SUB));
        }
    }

    private void dotBlock(int b, int target, int count) {
        java.util.Arrays.fill(partial, b * (count + 1), (b + 1) * (count + 1), 0.0);
        forEachSub(b, (s, e) -> dotChunk(b, target, count, s, e));
    }

    /** Adds the rows [s, e) of {@code ⟨v_i, v_target⟩} and of {@code ‖v_target‖²_M} to block b's sums. */
    private void dotChunk(int b, int target, int count, int s, int e) {
        int at = b * (count + 1);
        double[] w = vectors[target];
        int i = 0;
        for (; i + 3 < count; i += 4) {
            double[] v0 = vectors[i], v1 = vectors[i + 1], v2 = vectors[i + 2], v3 = vectors[i + 3];
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            for (int r = s; r < e; r++) {
                double z = mass[r] * w[r];
                s0 += v0[r] * z;
                s1 += v1[r] * z;
                s2 += v2[r] * z;
                s3 += v3[r] * z;
            }
            partial[at + i] += s0;
            partial[at + i + 1] += s1;
            partial[at + i + 2] += s2;
            partial[at + i + 3] += s3;
        }
        for (; i <= count; i++) {
            double[] v = i == count ? w : vectors[i];
            double sum = 0;
            for (int r = s; r < e; r++) {
                sum += v[r] * mass[r] * w[r];
            }
            partial[at + i] += sum;
        }
    }

    /** Rows [s, e) of {@code v_target −= Σ coefficient_i v_i}. */
    private void axpyChunk(int target, int count, double[] c, int s, int e) {
        double[] w = vectors[target];
        int i = 0;
        for (; i + 3 < count; i += 4) {
            double a0 = c[i], a1 = c[i + 1], a2 = c[i + 2], a3 = c[i + 3];
            double[] v0 = vectors[i], v1 = vectors[i + 1], v2 = vectors[i + 2], v3 = vectors[i + 3];
            for (int r = s; r < e; r++) {
                w[r] -= a0 * v0[r] + a1 * v1[r] + a2 * v2[r] + a3 * v3[r];
            }
        }
        for (; i < count; i++) {
            double a = c[i];
            double[] v = vectors[i];
            for (int r = s; r < e; r++) {
                w[r] -= a * v[r];
            }
        }
    }
}
