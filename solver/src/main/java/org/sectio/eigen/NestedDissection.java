package org.sectio.eigen;

import java.util.Arrays;

/**
 * Nested-dissection elimination order for unknowns that sit on distinct points of a 2-D integer
 * lattice and couple only to their lattice neighbours (5-point or 9-point stencil), after A. George, "Nested
 * dissection of a regular finite element mesh", SIAM J. Numer. Anal. 10 (1973) 345–363.
 *
 * <p>The tight bounding box of the unknowns is cut across its longer side at the middle lattice
 * line; the unknowns on that line form the separator, which is eliminated after both halves. The
 * halves are dissected recursively until a box holds at most {@link #DEFAULT_LEAF_SIZE} unknowns.
 * Because neither a 5-point nor a diagonal (9-point) coupling jumps over a lattice line, the separator
 * disconnects the halves.
 * Clipped regions (discs, holes) give empty separators or unbalanced halves, which are allowed.
 */
public final class NestedDissection {

    /** Largest box (in unknowns) that is ordered directly instead of being dissected further. */
    public static final int DEFAULT_LEAF_SIZE = 8;

    private final int[] column;
    private final int[] row;
    private final int leafSize;
    private final int[] order;
    private final int[] scratch;
    private final int[] columnStart;
    private final int[] columnEnd;
    private final int[] subtreeStart;
    private final int[] firstChild;
    private final int[] secondChild;
    private final int[] parent;
    private int nodes;

    private NestedDissection(int[] column, int[] row, int leafSize) {
        this.column = column;
        this.row = row;
        this.leafSize = leafSize;
        int n = column.length;
        this.order = new int[n];
        this.scratch = new int[n];
        int capacity = 2 * n + 1;
        this.columnStart = new int[capacity];
        this.columnEnd = new int[capacity];
        this.subtreeStart = new int[capacity];
        this.firstChild = new int[capacity];
        this.secondChild = new int[capacity];
        this.parent = new int[capacity];
    }

    /**
     * Computes the nested-dissection elimination order of lattice unknowns.
     *
     * @param column lattice column (x) of every unknown
     * @param row lattice row (y) of every unknown; the points {@code (column[k], row[k])} must be distinct
     * @return {@code perm} with {@code perm[p]} = original index of the unknown eliminated {@code p}-th
     * @throws IllegalArgumentException if the arrays differ in length, are empty, or repeat a lattice point
     */
    public static int[] latticeOrdering(int[] column, int[] row) {
        return dissect(column, row, DEFAULT_LEAF_SIZE).permutation().clone();
    }

    /**
     * Builds the dissection tree (ordering plus separator ranges) used as the assembly tree of the
     * multifrontal factorization.
     */
    static DissectionTree dissect(int[] column, int[] row, int leafSize) {
        if (column.length != row.length || column.length == 0) {
            throw new IllegalArgumentException("nested dissection: need as many rows as columns (got "
                    + column.length + " columns and " + row.length + " rows) and at least one unknown");
        }
        if (leafSize < 1) {
            throw new IllegalArgumentException("nested dissection: leaf size must be positive, got " + leafSize);
        }
        requireDistinctPoints(column, row);
        NestedDissection builder = new NestedDissection(column, row, leafSize);
        for (int k = 0; k < column.length; k++) {
            builder.order[k] = k;
        }
        int root = builder.build(0, column.length);
        builder.parent[root] = -1;
        int count = builder.nodes;
        return new DissectionTree(builder.order, Arrays.copyOf(builder.columnStart, count),
                Arrays.copyOf(builder.columnEnd, count), Arrays.copyOf(builder.subtreeStart, count),
                Arrays.copyOf(builder.firstChild, count), Arrays.copyOf(builder.secondChild, count),
                Arrays.copyOf(builder.parent, count));
    }

    /** Orders {@code order[lo, hi)} in place (children first, separator last) and returns its node. */
    private int build(int lo, int hi) {
        int count = hi - lo;
        if (count <= leafSize) {
            return addNode(lo, lo, hi, -1, -1);
        }
        int minC = Integer.MAX_VALUE, maxC = Integer.MIN_VALUE, minR = Integer.MAX_VALUE, maxR = Integer.MIN_VALUE;
        for (int p = lo; p < hi; p++) {
            int k = order[p];
            minC = Math.min(minC, column[k]);
            maxC = Math.max(maxC, column[k]);
            minR = Math.min(minR, row[k]);
            maxR = Math.max(maxR, row[k]);
        }
        boolean cutColumns = (long) maxC - minC >= (long) maxR - minR;
        int[] coordinate = cutColumns ? column : row;
        int[] along = cutColumns ? row : column;
        int middle = cutColumns ? (int) (((long) minC + maxC) >> 1) : (int) (((long) minR + maxR) >> 1);
        int lowCount = 0, highCount = 0;
        for (int p = lo; p < hi; p++) {
            int c = coordinate[order[p]];
            if (c < middle) {
                lowCount++;
            } else if (c > middle) {
                highCount++;
            }
        }
        int low = lo, high = lo + lowCount, separator = lo + lowCount + highCount;
        for (int p = lo; p < hi; p++) {
            int k = order[p];
            int c = coordinate[k];
            if (c < middle) {
                scratch[low++] = k;
            } else if (c > middle) {
                scratch[high++] = k;
            } else {
                scratch[separator++] = k;
            }
        }
        System.arraycopy(scratch, lo, order, lo, count);
        int separatorStart = lo + lowCount + highCount;
        sortAlong(separatorStart, hi, along);
        int lowChild = lowCount > 0 ? build(lo, lo + lowCount) : -1;
        int highChild = highCount > 0 ? build(lo + lowCount, separatorStart) : -1;
        int first = lowChild >= 0 ? lowChild : highChild;
        int second = lowChild >= 0 ? highChild : -1;
        return addNode(lo, separatorStart, hi, first, second);
    }

    private int addNode(int subtree, int start, int end, int first, int second) {
        int v = nodes++;
        subtreeStart[v] = subtree;
        columnStart[v] = start;
        columnEnd[v] = end;
        firstChild[v] = first;
        secondChild[v] = second;
        if (first >= 0) {
            parent[first] = v;
        }
        if (second >= 0) {
            parent[second] = v;
        }
        return v;
    }

    /** Orders a separator along its lattice line (by the other coordinate), so the order is reproducible. */
    private void sortAlong(int from, int to, int[] along) {
        long[] keyed = new long[to - from];
        for (int p = from; p < to; p++) {
            keyed[p - from] = ((long) along[order[p]] << 32) | (order[p] & 0xffffffffL);
        }
        Arrays.sort(keyed);
        for (int p = from; p < to; p++) {
            order[p] = (int) keyed[p - from];
        }
    }

    private static void requireDistinctPoints(int[] column, int[] row) {
        long[] points = new long[column.length];
        for (int k = 0; k < column.length; k++) {
            points[k] = ((long) column[k] << 32) | (row[k] & 0xffffffffL);
        }
        Arrays.sort(points);
        for (int k = 1; k < points.length; k++) {
            if (points[k] == points[k - 1]) {
                throw new IllegalArgumentException("nested dissection: lattice point (" + (int) (points[k] >> 32)
                        + ", " + (int) points[k] + ") holds more than one unknown");
            }
        }
    }
}
