package org.sectio.eigen;

import java.util.Arrays;
import java.util.Objects;
import java.util.Random;
import java.util.stream.IntStream;
import org.ejml.data.DMatrixSparseCSC;

/**
 * The lowest eigenpairs of a generalized symmetric pencil {@code A x = λ M x} by the thick-restart
 * Lanczos method of K. Wu and H. Simon, "Thick-restart Lanczos method for large symmetric eigenvalue
 * problems", SIAM J. Matrix Anal. Appl. 22(2) (2000) 602–616, applied to the shift-invert operator
 * {@code OP = (A − σM)⁻¹ M} in the M-inner product (T. Ericsson and A. Ruhe, "The spectral
 * transformation Lanczos method", Math. Comp. 35 (1980) 1251–1268). Pure Java, no global state: solves
 * may run concurrently.
 *
 * <p>An eigenvalue {@code ν = 1/(λ − σ)} of OP of large magnitude belongs to a λ close to σ; with σ below
 * the wanted part of the spectrum ({@code A − σM} positive definite) the {@code count} largest ν give the
 * lowest λ. {@code A} is sparse symmetric with both triangles stored and {@code M} is diagonal and
 * positive; λ has the units of {@code A} over {@code M} (for a waveguide cross-section the squared cutoff
 * wavenumber, rad²/m², with lengths in metres).
 *
 * <p>Every Lanczos vector is M-orthogonalized against the whole basis by classical Gram–Schmidt twice,
 * in blocked kernels over row chunks on the common fork-join pool whose partial sums are added in a fixed
 * order, so a given input gives the same output bit for bit whatever the thread count. The basis holds
 * {@code lanczosVectors} vectors; when full, the Ritz vectors of the {@code count + min(count, (m −
 * count)/2)} largest |ν| are kept and the iteration restarts from them (thick restart). A Ritz pair (ν, y)
 * is accepted when its residual estimate {@code |β y_last|} is at most {@code relativeTolerance · |ν|},
 * ARPACK's criterion; the test runs after every operator application, so the iteration stops as soon as
 * the count largest have converged.
 *
 * <p>A single Krylov vector sees a second copy of an exactly double eigenvalue only through rounding. So
 * after convergence a check runs: Lanczos from a fresh random vector, M-orthogonal to the converged
 * vectors at every step, until its top Ritz value either converges (relative residual estimate
 * {@value #CHECK_TOLERANCE}) below the smallest wanted ν, or rises above it: then a pair M-orthogonal to
 * all found ones lies beyond the smallest wanted ν, it is converged to the full tolerance, replaces that
 * smallest one, and the check runs again. This is a Krylov argument, not an inertia count; a multiplet
 * cut by the {@code count} boundary still comes back partly. Measured: on the 2-D Dirichlet Laplacian
 * (40², 41², 60² lattices, 4 to 12 pairs) and on TM pencils of a disc no pair was missed; on the 30² Neumann
 * Laplacian with 6 pairs one copy of the (0,2) doublet was, and the check recovered it. The check costs
 * about 7 to 12 operator applications.
 *
 * <p>Known eigenvectors can be deflated ({@link #solve(DMatrixSparseCSC, double[], double,
 * SymmetricFactorization, IterationListener, double[][])}), e.g. the constant null vector of a Neumann
 * Laplacian. They are M-orthonormalized into the first basis slots and locked there: the start vector,
 * every Lanczos vector, every restart's fresh vector and the check's vectors are M-orthogonalized against
 * them by the same Gram–Schmidt, so the iteration runs on the M-orthogonal complement {@code Z^⊥} of their
 * span Z. Since OP is M-self-adjoint and Z is OP-invariant, {@code Z^⊥} is OP-invariant too and the
 * spectrum found there is that of OP minus the eigenvalues of Z; this is deflation by explicit
 * orthogonalization against known eigenvectors (Y. Saad, <i>Numerical Methods for Large Eigenvalue
 * Problems</i>, 2nd ed., SIAM 2011, §4.2, "deflation techniques", locking of converged vectors). The
 * deflated vectors are not returned and no pair is spent on them.
 *
 * <p>Returned residuals are recomputed from {@code A} and {@code M}, as in {@link ShiftInvertLanczos},
 * and a pair with a normwise backward error far above the tolerance is refused.
 */
public final class ThickRestartLanczos {

    /** Accepted backward error, in units of the requested tolerance (see {@link #solve}). */
    private static final double BACKWARD_ERROR_FACTOR = 1e3;
    /** Relative residual estimate at which the check's top Ritz value counts as converged. */
    static final double CHECK_TOLERANCE = 1e-3;
    /** Relative margin by which the check's Ritz value must exceed the smallest wanted one to count as missed. */
    private static final double MISS_MARGIN = 1e-8;
    /** Smallest basis of the check, where the order allows it. */
    private static final int CHECK_SPACE = 12;

    private final LanczosSettings settings;

    /** A solve with its counts: thick restarts (check included), missed-pair reruns, applications spent on checks. */
    record Solution(Eigenpairs pairs, int restarts, int misses, int checkApplications) {
    }

    /**
     * @param settings how many pairs, basis size, tolerance, restart limit and seed
     * @throws NullPointerException if settings is null
     */
    public ThickRestartLanczos(LanczosSettings settings) {
        this.settings = Objects.requireNonNull(settings, "settings");
    }

    /** @return the settings of this solver */
    public LanczosSettings settings() {
        return settings;
    }

    /**
     * Same as {@link #solve(DMatrixSparseCSC, double[], double, SymmetricFactorization, IterationListener)}
     * without progress reports.
     *
     * @return the pairs, as there
     * @throws IllegalArgumentException as there
     * @throws EigenSolverException as there
     */
    public Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted) {
        return solve(a, m, shift, shifted, IterationListener.NONE);
    }

    /**
     * Finds the {@code count} eigenpairs of {@code A x = λ M x} with λ closest to the shift (the lowest,
     * for a shift below the spectrum).
     *
     * @param a the symmetric matrix {@code A}, n × n, both triangles stored; not modified
     * @param m the positive diagonal of {@code M}, length n; not modified
     * @param shift σ, below the lowest wanted eigenvalue (below the lowest eigenvalue of all, so that
     *        {@code A − σM} is positive definite)
     * @param shifted a factorization of {@code K = A − σ M} for this very σ
     * @param listener told the number of operator applications after each one
     * @return the pairs in ascending order of λ, {@code M}-orthonormal vectors, relative residuals
     *         {@code ‖A x − λ M x‖₂ / (‖A x‖₂ + |λ| ‖M x‖₂)}, and the number of solves with {@code K}
     * @throws IllegalArgumentException if sizes disagree, {@code M} is not positive, or {@code count ≥ n}
     * @throws EigenSolverException if the iteration does not converge within the restart limit (its
     *         message carries the applications, restarts, largest residual estimate and tolerance; its
     *         {@code arpackCode} is 0), or a returned pair has a normwise backward error
     *         {@code ‖A x − λ M x‖₂ / ((‖A‖₁ + |λ| ‖M‖₁) ‖x‖₂)} above
     *         {@code 1000 · tol · (1 + |σ| ‖M‖₁ / ‖A‖₁)} (typically a factorization of another matrix)
     */
    public Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener) {
        return solveCounted(a, m, shift, shifted, listener).pairs();
    }

    /**
     * As {@link #solve(DMatrixSparseCSC, double[], double, SymmetricFactorization, IterationListener)}, on
     * the M-orthogonal complement of known eigenvectors: the {@code count} pairs closest to the shift
     * among those M-orthogonal to {@code deflated}. The deflated vectors need not be normalized or
     * M-orthogonal to each other (they are M-orthonormalized by Gram–Schmidt in a copy); their span must
     * be invariant, i.e. each an eigenvector {@code A z = λ M z} or a combination within one eigenspace.
     *
     * @param deflated d known eigenvectors, each of length n; not modified; none returned
     * @return {@code count} pairs as there, every vector M-orthogonal to the deflated ones
     * @throws IllegalArgumentException as there, or if {@code count ≥ n − d}, a deflated vector has the
     *         wrong length, is not finite or no eigenvector (normwise backward error of its Rayleigh
     *         quotient {@code zᵀAz / zᵀMz} above the limit stated there), or lies in the span of the
     *         previous ones (less than 1e-8 of its M-norm left by Gram–Schmidt)
     * @throws EigenSolverException as there
     */
    public Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener, double[][] deflated) {
        return solveCounted(a, m, shift, shifted, listener, deflated).pairs();
    }

    /**
     * As {@link #solve(DMatrixSparseCSC, double[], double, SymmetricFactorization, IterationListener,
     * double[][])}, starting the first cycle from a given vector instead of the seeded random one, e.g.
     * the sum of the eigenvectors of a nearby pencil of the same pattern (a parameter sweep). Any start
     * that is not in the span of the deflated vectors gives the same pairs to the tolerance; a start
     * rich in the wanted eigenvectors needs fewer operator applications. The missed-pair check still
     * starts from the seeded random vector.
     *
     * @param start the first Lanczos vector, length n, finite; not modified; null for the seeded random one
     * @return the pairs, as there
     * @throws IllegalArgumentException as there, or if {@code start} has the wrong length or is not finite
     * @throws EigenSolverException as there
     */
    public Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener, double[][] deflated, double[] start) {
        return solveCounted(a, m, shift, shifted, listener, deflated, start).pairs();
    }

    /** {@link #solve} with the counts of the iteration, for tests and measurements. */
    Solution solveCounted(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener) {
        return solveCounted(a, m, shift, shifted, listener, new double[0][]);
    }

    /** {@link #solve} with deflated vectors and the counts of the iteration. */
    Solution solveCounted(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener, double[][] deflated) {
        return solveCounted(a, m, shift, shifted, listener, deflated, null);
    }

    /** {@link #solve} with deflated vectors, a start vector (or null) and the counts of the iteration. */
    Solution solveCounted(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener, double[][] deflated, double[] start) {
        int n = PencilResiduals.checkedOrder(a, m, shifted);
        int d = deflated.length;
        int count = settings.count();
        if (count >= n - d) {
            throw new IllegalArgumentException("count = " + count + " pairs asked of a pencil of order " + n
                    + " with " + d + " deflated vectors; ask for at most n - d - 1 = " + (n - d - 1)
                    + ", or use a dense solver for all of them");
        }
        int space = Math.min(settings.lanczosVectors(), n - d);
        int checkSpace = Math.min(Math.max(space - count, CHECK_SPACE), n - d - count);
        MOrthogonalBasis basis = new MOrthogonalBasis(m, d + Math.max(space, count + checkSpace) + 1);
        lockDeflated(a, m, shift, deflated, basis);
        ThickRestartCycle cycle = new ThickRestartCycle(basis, shifted, Objects.requireNonNull(listener, "listener"),
                new Random(settings.seed()), n);
        double tolerance = settings.relativeTolerance();
        if (start == null) {
            cycle.randomStart(d);
        } else {
            requireStart(start, n);
            System.arraycopy(start, 0, basis.vector(d), 0, n);
        }
        ThickRestartCycle.Outcome found = cycle.run(d, space, count, settings.maxRestarts(),
                (theta, estimates) -> allConverged(theta, estimates, 0, count, tolerance), tolerance);
        int restarts = found.restarts();
        double[] values = found.values();
        int misses = 0;
        int checkApplications = 0;
        while (true) {
            double threshold = Math.abs(values[count - 1]) * (1 + MISS_MARGIN);
            int before = cycle.applications();
            cycle.randomStart(d + count);
            ThickRestartCycle.Outcome check = cycle.run(d + count, checkSpace, 1, settings.maxRestarts(),
                    (theta, estimates) -> Math.abs(theta[0]) > threshold
                            ? allConverged(theta, estimates, 0, 1, tolerance)
                            : estimates[0] <= CHECK_TOLERANCE * Math.abs(theta[0]), tolerance);
            restarts += check.restarts();
            checkApplications += cycle.applications() - before;
            if (!(Math.abs(check.values()[0]) > threshold)) {
                break;
            }
            // a converged pair M-orthogonal to all found ones lies beyond the smallest wanted |θ|: it replaces it
            misses++;
            basis.swap(d + count - 1, d + count);
            values[count - 1] = check.values()[0];
            sortByMagnitude(values, basis, d);
        }
        Eigenpairs pairs = checkedPairs(a, m, shift, values, basis, d, cycle.applications(), restarts);
        return new Solution(pairs, restarts, misses, checkApplications);
    }

    private static void requireStart(double[] start, int n) {
        if (start.length != n) {
            throw new IllegalArgumentException("start vector has length " + start.length + " for a pencil of order " + n);
        }
        for (double v : start) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("start vector holds a non-finite value " + v);
            }
        }
    }

    private static boolean allConverged(double[] theta, double[] estimates, int from, int count, double tolerance) {
        for (int i = from; i < count; i++) {
            if (!(estimates[i] <= tolerance * Math.abs(theta[i]))) {
                return false;
            }
        }
        return true;
    }

    /** Insertion sort of the values and their basis slots {@code from + i} by decreasing magnitude. */
    private static void sortByMagnitude(double[] values, MOrthogonalBasis basis, int from) {
        for (int i = 1; i < values.length; i++) {
            for (int j = i; j > 0 && Math.abs(values[j]) > Math.abs(values[j - 1]); j--) {
                double t = values[j];
                values[j] = values[j - 1];
                values[j - 1] = t;
                basis.swap(from + j, from + j - 1);
            }
        }
    }

    /**
     * Copies the deflated vectors into slots {@code [0, d)}, M-orthonormalizes them and checks that each
     * is an eigenvector: backward error of {@code (ρ, z)}, {@code ρ = zᵀAz / zᵀMz}, within the limit of
     * the returned pairs.
     */
    private void lockDeflated(DMatrixSparseCSC a, double[] m, double shift, double[][] deflated,
            MOrthogonalBasis basis) {
        int n = m.length;
        double limit = backwardErrorLimit(a, m, shift);
        double aNorm = PencilResiduals.norm1(a);
        double mNorm = PencilResiduals.norm1(m);
        double[] h = new double[deflated.length + 1];
        for (int k = 0; k < deflated.length; k++) {
            double[] z = deflated[k];
            if (z.length != n) {
                throw new IllegalArgumentException("deflated vector " + k + " has length " + z.length
                        + " for a pencil of order " + n);
            }
            double rho = rayleighQuotient(a, m, z);
            double[] error = PencilResiduals.residualParts(a, m, rho, z);
            double backward = error[1] / ((aNorm + Math.abs(rho) * mNorm) * error[2]);
            if (!(backward <= limit)) {
                throw new IllegalArgumentException("deflated vector " + k + " is no finite eigenvector of the pencil:"
                        + " its Rayleigh quotient " + rho + " has backward error " + backward + " above " + limit);
            }
            System.arraycopy(z, 0, basis.vector(k), 0, n);
            double[] norms = basis.orthogonalize(k, k, h);
            if (!(norms[1] > 1e-16 * norms[0])) {
                throw new IllegalArgumentException("deflated vector " + k + " lies in the span of the previous "
                        + k + ": squared M-norm " + norms[0] + " before and " + norms[1] + " after orthogonalization");
            }
            basis.scale(k, 1 / Math.sqrt(norms[1]));
        }
    }

    private static double rayleighQuotient(DMatrixSparseCSC a, double[] m, double[] z) {
        double[] az = new double[z.length];
        PencilResiduals.multiply(a, z, az);
        double numerator = 0;
        double denominator = 0;
        for (int i = 0; i < z.length; i++) {
            numerator += z[i] * az[i];
            denominator += z[i] * m[i] * z[i];
        }
        return numerator / denominator;
    }

    private double backwardErrorLimit(DMatrixSparseCSC a, double[] m, double shift) {
        return BACKWARD_ERROR_FACTOR * settings.relativeTolerance()
                * (1 + Math.abs(shift) * PencilResiduals.norm1(m) / PencilResiduals.norm1(a));
    }

    private Eigenpairs checkedPairs(DMatrixSparseCSC a, double[] m, double shift, double[] theta,
            MOrthogonalBasis basis, int from, int applications, int restarts) {
        int count = theta.length;
        Integer[] order = new Integer[count];
        double[] lambda = new double[count];
        for (int k = 0; k < count; k++) {
            order[k] = k;
            lambda[k] = shift + 1 / theta[k];
        }
        Arrays.sort(order, (i, j) -> Double.compare(lambda[i], lambda[j]));
        double[] values = new double[count];
        double[][] vectors = new double[count][];
        for (int k = 0; k < count; k++) {
            values[k] = lambda[order[k]];
            vectors[k] = basis.vector(from + order[k]);
        }
        double tolerance = settings.relativeTolerance();
        double aNorm = PencilResiduals.norm1(a);
        double mNorm = PencilResiduals.norm1(m);
        double limit = backwardErrorLimit(a, m, shift);
        double[][] errors = new double[count][];
        IntStream.range(0, count).parallel().forEach(k -> errors[k] = PencilResiduals.residualParts(a, m, values[k], vectors[k]));
        double[] relative = new double[count];
        for (int k = 0; k < count; k++) {
            double backward = errors[k][1] / ((aNorm + Math.abs(values[k]) * mNorm) * errors[k][2]);
            if (!(backward <= limit)) {
                throw new EigenSolverException("eigenpair " + k + " (lambda = " + values[k] + ") has backward error "
                        + backward + " above " + limit + " although thick-restart Lanczos converged in " + restarts
                        + " restarts and " + applications + " operator applications to tolerance " + tolerance
                        + "; check that the factorization is of A - sigma M for sigma = " + shift, count, restarts,
                        tolerance, 0);
            }
            relative[k] = errors[k][0];
        }
        return new Eigenpairs(values, vectors, relative, applications);
    }


    }
