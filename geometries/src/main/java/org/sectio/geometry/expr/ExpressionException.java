package org.sectio.geometry.expr;

/**
 * An expression that cannot be read or evaluated. Carries the 1-based character position within the
 * expression text where the fault is, so that a file reader can point at it.
 */
public final class ExpressionException extends Exception {

    private static final long serialVersionUID = 1L;

    private final int column;
    private final String problem;

    /**
     * @param column 1-based position in the expression text
     * @param problem what is wrong and what was expected, one line
     */
    public ExpressionException(int column, String problem) {
        super("character " + column + ": " + problem);
        this.column = column;
        this.problem = problem;
    }

    /** @return the 1-based position of the fault in the expression text */
    public int column() {
        return column;
    }

    /** @return what is wrong, without the position */
    public String problem() {
        return problem;
    }
}
