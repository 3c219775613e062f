package org.sectio.modes;

import java.util.List;

/**
 * The hybrid modes of a cross-section at one frequency.
 *
 * @param sectionName the cross-section's name
 * @param frequencyHz f, Hz
 * @param modes largest Re β² first (or in tracked order, see {@link HybridSweep})
 * @param grid the grid (unknownsTE/TM: the cell and node unknowns; see {@code edgeUnknowns})
 * @param edgeUnknowns the order of the eigenproblem (Hx and Hy edges)
 * @param targetBetaSquared the shift τ of shift-invert, rad²/m²
 * @param timing assembly, factorization, Arnoldi and total time, s
 * @param operatorApplications shift-invert solves spent by Arnoldi
 */
public record HybridModeSet(String sectionName, double frequencyHz, List<HybridMode> modes, GridSummary grid,
                            int edgeUnknowns, double targetBetaSquared, SolveTiming timing,
                            int operatorApplications) {

    public HybridModeSet {
        modes = List.copyOf(modes);
    }
}
