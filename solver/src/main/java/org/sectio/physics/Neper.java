package org.sectio.physics;

/**
 * Nepers and decibels of a field attenuation: 1 Np = 20 log10(e) dB = 20 / ln 10 dB ≈ 8.686 dB
 * (Pozar, Microwave Engineering, 4th ed., §2.1 and Appendix on decibels and nepers, from memory).
 * An attenuation constant α in Np/m is thus 8.686 α dB/m.
 */
public final class Neper {

    /** 20 log10(e) = 20 / ln 10 ≈ 8.685889638 dB per neper. */
    public static final double DECIBELS_PER_NEPER = 20.0 / Math.log(10.0);

    private Neper() {
    }

    /**
     * @param nepers an attenuation in Np (or Np/m)
     * @return the same in dB (or dB/m)
     */
    public static double toDecibels(double nepers) {
        return nepers * DECIBELS_PER_NEPER;
    }

    /**
     * @param decibels an attenuation in dB (or dB/m)
     * @return the same in Np (or Np/m)
     */
    public static double toNepers(double decibels) {
        return decibels / DECIBELS_PER_NEPER;
    }
}
