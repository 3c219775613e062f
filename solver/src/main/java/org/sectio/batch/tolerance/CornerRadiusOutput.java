package org.sectio.batch.tolerance;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sectio.io.ChartRenderer;
import org.sectio.io.ChartSeries;
import org.sectio.io.LineChart;
import org.sectio.io.SeriesPalette;

/** The corner-radius study as a readable table, as CSV (SI units) and as a PNG chart. */
public final class CornerRadiusOutput {

    private CornerRadiusOutput() {
    }

    /**
     * @param r the study
     * @return the readable table, lines ending in '\n'
     */
    public static String table(CornerRadiusStudy.Result r) {
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT, "Corner radius study: rectangular guide %.4f × %.4f mm, inner corners"
                + " rounded from 0 to %.4f mm; grid %d cells across%n", r.widthMetres() * 1e3, r.heightMetres() * 1e3,
                r.rows().get(r.rows().size() - 1).radiusMetres() * 1e3, r.cellsAcross()));
        out.append("cutoffs in GHz; a column follows the k-th mode of a family, named at radius 0; usable band"
                + " 1.25 fc1 … 0.95 fc2 (common practice)\n");
        StringBuilder head = new StringBuilder(String.format(Locale.ROOT, "%10s", "r (mm)"));
        for (String name : r.modeNames()) {
            head.append(String.format(Locale.ROOT, " %11s", name));
        }
        head.append(String.format(Locale.ROOT, " %11s %11s %10s %8s", "usable lo", "usable hi", "fc2/fc1", "error"));
        out.append(head).append('\n');
        for (CornerRadiusStudy.Row row : r.rows()) {
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%10.4f", row.radiusMetres() * 1e3));
            for (double fc : row.cutoffsHz()) {
                line.append(String.format(Locale.ROOT, " %11.6f", fc / 1e9));
            }
            line.append(String.format(Locale.ROOT, " %11.6f %11.6f %10.6f %8.1e", row.usableLowHz() / 1e9,
                    row.usableHighHz() / 1e9, row.singleModeHighHz() / row.singleModeLowHz(), row.largestRelativeError()));
            out.append(line).append('\n');
        }
        CornerRadiusStudy.Row first = r.rows().get(0);
        CornerRadiusStudy.Row last = r.rows().get(r.rows().size() - 1);
        out.append(String.format(Locale.ROOT, "from r = 0 to %.4f mm: fc1 %+.3f %%, fc2 %+.3f %%, usable band %.4f … %.4f"
                + " → %.4f … %.4f GHz; %d solves in %.1f s%n", last.radiusMetres() * 1e3,
                100 * (last.singleModeLowHz() / first.singleModeLowHz() - 1),
                100 * (last.singleModeHighHz() / first.singleModeHighHz() - 1), first.usableLowHz() / 1e9,
                first.usableHighHz() / 1e9, last.usableLowHz() / 1e9, last.usableHighHz() / 1e9, r.rows().size(), r.seconds()));
        return out.toString();
    }

    /**
     * @param r the study
     * @return CSV: radius_m, cutoff_hz_&lt;name&gt; per mode, single_mode_low_hz, single_mode_high_hz,
     *     usable_low_hz, usable_high_hz, largest_relative_error_estimate
     */
    public static String csv(CornerRadiusStudy.Result r) {
        StringBuilder out = new StringBuilder("radius_m");
        for (String name : r.modeNames()) {
            out.append(",cutoff_hz_").append(name.replaceAll("[^A-Za-z0-9]+", "_"));
        }
        out.append(",single_mode_low_hz,single_mode_high_hz,usable_low_hz,usable_high_hz,largest_relative_error_estimate\n");
        for (CornerRadiusStudy.Row row : r.rows()) {
            out.append(String.format(Locale.ROOT, "%.9e", row.radiusMetres()));
            for (double fc : row.cutoffsHz()) {
                out.append(Double.isFinite(fc) ? String.format(Locale.ROOT, ",%.10e", fc) : ",");
            }
            out.append(String.format(Locale.ROOT, ",%.10e,%s,%s,%s,%.3e%n", row.singleModeLowHz(),
                    finite(row.singleModeHighHz()), finite(row.usableLowHz()), finite(row.usableHighHz()),
                    row.largestRelativeError()));
        }
        return out.toString();
    }

    private static String finite(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.10e", v) : "";
    }

    /**
     * @param r the study
     * @return the chart: each mode's cutoff against radius (mm), the usable band's edges dashed
     */
    public static LineChart chart(CornerRadiusStudy.Result r) {
        int n = r.rows().size();
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = r.rows().get(j).radiusMetres() * 1e3;
        }
        List<ChartSeries> series = new ArrayList<>();
        for (int k = 0; k < r.modeNames().size(); k++) {
            double[] y = new double[n];
            for (int j = 0; j < n; j++) {
                y[j] = r.rows().get(j).cutoffsHz()[k] / 1e9;
            }
            series.add(new ChartSeries(r.modeNames().get(k), x, y, SeriesPalette.colour(k), false));
        }
        double[] low = new double[n];
        double[] high = new double[n];
        for (int j = 0; j < n; j++) {
            low[j] = r.rows().get(j).usableLowHz() / 1e9;
            high[j] = r.rows().get(j).usableHighHz() / 1e9;
        }
        series.add(new ChartSeries("1.25 fc1", x, low, SeriesPalette.REFERENCE, true));
        series.add(new ChartSeries("0.95 fc2", x, high, SeriesPalette.INK, true));
        return new LineChart(String.format(Locale.ROOT, "Cutoffs against inner corner radius, %.2f × %.2f mm",
                r.widthMetres() * 1e3, r.heightMetres() * 1e3), "corner radius (mm)", "frequency (GHz)", series, null);
    }

    /**
     * Writes the chart as PNG, whole or not at all.
     *
     * @param r the study
     * @param file the PNG file; its folder must exist
     * @throws IOException if it cannot be written
     */
    public static void writePlot(CornerRadiusStudy.Result r, Path file) throws IOException {
        ChartRenderer.write(chart(r), ChartRenderer.DEFAULT_WIDTH, ChartRenderer.DEFAULT_HEIGHT, file);
    }
}
