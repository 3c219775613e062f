package org.sectio.eigen;

/**
 * Thrown when a Cholesky factorization meets a pivot that is not strictly positive (or is not a
 * number), which proves the matrix is not symmetric positive definite (a symmetric matrix is SPD
 * exactly when every pivot of its Cholesky factorization is positive; Golub and Van Loan, "Matrix
 * Computations", 4th ed., §4.2).
 */
public final class NotPositiveDefiniteException extends ArithmeticException {

    private static final long serialVersionUID = 1L;

    /** Elimination step (position in the pivot order) at which the factorization broke down. */
    private final int eliminationStep;
    /** Original index of the unknown whose pivot failed. */
    private final int unknown;
    /** The offending pivot value {@code a_kk − Σ l_kj²}. */
    private final double pivot;

    /**
     * @param eliminationStep position in the elimination order, {@code 0 ≤ step < n}
     * @param unknown original (unpermuted) index of the unknown
     * @param pivot the pivot value that was {@code ≤ 0} or NaN
     */
    public NotPositiveDefiniteException(int eliminationStep, int unknown, double pivot) {
        super("matrix is not positive definite: pivot " + pivot + " at elimination step " + eliminationStep
                + " (unknown " + unknown + ")");
        this.eliminationStep = eliminationStep;
        this.unknown = unknown;
        this.pivot = pivot;
    }

    /** @return the elimination step at which the pivot failed */
    public int eliminationStep() {
        return eliminationStep;
    }

    /** @return the original index of the unknown whose pivot failed */
    public int unknown() {
        return unknown;
    }

    /** @return the failed pivot value (≤ 0 or NaN) */
    public double pivot() {
        return pivot;
    }
}
