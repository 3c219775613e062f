package org.sectio.io;

import java.util.List;

/**
 * What a line chart shows: a title, the axis titles (with units), curves and an optional shaded
 * span of the x axis. Drawn by {@link ChartRenderer}; placed by {@link ChartGeometry}.
 *
 * @param title the heading, not blank
 * @param xTitle x axis title with its unit, e.g. "frequency (GHz)"
 * @param yTitle y axis title with its unit
 * @param series the curves, at least one; copied
 * @param shading the shaded span, or null for none
 */
public record LineChart(String title, String xTitle, String yTitle, List<ChartSeries> series, ChartSpan shading) {

    /**
     * Validates and copies the components.
     *
     * @param title as in the record description
     * @param xTitle as in the record description
     * @param yTitle as in the record description
     * @param series as in the record description
     * @param shading as in the record description
     * @throws IllegalArgumentException if a title is blank or there is no curve
     */
    public LineChart {
        if (title == null || title.isBlank() || xTitle == null || xTitle.isBlank() || yTitle == null
                || yTitle.isBlank()) {
            throw new IllegalArgumentException("a chart needs a title and two axis titles");
        }
        if (series == null || series.isEmpty()) {
            throw new IllegalArgumentException("chart \"" + title + "\" has no curve");
        }
        series = List.copyOf(series);
    }
}
