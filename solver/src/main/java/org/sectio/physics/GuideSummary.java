package org.sectio.physics;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.ModeSet;

/**
 * The engineering summary of a solved guide: its dominant mode, its first higher mode, the
 * single-mode band fc1 … fc2 and the usable band 1.25 fc1 … 0.95 fc2 of {@link BandRule} (common
 * practice).
 *
 * <p>The dominant mode is the one of lowest cutoff: in a guide with TEM modes a TEM mode (fc = 0).
 * The first higher mode is the lowest other mode of any family and any symmetry class (in a ridged
 * guide it is often not the TE20-like mode), skipping the degenerate partners of the dominant mode:
 * modes whose cutoff exceeds fc1 by no more than {@link BandRule#DEGENERATE_SPREAD} relative (the rule
 * of {@link BandRule#of}), further TEM modes, and, when identities are given, modes with the same
 * textbook family and indices as the dominant one (a guard for coarse or graded grids, where a
 * computed pair can split by more than the spread; the circle's TE11 pair splits by 3e-8 at 100 cells).
 *
 * <p>A summary is only as complete as the solve. {@code ModeSolver} reports the {@code modeCount}
 * lowest modes over the families asked for, so with modeCount = 1, or with only the dominant mode and
 * its partners in the set (a circle's TE11 pair needs modeCount ≥ 3), the first higher mode is unknown:
 * {@link #firstHigher()} and {@link #band()} are then empty and the band edges NaN. A mode of a family
 * that was not solved (TM when only TE was asked for) cannot be found either.
 *
 * @param sectionName the cross-section's name
 * @param dominant the dominant mode
 * @param dominantLabel its name, e.g. "TE10" (with identities) or "TE 1"
 * @param nextMode the first higher mode, or null when unknown
 * @param nextLabel its name, or "unknown"
 * @param rule fc1 and fc2 with the usable-band rule, or null when the first higher mode is unknown
 * @throws IllegalArgumentException if a name or the dominant mode is missing, or the next mode and
 *     band are not both given or both null
 */
public record GuideSummary(String sectionName, Mode dominant, String dominantLabel, Mode nextMode, String nextLabel,
                           BandRule rule) {

    /** The label of an unknown first higher mode. */
    public static final String UNKNOWN = "unknown";

    public GuideSummary {
        if (sectionName == null || dominant == null || dominantLabel == null || nextLabel == null
                || (nextMode == null) != (rule == null)) {
            throw new IllegalArgumentException("guide summary: section, dominant mode and labels are required, and"
                    + " the next mode and the band must be known together");
        }
    }

    /**
     * Summarizes a solve, naming modes by family and index ("TE 1").
     *
     * @param modes the solve, lowest cutoff first
     * @return the summary
     * @throws IllegalArgumentException if the set holds no mode
     */
    public static GuideSummary of(ModeSet modes) {
        return build(modes, null);
    }

    /**
     * Summarizes a solve, naming modes by their identities (from
     * {@code ModeIdentifier.identify(section, modes)}).
     *
     * @param modes the solve, lowest cutoff first
     * @param identities one per mode, in the set's order
     * @return the summary
     * @throws IllegalArgumentException if the set holds no mode or the identities do not match it in number
     */
    public static GuideSummary of(ModeSet modes, List<ModeIdentity> identities) {
        if (identities.size() != modes.modes().size()) {
            throw new IllegalArgumentException("guide summary of " + modes.sectionName() + ": " + identities.size()
                    + " identities for " + modes.modes().size() + " modes");
        }
        return build(modes, List.copyOf(identities));
    }

    private static GuideSummary build(ModeSet modes, List<ModeIdentity> ids) {
        List<Mode> list = modes.modes();
        if (list.isEmpty()) {
            throw new IllegalArgumentException("no modes in " + modes.sectionName() + " to summarize");
        }
        Mode first = list.get(0);
        double fc1 = first.cutoffFrequencyHz();
        for (int k = 1; k < list.size(); k++) {
            Mode m = list.get(k);
            boolean partner = !(m.cutoffFrequencyHz() > fc1 * (1 + BandRule.DEGENERATE_SPREAD) && m.cutoffFrequencyHz() > 0)
                    || (ids != null && ids.get(0).sameTextbookMode(ids.get(k)));
            if (!partner) {
                return new GuideSummary(modes.sectionName(), first, label(first, ids, 0), m, label(m, ids, k),
                        new BandRule(fc1, m.cutoffFrequencyHz()));
            }
        }
        return new GuideSummary(modes.sectionName(), first, label(first, ids, 0), null, UNKNOWN, null);
    }

    private static String label(Mode m, List<ModeIdentity> ids, int k) {
        return ids == null ? m.label() : ids.get(k).label();
    }

    /** @return the first higher mode, empty when unknown */
    public Optional<Mode> firstHigher() {
        return Optional.ofNullable(nextMode);
    }

    /** @return fc1 and fc2 with the usable-band rule, empty when the first higher mode is unknown */
    public Optional<BandRule> band() {
        return Optional.ofNullable(rule);
    }

    /** @return fc1, Hz: the lower edge of the single-mode band */
    public double singleModeLowHz() {
        return dominant.cutoffFrequencyHz();
    }

    /** @return fc2, Hz: the upper edge of the single-mode band, NaN when unknown */
    public double singleModeHighHz() {
        return rule == null ? Double.NaN : rule.nextCutoffHz();
    }

    /** @return 1.25 fc1, Hz, NaN when fc2 is unknown (common practice, see {@link BandRule}) */
    public double usableLowHz() {
        return rule == null ? Double.NaN : rule.usableLowHz();
    }

    /** @return 0.95 fc2, Hz, NaN when unknown (common practice, see {@link BandRule}) */
    public double usableHighHz() {
        return rule == null ? Double.NaN : rule.usableHighHz();
    }

    /** @return whether a usable band exists by the rule (false when fc2 is unknown) */
    public boolean hasUsableBand() {
        return rule != null && rule.hasUsableBand();
    }

    /**
     * The band drawn by {@link BandBar} over 0.8 fc1 … 1.2 fc2 (0 … 1.2 fc2 for a TEM dominant mode).
     *
     * @param width columns, {@value BandBar#MIN_WIDTH} … {@value BandBar#MAX_WIDTH}
     * @return the two-line picture, empty when fc2 is unknown
     * @throws IllegalArgumentException if the width is out of range
     */
    public Optional<String> bar(int width) {
        if (rule == null) {
            return Optional.empty();
        }
        return Optional.of(BandBar.render(rule, 0.8 * rule.dominantCutoffHz(), 1.2 * rule.nextCutoffHz(), width));
    }

    /**
     * @return one line, e.g. "dominant TE10 at 6.557 GHz; next TE20 at 13.114 GHz; single-mode 6.557 … 13.114 GHz;
     *     usable 8.196 … 12.458 GHz (1.25 fc1 … 0.95 fc2, common practice)"
     */
    public String text() {
        String head = String.format(Locale.ROOT, "dominant %s at %.3f GHz", dominantLabel, singleModeLowHz() / 1e9);
        if (rule == null) {
            return head + "; next mode unknown (solve for more modes)";
        }
        String usable = rule.hasUsableBand()
                ? String.format(Locale.ROOT, "usable %.3f … %.3f GHz", usableLowHz() / 1e9, usableHighHz() / 1e9)
                : "no usable band";
        return head + String.format(Locale.ROOT, "; next %s at %.3f GHz; single-mode %.3f … %.3f GHz; ", nextLabel,
                singleModeHighHz() / 1e9, singleModeLowHz() / 1e9, singleModeHighHz() / 1e9) + usable
                + " (1.25 fc1 … 0.95 fc2, common practice)";
    }
}
