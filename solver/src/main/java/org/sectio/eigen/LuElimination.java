package org.sectio.eigen;

import java.util.Arrays;
import java.util.concurrent.ConcurrentLinkedDeque;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Numeric phase of the multifrontal LU (Duff and Reid, SIAM J. Sci. Stat. Comput. 5 (1984)
 * 633–641): the dissection tree is walked in post-order; each front is assembled from both triangles
 * of its columns and rows plus the extend-add of its children's update matrices, partly factored by
 * {@link LuFrontKernels}, and its factor stored in the {@link LuFactor}. The walk, with sibling
 * subtrees as fork-join tasks, is {@link SubtreeWalk}, as for the Cholesky's {@link FrontalElimination},
 * so the factor is the same for every thread count.
 */
final class LuElimination {

    private final MultifrontalAnalysis analysis;
    private final DissectionTree tree;
    private final double[] values;
    private final int[] transpose;
    private final double tiny;
    private final boolean parallel;
    private final LuFactor factor;
    private final AtomicInteger perturbed = new AtomicInteger();
    private final ConcurrentLinkedDeque<double[][]> workspaces = new ConcurrentLinkedDeque<>();

    private LuElimination(MultifrontalAnalysis analysis, double[] values, int[] transpose, double tiny,
                          boolean parallel) {
        this.analysis = analysis;
        this.tree = analysis.tree();
        this.values = values;
        this.transpose = transpose;
        this.tiny = tiny;
        this.parallel = parallel;
        this.factor = new LuFactor(analysis);
    }

    /** The factor and the number of pivots replaced by static pivoting. */
    record Result(LuFactor factor, int perturbedPivots) {
    }

    /**
     * @param values the matrix entries in the analysed pattern
     * @param transpose for every entry (r, c) the index of (c, r)
     * @param tiny static pivot size
     * @param threads worker threads, ≥ 1
     */
    static Result eliminate(MultifrontalAnalysis analysis, double[] values, int[] transpose, double tiny,
                            int threads) {
        LuElimination run = new LuElimination(analysis, values, transpose, tiny, threads > 1);
        SubtreeWalk.run(analysis.tree(), threads, run::eliminateNode);
        return new Result(run.factor, run.perturbed.get());
    }

    /** Eliminates node v from its children's updates; returns its b × b update matrix, row-major. */
    private double[] eliminateNode(int v, double[] firstUpdate, double[] secondUpdate) {
        int first = tree.firstChild()[v];
        int second = tree.secondChild()[v];
        int start = tree.columnStart()[v];
        int w = tree.width(v);
        int[] boundary = analysis.boundary(v);
        int b = boundary.length;
        int s = w + b;
        double[][] f = takeWorkspace();
        for (int r = 0; r < s; r++) {
            Arrays.fill(f[r], 0, s, 0.0);
        }
        assemble(v, f);
        if (first >= 0) {
            extendAdd(f, firstUpdate, analysis.parentLocal(first));
        }
        if (second >= 0) {
            extendAdd(f, secondUpdate, analysis.parentLocal(second));
        }
        int[] pivots = factor.pivots();
        perturbed.addAndGet(LuFrontKernels.partialLu(f, w, s, pivots, start, tiny, parallel));
        double[] storage = factor.storage(v);
        int own = factor.offset(v);
        int lower = own + w * w;
        int upper = lower + w * b;
        for (int r = 0; r < w; r++) {
            System.arraycopy(f[r], 0, storage, own + r * w, w);
            System.arraycopy(f[r], w, storage, upper + r * b, b);
        }
        double[] update = new double[b * b];
        for (int i = 0; i < b; i++) {
            double[] row = f[w + i];
            for (int c = 0; c < w; c++) {
                storage[lower + c * b + i] = row[c];
            }
            System.arraycopy(row, w, update, i * b, b);
        }
        workspaces.push(f);
        return update;
    }

    /** A dense square workspace as large as the largest front (pooled; one per front in progress). */
    private double[][] takeWorkspace() {
        double[][] f = workspaces.poll();
        if (f == null) {
            int largest = analysis.largestFront();
            f = new double[largest][largest];
        }
        return f;
    }

    /** Adds the front's matrix entries: the analysis maps the lower triangle, the transpose index the upper. */
    private void assemble(int v, double[][] f) {
        int[] value = analysis.assemblyValue();
        int[] row = analysis.assemblyRow();
        int[] column = analysis.assemblyColumn();
        for (int e = analysis.assemblyStart(v), end = analysis.assemblyEnd(v); e < end; e++) {
            int r = row[e];
            int c = column[e];
            f[r][c] += values[value[e]];
            if (r != c) {
                f[c][r] += values[transpose[value[e]]];
            }
        }
    }

    /** Adds a child's square update matrix into the front at rows and columns {@code map}. */
    private static void extendAdd(double[][] f, double[] update, int[] map) {
        int b = map.length;
        for (int i = 0; i < b; i++) {
            double[] target = f[map[i]];
            int offset = i * b;
            for (int j = 0; j < b; j++) {
                target[map[j]] += update[offset + j];
            }
        }
    }
}
