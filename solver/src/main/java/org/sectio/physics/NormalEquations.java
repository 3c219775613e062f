package org.sectio.physics;

import java.util.Arrays;

/**
 * The normal equations G c = b of a small weighted least-squares fit (at most 6 unknowns), with a
 * conditioning test before the solve.
 *
 * <p>G is equilibrated, S = D G D with D = diag(G_aa^(−1/2)) (Jacobi scaling, so the test does not
 * depend on how the basis is scaled), factored S = L Lᵀ by Cholesky, and its condition number
 * estimated as κ_F = ‖S‖_F ‖S⁻¹‖_F, which bounds the 2-norm condition number κ₂ from above and exceeds
 * it by at most the number of unknowns (Golub &amp; Van Loan, Matrix Computations, 4th ed., §2.6 and
 * §4.2, from memory). Samples that are too few or lie on too few lines for the basis make S singular or
 * κ_F huge; {@link #solve()} then refuses, and the caller widens its fit.
 *
 * <p>Not thread-safe; allocates nothing after construction.
 */
final class NormalEquations {

    /**
     * The largest accepted κ_F of the equilibrated system. Well-spread samples give 1e1 to 4.3e3 (measured
     * over every fit of WR-90 TE10 and the circular modes of the tests); fits that lean on one sample of
     * almost no weight next to two aligned columns gave 1e5 to 1e6, and aligned samples a singular system.
     */
    static final double CONDITION_LIMIT = 2e4;

    private static final int MAX_UNKNOWNS = 6;

    private final double[] gram = new double[MAX_UNKNOWNS * MAX_UNKNOWNS];
    private final double[] rhs = new double[MAX_UNKNOWNS];
    private final double[] scale = new double[MAX_UNKNOWNS];
    private final double[] solution = new double[MAX_UNKNOWNS];
    private final double[] inverse = new double[MAX_UNKNOWNS * MAX_UNKNOWNS];
    private int count;
    private double condition;

    /**
     * Empties the system.
     *
     * @param unknowns the number of coefficients, 1 to 6
     */
    void clear(int unknowns) {
        count = unknowns;
        Arrays.fill(gram, 0, count * count, 0.0);
        Arrays.fill(rhs, 0, count, 0.0);
    }

    /** @return the number of coefficients */
    int unknowns() {
        return count;
    }

    /**
     * Adds one weighted row: G += w φ φᵀ, b += w φ v.
     *
     * @param row the basis values φ of the row, at least {@link #unknowns()} long
     * @param weight w ≥ 0
     * @param value v, the datum of the row
     */
    void addRow(double[] row, double weight, double value) {
        for (int a = 0; a < count; a++) {
            double wa = weight * row[a];
            rhs[a] += wa * value;
            for (int b = 0; b <= a; b++) {
                gram[a * count + b] += wa * row[b];
            }
        }
    }

    /** @return κ_F of the last {@link #solve()} (infinite if the system was singular) */
    double condition() {
        return condition;
    }

    /**
     * Solves in place if the system is well conditioned (κ_F ≤ {@link #CONDITION_LIMIT}).
     *
     * @return whether it was solved; the coefficients are then {@link #coefficient(int)}
     */
    boolean solve() {
        condition = Double.POSITIVE_INFINITY;
        double frobenius = 0;
        for (int a = 0; a < count; a++) {
            double d = gram[a * count + a];
            if (!(d > 0) || !Double.isFinite(d)) {
                return false;
            }
            scale[a] = 1 / Math.sqrt(d);
        }
        for (int a = 0; a < count; a++) {
            for (int b = 0; b <= a; b++) {
                double s = gram[a * count + b] * scale[a] * scale[b];
                gram[a * count + b] = s;
                frobenius += (a == b ? 1 : 2) * s * s;
            }
        }
        if (!factor()) {
            return false;
        }
        double inverseFrobenius = invert();
        condition = Math.sqrt(frobenius * inverseFrobenius);
        if (!(condition <= CONDITION_LIMIT)) {
            return false;
        }
        for (int a = 0; a < count; a++) { // c = D S⁻¹ D b
            double sum = 0;
            for (int b = 0; b < count; b++) {
                sum += inverse[a * count + b] * scale[b] * rhs[b];
            }
            solution[a] = scale[a] * sum;
        }
        return true;
    }

    /**
     * @param a the coefficient index
     * @return coefficient a of the last successful {@link #solve()}
     */
    double coefficient(int a) {
        return solution[a];
    }

    /** Cholesky of the scaled lower triangle, in place; false if a pivot is not positive. */
    private boolean factor() {
        for (int a = 0; a < count; a++) {
            for (int b = 0; b <= a; b++) {
                double sum = gram[a * count + b];
                for (int c = 0; c < b; c++) {
                    sum -= gram[a * count + c] * gram[b * count + c];
                }
                if (a == b) {
                    if (!(sum > 1e-14)) {
                        return false;
                    }
                    gram[a * count + a] = Math.sqrt(sum);
                } else {
                    gram[a * count + b] = sum / gram[b * count + b];
                }
            }
        }
        return true;
    }

    /** Fills {@code inverse} with S⁻¹ from the factor (column by column); returns ‖S⁻¹‖_F². */
    private double invert() {
        double sum2 = 0;
        for (int col = 0; col < count; col++) {
            for (int a = 0; a < count; a++) { // forward: L y = e_col
                double sum = a == col ? 1 : 0;
                for (int c = 0; c < a; c++) {
                    sum -= gram[a * count + c] * inverse[c * count + col];
                }
                inverse[a * count + col] = sum / gram[a * count + a];
            }
            for (int a = count - 1; a >= 0; a--) { // backward: Lᵀ x = y
                double sum = inverse[a * count + col];
                for (int c = a + 1; c < count; c++) {
                    sum -= gram[c * count + a] * inverse[c * count + col];
                }
                inverse[a * count + col] = sum / gram[a * count + a];
            }
            for (int a = 0; a < count; a++) {
                sum2 += inverse[a * count + col] * inverse[a * count + col];
            }
        }
        return sum2;
    }
}
