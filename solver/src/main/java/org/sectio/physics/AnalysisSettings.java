package org.sectio.physics;

/**
 * What {@link ModeAnalysis} needs besides the mode and the frequency.
 *
 * @param conductor the wall metal of every conductor
 * @param rmsRoughnessMetres Δ, rms wall roughness for the Hammerstad–Bekkadal factor ({@link RoughnessFactor}),
 *     finite and ≥ 0, m (0: smooth)
 * @param breakdown breakdown field and derating
 * @param definition the impedance reported as the chosen one (TM modes fall back to power–current, their
 *     wall-to-wall voltage being zero)
 * @param path the voltage path, or null for {@link VoltagePath#automatic}
 * @throws IllegalArgumentException if a value is missing or out of range, naming it
 */
public record AnalysisSettings(Conductor conductor, double rmsRoughnessMetres, Breakdown breakdown,
                               ImpedanceDefinition definition, VoltagePath path) {

    public AnalysisSettings {
        if (conductor == null || breakdown == null || definition == null) {
            throw new IllegalArgumentException("analysis settings need a conductor, a breakdown and an impedance"
                    + " definition, got " + conductor + ", " + breakdown + ", " + definition);
        }
        if (!(rmsRoughnessMetres >= 0) || Double.isInfinite(rmsRoughnessMetres)) {
            throw new IllegalArgumentException("rms roughness must be finite and ≥ 0 m, got " + rmsRoughnessMetres);
        }
    }

    /**
     * Smooth copper, dry air at sea level derated by 2 in field, power–voltage impedance, automatic path
     * (common practice).
     *
     * @return the defaults
     */
    public static AnalysisSettings defaults() {
        return new AnalysisSettings(Conductor.COPPER, 0.0, Breakdown.dryAir(), ImpedanceDefinition.POWER_VOLTAGE, null);
    }

    /** @return these settings with another conductor */
    public AnalysisSettings withConductor(Conductor metal) {
        return new AnalysisSettings(metal, rmsRoughnessMetres, breakdown, definition, path);
    }

    /** @return these settings with another voltage path (null: automatic) */
    public AnalysisSettings withPath(VoltagePath voltagePath) {
        return new AnalysisSettings(conductor, rmsRoughnessMetres, breakdown, definition, voltagePath);
    }
}
