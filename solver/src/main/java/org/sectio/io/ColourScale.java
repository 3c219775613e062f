package org.sectio.io;

/**
 * Sectio's diverging colour scale "fjord-amber" for normalized fields in [−1, +1]: deep blue through
 * sky blue to a warm white at 0, then through amber to burnt umber at +1. The five control colours are
 * interpolated linearly in the OKLab colour space, so lightness changes evenly and the two halves
 * rise to the same white. A pure function; values outside [−1, +1] are clamped.
 */
public final class ColourScale {

    /** Control positions in [−1, +1], ascending. */
    private static final double[] POSITIONS = {-1.0, -0.5, 0.0, 0.5, 1.0};
    /** Control colours as 0xRRGGBB: deep fjord blue, sky blue, warm white, amber, burnt umber. */
    private static final int[] COLOURS = {0x1A3A80, 0x74A6DD, 0xF6F3EC, 0xD69636, 0x66300A};
    private static final double[][] LAB = new double[COLOURS.length][];

    static {
        for (int k = 0; k < COLOURS.length; k++) {
            LAB[k] = toOklab(COLOURS[k]);
        }
    }

    private ColourScale() {
    }

    /**
     * @param value a normalized field value; clamped to [−1, +1]
     * @return its colour as 0xRRGGBB
     * @throws IllegalArgumentException if the value is NaN
     */
    public static int rgb(double value) {
        if (Double.isNaN(value)) {
            throw new IllegalArgumentException("colour scale: value is NaN");
        }
        double v = Math.max(-1.0, Math.min(1.0, value));
        int k = 0;
        while (k < POSITIONS.length - 2 && v > POSITIONS[k + 1]) {
            k++;
        }
        double t = (v - POSITIONS[k]) / (POSITIONS[k + 1] - POSITIONS[k]);
        if (t <= 0) {
            return COLOURS[k];
        }
        if (t >= 1) {
            return COLOURS[k + 1];
        }
        double[] a = LAB[k];
        double[] b = LAB[k + 1];
        return fromOklab(a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1]), a[2] + t * (b[2] - a[2]));
    }

    /**
     * @param rgb a colour as 0xRRGGBB
     * @return its OKLab coordinates {L, a, b}, L in [0, 1]
     */
    public static double[] toOklab(int rgb) {
        double r = toLinear((rgb >> 16) & 0xFF);
        double g = toLinear((rgb >> 8) & 0xFF);
        double bl = toLinear(rgb & 0xFF);
        double l = Math.cbrt(0.4122214708 * r + 0.5363325363 * g + 0.0514459929 * bl);
        double m = Math.cbrt(0.2119034982 * r + 0.6806995451 * g + 0.1073969566 * bl);
        double s = Math.cbrt(0.0883024619 * r + 0.2817188376 * g + 0.6299787005 * bl);
        return new double[] {
            0.2104542553 * l + 0.7936177850 * m - 0.0040720468 * s,
            1.9779984951 * l - 2.4285922050 * m + 0.4505937099 * s,
            0.0259040371 * l + 0.7827717662 * m - 0.8086757660 * s};
    }

    private static int fromOklab(double lightness, double a, double b) {
        double l = cube(lightness + 0.3963377774 * a + 0.2158037573 * b);
        double m = cube(lightness - 0.1055613458 * a - 0.0638541728 * b);
        double s = cube(lightness - 0.0894841775 * a - 1.2914855480 * b);
        int red = toByte(4.0767416621 * l - 3.3077115913 * m + 0.2309699292 * s);
        int green = toByte(-1.2684380046 * l + 2.6097574011 * m - 0.3413193965 * s);
        int blue = toByte(-0.0041960863 * l - 0.7034186147 * m + 1.7076147010 * s);
        return (red << 16) | (green << 8) | blue;
    }

    private static double cube(double x) {
        return x * x * x;
    }

    private static double toLinear(int channel) {
        double c = channel / 255.0;
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    private static int toByte(double linear) {
        double c = Math.max(0.0, Math.min(1.0, linear));
        double encoded = c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055;
        return (int) Math.round(255.0 * encoded);
    }
}
