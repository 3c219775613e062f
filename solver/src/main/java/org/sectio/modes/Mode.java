package org.sectio.modes;

/**
 * One guided mode of a hollow metal guide at cutoff.
 *
 * @param family TE or TM
 * @param index 1-based position within its family, lowest cutoff first
 * @param cutoffWavenumber kc, rad/m
 * @param cutoffFrequencyHz fc = c kc / (2π √(εr μr)) for the filling, Hz
 * @param relativeResidual ‖A x − λ M x‖ / (‖A x‖ + |λ| ‖M x‖) of the discrete eigenpair
 * @param relativeErrorEstimate estimated |kc − kc,exact| / kc of the printed value from a second,
 *     coarser grid, or NaN when not estimated
 * @param field the longitudinal field on the grid
 */
public record Mode(ModeFamily family, int index, double cutoffWavenumber, double cutoffFrequencyHz,
                   double relativeResidual, double relativeErrorEstimate, FieldMap field) {

    public Mode {
        if (index < 1 || !(cutoffWavenumber > 0) || !(cutoffFrequencyHz > 0)) {
            throw new IllegalArgumentException("mode " + family + " #" + index + ": expected index ≥ 1 and"
                    + " positive cutoff, got kc = " + cutoffWavenumber + " rad/m, fc = " + cutoffFrequencyHz + " Hz");
        }
    }

    /** @return e.g. "TE 3" */
    public String label() {
        return family + " " + index;
    }
}
