package org.sectio.io;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeIdentity;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.BandRule;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.Caution;
import org.sectio.physics.ModeAtFrequency;
import org.sectio.physics.VoltagePath;

/**
 * The CSV and JSON layouts of a {@link FrequencyReport}, SI units named in every key.
 *
 * <p>CSV: one row per frequency and mode (frequency outer, modes lowest cutoff first), columns
 * {@value #CSV_LEAD}, then the {@link FigureColumn} keys, then {@code impedance_definition,limitation}.
 * Unavailable figures are empty fields; text fields holding a comma or quote are quoted.
 *
 * <p>JSON: the object of the plain solve ({@code section, grid, timing, modes}; each mode gains
 * {@code name} and {@code symmetry}), plus {@code analysis} (the settings), {@code frequencies} (per
 * frequency {@code frequency_hz} and {@code modes}, each with {@code number}, {@code name},
 * {@code propagating}, every {@link FigureColumn} key, {@code impedance_definition} and
 * {@code limitation}), {@code summary} ({@code dominant_mode, dominant_cutoff_hz, next_mode,
 * next_cutoff_hz, single_mode_low_hz, single_mode_high_hz, has_usable_band, usable_low_hz,
 * usable_high_hz}; null where unknown) and {@code caution}.
 */
final class FrequencyDataWriter {

    /** The leading CSV columns. */
    static final String CSV_LEAD = "frequency_hz,number,family,index,name,symmetry,cutoff_frequency_hz,"
            + "relative_error_estimate,propagating";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private FrequencyDataWriter() {
    }

    /** @return the CSV header row */
    static String csvHeader() {
        StringBuilder header = new StringBuilder(CSV_LEAD);
        for (FigureColumn c : FigureColumn.values()) {
            header.append(',').append(c.key());
        }
        return header.append(",impedance_definition,limitation").toString();
    }

    static String csv(FrequencyReport report) {
        StringBuilder text = new StringBuilder(csvHeader()).append('\n');
        List<Mode> modes = report.modesByCutoff();
        double[] f = report.frequenciesHz();
        for (int i = 0; i < f.length; i++) {
            List<ModeAtFrequency> row = report.figures().get(i);
            for (int k = 0; k < modes.size(); k++) {
                Mode mode = modes.get(k);
                ModeAtFrequency at = row.get(k);
                ModeIdentity id = report.identities().get(k);
                text.append(f[i]).append(',').append(k + 1).append(',').append(mode.family()).append(',')
                        .append(mode.index()).append(',').append(csvText(id.label())).append(',')
                        .append(csvText(id.parityText())).append(',').append(mode.cutoffFrequencyHz()).append(',')
                        .append(csvNumber(mode.relativeErrorEstimate())).append(',').append(at.propagating());
                for (FigureColumn c : FigureColumn.values()) {
                    text.append(',').append(csvNumber(c.of(at)));
                }
                text.append(',').append(definitionKey(at)).append(',').append(csvText(at.limitation())).append('\n');
            }
        }
        return text.toString();
    }

    static String json(FrequencyReport report) {
        ObjectNode root = ModeTableWriter.jsonTree(report.modes());
        ArrayNode modeNodes = (ArrayNode) root.get("modes");
        for (int k = 0; k < modeNodes.size(); k++) {
            ObjectNode entry = (ObjectNode) modeNodes.get(k);
            entry.put("name", report.identities().get(k).label());
            entry.put("symmetry", report.identities().get(k).parityText());
        }
        root.set("analysis", analysis(report.settings()));
        ArrayNode frequencies = root.putArray("frequencies");
        double[] f = report.frequenciesHz();
        for (int i = 0; i < f.length; i++) {
            ObjectNode point = frequencies.addObject();
            JsonNumbers.put(point, "frequency_hz", f[i]);
            ArrayNode list = point.putArray("modes");
            List<ModeAtFrequency> row = report.figures().get(i);
            for (int k = 0; k < row.size(); k++) {
                ModeAtFrequency at = row.get(k);
                ObjectNode entry = list.addObject();
                entry.put("number", k + 1);
                entry.put("name", report.identities().get(k).label());
                entry.put("propagating", at.propagating());
                for (FigureColumn c : FigureColumn.values()) {
                    JsonNumbers.put(entry, c.key(), c.of(at));
                }
                entry.put("impedance_definition", definitionKey(at));
                entry.put("limitation", at.limitation());
            }
        }
        GuideSummary guide = report.summary();
        ObjectNode summary = root.putObject("summary");
        summary.put("dominant_mode", guide.dominantLabel());
        JsonNumbers.put(summary, "dominant_cutoff_hz", guide.singleModeLowHz());
        BandRule band = guide.band().orElse(null);
        if (band == null) {
            summary.putNull("next_mode");
        } else {
            summary.put("next_mode", guide.nextLabel());
        }
        JsonNumbers.put(summary, "next_cutoff_hz", guide.singleModeHighHz());
        JsonNumbers.put(summary, "single_mode_low_hz", guide.singleModeLowHz());
        JsonNumbers.put(summary, "single_mode_high_hz", guide.singleModeHighHz());
        summary.put("has_usable_band", guide.hasUsableBand());
        JsonNumbers.put(summary, "usable_low_hz", guide.hasUsableBand() ? guide.usableLowHz() : Double.NaN);
        JsonNumbers.put(summary, "usable_high_hz", guide.hasUsableBand() ? guide.usableHighHz() : Double.NaN);
        root.put("caution", Caution.TEXT);
        return JsonNumbers.text(JSON, root);
    }

    private static ObjectNode analysis(AnalysisSettings settings) {
        ObjectNode node = JSON.createObjectNode();
        node.put("conductor", settings.conductor().name());
        JsonNumbers.put(node, "conductivity_s_per_m", settings.conductor().conductivity());
        JsonNumbers.put(node, "rms_roughness_m", settings.rmsRoughnessMetres());
        JsonNumbers.put(node, "breakdown_field_v_per_m", settings.breakdown().breakdownField());
        JsonNumbers.put(node, "field_derating", settings.breakdown().fieldDerating());
        node.put("impedance_definition", FrequencyTableWriter.definitionKey(settings.definition()));
        VoltagePath path = settings.path();
        if (path == null) {
            node.putNull("voltage_path_m");
        } else {
            ArrayNode ends = node.putArray("voltage_path_m");
            ends.add(path.x1()).add(path.y1()).add(path.x2()).add(path.y2());
        }
        return node;
    }

    private static String definitionKey(ModeAtFrequency at) {
        return FrequencyTableWriter.definitionKey(at.chosenDefinition());
    }

    private static String csvNumber(double value) {
        return Double.isNaN(value) ? "" : Double.isInfinite(value) ? (value > 0 ? "inf" : "-inf")
                : Double.toString(value);
    }

    private static String csvText(String text) {
        if (text.contains(",") || text.contains("\"") || text.contains("\n")) {
            return "\"" + text.replace("\"", "\"\"") + "\"";
        }
        return text;
    }

}
