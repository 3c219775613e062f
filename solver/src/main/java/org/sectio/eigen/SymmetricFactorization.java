package org.sectio.eigen;

/**
 * A factorization {@code P A Pᵀ = L Lᵀ} of a sparse symmetric positive definite matrix {@code A},
 * kept so that many right-hand sides can be solved against it (the shift-invert step of a Krylov
 * eigensolver solves one system per iteration with the same factor).
 *
 * <p>Implementations are immutable after construction and {@link #solve} may be called from
 * several threads at once.
 */
public interface SymmetricFactorization {

    /** @return the order {@code n} of the factored matrix */
    int size();

    /**
     * Solves {@code A x = b}.
     *
     * @param rightHandSide {@code b}, length {@link #size()}; not modified
     * @param solution receives {@code x}, length {@link #size()}; must not be the same array as {@code b}
     * @throws IllegalArgumentException if a length differs from {@link #size()}
     */
    void solve(double[] rightHandSide, double[] solution);

    /** @return the number of stored entries of the factor {@code L} (diagonal included), a measure of fill */
    long factorNonZeros();
}
