package org.sectio.io;

/**
 * Sectio's categorical palette "ridge-line" for chart curves: eight colours picked to stay apart from
 * one another on white and from the grey of reference lines, used in order and repeated after the
 * eighth. Colours as 0xRRGGBB.
 */
public final class SeriesPalette {

    /** Slate blue, brick, moss green, plum, ochre, teal, rust brown, graphite violet. */
    private static final int[] COLOURS = {0x2B5C9E, 0xB8432F, 0x4F7F2A, 0x8A3F86, 0xC08A12, 0x17877F, 0x7A4A22,
        0x55507A};

    /** Grey of dashed reference curves. */
    public static final int REFERENCE = 0x8C8C8C;
    /** Pale sand of a shaded span. */
    public static final int SHADING = 0xF1E7CF;
    /** Text, axes and frame. */
    public static final int INK = 0x222222;
    /** Light grid lines at the ticks. */
    public static final int GRID = 0xE4E4E4;

    private SeriesPalette() {
    }

    /**
     * @param position 0-based position of a curve, ≥ 0
     * @return its colour, 0xRRGGBB
     * @throws IllegalArgumentException if the position is negative
     */
    public static int colour(int position) {
        if (position < 0) {
            throw new IllegalArgumentException("palette position must be ≥ 0, got " + position);
        }
        return COLOURS[position % COLOURS.length];
    }

    /** @return how many distinct colours there are before they repeat */
    public static int size() {
        return COLOURS.length;
    }
}
