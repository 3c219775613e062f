package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.modes.FieldMap;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;

class FieldImageWriterTest {

    private static final double RADIUS = 0.01;

    @TempDir
    Path folder;

    /** A circle of radius 10 mm centred at the origin, with a field that is +1 on a plateau around (3 mm, 2 mm). */
    private final CrossSection circle = Shapes.circle(RADIUS, 0, 0);
    private final Mode mode = new Mode(ModeFamily.TM, 1, 240.5, 11.48e9, 1e-12, Double.NaN, plateauField());

    private static FieldMap plateauField() {
        int n = 41;
        double[] xs = new double[n];
        double[] values = new double[n * n];
        for (int i = 0; i < n; i++) {
            xs[i] = -RADIUS + 2 * RADIUS * i / (n - 1);
        }
        for (int j = 0; j < n; j++) {
            for (int i = 0; i < n; i++) {
                double x = xs[i];
                double y = xs[j];
                double distance = Math.hypot(x - 0.003, y - 0.002);
                values[j * n + i] = Math.hypot(x, y) >= RADIUS ? Double.NaN
                        : distance <= 0.0015 ? 1.0 : -0.5 + 0.5 * Math.exp(-distance / 0.004);
            }
        }
        return new FieldMap(xs, xs.clone(), values);
    }

    @Test
    void thePngReadsBackWithTheLayoutSize() throws IOException {
        Path file = folder.resolve("tm-1.png");
        FieldImageWriter.write(circle, mode, FieldImageWriter.DEFAULT_WIDTH, file);
        BufferedImage image = ImageIO.read(file.toFile());
        FieldImageLayout layout = FieldImageLayout.of(circle.bounds(), 800);
        assertEquals(800, image.getWidth());
        assertEquals(layout.imageHeight(), image.getHeight());
        assertEquals(layout.plotWidth(), layout.plotHeight(), "a circle's plot is square");
    }

    @Test
    void theColourBarRunsFromThePlusOneColourAtTheTopToTheMinusOneColourAtTheBottom() throws IOException {
        BufferedImage image = writtenAndReadBack();
        FieldImageLayout layout = FieldImageLayout.of(circle.bounds(), 800);
        int middle = layout.barX() + layout.barWidth() / 2;
        assertEquals(ColourScale.rgb(1.0), rgb(image, middle, layout.barY()));
        assertEquals(ColourScale.rgb(-1.0), rgb(image, middle, layout.barY() + layout.barHeight() - 1));
        assertEquals(ColourScale.rgb(0.0), rgb(image, middle, layout.barY() + (layout.barHeight() - 1) / 2));
    }

    @Test
    void aPixelOnTheFieldMaximumShowsThePlusOneColour() throws IOException {
        BufferedImage image = writtenAndReadBack();
        FieldImageLayout layout = FieldImageLayout.of(circle.bounds(), 800);
        int column = layout.plotX() + (int) ((0.003 + RADIUS) / (2 * RADIUS) * layout.plotWidth());
        int row = layout.plotY() + (int) ((RADIUS - 0.002) / (2 * RADIUS) * layout.plotHeight());
        assertEquals(ColourScale.rgb(1.0), rgb(image, column, row));
    }

    @Test
    void pixelsOutsideTheGuideHaveTheOutsideColour() throws IOException {
        BufferedImage image = writtenAndReadBack();
        FieldImageLayout layout = FieldImageLayout.of(circle.bounds(), 800);
        assertEquals(FieldImageWriter.OUTSIDE, rgb(image, layout.plotX() + 3, layout.plotY() + 3));
        assertEquals(FieldImageWriter.OUTSIDE,
                rgb(image, layout.plotX() + layout.plotWidth() - 4, layout.plotY() + layout.plotHeight() - 4));
    }

    @Test
    void theWallIsDrawnInMetalGreyWhereTheCircleMeetsItsBox() throws IOException {
        BufferedImage image = writtenAndReadBack();
        FieldImageLayout layout = FieldImageLayout.of(circle.bounds(), 800);
        int column = layout.plotX() + layout.plotWidth() / 2;
        assertEquals(FieldImageWriter.METAL, rgb(image, column, layout.plotY()));
    }

    @Test
    void aWidthOutsideTheAcceptedRangeIsRefusedWithTheValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FieldImageWriter.render(circle, mode, 50));
        assertEquals("image width must be 200 … 8000 px, got 50", e.getMessage());
    }

    @Test
    void aWideRectangleGivesAWidePlot() {
        FieldImageLayout layout = FieldImageLayout.of(Shapes.rectangle(0.02286, 0.01016).bounds(), 1000);
        assertEquals(0.01016 / 0.02286, (double) layout.plotHeight() / layout.plotWidth(), 2.0 / layout.plotWidth());
        assertTrue(layout.barX() > layout.plotX() + layout.plotWidth());
        assertTrue(layout.barX() + layout.barWidth() < layout.imageWidth());
    }

    private BufferedImage writtenAndReadBack() throws IOException {
        Path file = folder.resolve("tm-1.png");
        FieldImageWriter.write(circle, mode, 800, file);
        assertTrue(Files.size(file) > 0);
        return ImageIO.read(file.toFile());
    }

    private static int rgb(BufferedImage image, int x, int y) {
        return image.getRGB(x, y) & 0xFFFFFF;
    }
}
