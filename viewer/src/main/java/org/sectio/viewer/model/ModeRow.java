package org.sectio.viewer.model;

import org.sectio.modes.Mode;
import org.sectio.modes.ModeIdentity;
import org.sectio.physics.ModeAtFrequency;

/**
 * One line of the mode table: a solved mode, what it is, and its figures at the chosen frequency.
 *
 * @param number 1-based, lowest cutoff first
 * @param mode the solved mode
 * @param identity its identity (label such as "TE10", symmetry)
 * @param figures its figures at the chosen frequency (β, λg, impedance, α_c, power handling); NaN
 *     figures where not defined, with the reason in {@link ModeAtFrequency#limitation()}
 */
public record ModeRow(int number, Mode mode, ModeIdentity identity, ModeAtFrequency figures) {

    /** @return the mode's name, e.g. "TE10" or "TE #2, odd/even" */
    public String label() {
        return identity.label();
    }
}
