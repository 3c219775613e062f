package org.sectio.io;

import java.util.Arrays;

/**
 * One curve of a {@link LineChart}: points (x_i, y_i) joined by straight lines; a NaN y leaves a gap
 * (e.g. a mode below its cutoff).
 *
 * @param label the legend text, not blank
 * @param x abscissae, finite, ascending; copied
 * @param y ordinates, as many as x, finite or NaN; copied
 * @param colour 0xRRGGBB
 * @param dashed true for a dashed line (a reference curve)
 */
public record ChartSeries(String label, double[] x, double[] y, int colour, boolean dashed) {

    /**
     * Validates and copies the components.
     *
     * @param label as in the record description
     * @param x as in the record description
     * @param y as in the record description
     * @param colour as in the record description
     * @param dashed as in the record description
     * @throws IllegalArgumentException if the label is blank, the lengths differ, or x is not finite and ascending
     */
    public ChartSeries {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("a chart series needs a label");
        }
        if (x == null || y == null || x.length != y.length || x.length == 0) {
            throw new IllegalArgumentException("chart series " + label + ": needs as many y as x values, at least one");
        }
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || (i > 0 && !(x[i] > x[i - 1])) || Double.isInfinite(y[i])) {
                throw new IllegalArgumentException("chart series " + label + ": x must be finite and ascending and y"
                        + " finite or NaN; point " + i + " is (" + x[i] + ", " + y[i] + ")");
            }
        }
        x = x.clone();
        y = y.clone();
        colour &= 0xFFFFFF;
    }

    /** @return a copy of the abscissae */
    @Override
    public double[] x() {
        return x.clone();
    }

    /** @return a copy of the ordinates */
    @Override
    public double[] y() {
        return y.clone();
    }

    /** @return the smallest finite y, or NaN if there is none */
    public double minY() {
        return Arrays.stream(y).filter(Double::isFinite).min().orElse(Double.NaN);
    }

    /** @return the largest finite y, or NaN if there is none */
    public double maxY() {
        return Arrays.stream(y).filter(Double::isFinite).max().orElse(Double.NaN);
    }
}
