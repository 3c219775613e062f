package org.sectio.viewer.model;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.sectio.io.AtomicFile;
import org.sectio.physics.ModeAtFrequency;

/**
 * The mode table as CSV: one row per mode at the chosen frequency, SI units named in the header,
 * empty cells for figures that are not defined (below cutoff, partly filled guides). Written whole or
 * not at all ({@link AtomicFile}).
 */
public final class TableCsv {

    /** The header line. */
    public static final String HEADER = "number,name,family,index,symmetry,cutoff_frequency_hz,relative_error_estimate,"
            + "frequency_hz,propagating,phase_constant_rad_per_m,evanescent_attenuation_np_per_m,guide_wavelength_m,"
            + "wave_impedance_ohm,impedance_ohm,impedance_definition,conductor_attenuation_db_per_m,"
            + "dielectric_attenuation_db_per_m,peak_field_at_1w_v_per_m,breakdown_power_w,rated_power_w";

    private TableCsv() {
    }

    /**
     * @param rows the table
     * @return the CSV text, header first, lines ending in \n
     */
    public static String text(List<ModeRow> rows) {
        StringBuilder out = new StringBuilder(HEADER).append('\n');
        for (ModeRow r : rows) {
            ModeAtFrequency a = r.figures();
            out.append(r.number()).append(',').append(quoted(r.label())).append(',').append(r.mode().family())
                    .append(',').append(r.mode().index()).append(',').append(r.identity().parityText()).append(',')
                    .append(number(r.mode().cutoffFrequencyHz())).append(',')
                    .append(number(r.mode().relativeErrorEstimate())).append(',').append(number(a.frequencyHz()))
                    .append(',').append(a.propagating()).append(',').append(number(a.phaseConstant())).append(',')
                    .append(number(a.evanescentAttenuation())).append(',').append(number(a.guideWavelength()))
                    .append(',').append(number(a.waveImpedanceOhms())).append(',').append(number(a.chosenImpedance()))
                    .append(',').append(a.chosenDefinition().name().toLowerCase(Locale.ROOT)).append(',')
                    .append(number(a.conductorAttenuationDbPerMetre())).append(',')
                    .append(number(a.dielectricAttenuationDbPerMetre())).append(',')
                    .append(number(a.peakFieldPerRootWatt())).append(',').append(number(a.breakdownPowerWatts()))
                    .append(',').append(number(a.ratedPowerWatts())).append('\n');
        }
        return out.toString();
    }

    /**
     * @param rows the table
     * @param file the file to create or replace
     * @throws IOException if it cannot be written (an earlier file is then kept)
     */
    public static void write(List<ModeRow> rows, Path file) throws IOException {
        byte[] bytes = text(rows).getBytes(StandardCharsets.UTF_8);
        AtomicFile.write(file, out -> out.write(bytes));
    }

    private static String number(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.10g", v) : "";
    }

    private static String quoted(String text) {
        return text.contains(",") || text.contains("\"") ? "\"" + text.replace("\"", "\"\"") + "\"" : text;
    }
}
