package org.sectio.physics;

/**
 * The reflection at a step from a guide section of wave impedance Z_A into one of Z_B, both real.
 *
 * <p>Γ = (Z_B − Z_A) / (Z_B + Z_A); return loss RL = −20 log10|Γ| dB; VSWR = (1 + |Γ|) / (1 − |Γ|);
 * reflected power fraction |Γ|², transmitted 1 − |Γ|² (Pozar, Microwave Engineering, 4th ed., §2.3).
 * This is the impedance-step estimate: it ignores the energy stored in the evanescent modes at the
 * step (the step's shunt susceptance, Pozar §4.6 on discontinuities, section number from memory), so
 * it is a first figure only, best for small steps.
 *
 * @param reflection Γ, real, −1 ≤ Γ ≤ 1
 */
public record Mismatch(double reflection) {

    /**
     * Validates the components.
     *
     * @param reflection as in the record description
     * @throws IllegalArgumentException if Γ is out of range
     */
    public Mismatch {
        if (!(reflection >= -1 && reflection <= 1)) {
            throw new IllegalArgumentException("reflection coefficient must be −1 … 1, got " + reflection);
        }
    }

    /**
     * The step from Z_A into Z_B.
     *
     * @param fromOhms Z_A, finite and &gt; 0, Ω
     * @param toOhms Z_B ≥ 0, Ω; 0 is a short (Γ = −1), +∞ an open (Γ = +1)
     * @return the mismatch
     * @throws IllegalArgumentException if an impedance is out of range
     */
    public static Mismatch between(double fromOhms, double toOhms) {
        if (!(fromOhms > 0) || Double.isInfinite(fromOhms)) {
            throw new IllegalArgumentException("reference impedance must be finite and > 0 Ω, got " + fromOhms);
        }
        if (!(toOhms >= 0)) {
            throw new IllegalArgumentException("load impedance must be ≥ 0 Ω, got " + toOhms);
        }
        if (Double.isInfinite(toOhms)) {
            return new Mismatch(1.0);
        }
        return new Mismatch((toOhms - fromOhms) / (toOhms + fromOhms));
    }

    /** @return |Γ| */
    public double magnitude() {
        return Math.abs(reflection);
    }

    /** @return RL = −20 log10|Γ|, dB; +∞ when matched, 0 for a short or open */
    public double returnLossDb() {
        return -20 * Math.log10(magnitude());
    }

    /** @return VSWR = (1 + |Γ|) / (1 − |Γ|), 1 … +∞ */
    public double vswr() {
        return (1 + magnitude()) / (1 - magnitude());
    }

    /** @return |Γ|², the fraction of the incident power reflected */
    public double reflectedFraction() {
        return reflection * reflection;
    }

    /** @return 1 − |Γ|², the fraction transmitted past the step (lossless step) */
    public double transmittedFraction() {
        return 1 - reflectedFraction();
    }

    /** @return the caution to print with reflected-power figures ({@link Caution#TEXT}) */
    public String caution() {
        return Caution.TEXT;
    }
}
