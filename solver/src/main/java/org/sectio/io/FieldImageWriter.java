package org.sectio.io;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.FieldMap;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;

/**
 * Renders a mode's normalized field as a PNG picture: the cross-section filled with the field in the
 * {@link ColourScale}, sampled bilinearly from the grid; the area outside the guide in a neutral light
 * colour; the metal wall drawn in grey; a colour bar with ticks at −1, 0 and +1; and a title naming
 * the section, the mode and its cutoff frequency in GHz. Layout per {@link FieldImageLayout}.
 */
public final class FieldImageWriter {

    /** Default image width, px. */
    public static final int DEFAULT_WIDTH = 800;
    /** Colour of everything that is not inside the guide, 0xRRGGBB. */
    public static final int OUTSIDE = 0xDCDCDA;
    /** Colour of the metal wall line, 0xRRGGBB. */
    public static final int METAL = 0x60656B;
    private static final int INK = 0x202020;

    private FieldImageWriter() {
    }

    /**
     * @param section the cross-section the mode belongs to (for the wall and the inside test), m
     * @param mode the mode to draw
     * @param imageWidth image width, px, see {@link FieldImageLayout#of}
     * @return the picture, RGB
     * @throws IllegalArgumentException if the width is out of range
     */
    public static BufferedImage render(CrossSection section, Mode mode, int imageWidth) {
        Bounds box = section.bounds();
        FieldImageLayout layout = FieldImageLayout.of(box, imageWidth);
        BufferedImage image = new BufferedImage(layout.imageWidth(), layout.imageHeight(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, layout.imageWidth(), layout.imageHeight());
            paintField(image, section, mode.field(), layout);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            drawWalls(g, section, layout);
            drawColourBar(image, g, layout, mode.family());
            g.setColor(new Color(INK));
            g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
            g.drawString(String.format(Locale.ROOT, "%s  ·  %s  ·  fc = %.6f GHz", section.name(), mode.label(),
                    mode.cutoffFrequencyHz() * 1e-9), layout.plotX(), 22);
        } finally {
            g.dispose();
        }
        return image;
    }

    /**
     * Renders and writes the picture as PNG, atomically (see {@link AtomicFile}).
     *
     * @param file the file to create or replace; its folder must exist
     * @throws IOException if the file cannot be written; an earlier file of that name is then kept
     * @throws IllegalArgumentException if the width is out of range
     */
    public static void write(CrossSection section, Mode mode, int imageWidth, Path file) throws IOException {
        BufferedImage image = render(section, mode, imageWidth);
        AtomicFile.write(file, out -> {
            if (!ImageIO.write(image, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
    }

    private static void paintField(BufferedImage image, CrossSection section, FieldMap field, FieldImageLayout layout) {
        Bounds box = section.bounds();
        double[] xs = field.xCoordinates();
        double[] ys = field.yCoordinates();
        for (int row = 0; row < layout.plotHeight(); row++) {
            double y = box.maxY() - (row + 0.5) / layout.plotHeight() * box.height();
            double[] crossings = section.wallCrossingsAtY(y);
            for (int column = 0; column < layout.plotWidth(); column++) {
                double x = box.minX() + (column + 0.5) / layout.plotWidth() * box.width();
                double value = isInside(crossings, x) ? sample(field, xs, ys, x, y) : Double.NaN;
                int colour = Double.isNaN(value) ? OUTSIDE : ColourScale.rgb(value);
                image.setRGB(layout.plotX() + column, layout.plotY() + row, colour);
            }
        }
    }

    private static boolean isInside(double[] crossings, double x) {
        int before = 0;
        while (before < crossings.length && crossings[before] <= x) {
            before++;
        }
        return before % 2 == 1;
    }

    /** Bilinear sample over the finite corners of the grid cell holding (x, y); NaN if none is finite. */
    static double sample(FieldMap field, double[] xs, double[] ys, double x, double y) {
        int i = cellIndex(xs, x);
        int j = cellIndex(ys, y);
        double tx = xs.length < 2 ? 0 : Math.max(0, Math.min(1, (x - xs[i]) / (xs[i + 1] - xs[i])));
        double ty = ys.length < 2 ? 0 : Math.max(0, Math.min(1, (y - ys[j]) / (ys[j + 1] - ys[j])));
        double sum = 0;
        double weights = 0;
        for (int dj = 0; dj <= 1; dj++) {
            for (int di = 0; di <= 1; di++) {
                int ci = Math.min(i + di, xs.length - 1);
                int cj = Math.min(j + dj, ys.length - 1);
                double v = field.valueAt(ci, cj);
                double w = (di == 0 ? 1 - tx : tx) * (dj == 0 ? 1 - ty : ty);
                if (Double.isFinite(v) && w > 0) {
                    sum += w * v;
                    weights += w;
                }
            }
        }
        return weights > 0 ? sum / weights : Double.NaN;
    }

    private static int cellIndex(double[] coordinates, double c) {
        if (coordinates.length < 2) {
            return 0;
        }
        int found = Arrays.binarySearch(coordinates, c);
        int index = found >= 0 ? found : -found - 2;
        return Math.max(0, Math.min(coordinates.length - 2, index));
    }

    private static void drawWalls(Graphics2D g, CrossSection section, FieldImageLayout layout) {
        Bounds box = section.bounds();
        double scaleX = layout.plotWidth() / box.width();
        double scaleY = layout.plotHeight() / box.height();
        g.setColor(new Color(METAL));
        g.setStroke(new BasicStroke(2.5f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        for (double[] line : section.wallPolylines(Math.max(box.width(), box.height()) / 400)) {
            Path2D.Double path = new Path2D.Double();
            for (int k = 0; k < line.length; k += 2) {
                double px = layout.plotX() + (line[k] - box.minX()) * scaleX;
                double py = layout.plotY() + (box.maxY() - line[k + 1]) * scaleY;
                if (k == 0) {
                    path.moveTo(px, py);
                } else {
                    path.lineTo(px, py);
                }
            }
            g.draw(path);
        }
    }

    private static void drawColourBar(BufferedImage image, Graphics2D g, FieldImageLayout layout, ModeFamily family) {
        int last = layout.barHeight() - 1;
        for (int row = 0; row <= last; row++) {
            int colour = ColourScale.rgb(1.0 - 2.0 * row / last);
            for (int column = 0; column < layout.barWidth(); column++) {
                image.setRGB(layout.barX() + column, layout.barY() + row, colour);
            }
        }
        g.setColor(new Color(INK));
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        int tickX = layout.barX() + layout.barWidth();
        String[] labels = {"+1", "0", "−1"};
        int[] rows = {layout.barY(), layout.barY() + last / 2, layout.barY() + last};
        for (int k = 0; k < 3; k++) {
            g.drawLine(tickX, rows[k], tickX + 4, rows[k]);
            g.drawString(labels[k], tickX + 7, rows[k] + 4);
        }
        String caption = "normalized " + (family == ModeFamily.TE ? "Hz" : family == ModeFamily.TM ? "Ez" : "potential");
        g.drawString(caption, layout.barX() - 8, layout.barY() + layout.barHeight() + 20);
    }
}
