package org.sectio.eigen;

import java.util.Arrays;
import java.util.concurrent.ConcurrentLinkedDeque;

/**
 * Numeric phase of the multifrontal Cholesky factorization (Duff and Reid, "The multifrontal
 * solution of indefinite sparse symmetric linear equations", ACM TOMS 9 (1983) 302–325; Liu, SIAM
 * Review 34 (1992) 82–109). The dissection tree is walked in post-order; at each node the front is
 * assembled from the matrix entries of its columns plus the extend-add of the children's update
 * matrices, its columns are eliminated by {@link DenseFrontKernels}, the factor columns are stored
 * and the update matrix is handed to the parent. The walk, with sibling subtrees as fork-join tasks
 * and children added in a fixed order, is {@link SubtreeWalk}, so results are identical for every
 * thread count.
 *
 * <p>Fronts are assembled in reusable dense workspaces (one per front in progress, pooled) and
 * each update matrix is handed up as a packed lower triangle, so the only allocations are the
 * stored factor and the update matrices.
 */
final class FrontalElimination {

    private final MultifrontalAnalysis analysis;
    private final DissectionTree tree;
    private final double[] values;
    private final boolean parallel;
    private final FrontFactor[] factors;
    private final double[][] storage;
    private final ConcurrentLinkedDeque<Workspace> workspaces = new ConcurrentLinkedDeque<>();

    /** Dense storage of one front in progress: its lower triangle by rows and the transposed panel buffer. */
    private record Workspace(double[][] front, double[][] panel) {
    }

    private FrontalElimination(MultifrontalAnalysis analysis, double[] values, boolean parallel) {
        this.analysis = analysis;
        this.tree = analysis.tree();
        this.values = values;
        this.parallel = parallel;
        this.factors = new FrontFactor[tree.nodeCount()];
        int[] lengths = analysis.segmentLengths();
        this.storage = new double[lengths.length][];
        for (int i = 0; i < lengths.length; i++) {
            storage[i] = new double[lengths[i]];
        }
    }

    /** Factors the matrix whose entries are {@code values} (in the analysed pattern) and returns one factor per front. */
    static FrontFactor[] eliminate(MultifrontalAnalysis analysis, double[] values, int threads) {
        FrontalElimination run = new FrontalElimination(analysis, values, threads > 1);
        SubtreeWalk.run(analysis.tree(), threads, run::eliminateNode);
        return run.factors;
    }

    /** Eliminates node {@code v} from its children's updates; returns its update matrix, packed lower triangle by rows. */
    private double[] eliminateNode(int v, double[] firstUpdate, double[] secondUpdate) {
        int first = tree.firstChild()[v];
        int second = tree.secondChild()[v];
        int start = tree.columnStart()[v];
        int width = tree.width(v);
        int[] boundary = analysis.boundary(v);
        int size = width + boundary.length;
        Workspace workspace = takeWorkspace();
        double[][] front = workspace.front();
        for (int i = 0; i < size; i++) {
            Arrays.fill(front[i], 0, i + 1, 0.0);
        }
        assemble(v, front);
        if (first >= 0) {
            extendAdd(front, firstUpdate, analysis.parentLocal(first));
        }
        if (second >= 0) {
            extendAdd(front, secondUpdate, analysis.parentLocal(second));
        }
        DenseFrontKernels.partialCholesky(front, workspace.panel(), width, size, parallel, tree.permutation(), start);
        factors[v] = store(front, start, width, boundary, storage[analysis.storageSegment(v)], analysis.storageOffset(v));
        double[] update = new double[boundary.length * (boundary.length + 1) / 2];
        for (int i = 0, offset = 0; i < boundary.length; offset += ++i) {
            System.arraycopy(front[width + i], width, update, offset, i + 1);
        }
        workspaces.push(workspace);
        return update;
    }

    /** A dense lower-triangular workspace large enough for every front (pooled; one per front in progress). */
    private Workspace takeWorkspace() {
        Workspace workspace = workspaces.poll();
        if (workspace == null) {
            int largest = analysis.largestFront();
            double[][] front = new double[largest][];
            for (int i = 0; i < largest; i++) {
                front[i] = new double[i + 1];
            }
            workspace = new Workspace(front, new double[DenseFrontKernels.PANEL][largest]);
        }
        return workspace;
    }

    private void assemble(int v, double[][] front) {
        int[] value = analysis.assemblyValue();
        int[] row = analysis.assemblyRow();
        int[] column = analysis.assemblyColumn();
        for (int e = analysis.assemblyStart(v), end = analysis.assemblyEnd(v); e < end; e++) {
            front[row[e]][column[e]] += values[value[e]];
        }
    }

    /** Adds the child's packed update matrix into the parent front at rows and columns {@code map}. */
    private static void extendAdd(double[][] front, double[] update, int[] map) {
        for (int i = 0, offset = 0; i < map.length; offset += ++i) {
            double[] target = front[map[i]];
            for (int j = 0; j <= i; j++) {
                target[map[j]] += update[offset + j];
            }
        }
    }

    private static FrontFactor store(double[][] front, int start, int width, int[] boundary, double[] target,
                                     int offset) {
        int position = offset;
        for (int r = 0; r < width; r++) {
            System.arraycopy(front[r], 0, target, position, r + 1);
            position += r + 1;
        }
        for (int i = 0; i < boundary.length; i++) {
            System.arraycopy(front[width + i], 0, target, position, width);
            position += width;
        }
        return new FrontFactor(start, width, boundary, target, offset);
    }
}
