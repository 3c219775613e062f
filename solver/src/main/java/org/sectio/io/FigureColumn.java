package org.sectio.io;

import java.util.function.ToDoubleFunction;
import org.sectio.physics.ModeAtFrequency;

/**
 * The numeric figures of a {@link ModeAtFrequency} as they are named in CSV columns and JSON keys,
 * in SI units named in the key. One list, so the two formats cannot drift apart.
 */
enum FigureColumn {
    /** β, rad/m (0 below cutoff). */
    PHASE_CONSTANT("phase_constant_rad_per_m", ModeAtFrequency::phaseConstant),
    /** α of an evanescent mode, Np/m (0 above cutoff). */
    EVANESCENT_ATTENUATION("evanescent_attenuation_np_per_m", ModeAtFrequency::evanescentAttenuation),
    /** λg, m. */
    GUIDE_WAVELENGTH("guide_wavelength_m", ModeAtFrequency::guideWavelength),
    /** vp, m/s. */
    PHASE_VELOCITY("phase_velocity_m_per_s", ModeAtFrequency::phaseVelocity),
    /** vg, m/s. */
    GROUP_VELOCITY("group_velocity_m_per_s", ModeAtFrequency::groupVelocity),
    /** Wave impedance, Ω. */
    WAVE_IMPEDANCE("wave_impedance_ohm", ModeAtFrequency::waveImpedanceOhms),
    /** α_c, Np/m. */
    CONDUCTOR_LOSS_NP("conductor_loss_np_per_m", ModeAtFrequency::conductorAttenuation),
    /** α_c, dB/m. */
    CONDUCTOR_LOSS_DB("conductor_loss_db_per_m", ModeAtFrequency::conductorAttenuationDbPerMetre),
    /** α_d, Np/m. */
    DIELECTRIC_LOSS_NP("dielectric_loss_np_per_m", ModeAtFrequency::dielectricAttenuation),
    /** α_d, dB/m. */
    DIELECTRIC_LOSS_DB("dielectric_loss_db_per_m", ModeAtFrequency::dielectricAttenuationDbPerMetre),
    /** Skin depth of the wall metal, m. */
    SKIN_DEPTH("skin_depth_m", ModeAtFrequency::skinDepth),
    /** Surface resistance with roughness, Ω. */
    SURFACE_RESISTANCE("surface_resistance_ohm", ModeAtFrequency::surfaceResistance),
    /** Peak |E_t| at 1 W, V/m. */
    PEAK_FIELD("peak_field_v_per_m_at_1w", ModeAtFrequency::peakFieldPerRootWatt),
    /** Where the peak is, x, m. */
    PEAK_X("peak_field_x_m", ModeAtFrequency::peakX),
    /** Where the peak is, y, m. */
    PEAK_Y("peak_field_y_m", ModeAtFrequency::peakY),
    /** Power at which the peak field reaches the breakdown field, W. */
    BREAKDOWN_POWER("breakdown_power_w", ModeAtFrequency::breakdownPowerWatts),
    /** Breakdown power over the derating squared, W. */
    RATED_POWER("rated_power_w", ModeAtFrequency::ratedPowerWatts),
    /** Z_PV, Ω. */
    IMPEDANCE_PV("impedance_pv_ohm", ModeAtFrequency::impedancePowerVoltage),
    /** Z_PI, Ω. */
    IMPEDANCE_PI("impedance_pi_ohm", ModeAtFrequency::impedancePowerCurrent),
    /** Z_VI, Ω. */
    IMPEDANCE_VI("impedance_vi_ohm", ModeAtFrequency::impedanceVoltageCurrent),
    /** The impedance of the chosen definition, Ω. */
    CHOSEN_IMPEDANCE("characteristic_impedance_ohm", ModeAtFrequency::chosenImpedance);

    private final String key;
    private final ToDoubleFunction<ModeAtFrequency> value;

    FigureColumn(String key, ToDoubleFunction<ModeAtFrequency> value) {
        this.key = key;
        this.value = value;
    }

    /** @return the CSV column name and JSON key */
    String key() {
        return key;
    }

    /**
     * @param figures one mode at one frequency
     * @return this figure, SI; NaN when not available
     */
    double of(ModeAtFrequency figures) {
        return value.applyAsDouble(figures);
    }
}
