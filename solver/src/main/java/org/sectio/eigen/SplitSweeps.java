package org.sectio.eigen;

/**
 * The forward sweep up the dissection tree (post-order) and the backward sweep down it that make a
 * multifrontal solve, on a work vector whose entries may interleave {@code stride} right-hand sides.
 * At the top levels of the tree ({@link DissectionTree#sweptApart}) the two subtrees are swept
 * independently: in the forward sweep the second subtree accumulates its contributions to ancestor
 * rows in a private vector that is added afterwards; in the backward sweep the subtrees only read
 * their ancestors' rows. Where to split depends on the tree only, so the result is the same whether
 * the subtrees run one after the other or concurrently on the fork-join pool.
 */
final class SplitSweeps {

    /** One front's step of a sweep; {@code scratch} and {@code more} each hold largest front × stride entries. */
    @FunctionalInterface
    interface FrontStep {
        void apply(int front, double[] work, double[] scratch, double[] more);
    }

    private final MultifrontalAnalysis analysis;
    private final DissectionTree tree;
    private final boolean parallel;
    private final int[] firstDescendant;

    SplitSweeps(MultifrontalAnalysis analysis, boolean parallel) {
        this.analysis = analysis;
        this.tree = analysis.tree();
        this.parallel = parallel;
        this.firstDescendant = new int[tree.nodeCount()];
        for (int v = 0; v < firstDescendant.length; v++) {
            int first = tree.firstChild()[v];
            firstDescendant[v] = first >= 0 ? firstDescendant[first] : v;
        }
    }

    /** Runs {@code step} on every front, children before parents. */
    void forward(double[] work, int stride, FrontStep step) {
        forward(tree.root(), 0, work, stride, step);
    }

    /** Runs {@code step} on every front, parents before children. */
    void backward(double[] work, int stride, FrontStep step) {
        backward(tree.root(), 0, work, stride, step);
    }

    private void forward(int v, int depth, double[] work, int stride, FrontStep step) {
        double[] scratch = new double[analysis.largestFront() * stride];
        double[] more = new double[scratch.length];
        if (!tree.sweptApart(v, depth)) {
            for (int u = firstDescendant[v]; u <= v; u++) {
                step.apply(u, work, scratch, more);
            }
            return;
        }
        int first = tree.firstChild()[v];
        int second = tree.secondChild()[v];
        int lo = tree.subtreeStart()[second] * stride;
        int hi = tree.columnEnd()[second] * stride;
        double[] privateWork = new double[work.length];
        System.arraycopy(work, lo, privateWork, lo, hi - lo);
        TaskPair.run(parallel, () -> forward(first, depth + 1, work, stride, step),
                () -> forward(second, depth + 1, privateWork, stride, step));
        System.arraycopy(privateWork, lo, work, lo, hi - lo);
        for (int q : analysis.boundary(second)) {
            for (int j = q * stride; j < q * stride + stride; j++) {
                work[j] += privateWork[j];
            }
        }
        step.apply(v, work, scratch, more);
    }

    private void backward(int v, int depth, double[] work, int stride, FrontStep step) {
        double[] scratch = new double[analysis.largestFront() * stride];
        double[] more = new double[scratch.length];
        if (!tree.sweptApart(v, depth)) {
            for (int u = v; u >= firstDescendant[v]; u--) {
                step.apply(u, work, scratch, more);
            }
            return;
        }
        step.apply(v, work, scratch, more);
        int first = tree.firstChild()[v];
        int second = tree.secondChild()[v];
        TaskPair.run(parallel, () -> backward(first, depth + 1, work, stride, step),
                () -> backward(second, depth + 1, work, stride, step));
    }
}
