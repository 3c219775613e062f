package org.sectio.io;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.sectio.modes.GridSummary;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.SolveTiming;

/**
 * Writes the modes of a solve as a table in one of three {@link TableFormat}s, modes ordered by cutoff,
 * lowest first. Values are SI (Hz, rad/m, m, s) in CSV and JSON; the readable table shows GHz and mm.
 *
 * <p>CSV columns: {@code number,family,index,cutoff_frequency_hz,cutoff_wavenumber_per_m,
 * relative_error_estimate,residual,characteristic_impedance_ohm}, with an empty field for an estimate
 * not made and for the impedance of a TE or TM mode. {@code cutoff_wavenumber_per_m} is k0 = 2π fc / c,
 * the free-space wavenumber at cutoff (kc for an air-filled guide; see {@code Mode}). TEM modes
 * (family {@code TEM}) print a cutoff of {@code 0} and their impedance in Ω. JSON: an object
 * with {@code section}, {@code grid} {cells_x, cells_y, cell_width_m, cell_height_m, unknowns_te,
 * unknowns_tm}, {@code timing} {assembly_s, factor_s, eigen_s, total_s} and {@code modes}, each mode
 * with {@code number, family, index, label, cutoff_wavenumber_per_m, cutoff_frequency_hz, residual,
 * relative_error_estimate} (null when not estimated) and {@code characteristic_impedance_ohm} (null
 * for TE and TM). The readable table adds a column "Z0 (ohm)" only when a TEM mode is listed. Numbers in CSV and JSON print the shortest
 * decimal that reads back to the same double.
 */
public final class ModeTableWriter {

    /** The CSV header row. */
    public static final String CSV_HEADER = "number,family,index,cutoff_frequency_hz,cutoff_wavenumber_per_m,"
            + "relative_error_estimate,residual,characteristic_impedance_ohm";

    private static final String TABLE_HEADER = String.format(Locale.ROOT, "%3s  %-6s  %5s  %14s  %14s  %10s  %9s",
            "#", "family", "index", "cutoff (GHz)", "kc (rad/m)", "rel. error", "residual");
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ModeTableWriter() {
    }

    /**
     * @param modes the result of a solve
     * @param format how to lay it out
     * @return the whole table, lines ending in {@code \n}
     */
    public static String format(ModeSet modes, TableFormat format) {
        return switch (format) {
            case TABLE -> readable(modes);
            case CSV -> csv(modes);
            case JSON -> json(modes);
        };
    }

    /**
     * @param modes the result of a solve
     * @param format how to lay it out
     * @param out where to write (UTF-8 text); flushed, not closed
     * @throws IOException if writing fails
     */
    public static void write(ModeSet modes, TableFormat format, Writer out) throws IOException {
        out.write(format(modes, format));
        out.flush();
    }

    /**
     * Writes the table to a file atomically (see {@link AtomicFile}).
     *
     * @param file the file to create or replace; its folder must exist
     * @throws IOException if the file cannot be written; an earlier file of that name is then kept
     */
    public static void write(ModeSet modes, TableFormat format, Path file) throws IOException {
        String text = format(modes, format);
        AtomicFile.write(file, out -> {
            Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            writer.write(text);
            writer.flush();
        });
    }

    private static String readable(ModeSet modes) {
        StringBuilder text = new StringBuilder(readableHeader(modes, ""));
        boolean anyTem = modes.modes().stream().anyMatch(m -> m.family() == ModeFamily.TEM);
        text.append(TABLE_HEADER).append(anyTem ? String.format(Locale.ROOT, "  %10s", "Z0 (ohm)") : "").append('\n');
        int number = 1;
        for (Mode mode : modes.byCutoff()) {
            boolean tem = mode.family() == ModeFamily.TEM;
            text.append(String.format(Locale.ROOT, "%3d  %-6s  %5d  %14s  %14s  %10s  %9s", number++,
                    mode.family(), mode.index(),
                    tem ? "0" : String.format(Locale.ROOT, "%.7f", mode.cutoffFrequencyHz() * 1e-9),
                    tem ? "0" : String.format(Locale.ROOT, "%.6f", mode.cutoffWavenumber()),
                    Double.isNaN(mode.relativeErrorEstimate()) ? "-"
                            : String.format(Locale.ROOT, "%.1e", mode.relativeErrorEstimate()),
                    String.format(Locale.ROOT, "%.1e", mode.relativeResidual())));
            if (anyTem) {
                text.append(String.format(Locale.ROOT, "  %10s",
                        tem ? String.format(Locale.ROOT, "%.4f", mode.characteristicImpedanceOhms()) : "-"));
            }
            text.append('\n');
        }
        text.append(timingLine(modes));
        return text.toString().replace("\r\n", "\n");
    }

    /**
     * @param modes a solve
     * @param where text after the section name (e.g. " at 10 GHz"), or ""
     * @return the two heading lines of the readable table: the section and the grid
     */
    static String readableHeader(ModeSet modes, String where) {
        GridSummary grid = modes.grid();
        return "Modes of " + modes.sectionName() + where + "\n"
                + String.format(Locale.ROOT, "grid %d × %d cells of %.5g × %.5g mm; unknowns TE %d, TM %d%n",
                grid.cellsX(), grid.cellsY(), grid.cellWidth() * 1e3, grid.cellHeight() * 1e3,
                grid.unknownsTE(), grid.unknownsTM()).replace("\r\n", "\n");
    }

    /**
     * @param modes a solve
     * @return the timing line that ends the readable table
     */
    static String timingLine(ModeSet modes) {
        SolveTiming time = modes.timing();
        return String.format(Locale.ROOT, "time %.3f s: assembly %.3f s, factorization %.3f s, eigenvalues %.3f s%n",
                time.totalSeconds(), time.assemblySeconds(), time.factorSeconds(), time.eigenSeconds())
                .replace("\r\n", "\n");
    }

    private static String csv(ModeSet modes) {
        StringBuilder text = new StringBuilder(CSV_HEADER).append('\n');
        int number = 1;
        for (Mode mode : modes.byCutoff()) {
            boolean tem = mode.family() == ModeFamily.TEM;
            text.append(number++).append(',').append(mode.family()).append(',').append(mode.index()).append(',')
                    .append(tem ? "0" : Double.toString(mode.cutoffFrequencyHz())).append(',')
                    .append(tem ? "0" : Double.toString(mode.cutoffWavenumber())).append(',')
                    .append(Double.isNaN(mode.relativeErrorEstimate()) ? "" : Double.toString(mode.relativeErrorEstimate()))
                    .append(',').append(mode.relativeResidual()).append(',')
                    .append(tem ? Double.toString(mode.characteristicImpedanceOhms()) : "").append('\n');
        }
        return text.toString();
    }

    private static String json(ModeSet modes) {
        return JsonNumbers.text(JSON, jsonTree(modes));
    }

    /**
     * @param modes a solve
     * @return the JSON object of {@link TableFormat#JSON} as a tree, for writers that add to it
     */
    static ObjectNode jsonTree(ModeSet modes) {
        ObjectNode root = JSON.createObjectNode();
        root.put("section", modes.sectionName());
        GridSummary grid = modes.grid();
        ObjectNode gridNode = root.putObject("grid");
        gridNode.put("cells_x", grid.cellsX());
        gridNode.put("cells_y", grid.cellsY());
        putNumber(gridNode, "cell_width_m", grid.cellWidth());
        putNumber(gridNode, "cell_height_m", grid.cellHeight());
        gridNode.put("unknowns_te", grid.unknownsTE());
        gridNode.put("unknowns_tm", grid.unknownsTM());
        SolveTiming time = modes.timing();
        ObjectNode timing = root.putObject("timing");
        putNumber(timing, "assembly_s", time.assemblySeconds());
        putNumber(timing, "factor_s", time.factorSeconds());
        putNumber(timing, "eigen_s", time.eigenSeconds());
        putNumber(timing, "total_s", time.totalSeconds());
        ArrayNode list = root.putArray("modes");
        int number = 1;
        for (Mode mode : modes.byCutoff()) {
            ObjectNode entry = list.addObject();
            entry.put("number", number++);
            entry.put("family", mode.family().name());
            entry.put("index", mode.index());
            entry.put("label", mode.label());
            putNumber(entry, "cutoff_wavenumber_per_m", mode.cutoffWavenumber());
            putNumber(entry, "cutoff_frequency_hz", mode.cutoffFrequencyHz());
            putNumber(entry, "residual", mode.relativeResidual());
            putNumber(entry, "relative_error_estimate", mode.relativeErrorEstimate());
            putNumber(entry, "characteristic_impedance_ohm", mode.characteristicImpedanceOhms());
        }
        return root;
    }

    /** JSON has no NaN or infinity: such values are written as null. */
    private static void putNumber(ObjectNode node, String key, double value) {
        JsonNumbers.put(node, key, value);
    }
}
