package org.sectio.modes;

import java.util.List;

/**
 * The result of one solve: modes sorted by cutoff, lowest first.
 *
 * @param sectionName the cross-section's name
 * @param modes the modes, ascending cutoff
 * @param grid the grid used
 * @param timing where the time went
 */
public record ModeSet(String sectionName, List<Mode> modes, GridSummary grid, SolveTiming timing) {

    public ModeSet {
        modes = List.copyOf(modes);
    }
}
