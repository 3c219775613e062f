package org.sectio.physics;

import java.util.List;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeSet;

/**
 * The single-mode band of a guide and its usable part.
 *
 * <p>Between the cutoff of the dominant mode fc1 and that of the next mode fc2 exactly one mode
 * propagates. Near fc1 the loss and dispersion are high and near fc2 the next mode is barely
 * evanescent, so the usable band is taken as 1.25 fc1 … 0.95 fc2 (common practice). For WR-90,
 * fc1 = 6.557 GHz and fc2 = 13.114 GHz give 8.20 … 12.46 GHz, close to the EIA recommended band
 * 8.2 … 12.4 GHz (from memory). A guide whose fc2/fc1 is below 0.95/1.25 has no usable band by this
 * rule ({@link #hasUsableBand()} false). With a TEM dominant mode (fc1 = 0) the usable band starts at 0.
 *
 * @param dominantCutoffHz fc1, finite and ≥ 0, Hz
 * @param nextCutoffHz fc2, finite and &gt; fc1, Hz
 */
public record BandRule(double dominantCutoffHz, double nextCutoffHz) {

    /** Lower edge of the usable band as a multiple of fc1 (common practice). */
    public static final double LOWER_FACTOR = 1.25;
    /** Upper edge of the usable band as a multiple of fc2 (common practice). */
    public static final double UPPER_FACTOR = 0.95;
    /** Relative spread within which two computed cutoffs are one (degenerate) mode. */
    public static final double DEGENERATE_SPREAD = 1e-6;

    /**
     * Validates the components.
     *
     * @param dominantCutoffHz as in the record description
     * @param nextCutoffHz as in the record description
     * @throws IllegalArgumentException if a value is out of range
     */
    public BandRule {
        if (!(dominantCutoffHz >= 0) || !(nextCutoffHz > dominantCutoffHz) || Double.isInfinite(nextCutoffHz)) {
            throw new IllegalArgumentException("cutoffs must satisfy 0 ≤ fc1 < fc2 < ∞, got fc1 = " + dominantCutoffHz
                    + " Hz, fc2 = " + nextCutoffHz + " Hz");
        }
    }

    /**
     * The band of a solved guide: fc1 of its lowest mode, fc2 of the first mode whose cutoff exceeds
     * fc1 by more than {@link #DEGENERATE_SPREAD} relative (so a doublet such as the circle's TE11
     * counts once).
     *
     * @param modes the solved modes, lowest cutoff first
     * @return the band rule
     * @throws IllegalArgumentException if the set has no second distinct cutoff
     */
    public static BandRule of(ModeSet modes) {
        List<Mode> list = modes.modes();
        if (list.isEmpty()) {
            throw new IllegalArgumentException("no modes in " + modes.sectionName() + " to find a band from");
        }
        double fc1 = list.get(0).cutoffFrequencyHz();
        for (Mode m : list) {
            if (m.cutoffFrequencyHz() > fc1 * (1 + DEGENERATE_SPREAD) && m.cutoffFrequencyHz() > 0) {
                return new BandRule(fc1, m.cutoffFrequencyHz());
            }
        }
        throw new IllegalArgumentException("all " + list.size() + " modes of " + modes.sectionName()
                + " share the cutoff " + fc1 + " Hz; solve for more modes to find the next one");
    }

    /** @return 1.25 fc1, Hz */
    public double usableLowHz() {
        return LOWER_FACTOR * dominantCutoffHz;
    }

    /** @return 0.95 fc2, Hz */
    public double usableHighHz() {
        return UPPER_FACTOR * nextCutoffHz;
    }

    /** @return true when 1.25 fc1 &lt; 0.95 fc2 */
    public boolean hasUsableBand() {
        return usableLowHz() < usableHighHz();
    }

    /** @return fc2 / fc1 (+∞ for a TEM dominant mode) */
    public double bandRatio() {
        return nextCutoffHz / dominantCutoffHz;
    }
}
