package org.sectio.io;

/**
 * Where a {@link LineChart} goes in a picture: the plot rectangle (pixel edges, y down), the legend
 * column to its right, and the two {@link ChartAxis axes} that map data to pixels. The x axis covers
 * every curve's x range, the y axis every finite y, widened to nice numbers; when no y is negative
 * the y axis starts at 0. A pure value, so tests can find where a data point lands without drawing.
 *
 * @param width picture width, px
 * @param height picture height, px
 * @param plotLeft left edge of the plot, px
 * @param plotTop top edge, px
 * @param plotRight right edge, px
 * @param plotBottom bottom edge, px
 * @param x the x axis, from plotLeft to plotRight
 * @param y the y axis, from plotBottom (low) up to plotTop (high)
 */
public record ChartGeometry(int width, int height, int plotLeft, int plotTop, int plotRight, int plotBottom,
                            ChartAxis x, ChartAxis y) {

    /** Smallest picture width, px. */
    public static final int MIN_WIDTH = 480;
    /** Largest picture width, px. */
    public static final int MAX_WIDTH = 4000;
    /** Smallest picture height, px. */
    public static final int MIN_HEIGHT = 320;
    /** Largest picture height, px. */
    public static final int MAX_HEIGHT = 3000;
    /** Width of the legend column, px. */
    public static final int LEGEND_WIDTH = 170;

    private static final int LEFT_MARGIN = 78;
    private static final int TOP_MARGIN = 42;
    private static final int BOTTOM_MARGIN = 58;
    private static final int PIXELS_PER_X_TICK = 90;
    private static final int PIXELS_PER_Y_TICK = 55;

    /**
     * Validates the components.
     *
     * @param width as in the record description
     * @param height as in the record description
     * @param plotLeft as in the record description
     * @param plotTop as in the record description
     * @param plotRight as in the record description
     * @param plotBottom as in the record description
     * @param x as in the record description
     * @param y as in the record description
     * @throws IllegalArgumentException if the plot does not lie inside the picture or an axis is missing
     */
    public ChartGeometry {
        if (x == null || y == null || !(0 <= plotLeft && plotLeft < plotRight && plotRight <= width)
                || !(0 <= plotTop && plotTop < plotBottom && plotBottom <= height)) {
            throw new IllegalArgumentException("chart plot " + plotLeft + "," + plotTop + " … " + plotRight + ","
                    + plotBottom + " does not fit a " + width + " × " + height + " picture");
        }
    }

    /**
     * @param chart what is drawn
     * @param width picture width, {@value #MIN_WIDTH} … {@value #MAX_WIDTH} px
     * @param height picture height, {@value #MIN_HEIGHT} … {@value #MAX_HEIGHT} px
     * @return the placement
     * @throws IllegalArgumentException if a size is out of range or no curve has a finite y
     */
    public static ChartGeometry of(LineChart chart, int width, int height) {
        if (width < MIN_WIDTH || width > MAX_WIDTH || height < MIN_HEIGHT || height > MAX_HEIGHT) {
            throw new IllegalArgumentException("chart size must be " + MIN_WIDTH + " … " + MAX_WIDTH + " × "
                    + MIN_HEIGHT + " … " + MAX_HEIGHT + " px, got " + width + " × " + height);
        }
        double xLow = Double.POSITIVE_INFINITY;
        double xHigh = Double.NEGATIVE_INFINITY;
        double yLow = Double.POSITIVE_INFINITY;
        double yHigh = Double.NEGATIVE_INFINITY;
        for (ChartSeries s : chart.series()) {
            double[] xs = s.x();
            xLow = Math.min(xLow, xs[0]);
            xHigh = Math.max(xHigh, xs[xs.length - 1]);
            if (!Double.isNaN(s.minY())) {
                yLow = Math.min(yLow, s.minY());
                yHigh = Math.max(yHigh, s.maxY());
            }
        }
        if (!Double.isFinite(yLow)) {
            throw new IllegalArgumentException("chart \"" + chart.title() + "\" has no point to draw");
        }
        if (yLow >= 0) {
            yLow = 0;
        }
        int left = LEFT_MARGIN;
        int right = width - LEGEND_WIDTH;
        int top = TOP_MARGIN;
        int bottom = height - BOTTOM_MARGIN;
        int xTicks = Math.max(ChartAxis.MIN_TICKS, (right - left) / PIXELS_PER_X_TICK);
        int yTicks = Math.max(ChartAxis.MIN_TICKS, (bottom - top) / PIXELS_PER_Y_TICK);
        ChartAxis xAxis = ChartAxis.covering(xLow, xHigh, xTicks, left, right);
        ChartAxis yAxis = ChartAxis.covering(yLow, yHigh, yTicks, bottom, top);
        return new ChartGeometry(width, height, left, top, right, bottom, xAxis, yAxis);
    }

    /**
     * @param value an x data value
     * @return its pixel column (fractional)
     */
    public double column(double value) {
        return x.toPixel(value);
    }

    /**
     * @param value a y data value
     * @return its pixel row (fractional, rows grow downward)
     */
    public double row(double value) {
        return y.toPixel(value);
    }
}
