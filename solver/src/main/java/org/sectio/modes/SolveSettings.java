package org.sectio.modes;

import java.util.EnumSet;
import java.util.Set;

/**
 * What to solve for.
 *
 * @param modeCount how many modes to report, lowest cutoff first over the chosen families, 1 … 200
 * @param families TE, TM or both
 * @param cellsAcross grid cells across the longer side of the cross-section's bounding box, 8 … 4000;
 *     ignored when {@code targetRelativeError} is set
 * @param targetRelativeError the wanted relative error of every reported cutoff, which then picks the
 *     grid (1e-7 … 0.1), or NaN to use {@code cellsAcross}
 * @param estimateError whether to solve again on a coarser grid to estimate each cutoff's error
 * @param threads worker threads for factorization, ≥ 1
 */
public record SolveSettings(int modeCount, Set<ModeFamily> families, int cellsAcross, double targetRelativeError,
                            boolean estimateError, int threads) {

    /** Most modes one solve reports. */
    public static final int MAX_MODES = 200;
    /** Fewest grid cells across. */
    public static final int MIN_CELLS = 8;
    /** Most grid cells across (about 12 M unknowns for a square). */
    public static final int MAX_CELLS = 4000;

    public SolveSettings {
        if (modeCount < 1 || modeCount > MAX_MODES) {
            throw new IllegalArgumentException("number of modes must be 1 … " + MAX_MODES + ", got " + modeCount);
        }
        if (families == null || families.isEmpty()) {
            throw new IllegalArgumentException("choose at least one mode family (TE, TM)");
        }
        families = Set.copyOf(families);
        if (cellsAcross < MIN_CELLS || cellsAcross > MAX_CELLS) {
            throw new IllegalArgumentException("cells across must be " + MIN_CELLS + " … " + MAX_CELLS
                    + ", got " + cellsAcross);
        }
        if (!Double.isNaN(targetRelativeError) && !(targetRelativeError >= 1e-7 && targetRelativeError <= 0.1)) {
            throw new IllegalArgumentException("target relative error must be 1e-7 … 0.1, got " + targetRelativeError);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
    }

    /**
     * Grid cells across the longer side by default: enough for every built-in family at its default
     * dimensions to have its first six cutoffs within 1e-4 of the converged values (DefaultAccuracyTest;
     * at 200 cells the sixth TE mode of the layer on the broad wall was at 1.08e-4).
     */
    public static final int DEFAULT_CELLS = 240;

    /** Ten modes of all families on the default grid with an error estimate, on all cores. */
    public static SolveSettings defaults() {
        return new SolveSettings(10, EnumSet.allOf(ModeFamily.class), DEFAULT_CELLS, Double.NaN, true,
                Runtime.getRuntime().availableProcessors());
    }

    /** @return these settings with another grid */
    public SolveSettings withCellsAcross(int cells) {
        return new SolveSettings(modeCount, families, cells, Double.NaN, estimateError, threads);
    }
}
