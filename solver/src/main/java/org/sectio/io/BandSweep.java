package org.sectio.io;

import java.util.List;

/**
 * The figures of a frequency sweep that the sweep charts draw: the frequencies, one
 * {@link ModeCurve} per mode, and the single-mode band fc1 … fc2 to shade.
 *
 * @param sectionName the cross-section, for the titles
 * @param frequenciesHz the frequencies, Hz, finite, &gt; 0 and ascending, at least two; copied
 * @param modes the modes, each with one value per frequency, at least one; copied
 * @param singleModeLowHz fc1, Hz, or NaN when not known
 * @param singleModeHighHz fc2, Hz (&gt; fc1), or NaN when not known
 */
public record BandSweep(String sectionName, double[] frequenciesHz, List<ModeCurve> modes, double singleModeLowHz,
                        double singleModeHighHz) {

    /**
     * Validates and copies the components.
     *
     * @param sectionName as in the record description
     * @param frequenciesHz as in the record description
     * @param modes as in the record description
     * @param singleModeLowHz as in the record description
     * @param singleModeHighHz as in the record description
     * @throws IllegalArgumentException if a component is out of range
     */
    public BandSweep {
        if (sectionName == null || frequenciesHz == null || frequenciesHz.length < 2 || modes == null
                || modes.isEmpty()) {
            throw new IllegalArgumentException("a band sweep needs a section name, at least two frequencies and a mode");
        }
        for (int i = 0; i < frequenciesHz.length; i++) {
            if (!(frequenciesHz[i] > 0) || Double.isInfinite(frequenciesHz[i])
                    || (i > 0 && !(frequenciesHz[i] > frequenciesHz[i - 1]))) {
                throw new IllegalArgumentException("band sweep frequencies must be finite, > 0 and ascending; #" + i
                        + " is " + frequenciesHz[i] + " Hz");
            }
        }
        for (ModeCurve m : modes) {
            if (m.phaseConstant().length != frequenciesHz.length) {
                throw new IllegalArgumentException("mode curve " + m.label() + " has " + m.phaseConstant().length
                        + " values for " + frequenciesHz.length + " frequencies");
            }
        }
        boolean known = Double.isFinite(singleModeLowHz) && Double.isFinite(singleModeHighHz);
        if (known && !(singleModeHighHz > singleModeLowHz)) {
            throw new IllegalArgumentException("single-mode band must have fc2 > fc1, got " + singleModeLowHz + " … "
                    + singleModeHighHz + " Hz");
        }
        frequenciesHz = frequenciesHz.clone();
        modes = List.copyOf(modes);
    }

    /** @return a copy of the frequencies, Hz */
    @Override
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }

    /** @return true when the single-mode band is known */
    public boolean hasSingleModeBand() {
        return Double.isFinite(singleModeLowHz) && Double.isFinite(singleModeHighHz);
    }
}
