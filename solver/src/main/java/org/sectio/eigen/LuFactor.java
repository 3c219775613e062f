package org.sectio.eigen;

/**
 * The stored factor of a multifrontal LU, laid out for the solve's sweeps: one front after another in
 * elimination (post-)order in a few large arrays, so the forward sweep streams through memory and
 * the backward sweep streams back (separate small arrays per front cost a cache miss each, which
 * measured slower than the arithmetic for the many narrow fronts deep in the dissection tree).
 *
 * <p>Front v, with w = {@link #width(int)} own columns starting at elimination position
 * {@link #start(int)} and b boundary rows {@code boundaryRows[boundaryStart[v] …]}, holds at
 * {@code offset[v]} of {@code segments[segment[v]]}: the own block (L11, unit lower with the diagonal
 * not stored, and U11 together, w × w row-major); L21 by columns ({@code L21[i][c]} at
 * {@code w² + c·b + i}); U12 by rows ({@code U12[r][i]} at {@code w² + w·b + r·b + i}).
 * {@code pivots[start(v) + c]} is the own row swapped with row c, applied in order c = 0, 1, ….
 * Placement depends on the tree only, so concurrent eliminations write disjoint parts.
 */
final class LuFactor {

    /** Largest segment; a few big arrays live in the old generation and are never copied by the collector. */
    private static final int SEGMENT_CAPACITY = 1 << 27;

    private final DissectionTree tree;
    private final int[] boundaryStart;
    private final int[] boundaryRows;
    private final int[] segment;
    private final int[] offset;
    private final double[][] segments;
    private final int[] pivots;
    private final long entries;

    LuFactor(MultifrontalAnalysis analysis) {
        tree = analysis.tree();
        int nodes = tree.nodeCount();
        boundaryStart = new int[nodes + 1];
        segment = new int[nodes];
        offset = new int[nodes];
        int boundaryTotal = 0;
        for (int v = 0; v < nodes; v++) {
            boundaryTotal += analysis.boundary(v).length;
        }
        boundaryRows = new int[boundaryTotal];
        int[] lengths = new int[nodes + 1];
        int current = 0;
        long total = 0;
        for (int v = 0; v < nodes; v++) {
            int[] rows = analysis.boundary(v);
            System.arraycopy(rows, 0, boundaryRows, boundaryStart[v], rows.length);
            boundaryStart[v + 1] = boundaryStart[v] + rows.length;
            long w = tree.width(v);
            long size = w * w + 2 * w * rows.length;
            if (size > Integer.MAX_VALUE - 16) {
                throw new IllegalArgumentException("multifrontal LU: front " + v + " needs " + size
                        + " factor entries, more than one array holds");
            }
            if (lengths[current] + size > SEGMENT_CAPACITY && lengths[current] > 0) {
                current++;
            }
            segment[v] = current;
            offset[v] = lengths[current];
            lengths[current] += (int) size;
            total += size;
        }
        segments = new double[current + 1][];
        for (int s = 0; s <= current; s++) {
            segments[s] = new double[lengths[s]];
        }
        pivots = new int[analysis.size()];
        entries = total;
    }

    int start(int v) {
        return tree.columnStart()[v];
    }

    int width(int v) {
        return tree.width(v);
    }

    int boundaryStart(int v) {
        return boundaryStart[v];
    }

    int boundaryCount(int v) {
        return boundaryStart[v + 1] - boundaryStart[v];
    }

    /** @return the packed boundary rows of all fronts (see {@link #boundaryStart}) */
    int[] boundaryRows() {
        return boundaryRows;
    }

    /** @return the array holding front v */
    double[] storage(int v) {
        return segments[segment[v]];
    }

    /** @return the index of front v's own block in {@link #storage(int)} */
    int offset(int v) {
        return offset[v];
    }

    /** @return the row swaps, indexed by elimination position (local row within the front) */
    int[] pivots() {
        return pivots;
    }

    /** @return stored entries of L and U */
    long entries() {
        return entries;
    }
}
