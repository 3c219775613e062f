package org.sectio.physics;

import java.util.Locale;

/**
 * A one-line text picture of a {@link BandRule} over a frequency axis, with a scale line below.
 *
 * <p>The axis start … stop is cut into {@code width} equal columns; column i covers
 * [start + iΔ, start + (i+1)Δ). A column holding a cutoff shows {@value #CUTOFF}; otherwise its
 * centre frequency f shows {@value #CUT_OFF} below fc1, {@value #USABLE} inside the usable band
 * (1.25 fc1 ≤ f ≤ 0.95 fc2), {@value #SINGLE} elsewhere between fc1 and fc2, and {@value #MULTI}
 * above fc2. The scale line puts the start frequency at the left and the stop frequency at the
 * right, in GHz with two decimals. Pure function: same input, same text.
 */
public final class BandBar {

    /** Column holding fc1 or fc2. */
    public static final char CUTOFF = '|';
    /** No mode propagates. */
    public static final char CUT_OFF = '.';
    /** One mode, outside the usable band. */
    public static final char SINGLE = '-';
    /** One mode, usable band. */
    public static final char USABLE = '=';
    /** More than one mode propagates. */
    public static final char MULTI = '~';
    /** Fewest columns. */
    public static final int MIN_WIDTH = 20;
    /** Most columns. */
    public static final int MAX_WIDTH = 400;
    /** What the characters mean, one line. */
    public static final String LEGEND = "| cutoff   . no mode   - one mode   = usable band   ~ several modes";

    private BandBar() {
    }

    /**
     * The bar and its scale, two lines joined by '\n' (no trailing newline), each {@code width} long.
     *
     * @param band the band to draw
     * @param axisStartHz left end of the axis, finite and ≥ 0, Hz
     * @param axisStopHz right end, finite and &gt; start, Hz
     * @param width columns, {@value #MIN_WIDTH} … {@value #MAX_WIDTH}
     * @return the picture
     * @throws IllegalArgumentException if a value is out of range
     */
    public static String render(BandRule band, double axisStartHz, double axisStopHz, int width) {
        if (!(axisStartHz >= 0) || !(axisStopHz > axisStartHz) || Double.isInfinite(axisStopHz)) {
            throw new IllegalArgumentException("axis must satisfy 0 ≤ start < stop < ∞, got " + axisStartHz + " … "
                    + axisStopHz + " Hz");
        }
        if (width < MIN_WIDTH || width > MAX_WIDTH) {
            throw new IllegalArgumentException("bar width must be " + MIN_WIDTH + " … " + MAX_WIDTH + ", got " + width);
        }
        double step = (axisStopHz - axisStartHz) / width;
        StringBuilder bar = new StringBuilder(width);
        for (int i = 0; i < width; i++) {
            double lo = axisStartHz + i * step;
            double hi = axisStartHz + (i + 1) * step;
            double centre = axisStartHz + (i + 0.5) * step;
            bar.append(symbol(band, lo, hi, centre));
        }
        String left = ghz(axisStartHz);
        String right = ghz(axisStopHz);
        int gap = width - left.length() - right.length();
        String scale = gap >= 1 ? left + " ".repeat(gap) + right : left;
        return bar + "\n" + scale;
    }

    private static char symbol(BandRule band, double lo, double hi, double centre) {
        double fc1 = band.dominantCutoffHz();
        double fc2 = band.nextCutoffHz();
        if ((lo <= fc1 && fc1 < hi) || (lo <= fc2 && fc2 < hi)) {
            return CUTOFF;
        }
        if (centre < fc1) {
            return CUT_OFF;
        }
        if (centre >= fc2) {
            return MULTI;
        }
        return centre >= band.usableLowHz() && centre <= band.usableHighHz() ? USABLE : SINGLE;
    }

    private static String ghz(double hz) {
        return String.format(Locale.ROOT, "%.2f GHz", hz / 1e9);
    }
}
