package org.sectio.geometry;

/**
 * A piece of metal wall that is monotone in both x and y, oriented so that the guide's interior lies
 * on its left. Monotonicity makes every grid-line crossing unique and every clip to a box a single
 * parameter interval, which is what the cut-cell construction relies on.
 *
 * <p>Coordinates are in metres. The parameter runs from {@link #startParameter()} to
 * {@link #endParameter()}, which may be smaller than the start (a clockwise arc).
 */
public interface WallPiece {

    /** @return the parameter of the first end */
    double startParameter();

    /** @return the parameter of the second end */
    double endParameter();

    /** @return x at parameter {@code t}, m */
    double x(double t);

    /** @return y at parameter {@code t}, m */
    double y(double t);

    /**
     * @param x a coordinate strictly between the x of the two ends, m
     * @return the parameter at which the piece has that x
     */
    double parameterAtX(double x);

    /**
     * @param y a coordinate strictly between the y of the two ends, m
     * @return the parameter at which the piece has that y
     */
    double parameterAtY(double y);

    /**
     * The line integral ∫ x dy along the piece from {@code t0} to {@code t1}, m². Summed over a closed
     * boundary traversed with the interior on the left it is the enclosed area (Green's theorem).
     */
    double integralXdy(double t0, double t1);

    /** @return x of the start, m */
    default double startX() {
        return x(startParameter());
    }

    /** @return y of the start, m */
    default double startY() {
        return y(startParameter());
    }

    /** @return x of the end, m */
    default double endX() {
        return x(endParameter());
    }

    /** @return y of the end, m */
    default double endY() {
        return y(endParameter());
    }
}
