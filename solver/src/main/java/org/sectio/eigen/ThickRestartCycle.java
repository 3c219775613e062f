package org.sectio.eigen;

import java.util.Random;

/**
 * The thick-restart Lanczos iteration of K. Wu and H. Simon (SIAM J. Matrix Anal. Appl. 22 (2000)
 * 602–616) for the operator {@code OP = K⁻¹ M}, {@code K = A − σ M}, which is self-adjoint in the
 * M-inner product (T. Ericsson and A. Ruhe, Math. Comp. 35 (1980) 1251–1268), with full
 * reorthogonalization. The iteration works in the slots {@code [locked, locked + space]} of a shared
 * {@link MOrthogonalBasis}; the slots below {@code locked} hold converged or known eigenvectors that
 * every new vector, fresh ones included, is orthogonalized against as well (deflation by locking, Y. Saad,
 * <i>Numerical Methods for Large Eigenvalue Problems</i>, 2nd ed., SIAM 2011, §4.2), without entering the
 * projected matrix.
 *
 * <p>One step: {@code w = OP v_j}; Gram–Schmidt of w against the whole basis gives {@code α_j = ⟨v_j, w⟩}
 * and {@code β_j = ‖w‖_M}; {@code v_{j+1} = w / β_j}. After every step the projected matrix
 * ({@link ArrowheadTridiagonal}) is decomposed and a Ritz pair (θ, y) has the residual
 * {@code ‖OP x − θ x‖_M = |β_j y_j|} (its last component), which the caller's rule judges. When the
 * basis is full, the {@code keep} Ritz vectors of largest |θ| replace it, {@code v_{j+1}} follows them,
 * and the iteration goes on from the arrowhead. An invariant subspace ({@code β_j} lost to rounding)
 * continues from a fresh random vector, M-orthogonal to all slots in use.
 */
final class ThickRestartCycle {

    /** {@code β_j ≤ BREAKDOWN ‖OP v_j‖_M} means the Krylov space is invariant to working precision. */
    private static final double BREAKDOWN = 1e-12;

    /** Decides, after each step, whether the Ritz pairs are good enough. */
    interface StopRule {
        /**
         * @param values Ritz values by decreasing magnitude
         * @param estimates their residual estimates {@code |β y_last|}, same order
         * @return true to stop
         */
        boolean done(double[] values, double[] estimates);
    }

    /** What a cycle ended with; the Ritz vectors of {@code values} sit in slots {@code [locked, locked + wanted)}. */
    record Outcome(double[] values, double[] estimates, int restarts) {
    }

    private final MOrthogonalBasis basis;
    private final SymmetricFactorization shifted;
    private final IterationListener listener;
    private final Random random;
    private final double[] massTimes;
    private int applications;

    ThickRestartCycle(MOrthogonalBasis basis, SymmetricFactorization shifted, IterationListener listener,
            Random random, int n) {
        this.basis = basis;
        this.shifted = shifted;
        this.listener = listener;
        this.random = random;
        this.massTimes = new double[n];
    }

    /** @return operator applications so far, over all cycles */
    int applications() {
        return applications;
    }

    /** Fills slot {@code slot} with a random vector. */
    void randomStart(int slot) {
        basis.fillRandom(slot, random);
    }

    /**
     * Runs the iteration from the vector in slot {@code locked} (any non-zero vector; it is
     * orthogonalized and normalized here).
     *
     * @param locked slots below are converged vectors to deflate
     * @param space basis size of this cycle, {@code > wanted}; slots up to {@code locked + space} are used
     * @param wanted how many Ritz vectors to return, of largest |θ|
     * @param maxRestarts the most restarts before giving up
     * @param rule when to stop
     * @return the Ritz values of largest magnitude, their estimates, and the restarts made
     * @throws EigenSolverException if the rule is not met within {@code maxRestarts} restarts, with the
     *         applications, the restarts, the largest estimate and the tolerance
     */
    Outcome run(int locked, int space, int wanted, int maxRestarts, StopRule rule, double tolerance) {
        ArrowheadTridiagonal t = new ArrowheadTridiagonal(space);
        double[] h = new double[locked + space + 2];
        normalizeFresh(locked, false);
        int keep = Math.min(space - 1, wanted + Math.min(wanted, (space - wanted) / 2));
        int kept = 0;
        int restarts = 0;
        while (true) {
            ArrowheadTridiagonal.Ritz ritz = null;
            double beta = 0;
            for (int j = kept; j < space; j++) {
                int slot = locked + j;
                basis.multiplyMass(slot, massTimes);
                shifted.solve(massTimes, basis.vector(slot + 1));
                applications++;
                listener.operatorApplied(applications);
                double[] norms = basis.orthogonalize(slot + 1, slot + 1, h);
                t.set(j, j, h[slot]);
                beta = Math.sqrt(norms[1]);
                boolean breakdown = !(beta > BREAKDOWN * Math.sqrt(norms[0]));
                if (breakdown) {
                    beta = 0;
                }
                if (j + 1 >= wanted) {
                    ritz = t.decompose(j + 1);
                    double[] estimates = estimates(ritz, beta, j + 1);
                    if (rule.done(ritz.values(), estimates)) {
                        basis.combine(locked, j + 1, ritz.vectors(), wanted);
                        return new Outcome(java.util.Arrays.copyOf(ritz.values(), wanted),
                                java.util.Arrays.copyOf(estimates, wanted), restarts);
                    }
                }
                if (breakdown) {
                    normalizeFresh(slot + 1, true);
                } else {
                    basis.scale(slot + 1, 1 / beta);
                }
                if (j + 1 < space) {
                    t.set(j, j + 1, beta);
                }
            }
            if (restarts >= maxRestarts) {
                throw notConverged(ritz, beta, wanted, restarts, space, tolerance);
            }
            basis.combine(locked, space, ritz.vectors(), keep);
            basis.swap(locked + keep, locked + space);
            t.clear();
            for (int i = 0; i < keep; i++) {
                t.set(i, i, ritz.values()[i]);
                t.set(i, keep, beta * ritz.vectors()[space - 1][i]);
            }
            kept = keep;
            restarts++;
        }
    }

    private static double[] estimates(ArrowheadTridiagonal.Ritz ritz, double beta, int size) {
        double[] estimates = new double[size];
        for (int i = 0; i < size; i++) {
            estimates[i] = Math.abs(beta * ritz.vectors()[size - 1][i]);
        }
        return estimates;
    }

    /**
     * Orthogonalizes slot {@code slot} against all slots below it and normalizes it, drawing random
     * vectors (first one at once if {@code redraw}) until one is independent of them.
     */
    private void normalizeFresh(int slot, boolean redraw) {
        double[] h = new double[slot + 1];
        for (int attempt = 0; attempt < 3; attempt++) {
            if (redraw || attempt > 0) {
                basis.fillRandom(slot, random);
            }
            double[] norms = basis.orthogonalize(slot, slot, h);
            if (norms[1] > BREAKDOWN * BREAKDOWN * norms[0] && norms[1] > 0) {
                basis.scale(slot, 1 / Math.sqrt(norms[1]));
                return;
            }
        }
        throw new EigenSolverException("no vector independent of the " + slot + " basis vectors could be drawn after "
                + applications + " operator applications; the pencil's order is too small for this basis", slot, 0,
                0, 0);
    }

    private EigenSolverException notConverged(ArrowheadTridiagonal.Ritz ritz, double beta, int wanted, int restarts,
            int space, double tolerance) {
        double[] estimates = estimates(ritz, beta, space);
        int converged = 0;
        double worst = 0;
        for (int i = 0; i < wanted; i++) {
            double relative = estimates[i] / Math.abs(ritz.values()[i]);
            if (relative <= tolerance) {
                converged++;
            }
            worst = Math.max(worst, relative);
        }
        return new EigenSolverException("thick-restart Lanczos did not converge: " + converged + " of " + wanted
                + " Ritz pairs within relative tolerance " + tolerance + " after " + restarts + " restarts and "
                + applications + " operator applications with " + space + " Lanczos vectors; the largest relative"
                + " residual estimate is " + worst + "; raise maxRestarts or lanczosVectors, loosen the tolerance,"
                + " or move the shift closer to the wanted eigenvalues", converged, restarts, tolerance, 0);
    }
}
