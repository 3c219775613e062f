package org.sectio.physics;

/**
 * Breakdown-limited power handling: a breakdown field and a safety derating.
 *
 * <p>The fields of a mode scale with the square root of the power it carries, so a peak field
 * E_ref computed at reference power P_ref gives the power at which the peak reaches E_b exactly:
 * P_max = P_ref (E_b / E_ref)². The rated power is P_max / d² for a derating d in field (d² in
 * power). The defaults, E_b = 3 MV/m for dry air at sea level and d = 2 (4 in power), are common
 * practice, not a standard. For the TE10 mode of a rectangular guide a × b the peak field is
 * E_max at the centre of the broad wall and P = E_max² a b / (4 Z_TE) (Pozar, Microwave
 * Engineering, 4th ed., §3.3, the TE10 power flow, eq. (3.90) from memory).
 *
 * @param breakdownField E_b, finite and &gt; 0, V/m
 * @param fieldDerating d ≥ 1, the factor the peak field is kept below E_b
 */
public record Breakdown(double breakdownField, double fieldDerating) {

    /** 3 MV/m: breakdown of dry air at sea level, uniform field (common practice). */
    public static final double DRY_AIR_SEA_LEVEL = 3.0e6;
    /** Field derating 2, i.e. 4 in power (common practice). */
    public static final double DEFAULT_FIELD_DERATING = 2.0;

    /**
     * Validates the components.
     *
     * @param breakdownField as in the record description
     * @param fieldDerating as in the record description
     * @throws IllegalArgumentException if a value is out of range
     */
    public Breakdown {
        if (!(breakdownField > 0) || Double.isInfinite(breakdownField)) {
            throw new IllegalArgumentException("breakdown field must be finite and > 0 V/m, got " + breakdownField);
        }
        if (!(fieldDerating >= 1) || Double.isInfinite(fieldDerating)) {
            throw new IllegalArgumentException("field derating must be finite and ≥ 1, got " + fieldDerating);
        }
    }

    /** @return dry air at sea level, 3 MV/m, derated by 2 in field (common practice) */
    public static Breakdown dryAir() {
        return new Breakdown(DRY_AIR_SEA_LEVEL, DEFAULT_FIELD_DERATING);
    }

    /**
     * P_max = P_ref (E_b / E_ref)², exact for a linear field.
     *
     * @param referencePower P_ref, finite and &gt; 0, W
     * @param peakFieldAtReference E_ref, the largest |E| at P_ref, finite and &gt; 0, V/m
     * @return the power at which the peak field reaches E_b, W
     * @throws IllegalArgumentException if a value is out of range
     */
    public double maximumPower(double referencePower, double peakFieldAtReference) {
        if (!(referencePower > 0) || Double.isInfinite(referencePower)
                || !(peakFieldAtReference > 0) || Double.isInfinite(peakFieldAtReference)) {
            throw new IllegalArgumentException("reference power and peak field must be finite and > 0, got "
                    + referencePower + " W, " + peakFieldAtReference + " V/m");
        }
        double ratio = breakdownField / peakFieldAtReference;
        return referencePower * ratio * ratio;
    }

    /**
     * P_max / d².
     *
     * @param referencePower P_ref, W
     * @param peakFieldAtReference E_ref at P_ref, V/m
     * @return the derated power, W
     * @throws IllegalArgumentException if a value is out of range
     */
    public double ratedPower(double referencePower, double peakFieldAtReference) {
        return maximumPower(referencePower, peakFieldAtReference) / (fieldDerating * fieldDerating);
    }

    /**
     * P = E_max² a b / (4 Z_TE), the power carried by TE10 of an a × b guide with peak field E_max.
     *
     * @param peakField E_max, finite and &gt; 0, V/m
     * @param a broad side, finite and &gt; 0, m
     * @param b narrow side, finite and &gt; 0, m
     * @param waveImpedance Z_TE of TE10 at the frequency, finite and &gt; 0, Ω ({@link Propagation#waveImpedance()})
     * @return the power, W
     * @throws IllegalArgumentException if a value is out of range
     */
    public static double rectangularTe10Power(double peakField, double a, double b, double waveImpedance) {
        for (double v : new double[] {peakField, a, b, waveImpedance}) {
            if (!(v > 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("E_max, a, b and Z_TE must be finite and > 0, got " + peakField
                        + " V/m, " + a + " m, " + b + " m, " + waveImpedance + " Ω");
            }
        }
        return peakField * peakField * a * b / (4 * waveImpedance);
    }

    /** @return the caution to print with power-handling figures ({@link Caution#TEXT}) */
    public String caution() {
        return Caution.TEXT;
    }
}
