package org.sectio.io;

/**
 * A shaded stretch of a chart's x axis, with its legend text (e.g. the single-mode band).
 *
 * @param low start, finite
 * @param high end, finite and &gt; low
 * @param label the legend text, not blank
 */
public record ChartSpan(double low, double high, String label) {

    /**
     * Validates the components.
     *
     * @param low as in the record description
     * @param high as in the record description
     * @param label as in the record description
     * @throws IllegalArgumentException if a value is out of range
     */
    public ChartSpan {
        if (!Double.isFinite(low) || !Double.isFinite(high) || !(high > low) || label == null || label.isBlank()) {
            throw new IllegalArgumentException("a shaded span needs finite low < high and a label, got " + low + " … "
                    + high + ", \"" + label + "\"");
        }
    }
}
