package org.sectio.modes;

import java.util.Comparator;
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

    /** @return the modes lowest cutoff frequency first (a stable sort: equal cutoffs keep this set's order) */
    public List<Mode> byCutoff() {
        return modes.stream().sorted(Comparator.comparingDouble(Mode::cutoffFrequencyHz)).toList();
    }
}
