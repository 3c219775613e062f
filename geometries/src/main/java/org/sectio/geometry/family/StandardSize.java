package org.sectio.geometry.family;

import java.util.Map;

/**
 * One standard rectangular waveguide size: its designation, inner dimensions and recommended
 * operating band. See {@link StandardSizes} for the table and its source.
 *
 * @param designation e.g. "WR-90"
 * @param widthInches inner broad side a, inches, &gt; heightInches
 * @param heightInches inner narrow side b, inches, &gt; 0
 * @param bandLowHz lower end of the recommended band, Hz, &gt; 0
 * @param bandHighHz upper end of the recommended band, Hz, &gt; bandLowHz
 */
public record StandardSize(String designation, double widthInches, double heightInches, double bandLowHz,
        double bandHighHz) {

    /** Metres per inch, exact by definition (international inch, 1959). */
    public static final double METRES_PER_INCH = 0.0254;

    /** @throws IllegalArgumentException unless widthInches &gt; heightInches &gt; 0 and 0 &lt; bandLowHz &lt; bandHighHz */
    public StandardSize {
        if (designation == null || designation.isBlank() || !(heightInches > 0) || !(widthInches > heightInches)
                || !(bandLowHz > 0) || !(bandHighHz > bandLowHz) || !Double.isFinite(widthInches + bandHighHz)) {
            throw new IllegalArgumentException("standard size " + designation + ": expected a > b > 0 and a band low < high, got "
                    + widthInches + " × " + heightInches + " in, " + bandLowHz + " … " + bandHighHz + " Hz");
        }
    }

    /** @return inner broad side a, m */
    public double width() {
        return widthInches * METRES_PER_INCH;
    }

    /** @return inner narrow side b, m */
    public double height() {
        return heightInches * METRES_PER_INCH;
    }

    /**
     * @return {@code width} and {@code height} in metres, the values of the "rectangular" family (and the
     *     outer rectangle of the ridged and slab-loaded families) for this size
     */
    public Map<String, Double> dimensions() {
        return Map.of("width", width(), "height", height());
    }
}
