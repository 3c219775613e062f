package org.sectio.cli;

import java.util.List;
import java.util.Locale;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Breakdown;
import org.sectio.physics.Conductor;
import org.sectio.physics.VoltagePath;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/**
 * The options that say how modes are analysed at a frequency: wall metal, roughness, breakdown field,
 * derating and impedance definition. Shared by {@code solve} and {@code junction} as a picocli mixin.
 */
final class AnalysisOptions {

    /** The option names, to tell whether any was given. */
    static final List<String> NAMES = List.of("--conductor", "--roughness", "--breakdown-field", "--derating",
            "--impedance");

    @Option(names = "--conductor", paramLabel = "NAME|S_PER_M",
            description = "wall metal of every wall: copper, silver, gold, aluminium or brass, or a conductivity in"
                    + " S/m such as 3.5e7 (default: the metal the geometry file gives the walls, else copper)")
    private String conductor;

    @Option(names = "--roughness", paramLabel = "LENGTH", defaultValue = "0",
            description = "rms roughness of the walls, e.g. 0.4um, 1.5mil or 4e-7 (metres without a unit;"
                    + " default: ${DEFAULT-VALUE}, smooth)")
    private String roughness;

    @Option(names = "--breakdown-field", paramLabel = "V_PER_M", defaultValue = "3e6",
            description = "field at which the filling breaks down, V/m (default: ${DEFAULT-VALUE}, dry air at sea"
                    + " level, common practice)")
    private double breakdownField;

    @Option(names = "--derating", paramLabel = "FACTOR", defaultValue = "2",
            description = "keep the peak field this factor below the breakdown field; the rated power is the"
                    + " breakdown power over its square (default: ${DEFAULT-VALUE})")
    private double derating;

    @Option(names = "--impedance", paramLabel = "pv|pi|vi",
            description = "characteristic impedance to report: pv power–voltage, pi power–current, vi"
                    + " voltage–current (default: pv; TM modes, whose wall-to-wall voltage is zero, report pi)")
    private ImpedanceChoice impedance;

    /**
     * @param spec the command, to tell whether an option was given
     * @return the first analysis option given on the command line, or null
     */
    static String firstGiven(CommandSpec spec) {
        for (String name : NAMES) {
            if (spec.commandLine().getParseResult().hasMatchedOption(name)) {
                return name;
            }
        }
        return null;
    }

    /**
     * @param path the voltage path, or null for the automatic one
     * @return the analysis settings
     * @throws IllegalArgumentException with a one-line message naming the option at fault
     */
    AnalysisSettings settings(VoltagePath path) {
        Conductor metal = conductor();
        double rms = LengthText.parse("--roughness", roughness);
        Breakdown breakdown;
        try {
            breakdown = new Breakdown(breakdownField, Breakdown.DEFAULT_FIELD_DERATING);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--breakdown-field " + breakdownField + ": " + e.getMessage());
        }
        try {
            breakdown = new Breakdown(breakdownField, derating);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--derating " + derating + ": " + e.getMessage());
        }
        return new AnalysisSettings(metal, rms, breakdown, impedance == null
                ? AnalysisSettings.defaults().definition() : impedance.definition(), path);
    }

    /** @return whether {@code --conductor} was given (it then overrides the geometry file's metal) */
    boolean conductorGiven() {
        return conductor != null;
    }

    private Conductor conductor() {
        if (conductor == null) {
            return Conductor.COPPER;
        }
        String text = conductor.strip();
        if (!text.isEmpty() && (Character.isDigit(text.charAt(0)) || text.charAt(0) == '.' || text.charAt(0) == '-'
                || text.charAt(0) == '+')) {
            double sigma;
            try {
                sigma = Double.parseDouble(text);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("--conductor " + text + ": expected a metal name or a conductivity"
                        + " in S/m such as 3.5e7");
            }
            try {
                return Conductor.user(sigma);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("--conductor " + text + ": " + e.getMessage());
            }
        }
        try {
            return Conductor.named(text);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--conductor " + text.toLowerCase(Locale.ROOT) + ": " + e.getMessage());
        }
    }
}
