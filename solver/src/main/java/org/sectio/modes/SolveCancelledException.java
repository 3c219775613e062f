package org.sectio.modes;

/**
 * Thrown by a {@link SolveProgress} to abandon a solve (the viewer's Cancel button, or a newer solve
 * taking its place). It is not a {@link SolveException}, so nothing inside the solver mistakes it for
 * a failed coarse-grid estimate: it leaves {@link ModeSolver#solve} unchanged, and no result is made.
 */
public class SolveCancelledException extends RuntimeException {

    /** @param message what was cancelled, e.g. "solve cancelled" */
    public SolveCancelledException(String message) {
        super(message);
    }
}
