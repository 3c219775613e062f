package org.sectio.physics;

/**
 * Attenuation by a lossy filling of loss tangent tan δ in a homogeneously filled guide.
 *
 * <p>TE or TM mode: α_d = k² tan δ / (2β) Np/m (Pozar, Microwave Engineering, 4th ed., §3.1,
 * eq. (3.29), equation number from memory), with k = ω√(με) and β the phase constant; TEM (β = k):
 * α_d = k tan δ / 2 (Pozar §2.7 / §3.1). Valid for tan δ ≪ 1.
 */
public final class DielectricLoss {

    private DielectricLoss() {
    }

    /**
     * α_d = k² tan δ / (2β), with tan δ that of the propagation's filling.
     *
     * @param propagation a propagating TE, TM or TEM mode
     * @return α_d, Np/m
     * @throws IllegalArgumentException if the mode is at or below cutoff
     */
    public static double attenuation(Propagation propagation) {
        if (!propagation.propagating()) {
            throw new IllegalArgumentException("dielectric loss is defined for a propagating mode; "
                    + propagation.family() + " with cutoff " + propagation.cutoffHz() + " Hz is evanescent at "
                    + propagation.frequencyHz() + " Hz");
        }
        double k = propagation.wavenumber();
        return k * k * propagation.filling().lossTangent() / (2 * propagation.phaseConstant());
    }

    /**
     * α_d = k tan δ / 2 of a TEM wave.
     *
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @param filling the medium, with its tan δ
     * @return α_d, Np/m
     * @throws IllegalArgumentException if f is out of range
     */
    public static double temAttenuation(double frequencyHz, Filling filling) {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("frequency must be finite and > 0 Hz, got " + frequencyHz);
        }
        return filling.wavenumber(frequencyHz) * filling.lossTangent() / 2;
    }
}
