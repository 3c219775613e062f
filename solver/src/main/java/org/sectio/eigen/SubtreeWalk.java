package org.sectio.eigen;

import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.ForkJoinTask;

/**
 * The post-order walk of a multifrontal factorization over the dissection tree: a node is
 * eliminated once both children have handed up their update matrices. The two subtrees of a node
 * run as fork-join tasks down to {@link #FORK_DEPTH} when both are at least {@link #FORK_MINIMUM}
 * unknowns; the step always receives the first child's update first, so the result is the same for
 * every thread count.
 */
final class SubtreeWalk {

    /** Deepest tree level at which sibling subtrees are forked. */
    private static final int FORK_DEPTH = 12;
    /** Smallest subtree (in unknowns) worth a task of its own. */
    private static final int FORK_MINIMUM = 4096;

    private SubtreeWalk() {
    }

    /** The elimination of one node from its children's updates (null for a missing child). */
    @FunctionalInterface
    interface Step<U> {
        U eliminate(int node, U firstUpdate, U secondUpdate);
    }

    /**
     * Walks the whole tree.
     *
     * @param threads worker threads, ≥ 1; with more than one, a pool of that size runs the walk
     * @return the root's update
     */
    static <U> U run(DissectionTree tree, int threads, Step<U> step) {
        int root = tree.root();
        if (threads == 1) {
            return walk(tree, root, 0, false, step);
        }
        ForkJoinPool pool = new ForkJoinPool(threads);
        try {
            return pool.invoke(ForkJoinTask.adapt(() -> walk(tree, root, 0, true, step)));
        } finally {
            pool.shutdown();
        }
    }

    private static <U> U walk(DissectionTree tree, int v, int depth, boolean parallel, Step<U> step) {
        int first = tree.firstChild()[v];
        int second = tree.secondChild()[v];
        U firstUpdate = null;
        U secondUpdate = null;
        if (parallel && first >= 0 && second >= 0 && depth < FORK_DEPTH && tree.subtreeSize(first) >= FORK_MINIMUM
                && tree.subtreeSize(second) >= FORK_MINIMUM) {
            ForkJoinTask<U> task = ForkJoinTask.adapt(() -> walk(tree, second, depth + 1, true, step));
            task.fork();
            firstUpdate = walk(tree, first, depth + 1, true, step);
            secondUpdate = task.join();
        } else {
            if (first >= 0) {
                firstUpdate = walk(tree, first, depth + 1, parallel, step);
            }
            if (second >= 0) {
                secondUpdate = walk(tree, second, depth + 1, parallel, step);
            }
        }
        return step.eliminate(v, firstUpdate, secondUpdate);
    }
}
