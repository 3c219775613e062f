package org.sectio.modes;

/**
 * One guided mode of a metal guide at cutoff.
 *
 * <p>{@code cutoffWavenumber} is k0 = 2π fc / c, the free-space wavenumber at the cutoff frequency,
 * rad/m: the square root of the eigenvalue of the pencils at β = 0 (−∇²Ez = k0² εr Ez,
 * −∇·(εr⁻¹∇Hz) = k0² Hz). For an air-filled guide it is the cutoff wavenumber kc of the textbooks;
 * for a homogeneous filling εr it is kc / √εr, so that fc = c kc / (2π √εr); with dielectric regions
 * it is the only wavenumber that stays defined. It is written to CSV and JSON as
 * {@code cutoff_wavenumber_per_m} with that meaning.
 *
 * <p>TEM modes (guides with two or more conductors) have k0 = 0 and fc = 0 and carry a characteristic
 * impedance; TE and TM modes have k0 &gt; 0 and no impedance (NaN).
 *
 * @param family TE, TM or TEM
 * @param index 1-based position within its family, lowest cutoff first (TEM: ascending impedance)
 * @param cutoffWavenumber k0 at cutoff, rad/m (see above); 0 for TEM
 * @param cutoffFrequencyHz fc = c k0 / (2π), Hz; 0 for TEM
 * @param relativeResidual TE/TM: ‖A x − λ M x‖ / (‖A x‖ + |λ| ‖M x‖) of the discrete eigenpair;
 *     TEM: ‖A φ − b‖ / ‖b‖ of the electrostatic solve
 * @param relativeErrorEstimate estimated |kc − kc,exact| / kc (TEM: |Z0 − Z0,exact| / Z0) of the
 *     printed value from a second, coarser grid, or NaN when not estimated
 * @param field the longitudinal field on the grid (TEM: the electrostatic potential on the nodes)
 * @param characteristicImpedanceOhms TEM: Z0 = 1 / (v C) with v = c / √εr and C the modal capacitance
 *     per unit length, Ω; TE and TM: NaN
 * @throws IllegalArgumentException if index &lt; 1, or a TE/TM cutoff is not positive, or a TEM mode
 *     has a non-zero cutoff or no positive impedance
 */
public record Mode(ModeFamily family, int index, double cutoffWavenumber, double cutoffFrequencyHz,
                   double relativeResidual, double relativeErrorEstimate, FieldMap field,
                   double characteristicImpedanceOhms) {

    public Mode {
        boolean tem = family == ModeFamily.TEM;
        boolean cutoffOk = tem ? cutoffWavenumber == 0 && cutoffFrequencyHz == 0 && characteristicImpedanceOhms > 0
                : cutoffWavenumber > 0 && cutoffFrequencyHz > 0;
        if (index < 1 || !cutoffOk) {
            throw new IllegalArgumentException("mode " + family + " #" + index + ": expected index ≥ 1 and "
                    + (tem ? "zero cutoff with a positive impedance" : "positive cutoff") + ", got kc = "
                    + cutoffWavenumber + " rad/m, fc = " + cutoffFrequencyHz + " Hz, Z0 = "
                    + characteristicImpedanceOhms + " Ω");
        }
    }

    /** A TE or TM mode, which has no characteristic impedance. */
    public Mode(ModeFamily family, int index, double cutoffWavenumber, double cutoffFrequencyHz,
                double relativeResidual, double relativeErrorEstimate, FieldMap field) {
        this(family, index, cutoffWavenumber, cutoffFrequencyHz, relativeResidual, relativeErrorEstimate, field,
                Double.NaN);
    }

    /** @return e.g. "TE 3" */
    public String label() {
        return family + " " + index;
    }
}
