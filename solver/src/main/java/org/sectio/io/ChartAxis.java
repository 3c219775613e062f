package org.sectio.io;

import java.util.Locale;

/**
 * One axis of a chart: a data interval widened to "nice" round ends, its tick values, and the linear
 * map from data values to pixel positions.
 *
 * <p>The ends and the tick step follow Heckbert's nice-number rule (P. S. Heckbert, "Nice numbers
 * for graph labels", Graphics Gems, 1990, from memory): the range is rounded up to 1, 2, 5 or 10
 * times a power of ten, the step is that range divided by (ticks − 1) rounded to the nearest of
 * 1, 2, 5 or 10 times a power of ten, and the ends are the data ends rounded outward to whole
 * steps. A pixel position is p = p_low + (v − low) (p_high − p_low) / (high − low); p_high may be
 * below p_low (a y axis growing upward on a screen). A pure value: no drawing happens here.
 *
 * @param low the value at the axis start, finite
 * @param high the value at the axis end, finite and &gt; low
 * @param step the spacing of ticks, finite and &gt; 0, at most high − low
 * @param pixelLow the pixel position of {@code low}
 * @param pixelHigh the pixel position of {@code high}, different from {@code pixelLow}
 */
public record ChartAxis(double low, double high, double step, double pixelLow, double pixelHigh) {

    /** Fewest ticks asked of {@link #covering}. */
    public static final int MIN_TICKS = 2;

    /**
     * Validates the components.
     *
     * @param low as in the record description
     * @param high as in the record description
     * @param step as in the record description
     * @param pixelLow as in the record description
     * @param pixelHigh as in the record description
     * @throws IllegalArgumentException if a value is out of range
     */
    public ChartAxis {
        if (!Double.isFinite(low) || !Double.isFinite(high) || !(high > low) || !(step > 0) || step > high - low
                || !Double.isFinite(pixelLow) || !Double.isFinite(pixelHigh) || pixelLow == pixelHigh) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "chart axis needs low < high, 0 < step ≤ high − low and two different pixel ends; got %s … %s"
                            + " step %s, pixels %s … %s", low, high, step, pixelLow, pixelHigh));
        }
    }

    /**
     * The nice axis that covers the data interval.
     *
     * @param dataLow smallest data value, finite
     * @param dataHigh largest data value, finite and ≥ dataLow (equal values get a unit-wide interval)
     * @param ticks about how many ticks, ≥ {@value #MIN_TICKS}
     * @param pixelLow pixel position of the low end
     * @param pixelHigh pixel position of the high end
     * @return the axis
     * @throws IllegalArgumentException if a value is out of range
     */
    public static ChartAxis covering(double dataLow, double dataHigh, int ticks, double pixelLow, double pixelHigh) {
        if (!Double.isFinite(dataLow) || !Double.isFinite(dataHigh) || dataHigh < dataLow || ticks < MIN_TICKS) {
            throw new IllegalArgumentException("chart axis needs finite data low ≤ high and at least " + MIN_TICKS
                    + " ticks, got " + dataLow + " … " + dataHigh + ", " + ticks + " ticks");
        }
        double lo = dataLow;
        double hi = dataHigh;
        if (hi == lo) {
            double half = lo == 0 ? 0.5 : Math.abs(lo) * 0.5;
            lo -= half;
            hi += half;
        }
        double range = niceNumber(hi - lo, false);
        double step = niceNumber(range / (ticks - 1), true);
        double niceLow = Math.floor(lo / step) * step;
        double niceHigh = Math.ceil(hi / step) * step;
        return new ChartAxis(niceLow, niceHigh, step, pixelLow, pixelHigh);
    }

    /**
     * Heckbert's nice number: 1, 2, 5 or 10 times the power of ten of {@code x}.
     *
     * @param x a positive finite number
     * @param nearest true to take the nearest (thresholds 1.5, 3, 7), false to take the next one up
     * @return the nice number
     * @throws IllegalArgumentException if x is not positive and finite
     */
    public static double niceNumber(double x, boolean nearest) {
        if (!(x > 0) || Double.isInfinite(x)) {
            throw new IllegalArgumentException("a nice number needs a positive finite value, got " + x);
        }
        double power = Math.pow(10, Math.floor(Math.log10(x)));
        double fraction = x / power;
        double nice;
        if (nearest) {
            nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
        } else {
            nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        }
        return nice * power;
    }

    /**
     * @param value a data value
     * @return its pixel position (outside the pixel ends for values outside the axis)
     */
    public double toPixel(double value) {
        return pixelLow + (value - low) * (pixelHigh - pixelLow) / (high - low);
    }

    /** @return the tick values from low to high, whole multiples of the step (rounding noise removed) */
    public double[] ticks() {
        int count = (int) Math.floor((high - low) / step + 1e-9) + 1;
        double[] values = new double[count];
        for (int k = 0; k < count; k++) {
            double v = low + k * step;
            values[k] = Math.abs(v) < step * 1e-9 ? 0.0 : Math.round(v / step) * step;
        }
        return values;
    }

    /**
     * @param value a tick value of this axis
     * @return its label with as many decimals as the step needs, e.g. "8", "8.5", "0.25"
     */
    public String tickLabel(double value) {
        int decimals = Math.max(0, -(int) Math.floor(Math.log10(step) + 1e-9));
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }
}
