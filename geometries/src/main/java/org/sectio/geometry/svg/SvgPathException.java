package org.sectio.geometry.svg;

/**
 * SVG path data that cannot be read or turned into walls. Carries the 1-based character position in
 * the {@code d} text where the fault is.
 */
public final class SvgPathException extends Exception {

    private static final long serialVersionUID = 1L;

    private final int position;
    private final String problem;

    /**
     * @param position 1-based character position in the path data
     * @param problem what is wrong and what was expected, one line
     */
    public SvgPathException(int position, String problem) {
        super("character " + position + ": " + problem);
        this.position = position;
        this.problem = problem;
    }

    /** @return the 1-based character position in the path data */
    public int position() {
        return position;
    }

    /** @return what is wrong, without the position */
    public String problem() {
        return problem;
    }
}
