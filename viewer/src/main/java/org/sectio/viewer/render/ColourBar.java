package org.sectio.viewer.render;

import org.sectio.io.ColourScale;

/**
 * The colour bar beside the field: a caption with units and the values at its top and bottom. A
 * diverging bar (a signed field) runs the whole {@link ColourScale} from +1 at the top to −1 at the
 * bottom; a sequential bar (a magnitude) runs its upper half, from the peak at the top to 0 (warm
 * white) at the bottom. The field raster maps values the same way, so the bar reads the picture.
 *
 * @param caption what is shown, with its unit, e.g. "|E_t| (kV/m at 1 W)"
 * @param top the value at the top row, in the caption's unit
 * @param bottom the value at the bottom row
 * @param diverging true for a signed field
 */
public record ColourBar(String caption, double top, double bottom, boolean diverging) {

    /**
     * @param row 0 at the top … rows − 1 at the bottom
     * @param rows the bar's height, px, ≥ 2
     * @return the position in the colour scale, +1 at the top, −1 (diverging) or 0 (sequential) at the bottom
     */
    public double scaleAtRow(int row, int rows) {
        double t = (double) row / (rows - 1);
        return diverging ? 1 - 2 * t : 1 - t;
    }

    /** @return the colour of a row, 0xRRGGBB */
    public int rgbAtRow(int row, int rows) {
        return ColourScale.rgb(scaleAtRow(row, rows));
    }

    /** @return the value of a row in the caption's unit */
    public double valueAtRow(int row, int rows) {
        return top + (bottom - top) * row / (rows - 1);
    }

    /**
     * @param normalized a field value divided by its peak: −1 … 1 (signed) or 0 … 1 (magnitude)
     * @return its colour, 0xRRGGBB, as the raster paints it
     */
    public static int rgb(double normalized) {
        return ColourScale.rgb(normalized);
    }
}
