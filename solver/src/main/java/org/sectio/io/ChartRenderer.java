package org.sectio.io;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/**
 * Draws a {@link LineChart} with plain Java 2D as a PNG picture, placed by {@link ChartGeometry}:
 * the shaded span under everything, light grid lines at the ticks, the curves clipped to the plot
 * (solid, or dashed for reference curves), the frame with tick marks and labels, the axis titles,
 * the title above and a legend to the right (a line sample per curve, a swatch for the span).
 * Colours from {@link SeriesPalette}.
 */
public final class ChartRenderer {

    /** Default picture width, px. */
    public static final int DEFAULT_WIDTH = 900;
    /** Default picture height, px. */
    public static final int DEFAULT_HEIGHT = 560;

    private static final float CURVE_WIDTH = 2.2f;
    private static final float[] DASHES = {7f, 5f};

    private ChartRenderer() {
    }

    /**
     * @param chart what to draw
     * @param width picture width, px (see {@link ChartGeometry#of})
     * @param height picture height, px
     * @return the picture, RGB
     * @throws IllegalArgumentException if a size is out of range or the chart has no finite point
     */
    public static BufferedImage render(LineChart chart, int width, int height) {
        ChartGeometry place = ChartGeometry.of(chart, width, height);
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, width, height);
            if (chart.shading() != null) {
                shade(g, place, chart.shading());
            }
            grid(g, place);
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setClip(place.plotLeft(), place.plotTop(), place.plotRight() - place.plotLeft(),
                    place.plotBottom() - place.plotTop());
            for (ChartSeries s : chart.series()) {
                curve(g, place, s);
            }
            g.setClip(null);
            frame(g, place);
            titles(g, place, chart);
            legend(g, place, chart);
        } finally {
            g.dispose();
        }
        return image;
    }

    /**
     * Renders and writes the picture as PNG, atomically (see {@link AtomicFile}).
     *
     * @param chart what to draw
     * @param width picture width, px
     * @param height picture height, px
     * @param file the file to create or replace; its folder must exist
     * @throws IOException if the file cannot be written; an earlier file of that name is then kept
     * @throws IllegalArgumentException as {@link #render}
     */
    public static void write(LineChart chart, int width, int height, Path file) throws IOException {
        BufferedImage image = render(chart, width, height);
        AtomicFile.write(file, out -> {
            if (!ImageIO.write(image, "png", out)) {
                throw new IOException("no PNG writer available in this Java runtime");
            }
        });
    }

    private static void shade(Graphics2D g, ChartGeometry place, ChartSpan span) {
        int from = (int) Math.round(Math.max(place.plotLeft(), place.column(span.low())));
        int to = (int) Math.round(Math.min(place.plotRight(), place.column(span.high())));
        if (to > from) {
            g.setColor(new Color(SeriesPalette.SHADING));
            g.fillRect(from, place.plotTop(), to - from, place.plotBottom() - place.plotTop());
        }
    }

    private static void grid(Graphics2D g, ChartGeometry place) {
        g.setColor(new Color(SeriesPalette.GRID));
        for (double t : place.x().ticks()) {
            int column = (int) Math.round(place.column(t));
            g.drawLine(column, place.plotTop(), column, place.plotBottom());
        }
        for (double t : place.y().ticks()) {
            int row = (int) Math.round(place.row(t));
            g.drawLine(place.plotLeft(), row, place.plotRight(), row);
        }
    }

    private static void curve(Graphics2D g, ChartGeometry place, ChartSeries s) {
        g.setColor(new Color(s.colour()));
        g.setStroke(s.dashed() ? new BasicStroke(CURVE_WIDTH * 0.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND,
                10f, DASHES, 0f) : new BasicStroke(CURVE_WIDTH, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        double[] xs = s.x();
        double[] ys = s.y();
        Path2D.Double path = new Path2D.Double();
        boolean open = false;
        for (int i = 0; i < xs.length; i++) {
            if (Double.isNaN(ys[i])) {
                open = false;
                continue;
            }
            double px = place.column(xs[i]);
            double py = place.row(ys[i]);
            if (open) {
                path.lineTo(px, py);
            } else {
                path.moveTo(px, py);
                open = true;
            }
        }
        g.draw(path);
    }

    private static void frame(Graphics2D g, ChartGeometry place) {
        g.setColor(new Color(SeriesPalette.INK));
        g.setStroke(new BasicStroke(1f));
        g.drawRect(place.plotLeft(), place.plotTop(), place.plotRight() - place.plotLeft(),
                place.plotBottom() - place.plotTop());
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        FontMetrics metrics = g.getFontMetrics();
        for (double t : place.x().ticks()) {
            int column = (int) Math.round(place.column(t));
            g.drawLine(column, place.plotBottom(), column, place.plotBottom() + 5);
            String label = place.x().tickLabel(t);
            g.drawString(label, column - metrics.stringWidth(label) / 2, place.plotBottom() + 19);
        }
        for (double t : place.y().ticks()) {
            int row = (int) Math.round(place.row(t));
            g.drawLine(place.plotLeft() - 5, row, place.plotLeft(), row);
            String label = place.y().tickLabel(t);
            g.drawString(label, place.plotLeft() - 8 - metrics.stringWidth(label), row + 4);
        }
    }

    private static void titles(Graphics2D g, ChartGeometry place, LineChart chart) {
        g.setColor(new Color(SeriesPalette.INK));
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        g.drawString(chart.title(), place.plotLeft(), 24);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        FontMetrics metrics = g.getFontMetrics();
        int middle = (place.plotLeft() + place.plotRight()) / 2;
        g.drawString(chart.xTitle(), middle - metrics.stringWidth(chart.xTitle()) / 2, place.plotBottom() + 42);
        AffineTransform saved = g.getTransform();
        int centreRow = (place.plotTop() + place.plotBottom()) / 2;
        g.rotate(-Math.PI / 2, 20, centreRow);
        g.drawString(chart.yTitle(), 20 - metrics.stringWidth(chart.yTitle()) / 2, centreRow + 4);
        g.setTransform(saved);
    }

    private static void legend(Graphics2D g, ChartGeometry place, LineChart chart) {
        int x = place.plotRight() + 16;
        int y = place.plotTop() + 10;
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        for (ChartSeries s : chart.series()) {
            g.setColor(new Color(s.colour()));
            g.setStroke(s.dashed() ? new BasicStroke(CURVE_WIDTH * 0.8f, BasicStroke.CAP_BUTT,
                    BasicStroke.JOIN_ROUND, 10f, DASHES, 0f) : new BasicStroke(CURVE_WIDTH));
            g.drawLine(x, y, x + 26, y);
            g.setColor(new Color(SeriesPalette.INK));
            g.drawString(s.label(), x + 34, y + 4);
            y += 20;
        }
        if (chart.shading() != null) {
            g.setColor(new Color(SeriesPalette.SHADING));
            g.fillRect(x, y - 6, 26, 12);
            g.setColor(new Color(SeriesPalette.INK));
            g.drawString(chart.shading().label(), x + 34, y + 4);
        }
    }
}
