package org.sectio.physics;

import org.sectio.modes.HybridField;
import org.sectio.modes.HybridMode;

/**
 * The engineering figures of a hybrid mode of a partially filled guide at one frequency, from the
 * full-vector solve (no matrices here: the mode carries β, its field scaled to 1 W, its power and
 * stored energy).
 *
 * <p>Above cutoff: β′ from the eigenvalue, λg = 2π/β′, vp = ω/β′, vg = P/W (the energy velocity, equal
 * to the group velocity of a lossless guide: Collin, Field Theory of Guided Waves, ch. 5, energy
 * relations, from memory), α_d = −Im β from the complex eigenvalue of a lossy filling (0 for lossless
 * materials), the peak |E| at 1 W and the breakdown and rated powers of {@link Breakdown}. Not
 * defined for a hybrid mode, or not yet computed, and NaN with the reason: the wave impedance (E_t/H_t
 * varies over the section), the wall loss α_c, and the characteristic impedances. Below cutoff: α.
 */
public final class HybridFigures {

    private HybridFigures() {
    }

    /**
     * @param mode the hybrid mode at this frequency
     * @param label the row's mode label
     * @param frequencyHz f, Hz
     * @param cutoffHz the mode's cutoff from the scalar solve, Hz
     * @param settings wall metal (skin depth, surface resistance), breakdown, impedance definition
     * @return the figures
     */
    public static ModeAtFrequency at(HybridMode mode, String label, double frequencyHz, double cutoffHz,
                                     AnalysisSettings settings) {
        double nan = Double.NaN;
        double skin = settings.conductor().skinDepth(frequencyHz);
        double rs = settings.conductor().surfaceResistance(frequencyHz, settings.rmsRoughnessMetres());
        if (!mode.propagating()) {
            return new ModeAtFrequency(label, frequencyHz, cutoffHz, false, 0, mode.attenuation(),
                    Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 0, nan, nan, nan, nan, nan, skin, rs, nan, nan,
                    nan, nan, nan, nan, nan, nan, settings.definition(), nan,
                    "below cutoff (hybrid solve): the mode carries no power");
        }
        double omega = 2 * Math.PI * frequencyHz;
        double beta = mode.phaseConstant();
        HybridField field = mode.field();
        double vg = field.powerWatts() / field.storedEnergyJoulesPerMetre();
        double alphaD = mode.attenuation();
        double peak = field.peakElectricField() / Math.sqrt(field.powerWatts());
        Breakdown bd = settings.breakdown();
        return new ModeAtFrequency(label, frequencyHz, cutoffHz, true, beta, 0, 2 * Math.PI / beta, omega / beta, vg,
                nan, nan, nan, alphaD, Neper.toDecibels(alphaD), skin, rs, peak, field.peakX(), field.peakY(),
                bd.maximumPower(1.0, peak), bd.ratedPower(1.0, peak), nan, nan, nan, settings.definition(), nan,
                "hybrid mode (full-vector solve): wave impedance, wall loss and characteristic impedances are not"
                        + " computed for partly filled guides");
    }
}
