package org.sectio.physics;

/**
 * The engineering figures of one mode at one frequency, SI units. A figure that is not available is NaN,
 * and {@link #limitation()} says why (empty when everything is available).
 *
 * <p>Power-handling figures ({@code peakFieldPerRootWatt}, {@code breakdownPowerWatts},
 * {@code ratedPowerWatts}) are engineering estimates: print {@link #caution()} beside them.
 *
 * @param modeLabel e.g. "TE 1"
 * @param frequencyHz f, Hz
 * @param cutoffFrequencyHz fc of the mode as computed, Hz (always given)
 * @param propagating f &gt; fc (TEM: always)
 * @param phaseConstant β, rad/m (0 below cutoff)
 * @param evanescentAttenuation α = √(kc² − k²) below cutoff, Np/m (0 above)
 * @param guideWavelength λg = 2π/β, m
 * @param phaseVelocity vp = ω/β, m/s
 * @param groupVelocity vg = v²β/ω, m/s
 * @param waveImpedanceOhms Z_TE = ωμ/β, Z_TM = β/(ωε) or η, Ω (real, above cutoff)
 * @param conductorAttenuation α_c = P_wall / (2P), Np/m
 * @param conductorAttenuationDbPerMetre α_c in dB/m (8.686 dB per Np)
 * @param dielectricAttenuation α_d = ω ∫ ε tanδ |E|² dA / (4P), Np/m
 * @param dielectricAttenuationDbPerMetre α_d in dB/m
 * @param skinDepth δs of the wall metal, m
 * @param surfaceResistance Rs of the wall (roughness included), Ω
 * @param peakFieldPerRootWatt the largest |E_t| at 1 W transmitted, V/m (per √W)
 * @param peakX where it is, m
 * @param peakY where it is, m
 * @param breakdownPowerWatts 1 W · (E_bd / E_peak(1 W))², W
 * @param ratedPowerWatts the breakdown power over the derating squared, W
 * @param impedancePowerVoltage Z_PV = |V|²/(2P), Ω
 * @param impedancePowerCurrent Z_PI = 2P/|I|², Ω
 * @param impedanceVoltageCurrent Z_VI = V/I, Ω
 * @param chosenDefinition which of the three {@code chosenImpedance} is
 * @param chosenImpedance the impedance reported by default, Ω
 * @param limitation why figures are NaN, or ""
 * @throws IllegalArgumentException if the label, definition or limitation is missing or f is not positive
 */
public record ModeAtFrequency(String modeLabel, double frequencyHz, double cutoffFrequencyHz, boolean propagating,
                              double phaseConstant, double evanescentAttenuation, double guideWavelength,
                              double phaseVelocity, double groupVelocity, double waveImpedanceOhms,
                              double conductorAttenuation, double conductorAttenuationDbPerMetre,
                              double dielectricAttenuation, double dielectricAttenuationDbPerMetre,
                              double skinDepth, double surfaceResistance, double peakFieldPerRootWatt,
                              double peakX, double peakY, double breakdownPowerWatts, double ratedPowerWatts,
                              double impedancePowerVoltage, double impedancePowerCurrent,
                              double impedanceVoltageCurrent, ImpedanceDefinition chosenDefinition,
                              double chosenImpedance, String limitation) {

    public ModeAtFrequency {
        if (modeLabel == null || chosenDefinition == null || limitation == null || !(frequencyHz > 0)) {
            throw new IllegalArgumentException("mode at frequency: label, impedance definition and limitation are"
                    + " required and f > 0, got " + modeLabel + ", " + chosenDefinition + ", " + frequencyHz + " Hz");
        }
    }

    /** @return the caution to print beside the power-handling figures ({@link Caution#TEXT}) */
    public String caution() {
        return Caution.TEXT;
    }
}
