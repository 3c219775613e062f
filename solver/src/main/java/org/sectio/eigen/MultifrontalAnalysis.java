package org.sectio.eigen;

import java.util.Arrays;
import org.ejml.data.DMatrixSparseCSC;

/**
 * Symbolic phase of the multifrontal Cholesky factorization of a lattice matrix: the
 * nested-dissection order, the assembly tree (one front per dissection node) and the exact row
 * structure of every front, which depend only on the sparsity pattern. One analysis serves every
 * matrix with the same pattern (for instance {@code A − σM} for several shifts {@code σ}).
 *
 * <p>The front of node {@code v} has the rows of its own columns followed by its boundary: the
 * ancestor unknowns coupled to the subtree of {@code v}, which is the union of the children's
 * boundaries and the direct couplings of {@code v}'s columns, restricted to later positions (Liu,
 * "The multifrontal method for sparse matrix solution: theory and practice", SIAM Review 34 (1992)
 * 82–109). For lattice-neighbour couplings every later unknown reached this way lies on an ancestor
 * separator, so the dissection tree is an assembly tree without a general symbolic factorization.
 * Neighbours are the eight lattice points around a point (|Δcolumn| ≤ 1 and |Δrow| ≤ 1): 5-point
 * and 9-point stencils. A diagonal coupling cannot jump over a lattice line either, so a separator
 * line still disconnects the two halves (George 1973 dissects the 9-point finite-element mesh).
 *
 * <p>Instances are immutable and may be shared between threads.
 */
public final class MultifrontalAnalysis {

    private final int size;
    private final DissectionTree tree;
    private final int[] patternColumns;
    private final int[] patternRows;
    private final int[][] boundary;
    private final int[][] parentLocal;
    private final int[] assemblyOffset;
    private final int[] assemblyValue;
    private final int[] assemblyRow;
    private final int[] assemblyColumn;
    private final long factorNonZeros;
    private final int largestFront;
    private final int[] storageSegment;
    private final int[] storageOffset;
    private final int[] segmentLengths;

    /** Largest segment of factor storage; few big arrays live in the old generation and are never copied by the collector. */
    private static final int SEGMENT_CAPACITY = 1 << 27;

    private MultifrontalAnalysis(DMatrixSparseCSC pattern, int[] column, int[] row, int leafSize) {
        int n = pattern.numCols;
        if (pattern.numRows != n || column.length != n || row.length != n) {
            throw new IllegalArgumentException("multifrontal analysis: matrix is " + pattern.numRows + " x "
                    + pattern.numCols + " but " + column.length + " column and " + row.length
                    + " row coordinates were given; need a square matrix with one lattice point per unknown");
        }
        this.size = n;
        this.tree = NestedDissection.dissect(column, row, leafSize);
        this.patternColumns = Arrays.copyOf(pattern.col_idx, n + 1);
        this.patternRows = Arrays.copyOf(pattern.nz_rows, pattern.nz_length);
        int[] perm = tree.permutation();
        int[] position = new int[n];
        for (int p = 0; p < n; p++) {
            position[perm[p]] = p;
        }
        requireLatticeCouplings(column, row);
        requireSymmetricCount();
        int nodes = tree.nodeCount();
        boundary = new int[nodes][];
        parentLocal = new int[nodes][];
        assemblyOffset = new int[nodes + 1];
        int lowerEntries = 0;
        for (int k = 0; k < n; k++) {
            for (int idx = patternColumns[k]; idx < patternColumns[k + 1]; idx++) {
                if (position[patternRows[idx]] >= position[k]) {
                    lowerEntries++;
                }
            }
        }
        assemblyValue = new int[lowerEntries];
        assemblyRow = new int[lowerEntries];
        assemblyColumn = new int[lowerEntries];
        int[] mark = new int[n];
        Arrays.fill(mark, -1);
        int[] local = new int[n];
        int[] buffer = new int[n];
        long nonZeros = 0;
        int widest = 0;
        int entry = 0;
        for (int v = 0; v < nodes; v++) {
            int start = tree.columnStart()[v];
            int end = tree.columnEnd()[v];
            int count = 0;
            for (int child : new int[] {tree.firstChild()[v], tree.secondChild()[v]}) {
                if (child < 0) {
                    continue;
                }
                for (int q : boundary[child]) {
                    if (q >= end && mark[q] != v) {
                        mark[q] = v;
                        buffer[count++] = q;
                    }
                }
            }
            for (int p = start; p < end; p++) {
                int k = perm[p];
                for (int idx = patternColumns[k]; idx < patternColumns[k + 1]; idx++) {
                    int q = position[patternRows[idx]];
                    if (q >= end && mark[q] != v) {
                        mark[q] = v;
                        buffer[count++] = q;
                    }
                }
            }
            int[] rows = Arrays.copyOf(buffer, count);
            Arrays.sort(rows);
            boundary[v] = rows;
            int width = end - start;
            for (int p = start; p < end; p++) {
                local[p] = p - start;
            }
            for (int i = 0; i < count; i++) {
                local[rows[i]] = width + i;
            }
            assemblyOffset[v] = entry;
            for (int p = start; p < end; p++) {
                int k = perm[p];
                for (int idx = patternColumns[k]; idx < patternColumns[k + 1]; idx++) {
                    int q = position[patternRows[idx]];
                    if (q >= p) {
                        assemblyValue[entry] = idx;
                        assemblyRow[entry] = local[q];
                        assemblyColumn[entry] = p - start;
                        entry++;
                    }
                }
            }
            for (int child : new int[] {tree.firstChild()[v], tree.secondChild()[v]}) {
                if (child >= 0) {
                    int[] childRows = boundary[child];
                    int[] map = new int[childRows.length];
                    for (int i = 0; i < map.length; i++) {
                        map[i] = local[childRows[i]];
                    }
                    parentLocal[child] = map;
                }
            }
            long frontSize = (long) width + count;
            if (frontSize * frontSize > Integer.MAX_VALUE) {
                throw new IllegalArgumentException("multifrontal analysis: front of " + frontSize
                        + " rows is too large for dense storage");
            }
            widest = (int) Math.max(widest, frontSize);
            nonZeros += (long) width * (width + 1) / 2 + (long) width * count;
        }
        assemblyOffset[nodes] = entry;
        storageSegment = new int[nodes];
        storageOffset = new int[nodes];
        int[] lengths = new int[nodes + 1];
        int segment = 0;
        for (int v = 0; v < nodes; v++) {
            long width = tree.width(v);
            long entries = width * (width + 1) / 2 + width * boundary[v].length;
            if (lengths[segment] + entries > SEGMENT_CAPACITY && lengths[segment] > 0) {
                segment++;
            }
            if (entries > Integer.MAX_VALUE - 16) {
                throw new IllegalArgumentException("multifrontal analysis: front " + v + " needs " + entries
                        + " factor entries, more than one array holds");
            }
            storageSegment[v] = segment;
            storageOffset[v] = lengths[segment];
            lengths[segment] += (int) entries;
        }
        segmentLengths = Arrays.copyOf(lengths, segment + 1);
        parentLocal[tree.root()] = new int[0];
        this.factorNonZeros = nonZeros;
        this.largestFront = widest;
    }

    /**
     * Analyses the pattern of a lattice matrix with the default leaf size
     * ({@link NestedDissection#DEFAULT_LEAF_SIZE}).
     *
     * @param pattern square sparse matrix in full symmetric storage (both triangles); only its
     *     pattern is read; an entry {@code (k, l)}, {@code k ≠ l}, may exist only if unknowns
     *     {@code k} and {@code l} are lattice neighbours ({@code max(|Δcolumn|, |Δrow|) = 1}: the
     *     four edge neighbours of a 5-point stencil and the four diagonal ones of a 9-point stencil)
     * @param column lattice column of every unknown
     * @param row lattice row of every unknown (points distinct)
     * @return the reusable symbolic analysis
     * @throws IllegalArgumentException if sizes disagree, points repeat, an entry couples
     *     non-neighbours or the pattern is not structurally symmetric
     */
    public static MultifrontalAnalysis analyse(DMatrixSparseCSC pattern, int[] column, int[] row) {
        return new MultifrontalAnalysis(pattern, column, row, NestedDissection.DEFAULT_LEAF_SIZE);
    }

    /** As {@link #analyse(DMatrixSparseCSC, int[], int[])} with an explicit dissection leaf size. */
    static MultifrontalAnalysis analyse(DMatrixSparseCSC pattern, int[] column, int[] row, int leafSize) {
        return new MultifrontalAnalysis(pattern, column, row, leafSize);
    }

    /**
     * Numeric phase: factors {@code P A Pᵀ = L Lᵀ} for a matrix with the analysed pattern.
     *
     * @param matrix SPD matrix, full symmetric storage, identical pattern (same column pointers and
     *     row indices) to the analysed one
     * @param threads worker threads, {@code ≥ 1}; the factor is bitwise identical for every count
     * @return the factorization
     * @throws IllegalArgumentException if the pattern differs or {@code threads < 1}
     * @throws NotPositiveDefiniteException if a pivot is {@code ≤ 0}
     */
    public MultifrontalCholesky factor(DMatrixSparseCSC matrix, int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("multifrontal factor: threads must be at least 1, got " + threads);
        }
        requireSamePattern(matrix);
        return new MultifrontalCholesky(this, FrontalElimination.eliminate(this, matrix.nz_values, threads), threads);
    }

    /** @return the order {@code n} of the analysed matrix */
    public int size() {
        return size;
    }

    /** @return the number of entries of {@code L} that the numeric phase will store */
    public long factorNonZeros() {
        return factorNonZeros;
    }

    /** @return the number of fronts (dissection-tree nodes) */
    public int frontCount() {
        return tree.nodeCount();
    }

    /** @return the order of the largest dense front */
    public int largestFront() {
        return largestFront;
    }

    int storageSegment(int v) {
        return storageSegment[v];
    }

    int storageOffset(int v) {
        return storageOffset[v];
    }

    int[] segmentLengths() {
        return segmentLengths.clone();
    }

    DissectionTree tree() {
        return tree;
    }

    int[] boundary(int v) {
        return boundary[v];
    }

    int[] parentLocal(int v) {
        return parentLocal[v];
    }

    int assemblyStart(int v) {
        return assemblyOffset[v];
    }

    int assemblyEnd(int v) {
        return assemblyOffset[v + 1];
    }

    int[] assemblyValue() {
        return assemblyValue;
    }

    int[] assemblyRow() {
        return assemblyRow;
    }

    int[] assemblyColumn() {
        return assemblyColumn;
    }

    private void requireSamePattern(DMatrixSparseCSC matrix) {
        boolean same = matrix.numRows == size && matrix.numCols == size && matrix.nz_length == patternRows.length
                && Arrays.equals(matrix.col_idx, 0, size + 1, patternColumns, 0, size + 1)
                && Arrays.equals(matrix.nz_rows, 0, matrix.nz_length, patternRows, 0, patternRows.length);
        if (!same) {
            throw new IllegalArgumentException("multifrontal factor: matrix " + matrix.numRows + " x " + matrix.numCols
                    + " with " + matrix.nz_length + " entries does not have the analysed pattern (" + size + " x "
                    + size + ", " + patternRows.length + " entries)");
        }
    }

    private void requireLatticeCouplings(int[] column, int[] row) {
        for (int k = 0; k < size; k++) {
            for (int idx = patternColumns[k]; idx < patternColumns[k + 1]; idx++) {
                int l = patternRows[idx];
                if (l != k && Math.max(Math.abs(column[k] - column[l]), Math.abs(row[k] - row[l])) != 1) {
                    throw new IllegalArgumentException("multifrontal analysis: entry (" + l + ", " + k
                            + ") couples lattice points (" + column[l] + ", " + row[l] + ") and (" + column[k] + ", "
                            + row[k] + "), which are not neighbours");
                }
            }
        }
    }

    private void requireSymmetricCount() {
        long lower = 0, upper = 0;
        for (int k = 0; k < size; k++) {
            for (int idx = patternColumns[k]; idx < patternColumns[k + 1]; idx++) {
                int l = patternRows[idx];
                if (l > k) {
                    lower++;
                } else if (l < k) {
                    upper++;
                }
            }
        }
        if (lower != upper) {
            throw new IllegalArgumentException("multifrontal analysis: " + lower + " entries below and " + upper
                    + " above the diagonal; the matrix must be stored with both triangles");
        }
    }
}
