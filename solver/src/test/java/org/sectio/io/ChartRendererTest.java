package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sweep charts as pictures, read back from the PNG file. The curve is the TE10 dispersion of a
 * 22.86 mm wide air-filled guide, β = √(k² − kc²) with kc = π/a (Pozar, Microwave Engineering, 4th
 * ed., §3.3).
 */
class ChartRendererTest {

    private static final double C = 299_792_458.0;
    private static final double A = 0.02286;

    @TempDir
    Path folder;

    private static double beta(double f) {
        double k = 2 * Math.PI * f / C;
        double kc = Math.PI / A;
        return k > kc ? Math.sqrt(k * k - kc * kc) : Double.NaN;
    }

    private static BandSweep te10Sweep() {
        int n = 81;
        double[] f = new double[n];
        double[] b = new double[n];
        double[] loss = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 6e9 + i * 8e9 / (n - 1);
            b[i] = beta(f[i]);
            loss[i] = Double.isNaN(b[i]) ? Double.NaN : 0.1;
        }
        return new BandSweep("test guide", f, List.of(new ModeCurve("TE10", b, loss)), C / (2 * A), C / A);
    }

    @Test
    void theDispersionCurvePassesThroughThePixelOfBetaAtTenGigahertz() throws IOException {
        LineChart chart = SweepCharts.dispersion(te10Sweep());
        Path file = folder.resolve("d.png");
        ChartRenderer.write(chart, 900, 560, file);
        BufferedImage image = ImageIO.read(file.toFile());
        ChartGeometry place = ChartGeometry.of(chart, 900, 560);
        int column = (int) Math.round(place.column(10.0));
        int row = (int) Math.round(place.row(beta(10e9)));
        int colour = SeriesPalette.colour(0);
        assertTrue(near(image, column, row, colour, 1), "no TE10 curve pixel near (" + column + ", " + row + ")");
        // 30 rows below the curve there is no curve: the check above can fail.
        assertTrue(!near(image, column, row + 30, colour, 1), "curve colour where no curve runs");
    }

    @Test
    void theSingleModeBandIsShadedAndOutsideItThePlotIsWhite() throws IOException {
        LineChart chart = SweepCharts.dispersion(te10Sweep());
        Path file = folder.resolve("s.png");
        ChartRenderer.write(chart, 900, 560, file);
        BufferedImage image = ImageIO.read(file.toFile());
        ChartGeometry place = ChartGeometry.of(chart, 900, 560);
        double[] yTicks = place.y().ticks();
        // Halfway between the two highest y ticks: above both curves there, and off every grid line.
        int row = (int) Math.round(place.row((yTicks[yTicks.length - 1] + yTicks[yTicks.length - 2]) / 2));
        int inside = (int) Math.round(place.column(7.0 + 0.07));
        int outside = (int) Math.round(place.column(6.2));
        assertEquals(SeriesPalette.SHADING, image.getRGB(inside, row) & 0xFFFFFF);
        assertEquals(0xFFFFFF, image.getRGB(outside, row) & 0xFFFFFF);
    }

    @Test
    void bothChartsAreWrittenIntoTheFolder() throws IOException {
        List<Path> files = SweepCharts.write(te10Sweep(), folder);
        assertEquals(List.of(folder.resolve("dispersion.png"), folder.resolve("attenuation.png")), files);
        for (Path p : files) {
            BufferedImage image = ImageIO.read(p.toFile());
            assertEquals(ChartRenderer.DEFAULT_WIDTH, image.getWidth());
        }
    }

    /** True if a pixel within {@code reach} of (column, row) has each channel within 40 of the colour. */
    private static boolean near(BufferedImage image, int column, int row, int colour, int reach) {
        for (int dy = -reach; dy <= reach; dy++) {
            for (int dx = -reach; dx <= reach; dx++) {
                int rgb = image.getRGB(column + dx, row + dy);
                boolean close = true;
                for (int shift = 0; shift <= 16; shift += 8) {
                    close &= Math.abs(((rgb >> shift) & 0xFF) - ((colour >> shift) & 0xFF)) <= 40;
                }
                if (close) {
                    return true;
                }
            }
        }
        return false;
    }
}
