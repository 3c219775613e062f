package org.sectio.modes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ejml.data.DMatrixSparseCSC;
import org.sectio.eigen.MultifrontalAnalysis;

/**
 * What consecutive solves on one thread can share, for parameter sweeps: the symbolic analysis of the
 * shifted pencil (nested-dissection ordering, dissection tree, front structure) when a family's matrix
 * has the same lattice points and the same sparsity pattern as in an earlier solve, and, if asked for,
 * the last eigenvectors of that pattern as the start of the next Lanczos run.
 *
 * <p>Why a session and not a global cache: a sweep runs one solve per thread at a time, and a
 * session owned by one thread needs no locking and holds no state another solve could see. A session
 * is therefore <b>not</b> thread-safe; give each worker thread its own.
 *
 * <p>Reusing the analysis changes no number: the analysis depends only on the pattern and the lattice
 * points, and the numeric factor computed from it is the same bit for bit. Starting Lanczos from the
 * previous eigenvectors ({@link #createWarm()}) gives the same pairs to the Lanczos tolerance
 * (1e-12 relative) but not the same bits, so a result then depends on which point was solved before it;
 * batch work that must reproduce every record exactly leaves it off.
 */
public final class SolveSession {

    /** Patterns remembered per session: the fine and the coarse grid of both families, with room to spare. */
    private static final int CAPACITY = 6;

    private final boolean warmStart;
    private final List<Entry> entries = new ArrayList<>();
    private int analysesReused;
    private int analysesMade;
    private int warmStarts;

    private SolveSession(boolean warmStart) {
        this.warmStart = warmStart;
    }

    /** @return a session that reuses symbolic analyses only (results identical to solves without it) */
    public static SolveSession create() {
        return new SolveSession(false);
    }

    /** @return a session that also starts Lanczos from the last eigenvectors of the same pattern */
    public static SolveSession createWarm() {
        return new SolveSession(true);
    }

    /** @return whether this session starts Lanczos from earlier eigenvectors */
    public boolean warmStart() {
        return warmStart;
    }

    /** @return how many factorizations used a remembered analysis */
    public int analysesReused() {
        return analysesReused;
    }

    /** @return how many analyses were computed (and remembered) */
    public int analysesMade() {
        return analysesMade;
    }

    /** @return how many Lanczos runs started from earlier eigenvectors */
    public int warmStarts() {
        return warmStarts;
    }

    /** The analysis of this pattern: remembered, or computed now and remembered (oldest dropped first). */
    MultifrontalAnalysis analysis(ModeFamily family, DMatrixSparseCSC shifted, int[] column, int[] row) {
        Entry found = find(family, shifted, column, row);
        if (found != null) {
            analysesReused++;
            return found.analysis;
        }
        MultifrontalAnalysis made = MultifrontalAnalysis.analyse(shifted, column, row);
        analysesMade++;
        if (entries.size() == CAPACITY) {
            entries.remove(0);
        }
        entries.add(new Entry(family, Arrays.copyOf(shifted.col_idx, shifted.numCols + 1),
                Arrays.copyOf(shifted.nz_rows, shifted.nz_length), column.clone(), row.clone(), made));
        return made;
    }

    /**
     * @return the sum of the eigenvectors last found for this pattern, or null when there are none or
     *     warm starts are off
     */
    double[] start(ModeFamily family, DMatrixSparseCSC shifted, int[] column, int[] row) {
        if (!warmStart) {
            return null;
        }
        Entry found = find(family, shifted, column, row);
        if (found == null || found.lastVectors == null) {
            return null;
        }
        warmStarts++;
        double[] sum = new double[column.length];
        for (double[] v : found.lastVectors) {
            for (int i = 0; i < sum.length; i++) {
                sum[i] += v[i];
            }
        }
        return sum;
    }

    /** Remembers the eigenvectors just found for this pattern (only with warm starts on). */
    void rememberVectors(ModeFamily family, DMatrixSparseCSC shifted, int[] column, int[] row, double[][] vectors) {
        if (!warmStart) {
            return;
        }
        Entry found = find(family, shifted, column, row);
        if (found != null) {
            found.lastVectors = vectors.clone();
        }
    }

    private Entry find(ModeFamily family, DMatrixSparseCSC shifted, int[] column, int[] row) {
        for (Entry e : entries) {
            if (e.family == family && e.column.length == column.length && e.rows.length == shifted.nz_length
                    && Arrays.equals(e.column, column) && Arrays.equals(e.row, row)
                    && Arrays.equals(e.columnStarts, 0, e.columnStarts.length, shifted.col_idx, 0, shifted.numCols + 1)
                    && Arrays.equals(e.rows, 0, e.rows.length, shifted.nz_rows, 0, shifted.nz_length)) {
                return e;
            }
        }
        return null;
    }

    /** One remembered pattern: its structure, its analysis and its last eigenvectors. */
    private static final class Entry {
        final ModeFamily family;
        final int[] columnStarts;
        final int[] rows;
        final int[] column;
        final int[] row;
        final MultifrontalAnalysis analysis;
        double[][] lastVectors;

        Entry(ModeFamily family, int[] columnStarts, int[] rows, int[] column, int[] row, MultifrontalAnalysis analysis) {
            this.family = family;
            this.columnStarts = columnStarts;
            this.rows = rows;
            this.column = column;
            this.row = row;
            this.analysis = analysis;
        }
    }
}
