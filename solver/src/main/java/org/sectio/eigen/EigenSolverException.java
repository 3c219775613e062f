package org.sectio.eigen;

/**
 * An eigensolver gave up: the iteration did not converge to the requested pairs within its limits, or
 * the underlying ARPACK routine reported an error code.
 *
 * <p>The message carries the values (converged count, restarts, tolerance, ARPACK code) and says what
 * to change; the same values are available from the accessors.
 */
public final class EigenSolverException extends ArithmeticException {

    private static final long serialVersionUID = 1L;

    private final int convergedCount;
    private final int restarts;
    private final double tolerance;
    private final int arpackCode;

    /**
     * @param message what failed and what to do, with the values
     * @param convergedCount how many Ritz pairs had converged, {@code ≥ 0}
     * @param restarts how many implicit restarts were made
     * @param tolerance the relative tolerance asked for
     * @param arpackCode ARPACK's {@code info} or {@code ierr} code (0 if ARPACK itself reported none)
     */
    public EigenSolverException(String message, int convergedCount, int restarts, double tolerance, int arpackCode) {
        super(message);
        this.convergedCount = convergedCount;
        this.restarts = restarts;
        this.tolerance = tolerance;
        this.arpackCode = arpackCode;
    }

    /** @return how many Ritz pairs had converged when the solver gave up */
    public int convergedCount() {
        return convergedCount;
    }

    /** @return how many implicit restarts had been made */
    public int restarts() {
        return restarts;
    }

    /** @return the relative tolerance that was asked for */
    public double tolerance() {
        return tolerance;
    }

    /** @return ARPACK's {@code info}/{@code ierr} code, 0 if none */
    public int arpackCode() {
        return arpackCode;
    }
}
