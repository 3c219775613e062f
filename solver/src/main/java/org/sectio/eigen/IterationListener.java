package org.sectio.eigen;

/**
 * Told of the progress of an iterative eigensolver, for a progress bar or a log.
 *
 * <p>It is called on the solving thread after every application of the shift-inverted operator
 * ({@code K⁻¹ M}, one sparse triangular solve pair each), so it must be cheap. It may throw an unchecked
 * exception only to abandon the iteration (a cancelled solve): that exception leaves the solver unchanged.
 */
@FunctionalInterface
public interface IterationListener {

    /** A listener that ignores every report. */
    IterationListener NONE = operatorApplications -> { };

    /**
     * @param operatorApplications how many operator applications the iteration has made so far, {@code ≥ 1},
     *        increasing by one between calls
     */
    void operatorApplied(int operatorApplications);
}
