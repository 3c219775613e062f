package org.sectio.io;

/**
 * One mode's figures over the frequencies of a {@link BandSweep}, for the sweep charts: NaN where the
 * mode is cut off (or a figure is not defined).
 *
 * @param label the mode's name, e.g. "TE10", not blank
 * @param phaseConstant β at each frequency, rad/m, or NaN; copied
 * @param attenuationDbPerMetre α_c + α_d at each frequency, dB/m, or NaN; copied
 */
public record ModeCurve(String label, double[] phaseConstant, double[] attenuationDbPerMetre) {

    /**
     * Validates and copies the components.
     *
     * @param label as in the record description
     * @param phaseConstant as in the record description
     * @param attenuationDbPerMetre as in the record description
     * @throws IllegalArgumentException if the label is blank or the two arrays differ in length
     */
    public ModeCurve {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("a mode curve needs a label");
        }
        if (phaseConstant == null || attenuationDbPerMetre == null
                || phaseConstant.length != attenuationDbPerMetre.length) {
            throw new IllegalArgumentException("mode curve " + label + ": β and α need one value per frequency");
        }
        phaseConstant = phaseConstant.clone();
        attenuationDbPerMetre = attenuationDbPerMetre.clone();
    }

    /** @return a copy of β per frequency, rad/m */
    @Override
    public double[] phaseConstant() {
        return phaseConstant.clone();
    }

    /** @return a copy of α_c + α_d per frequency, dB/m */
    @Override
    public double[] attenuationDbPerMetre() {
        return attenuationDbPerMetre.clone();
    }
}
