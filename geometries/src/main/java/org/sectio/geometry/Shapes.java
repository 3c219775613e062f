package org.sectio.geometry;

/**
 * The basic air-filled metal cross-sections, dimensions in metres. Each checks its dimensions and
 * throws {@link IllegalArgumentException} naming the bad value.
 */
public final class Shapes {

    private Shapes() {
    }

    /**
     * A rectangle {@code width × height} with its lower-left corner at the origin, sides on the axes.
     *
     * @param width broad side a, m, &gt; 0
     * @param height narrow side b, m, &gt; 0
     */
    public static CrossSection rectangle(double width, double height) {
        requirePositive("width", width);
        requirePositive("height", height);
        return GuideSection.airFilled(String.format("rectangle %.4g × %.4g mm", width * 1e3, height * 1e3),
                Outline.startAt(0, 0).lineTo(width, 0).lineTo(width, height).lineTo(0, height).close());
    }

    /**
     * A rectangle {@code width × height} centred at (centreX, centreY) and turned counter-clockwise by
     * {@code rotationRadians}, so that its walls need not lie on any grid line.
     */
    public static CrossSection rotatedRectangle(double width, double height, double centreX, double centreY,
                                                double rotationRadians) {
        requirePositive("width", width);
        requirePositive("height", height);
        double c = Math.cos(rotationRadians);
        double s = Math.sin(rotationRadians);
        double[][] corners = {{-width / 2, -height / 2}, {width / 2, -height / 2},
            {width / 2, height / 2}, {-width / 2, height / 2}};
        double[] xs = new double[4];
        double[] ys = new double[4];
        for (int k = 0; k < 4; k++) {
            xs[k] = centreX + c * corners[k][0] - s * corners[k][1];
            ys[k] = centreY + s * corners[k][0] + c * corners[k][1];
        }
        return GuideSection.airFilled(String.format("rectangle %.4g × %.4g mm turned %.3g°", width * 1e3, height * 1e3,
                Math.toDegrees(rotationRadians)),
                Outline.startAt(xs[0], ys[0]).lineTo(xs[1], ys[1]).lineTo(xs[2], ys[2]).lineTo(xs[3], ys[3]).close());
    }

    /**
     * A circle of the given radius centred at (centreX, centreY).
     *
     * @param radius m, &gt; 0
     */
    public static CrossSection circle(double radius, double centreX, double centreY) {
        requirePositive("radius", radius);
        return GuideSection.airFilled(String.format("circle of radius %.4g mm", radius * 1e3),
                Outline.circle(centreX, centreY, radius));
    }

    /**
     * An ellipse centred at (centreX, centreY) whose own axes are turned counter-clockwise by
     * {@code rotationRadians} from the coordinate axes: (x, y) = c + R(φ)(a cos t, b sin t).
     *
     * @param semiAxisX semi-axis a along the ellipse's own x direction, m, &gt; 0
     * @param semiAxisY semi-axis b along the ellipse's own y direction, m, &gt; 0
     * @param centreX centre x, m
     * @param centreY centre y, m
     * @param rotationRadians the turn φ, radians, finite
     * @throws IllegalArgumentException if a semi-axis is not a positive length or a value is not finite
     */
    public static CrossSection ellipse(double semiAxisX, double semiAxisY, double centreX, double centreY,
                                       double rotationRadians) {
        requirePositive("semi-axis x", semiAxisX);
        requirePositive("semi-axis y", semiAxisY);
        if (!Double.isFinite(centreX) || !Double.isFinite(centreY) || !Double.isFinite(rotationRadians)) {
            throw new IllegalArgumentException("ellipse centre and rotation must be finite, got (" + centreX + ", "
                    + centreY + ") m and " + rotationRadians + " rad");
        }
        return GuideSection.airFilled(String.format("ellipse %.4g × %.4g mm turned %.3g°", 2e3 * semiAxisX,
                2e3 * semiAxisY, Math.toDegrees(rotationRadians)),
                Outline.ellipse(centreX, centreY, semiAxisX, semiAxisY, rotationRadians));
    }

    /**
     * A closed outline of segments and arcs built with {@link Outline}.
     *
     * @param name a short description
     * @param outline the outline, closed here
     */
    public static CrossSection polygon(String name, Outline outline) {
        return GuideSection.airFilled(name, outline.close());
    }

    private static void requirePositive(String what, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(what + " must be a positive length in metres, got " + value);
        }
    }
}
