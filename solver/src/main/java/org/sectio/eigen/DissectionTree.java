package org.sectio.eigen;

/**
 * The tree of a nested dissection: every node owns a contiguous range of the elimination order
 * (its separator, or all unknowns of a small box at a leaf), and its subtree occupies the range
 * {@code [subtreeStart[v], columnEnd[v])} that ends with the node's own columns. Nodes are numbered
 * in post-order, so every child has a smaller number than its parent and the root is the last node.
 *
 * @param permutation {@code permutation[p]} is the original index of the unknown eliminated {@code p}-th
 * @param columnStart first elimination position owned by each node
 * @param columnEnd one past the last elimination position owned by each node
 * @param subtreeStart first elimination position of each node's subtree
 * @param firstChild first child of each node, or {@code -1}
 * @param secondChild second child of each node, or {@code -1}
 * @param parent parent of each node, or {@code -1} for the root
 */
record DissectionTree(int[] permutation, int[] columnStart, int[] columnEnd, int[] subtreeStart,
                      int[] firstChild, int[] secondChild, int[] parent) {

    DissectionTree {
        int nodes = columnStart.length;
        if (nodes == 0 || columnEnd.length != nodes || subtreeStart.length != nodes || firstChild.length != nodes
                || secondChild.length != nodes || parent.length != nodes) {
            throw new IllegalArgumentException("dissection tree: per-node arrays must share one non-zero length, got "
                    + nodes + ", " + columnEnd.length + ", " + subtreeStart.length + ", " + firstChild.length + ", "
                    + secondChild.length + ", " + parent.length);
        }
        if (columnEnd[nodes - 1] != permutation.length || subtreeStart[nodes - 1] != 0 || parent[nodes - 1] != -1) {
            throw new IllegalArgumentException("dissection tree: the last node must be the root covering all "
                    + permutation.length + " unknowns, got subtree [" + subtreeStart[nodes - 1] + ", "
                    + columnEnd[nodes - 1] + ") with parent " + parent[nodes - 1]);
        }
        for (int v = 0; v < nodes; v++) {
            if (subtreeStart[v] > columnStart[v] || columnStart[v] > columnEnd[v]) {
                throw new IllegalArgumentException("dissection tree: node " + v + " has subtree start "
                        + subtreeStart[v] + ", columns [" + columnStart[v] + ", " + columnEnd[v] + ")");
            }
        }
    }

    /** @return the number of nodes */
    int nodeCount() {
        return columnStart.length;
    }

    /** @return the index of the root node */
    int root() {
        return columnStart.length - 1;
    }

    /** @return how many columns node {@code v} owns */
    int width(int v) {
        return columnEnd[v] - columnStart[v];
    }

    /**
     * Whether a solve sweeps the two subtrees of v independently: within the top two levels, and
     * only where both hold at least 10 000 unknowns (the tree alone decides, never the thread count).
     */
    boolean sweptApart(int v, int depth) {
        int first = firstChild[v];
        int second = secondChild[v];
        return depth < 2 && first >= 0 && second >= 0 && subtreeSize(first) >= 10_000 && subtreeSize(second) >= 10_000;
    }

    /** @return the unknowns in the subtree of v */
    int subtreeSize(int v) {
        return columnEnd[v] - subtreeStart[v];
    }
}
