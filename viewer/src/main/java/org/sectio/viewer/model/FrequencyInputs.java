package org.sectio.viewer.model;

import org.sectio.modes.Mode;
import org.sectio.physics.FrequencySpec;

/**
 * The frequency of the mode table and the band of the charts, as typed, in the command line's syntax
 * ({@link FrequencySpec}) and with its messages. The band may be left empty: it is then 0.8 … 2.4
 * times the lowest non-zero cutoff of the solve, 81 points, which holds the single-mode band of every
 * built-in family.
 */
public final class FrequencyInputs {

    /** Points of the automatic band. */
    static final int AUTOMATIC_POINTS = 81;

    private String frequencyText = "10 GHz";
    private String frequencyError = "";
    private String bandText = "";
    private String bandError = "";

    /** @return the frequency as typed */
    public String frequencyText() {
        return frequencyText;
    }

    /** @return the problem with the typed frequency, or "" */
    public String frequencyError() {
        return frequencyError;
    }

    /** @return the band as typed, "" for automatic */
    public String bandText() {
        return bandText;
    }

    /** @return the problem with the typed band, or "" */
    public String bandError() {
        return bandError;
    }

    /** @return whether the text was read; otherwise {@link #frequencyError()} says why */
    boolean setFrequency(String text) {
        frequencyText = text == null ? "" : text;
        try {
            FrequencySpec.parseFrequency(frequencyText);
            frequencyError = "";
        } catch (IllegalArgumentException e) {
            frequencyError = e.getMessage();
        }
        return frequencyError.isEmpty();
    }

    /** @return whether the text was read; otherwise {@link #bandError()} says why */
    boolean setBand(String text) {
        bandText = text == null ? "" : text.strip();
        bandError = "";
        if (!bandText.isEmpty()) {
            try {
                if (!FrequencySpec.parse(bandText).isSweep()) {
                    bandError = "a band needs START:STOP:POINTS, e.g. 8GHz:12GHz:41";
                }
            } catch (IllegalArgumentException e) {
                bandError = e.getMessage();
            }
        }
        return bandError.isEmpty();
    }

    /** @return the frequency, Hz, or NaN while the text has a problem */
    public double frequencyHz() {
        return frequencyError.isEmpty() ? FrequencySpec.parseFrequency(frequencyText) : Double.NaN;
    }

    /**
     * @param band a band text that was accepted ("" for automatic)
     * @param outcome the solve the band is for
     * @return the frequencies, Hz, or null when automatic and no mode has a cutoff above 0
     */
    static double[] bandFrequencies(String band, SolveOutcome outcome) {
        if (!band.isEmpty()) {
            return FrequencySpec.parse(band).values();
        }
        double fc = outcome.modes().stream().mapToDouble(Mode::cutoffFrequencyHz).filter(v -> v > 0).min()
                .orElse(Double.NaN);
        return Double.isNaN(fc) ? null : new FrequencySpec(0.8 * fc, 2.4 * fc, AUTOMATIC_POINTS).values();
    }
}
