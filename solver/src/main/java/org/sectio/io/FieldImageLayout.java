package org.sectio.io;

import org.sectio.geometry.Bounds;

/**
 * Where things go in a field image, in pixels from the top-left corner: a title band, the plot of
 * the cross-section (its aspect ratio that of the section's bounds), and a vertical colour bar on
 * the right whose top row is +1 and bottom row −1.
 *
 * @param imageWidth whole image width, px
 * @param imageHeight whole image height, px
 * @param plotX left column of the plot, px
 * @param plotY top row of the plot, px
 * @param plotWidth plot width, px
 * @param plotHeight plot height, px
 * @param barX left column of the colour bar, px
 * @param barY top row of the colour bar (value +1), px
 * @param barWidth colour bar width, px
 * @param barHeight colour bar height, px, odd; its middle row has value 0 and its last row −1
 */
public record FieldImageLayout(int imageWidth, int imageHeight, int plotX, int plotY, int plotWidth, int plotHeight,
                               int barX, int barY, int barWidth, int barHeight) {

    /** Narrowest image accepted, px. */
    public static final int MIN_WIDTH = 200;
    /** Widest image accepted, px. */
    public static final int MAX_WIDTH = 8000;

    private static final int MARGIN = 16;
    private static final int TITLE_BAND = 34;
    private static final int BAR_WIDTH = 18;
    private static final int BAR_BAND = 120;
    private static final int MIN_BAR_HEIGHT = 120;

    /**
     * @param section the bounds of the section drawn, m
     * @param imageWidth the image width, px, {@value #MIN_WIDTH} … {@value #MAX_WIDTH}
     * @return the layout; the plot keeps the aspect of the bounds, the height follows from it
     * @throws IllegalArgumentException if the width is out of range or the section too slender to draw
     */
    public static FieldImageLayout of(Bounds section, int imageWidth) {
        if (imageWidth < MIN_WIDTH || imageWidth > MAX_WIDTH) {
            throw new IllegalArgumentException("image width must be " + MIN_WIDTH + " … " + MAX_WIDTH
                    + " px, got " + imageWidth);
        }
        int plotWidth = imageWidth - 2 * MARGIN - BAR_BAND;
        long plotHeight = Math.round(plotWidth * section.height() / section.width());
        if (plotHeight < 1 || plotHeight > 4L * MAX_WIDTH) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "cross-section of %g × %g m is too slender to draw", section.width(), section.height()));
        }
        int barHeight = Math.max((int) plotHeight, MIN_BAR_HEIGHT) | 1; // odd, so the middle row is exactly 0
        int plotY = TITLE_BAND + (barHeight - (int) plotHeight) / 2;
        int imageHeight = TITLE_BAND + barHeight + 2 * MARGIN;
        int barX = MARGIN + plotWidth + 24;
        return new FieldImageLayout(imageWidth, imageHeight, MARGIN, plotY, plotWidth, (int) plotHeight,
                barX, TITLE_BAND, BAR_WIDTH, barHeight);
    }
}
