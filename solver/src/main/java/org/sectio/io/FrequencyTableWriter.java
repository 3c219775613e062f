package org.sectio.io;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.sectio.modes.Mode;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.BandBar;
import org.sectio.physics.BandRule;
import org.sectio.physics.Caution;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.FreeSpace;
import org.sectio.physics.ImpedanceDefinition;
import org.sectio.physics.ModeAtFrequency;

/**
 * Writes a {@link FrequencyReport} in a {@link TableFormat}; CSV and JSON as in {@link FrequencyDataWriter}.
 *
 * <p>The readable table: the heading of the plain solve, the wall metal with its skin depth, the
 * breakdown and impedance settings, then one row per mode (per frequency and mode for a sweep, with
 * a leading "f (GHz)" column): number, name, symmetry (parity about the vertical/horizontal mirror),
 * cutoff (GHz), estimated relative error, whether it propagates, β (rad/m) or the evanescent α
 * (Np/m), λg (mm), vp/c and vg/c, wave impedance (Ω), α_c and α_d (dB/m), peak |E| at 1 W (kV/m),
 * breakdown and rated power (kW), and the characteristic impedance (Ω) with its definition (pv, pi
 * or vi). A figure that is not available prints "-", and the reasons follow the table. Then the
 * guide summary (dominant and first higher mode, single-mode and usable band, a {@link BandBar}),
 * {@link Caution#TEXT} and the timing line.
 */
public final class FrequencyTableWriter {

    private static final int BAR_WIDTH = 64;
    private static final String MISSING = "-";

    private FrequencyTableWriter() {
    }

    /**
     * @param report the analysed modes
     * @param format the layout
     * @return the whole text, lines ending in {@code \n}
     */
    public static String format(FrequencyReport report, TableFormat format) {
        return switch (format) {
            case TABLE -> readable(report);
            case CSV -> FrequencyDataWriter.csv(report);
            case JSON -> FrequencyDataWriter.json(report);
        };
    }

    /**
     * @param report the analysed modes
     * @param format the layout
     * @param out where to write; flushed, not closed
     * @throws IOException if writing fails
     */
    public static void write(FrequencyReport report, TableFormat format, Writer out) throws IOException {
        out.write(format(report, format));
        out.flush();
    }

    /**
     * Writes the text to a file atomically (see {@link AtomicFile}).
     *
     * @param report the analysed modes
     * @param format the layout
     * @param file the file to create or replace; its folder must exist
     * @throws IOException if the file cannot be written; an earlier file of that name is then kept
     */
    public static void write(FrequencyReport report, TableFormat format, Path file) throws IOException {
        String text = format(report, format);
        AtomicFile.write(file, out -> {
            Writer writer = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            writer.write(text);
            writer.flush();
        });
    }

    /**
     * @param definition an impedance definition
     * @return its short name as on the command line: "pv", "pi" or "vi"
     */
    public static String definitionKey(ImpedanceDefinition definition) {
        return switch (definition) {
            case POWER_VOLTAGE -> "pv";
            case POWER_CURRENT -> "pi";
            case VOLTAGE_CURRENT -> "vi";
        };
    }

    private static String readable(FrequencyReport report) {
        double[] f = report.frequenciesHz();
        String where = report.isSweep()
                ? String.format(Locale.ROOT, " from %.6f to %.6f GHz (%d frequencies)", f[0] * 1e-9,
                        f[f.length - 1] * 1e-9, f.length)
                : String.format(Locale.ROOT, " at %.6f GHz", f[0] * 1e-9);
        StringBuilder text = new StringBuilder(ModeTableWriter.readableHeader(report.modes(), where));
        text.append(settingsLines(report.settings(), f));
        text.append(rows(report).render());
        text.append(notes(report));
        text.append(peaks(report));
        text.append(summary(report));
        text.append(Caution.TEXT).append('\n');
        text.append(ModeTableWriter.timingLine(report.modes()));
        return text.toString().replace("\r\n", "\n");
    }

    private static String settingsLines(AnalysisSettings s, double[] f) {
        double first = s.conductor().skinDepth(f[0]);
        String skin = f.length == 1 ? String.format(Locale.ROOT, "skin depth %.4f µm", first * 1e6)
                : String.format(Locale.ROOT, "skin depth %.4f µm at %.3f GHz … %.4f µm at %.3f GHz", first * 1e6,
                        f[0] * 1e-9, s.conductor().skinDepth(f[f.length - 1]) * 1e6, f[f.length - 1] * 1e-9);
        String path = s.path() == null ? "automatic (vertical, wall to wall at the centre line)"
                : String.format(Locale.ROOT, "(%.4f, %.4f) → (%.4f, %.4f) mm", s.path().x1() * 1e3,
                        s.path().y1() * 1e3, s.path().x2() * 1e3, s.path().y2() * 1e3);
        String finish = s.rmsRoughnessMetres() == 0 ? "smooth"
                : "rms roughness " + plain(s.rmsRoughnessMetres() * 1e6) + " µm";
        return String.format(Locale.ROOT, "walls %s (σ %s S/m), %s; %s%n", s.conductor().name(),
                plain(s.conductor().conductivity()), finish, skin)
                + String.format(Locale.ROOT, "breakdown field %s MV/m, field derating %s (power ÷ %s);"
                        + " impedance %s, voltage path %s%n", plain(s.breakdown().breakdownField() * 1e-6),
                        plain(s.breakdown().fieldDerating()),
                        plain(s.breakdown().fieldDerating() * s.breakdown().fieldDerating()),
                        definitionKey(s.definition()), path);
    }

    private static TextColumns rows(FrequencyReport report) {
        boolean sweep = report.isSweep();
        List<String> header = new ArrayList<>(List.of("#", "mode", "symmetry", "cutoff (GHz)", "rel. error", "state",
                "β (rad/m)", "α (Np/m)", "λg (mm)", "vp/c", "vg/c", "Zw (ohm)", "α_c (dB/m)", "α_d (dB/m)",
                "E_pk 1 W (kV/m)", "P_bd (kW)", "P_rated (kW)", "Z (ohm)", "Z by"));
        int offset = sweep ? 1 : 0;
        if (sweep) {
            header.add(0, "f (GHz)");
        }
        TextColumns table = new TextColumns(header, offset + 1, offset + 2, offset + 5, offset + 18);
        List<Mode> modes = report.modesByCutoff();
        double[] f = report.frequenciesHz();
        double c = FreeSpace.SPEED_OF_LIGHT;
        for (int i = 0; i < f.length; i++) {
            for (int k = 0; k < modes.size(); k++) {
                Mode mode = modes.get(k);
                ModeAtFrequency at = report.figures().get(i).get(k);
                List<String> cells = new ArrayList<>();
                if (sweep) {
                    cells.add(String.format(Locale.ROOT, "%.6f", f[i] * 1e-9));
                }
                cells.add(Integer.toString(k + 1));
                cells.add(report.identities().get(k).label());
                cells.add(report.identities().get(k).parityText());
                cells.add(mode.cutoffFrequencyHz() == 0 ? "0" : number(mode.cutoffFrequencyHz() * 1e-9, "%.7f"));
                cells.add(number(mode.relativeErrorEstimate(), "%.1e"));
                cells.add(at.propagating() ? "propagates" : "cut off");
                cells.add(at.propagating() ? number(at.phaseConstant(), "%.4f") : MISSING);
                cells.add(at.propagating() ? MISSING : number(at.evanescentAttenuation(), "%.4f"));
                cells.add(at.propagating() ? number(at.guideWavelength() * 1e3, "%.4f") : MISSING);
                cells.add(at.propagating() ? number(at.phaseVelocity() / c, "%.5f") : MISSING);
                cells.add(at.propagating() ? number(at.groupVelocity() / c, "%.5f") : MISSING);
                cells.add(at.propagating() ? number(at.waveImpedanceOhms(), "%.3f") : MISSING);
                cells.add(number(at.conductorAttenuationDbPerMetre(), "%.5f"));
                cells.add(number(at.dielectricAttenuationDbPerMetre(), "%.5f"));
                cells.add(number(at.peakFieldPerRootWatt() * 1e-3, "%.4f"));
                cells.add(number(at.breakdownPowerWatts() * 1e-3, "%.1f"));
                cells.add(number(at.ratedPowerWatts() * 1e-3, "%.1f"));
                cells.add(number(at.chosenImpedance(), "%.3f"));
                cells.add(Double.isNaN(at.chosenImpedance()) ? MISSING : definitionKey(at.chosenDefinition()));
                table.add(cells);
            }
        }
        return table;
    }

    /**
     * Where each propagating mode's transverse electric field peaks (from the first frequency at which it
     * propagates; the pattern, and so the place, does not change with frequency in a homogeneous guide).
     */
    private static String peaks(FrequencyReport report) {
        StringBuilder text = new StringBuilder();
        int modes = report.identities().size();
        for (int k = 0; k < modes; k++) {
            for (List<ModeAtFrequency> row : report.figures()) {
                ModeAtFrequency at = row.get(k);
                if (Double.isFinite(at.peakX()) && Double.isFinite(at.peakFieldPerRootWatt())) {
                    text.append(String.format(Locale.ROOT, "field peak: %s, %.4g kV/m at 1 W, at (%.3f, %.3f) mm%n",
                            report.identities().get(k).label(), at.peakFieldPerRootWatt() * 1e-3, at.peakX() * 1e3,
                            at.peakY() * 1e3));
                    break;
                }
            }
        }
        return text.toString();
    }

    /** The distinct reasons for missing figures, each with the modes it applies to. */
    private static String notes(FrequencyReport report) {
        Map<String, List<String>> reasons = new LinkedHashMap<>();
        for (List<ModeAtFrequency> row : report.figures()) {
            for (int k = 0; k < row.size(); k++) {
                String why = row.get(k).limitation();
                String name = report.identities().get(k).label();
                if (!why.isEmpty()) {
                    List<String> names = reasons.computeIfAbsent(why, w -> new ArrayList<>());
                    if (!names.contains(name)) {
                        names.add(name);
                    }
                }
            }
        }
        StringBuilder text = new StringBuilder();
        reasons.forEach((why, names) -> text.append("note: ").append(String.join(", ", names)).append(": ")
                .append(why).append('\n'));
        return text.toString();
    }

    private static String summary(FrequencyReport report) {
        GuideSummary guide = report.summary();
        double[] f = report.frequenciesHz();
        StringBuilder text = new StringBuilder("Guide summary\n");
        text.append(String.format(Locale.ROOT, "  dominant mode      %s, fc %.6f GHz%n", guide.dominantLabel(),
                guide.singleModeLowHz() * 1e-9));
        BandRule band = guide.band().orElse(null);
        if (band == null) {
            return text.append("  first higher mode  unknown: solve for more modes (--modes)\n").toString();
        }
        text.append(String.format(Locale.ROOT, "  first higher mode  %s, fc %.6f GHz%n", guide.nextLabel(),
                band.nextCutoffHz() * 1e-9));
        text.append(String.format(Locale.ROOT, "  single-mode band   %.4f … %.4f GHz (fc2/fc1 = %.4f)%n",
                band.dominantCutoffHz() * 1e-9, band.nextCutoffHz() * 1e-9, band.bandRatio()));
        text.append(band.hasUsableBand()
                ? String.format(Locale.ROOT, "  usable band        %.4f … %.4f GHz (1.25 fc1 … 0.95 fc2, common practice)%n",
                        band.usableLowHz() * 1e-9, band.usableHighHz() * 1e-9)
                : "  usable band        none: fc2/fc1 is below 0.95/1.25 (common practice)\n");
        double start = Math.max(0, 0.75 * Math.min(band.dominantCutoffHz(), f[0]));
        double stop = Math.max(1.15 * band.nextCutoffHz(), 1.05 * f[f.length - 1]);
        for (String line : BandBar.render(band, start, stop, BAR_WIDTH).split("\n")) {
            text.append("  ").append(line).append('\n');
        }
        if (!report.isSweep()) {
            int column = (int) Math.floor((f[0] - start) / ((stop - start) / BAR_WIDTH));
            text.append("  ").append(" ".repeat(column)).append(String.format(Locale.ROOT, "^ %.3f GHz%n", f[0] * 1e-9));
        }
        text.append("  ").append(BandBar.LEGEND).append('\n');
        return text.toString();
    }

    /** @return the value to four significant digits without trailing zeros, e.g. "2", "0.4", "5.813e+07" */
    private static String plain(double value) {
        String text = String.format(Locale.ROOT, "%.4g", value);
        if (text.contains("e")) {
            return text.replaceFirst("\\.?0+e", "e");
        }
        return text.contains(".") ? text.replaceFirst("\\.?0+$", "") : text;
    }

    private static String number(double value, String pattern) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, pattern, value) : MISSING;
    }
}
