package org.sectio.io;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Locale;
import org.sectio.physics.Caution;
import org.sectio.physics.Mismatch;

/**
 * Writes a {@link JunctionReport} in one of the {@link TableFormat}s. The readable table names both
 * guides and their dominant modes, states that the figures are the impedance-step estimate, prints
 * one row per frequency (f in GHz, Z_A and Z_B in Ω, Γ, return loss in dB, VSWR, reflected power in
 * %) and ends with {@link Caution#TEXT}. A matched step (Γ = 0) has an infinite return loss, printed
 * {@value #INFINITE} in the table; VSWR of a total reflection likewise.
 *
 * <p>CSV columns: {@value #CSV_HEADER}; an infinite value is written {@code inf}. The caution is not
 * part of the CSV (the command prints it on the error stream). JSON: {@code section_a},
 * {@code section_b}, {@code mode_a}, {@code mode_b}, {@code cutoff_a_hz}, {@code cutoff_b_hz},
 * {@code impedance_definition}, {@code method}, {@code steps} (each with the CSV keys; an infinite
 * value is null) and {@code caution}.
 */
public final class JunctionWriter {

    /** The CSV header row. */
    public static final String CSV_HEADER = "frequency_hz,impedance_a_ohm,impedance_b_ohm,reflection_coefficient,"
            + "return_loss_db,vswr,reflected_power_fraction";
    /** How the table prints an infinite return loss or VSWR. */
    public static final String INFINITE = "infinite";
    /** What the figures are, one sentence. */
    public static final String METHOD = "impedance-step estimate: Γ = (Z_B − Z_A)/(Z_B + Z_A) from the dominant"
            + " modes' characteristic impedances; it ignores the energy stored at the step (its reactance),"
            + " so it is a first figure, best for small steps";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private JunctionWriter() {
    }

    /**
     * @param report the junction
     * @param format the layout
     * @return the whole text, lines ending in {@code \n}
     */
    public static String format(JunctionReport report, TableFormat format) {
        return switch (format) {
            case TABLE -> readable(report);
            case CSV -> csv(report);
            case JSON -> json(report);
        };
    }

    private static String readable(JunctionReport r) {
        StringBuilder text = new StringBuilder();
        text.append("Junction from A into B\n");
        text.append(String.format(Locale.ROOT, "  A: %s, dominant mode %s, fc %s%n", r.sectionA(), r.modeA(),
                ghz(r.cutoffA())));
        text.append(String.format(Locale.ROOT, "  B: %s, dominant mode %s, fc %s%n", r.sectionB(), r.modeB(),
                ghz(r.cutoffB())));
        text.append("  characteristic impedance: ").append(r.impedanceDefinition()).append('\n');
        text.append("  ").append(METHOD).append('\n');
        text.append(String.format(Locale.ROOT, "%12s  %10s  %10s  %8s  %16s  %10s  %13s%n", "f (GHz)", "Z_A (ohm)",
                "Z_B (ohm)", "Gamma", "return loss (dB)", "VSWR", "reflected (%)"));
        for (JunctionStep s : r.steps()) {
            Mismatch m = s.mismatch();
            text.append(String.format(Locale.ROOT, "%12.6f  %10.3f  %10.3f  %8.4f  %16s  %10s  %13.3f%n",
                    s.frequencyHz() * 1e-9, s.impedanceA(), s.impedanceB(), m.reflection(),
                    finiteOr(m.returnLossDb(), "%.2f"), finiteOr(m.vswr(), "%.4f"), 100 * m.reflectedFraction()));
        }
        text.append(Caution.TEXT).append('\n');
        return text.toString().replace("\r\n", "\n");
    }

    private static String csv(JunctionReport r) {
        StringBuilder text = new StringBuilder(CSV_HEADER).append('\n');
        for (JunctionStep s : r.steps()) {
            Mismatch m = s.mismatch();
            text.append(s.frequencyHz()).append(',').append(s.impedanceA()).append(',').append(s.impedanceB())
                    .append(',').append(m.reflection()).append(',').append(csvNumber(m.returnLossDb())).append(',')
                    .append(csvNumber(m.vswr())).append(',').append(m.reflectedFraction()).append('\n');
        }
        return text.toString();
    }

    private static String json(JunctionReport r) {
        ObjectNode root = JSON.createObjectNode();
        root.put("section_a", r.sectionA());
        root.put("section_b", r.sectionB());
        root.put("mode_a", r.modeA());
        root.put("mode_b", r.modeB());
        JsonNumbers.put(root, "cutoff_a_hz", r.cutoffA());
        JsonNumbers.put(root, "cutoff_b_hz", r.cutoffB());
        root.put("impedance_definition", r.impedanceDefinition());
        root.put("method", METHOD);
        ArrayNode steps = root.putArray("steps");
        for (JunctionStep s : r.steps()) {
            Mismatch m = s.mismatch();
            ObjectNode step = steps.addObject();
            JsonNumbers.put(step, "frequency_hz", s.frequencyHz());
            JsonNumbers.put(step, "impedance_a_ohm", s.impedanceA());
            JsonNumbers.put(step, "impedance_b_ohm", s.impedanceB());
            JsonNumbers.put(step, "reflection_coefficient", m.reflection());
            JsonNumbers.put(step, "return_loss_db", m.returnLossDb());
            JsonNumbers.put(step, "vswr", m.vswr());
            JsonNumbers.put(step, "reflected_power_fraction", m.reflectedFraction());
        }
        root.put("caution", Caution.TEXT);
        return JsonNumbers.text(JSON, root);
    }

    private static String finiteOr(double value, String pattern) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, pattern, value) : INFINITE;
    }

    private static String csvNumber(double value) {
        return Double.isFinite(value) ? Double.toString(value) : "inf";
    }

    private static String ghz(double hz) {
        return hz == 0 ? "0 (TEM)" : String.format(Locale.ROOT, "%.6f GHz", hz * 1e-9);
    }
}
