package org.sectio.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * The two charts of a frequency sweep, against frequency in GHz, with the single-mode band fc1 … fc2
 * shaded: {@value #DISPERSION_FILE}, the phase constant β (rad/m) of each mode with the light line
 * k = ω/c = 2π f / c dashed (a mode of an air-filled guide approaches it from below; Pozar,
 * Microwave Engineering, 4th ed., §3.1, β = √(k² − kc²)), and {@value #ATTENUATION_FILE}, the loss
 * α_c + α_d (dB/m) of each propagating mode. Modes with no finite point are left out of a chart.
 */
public final class SweepCharts {

    /** File name of the dispersion chart. */
    public static final String DISPERSION_FILE = "dispersion.png";
    /** File name of the attenuation chart. */
    public static final String ATTENUATION_FILE = "attenuation.png";
    /** Legend text of the shaded band. */
    public static final String BAND_LABEL = "single-mode band";
    /** Legend text of the light line. */
    public static final String LIGHT_LINE_LABEL = "light line k = ω/c";

    private static final double SPEED_OF_LIGHT = 299_792_458.0;
    private static final String FREQUENCY_TITLE = "frequency (GHz)";

    private SweepCharts() {
    }

    /**
     * @param sweep the figures
     * @return β against f, with the light line
     */
    public static LineChart dispersion(BandSweep sweep) {
        double[] ghz = gigahertz(sweep);
        List<ChartSeries> series = curves(sweep, ghz, ModeCurve::phaseConstant);
        double[] f = sweep.frequenciesHz();
        double[] light = new double[f.length];
        for (int i = 0; i < f.length; i++) {
            light[i] = 2 * Math.PI * f[i] / SPEED_OF_LIGHT;
        }
        series.add(new ChartSeries(LIGHT_LINE_LABEL, ghz, light, SeriesPalette.REFERENCE, true));
        return new LineChart("Dispersion of " + sweep.sectionName(), FREQUENCY_TITLE, "phase constant β (rad/m)",
                series, span(sweep));
    }

    /**
     * @param sweep the figures
     * @return α_c + α_d against f
     * @throws IllegalArgumentException if no mode has a finite loss in the sweep (none propagates, or
     *     their loss is not computed)
     */
    public static LineChart attenuation(BandSweep sweep) {
        List<ChartSeries> series = curves(sweep, gigahertz(sweep), ModeCurve::attenuationDbPerMetre);
        if (series.isEmpty()) {
            throw new IllegalArgumentException("no mode of " + sweep.sectionName() + " has a finite loss in the"
                    + " sweep (none propagates, or their loss is not computed): nothing to draw in the attenuation"
                    + " chart");
        }
        return new LineChart("Attenuation of " + sweep.sectionName(), FREQUENCY_TITLE,
                "attenuation α_c + α_d (dB/m)", series, span(sweep));
    }

    /**
     * Writes both charts into a folder, each file atomically; the attenuation chart only when some
     * mode has a finite loss in the sweep (none does when every mode is cut off throughout, or when the
     * loss of the propagating modes is not computed).
     *
     * @param sweep the figures
     * @param folder an existing, writable folder
     * @return the files written
     * @throws IOException if a file cannot be written
     */
    public static List<Path> write(BandSweep sweep, Path folder) throws IOException {
        List<Path> written = new ArrayList<>();
        Path dispersionFile = folder.resolve(DISPERSION_FILE);
        ChartRenderer.write(dispersion(sweep), ChartRenderer.DEFAULT_WIDTH, ChartRenderer.DEFAULT_HEIGHT,
                dispersionFile);
        written.add(dispersionFile);
        if (!curves(sweep, gigahertz(sweep), ModeCurve::attenuationDbPerMetre).isEmpty()) {
            Path attenuationFile = folder.resolve(ATTENUATION_FILE);
            ChartRenderer.write(attenuation(sweep), ChartRenderer.DEFAULT_WIDTH, ChartRenderer.DEFAULT_HEIGHT,
                    attenuationFile);
            written.add(attenuationFile);
        }
        return written;
    }

    private static List<ChartSeries> curves(BandSweep sweep, double[] ghz, Function<ModeCurve, double[]> figure) {
        List<ChartSeries> series = new ArrayList<>();
        int position = 0;
        for (ModeCurve mode : sweep.modes()) {
            double[] values = figure.apply(mode);
            int colour = SeriesPalette.colour(position++);
            boolean any = false;
            for (double v : values) {
                any |= Double.isFinite(v);
            }
            if (any) {
                series.add(new ChartSeries(mode.label(), ghz, values, colour, false));
            }
        }
        return series;
    }

    private static double[] gigahertz(BandSweep sweep) {
        double[] f = sweep.frequenciesHz();
        for (int i = 0; i < f.length; i++) {
            f[i] *= 1e-9;
        }
        return f;
    }

    private static ChartSpan span(BandSweep sweep) {
        return sweep.hasSingleModeBand()
                ? new ChartSpan(sweep.singleModeLowHz() * 1e-9, sweep.singleModeHighHz() * 1e-9, BAND_LABEL) : null;
    }
}
