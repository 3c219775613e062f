package org.sectio.io;

import org.sectio.physics.Mismatch;

/**
 * The impedance-step estimate of a junction at one frequency: the characteristic impedances of the
 * dominant modes on both sides and the {@link Mismatch} between them, Γ = (Z_B − Z_A) / (Z_B + Z_A)
 * (Pozar, Microwave Engineering, 4th ed., §2.3). It ignores the energy stored in the evanescent
 * modes at the step.
 *
 * @param frequencyHz f, finite and &gt; 0, Hz
 * @param impedanceA Z_A of the dominant mode of guide A, finite and &gt; 0, Ω
 * @param impedanceB Z_B of the dominant mode of guide B, finite and ≥ 0, Ω
 * @param mismatch the step from Z_A into Z_B
 */
public record JunctionStep(double frequencyHz, double impedanceA, double impedanceB, Mismatch mismatch) {

    /**
     * Validates the components.
     *
     * @param frequencyHz as in the record description
     * @param impedanceA as in the record description
     * @param impedanceB as in the record description
     * @param mismatch as in the record description
     * @throws IllegalArgumentException if a value is out of range
     */
    public JunctionStep {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz) || !(impedanceA > 0) || Double.isInfinite(impedanceA)
                || !(impedanceB >= 0) || Double.isInfinite(impedanceB) || mismatch == null) {
            throw new IllegalArgumentException("junction step needs f > 0, Z_A > 0, Z_B ≥ 0 (finite) and a mismatch;"
                    + " got " + frequencyHz + " Hz, " + impedanceA + " Ω, " + impedanceB + " Ω");
        }
    }

    /**
     * The step at one frequency.
     *
     * @param frequencyHz f, Hz
     * @param impedanceA Z_A, Ω
     * @param impedanceB Z_B, Ω
     * @return the step, with Γ from {@link Mismatch#between}
     * @throws IllegalArgumentException if a value is out of range
     */
    public static JunctionStep of(double frequencyHz, double impedanceA, double impedanceB) {
        return new JunctionStep(frequencyHz, impedanceA, impedanceB, Mismatch.between(impedanceA, impedanceB));
    }
}
