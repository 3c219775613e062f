package org.sectio.modes;

/**
 * Receives progress of a long solve. Called from the solving thread: between the stages of a solve
 * (grid, factorization of each family, each grid of the error estimate) and after every operator
 * application of the Lanczos iteration; a factorization runs to its end between two reports.
 *
 * <p>Cancelling: {@link #report} may throw {@link SolveCancelledException}; the solve stops there and
 * the exception leaves {@link ModeSolver#solve} unchanged. Nothing else thrown is allowed.
 */
@FunctionalInterface
public interface SolveProgress {

    /** Ignores all progress. */
    SolveProgress SILENT = (stage, fraction) -> { };

    /**
     * @param stage what is being done, e.g. "TM: factorizing 785,000 unknowns"
     * @param fractionDone overall fraction done, 0 … 1
     * @throws SolveCancelledException to abandon the solve
     */
    void report(String stage, double fractionDone);
}
