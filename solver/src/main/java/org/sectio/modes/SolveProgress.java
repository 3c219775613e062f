package org.sectio.modes;

/** Receives progress of a long solve. Called from the solving thread. */
@FunctionalInterface
public interface SolveProgress {

    /** Ignores all progress. */
    SolveProgress SILENT = (stage, fraction) -> { };

    /**
     * @param stage what is being done, e.g. "TM: factorizing 785,000 unknowns"
     * @param fractionDone overall fraction done, 0 … 1
     */
    void report(String stage, double fractionDone);
}
