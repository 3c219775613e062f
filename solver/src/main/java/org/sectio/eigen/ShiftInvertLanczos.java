package org.sectio.eigen;

import dev.ludovic.netlib.arpack.ARPACK;
import dev.ludovic.netlib.arpack.JavaARPACK;
import java.util.Arrays;
import java.util.Random;
import org.ejml.data.DMatrixSparseCSC;
import org.netlib.util.doubleW;
import org.netlib.util.intW;

/**
 * The lowest eigenpairs of a generalized symmetric pencil {@code A x = λ M x} by implicitly restarted
 * Lanczos in shift-invert mode: ARPACK's {@code dsaupd}/{@code dseupd} in mode 3 (generalized,
 * {@code bmat = 'G'}, {@code which = 'LM'}) with {@code OP = (A − σ M)⁻¹ M} and {@code B = M}, as in
 * R. B. Lehoucq, D. C. Sorensen and C. Yang, <i>ARPACK Users' Guide</i>, SIAM 1998, §3.2 (shift-invert
 * spectral transformation) and §4.2 (the mode-3 reverse communication of {@code dsaupd}).
 *
 * <p>The eigenvalues {@code ν = 1/(λ − σ)} of {@code OP} that are largest in magnitude belong to the
 * {@code λ} closest to σ; with σ below the whole wanted part of the spectrum (so that {@code A − σM} is
 * positive definite) these are the lowest {@code λ}. {@code A} is sparse symmetric with both triangles
 * stored and {@code M} is diagonal and positive; the units of λ are those of {@code A} over {@code M}
 * (for a waveguide cross-section, the squared cutoff wavenumber in rad²/m² if lengths are in metres).
 *
 * <p>The starting vector is drawn from a {@link Random} with the settings' seed, so the same input gives
 * the same output bit for bit. A multiple eigenvalue (a doublet of a symmetric cross-section) is
 * returned once per multiplicity, with {@code M}-orthonormal vectors, as ARPACK's restarts let rounding
 * errors bring in the missing directions. This is what Krylov methods deliver in practice, not a proof:
 * no inertia count confirms that nothing below the last returned value was skipped, and a multiplet cut
 * by the {@code count} boundary comes back partly; ask for a few pairs more than needed when that
 * matters. The returned residuals are recomputed here from {@code A} and {@code M}, not taken from
 * ARPACK's estimates. For an eigenvalue at zero (a Neumann pencil's constant mode) the relative residual
 * {@code ‖A x − λ M x‖₂ / (‖A x‖₂ + |λ| ‖M x‖₂)} is of order one whatever the accuracy, since numerator
 * and denominator are both rounding noise; such pairs are accepted on their normwise backward error.
 *
 * <p>The pure-Java ARPACK keeps its Fortran {@code SAVE} state in static fields, so solves are
 * serialized on a class-wide lock: concurrent callers wait for each other, and no other code in the
 * process may drive the same ARPACK routines at the same time.
 */
public final class ShiftInvertLanczos {

    private static final Object ARPACK_LOCK = new Object();

    /** Accepted backward error, in units of the requested tolerance (see {@link #solve}). */
    private static final double BACKWARD_ERROR_FACTOR = 1e3;

    private final LanczosSettings settings;

    /**
     * @param settings how many pairs, basis size, tolerance, restart limit and seed
     */
    public ShiftInvertLanczos(LanczosSettings settings) {
        this.settings = java.util.Objects.requireNonNull(settings, "settings");
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
     * Finds the {@code count} eigenpairs of {@code A x = λ M x} with the lowest λ above the shift.
     *
     * @param a the symmetric matrix {@code A}, n × n, both triangles stored; not modified
     * @param m the positive diagonal of {@code M}, length n; not modified
     * @param shift σ, below the lowest wanted eigenvalue (below the lowest eigenvalue of all, so that
     *        {@code A − σM} is positive definite)
     * @param shifted a factorization of {@code K = A − σ M} for this very σ
     * @param listener told the number of operator applications after each one
     * @return the pairs in ascending order of λ, {@code M}-orthonormal vectors, relative residuals
     *         {@code ‖A x − λ M x‖₂ / (‖A x‖₂ + |λ| ‖M x‖₂)}, and the number of solves with {@code K}
     * @throws IllegalArgumentException if sizes disagree, {@code M} is not positive, or
     *         {@code count ≥ n}
     * @throws EigenSolverException if ARPACK does not converge within the restart limit, reports an
     *         error code, or a returned pair has a normwise backward error
     *         {@code ‖A x − λ M x‖₂ / ((‖A‖₁ + |λ| ‖M‖₁) ‖x‖₂)} above
     *         {@code 1000 · tol · (1 + |σ| ‖M‖₁ / ‖A‖₁)} (typically a factorization of another matrix)
     */
    public Eigenpairs solve(DMatrixSparseCSC a, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener) {
        int n = PencilResiduals.checkedOrder(a, m, shifted);
        int count = settings.count();
        if (count >= n) {
            throw new IllegalArgumentException("count = " + count + " pairs asked of a pencil of order " + n
                    + "; ARPACK finds at most n - 1, use a dense solver for all of them");
        }
        int ncv = Math.min(settings.lanczosVectors(), n);
        ArpackRun run;
        synchronized (ARPACK_LOCK) {
            run = iterate(n, ncv, m, shift, shifted, listener);
        }
        return checkedPairs(a, m, shift, run);
    }

    private record ArpackRun(double[] values, double[][] vectors, int operatorApplications, int restarts) {
    }

    private ArpackRun iterate(int n, int ncv, double[] m, double shift, SymmetricFactorization shifted,
            IterationListener listener) {
        ARPACK arpack = JavaARPACK.getInstance();
        int nev = settings.count();
        double tolerance = settings.relativeTolerance();
        intW ido = new intW(0);
        intW info = new intW(1);
        doubleW tol = new doubleW(tolerance);
        double[] resid = startingVector(n, settings.seed());
        double[] v = new double[n * ncv];
        int[] iparam = new int[11];
        iparam[0] = 1;
        iparam[2] = settings.maxRestarts();
        iparam[6] = 3;
        int[] ipntr = new int[11];
        double[] workd = new double[3 * n];
        int lworkl = ncv * (ncv + 8);
        double[] workl = new double[lworkl];
        double[] input = new double[n];
        double[] output = new double[n];
        int applications = 0;
        while (true) {
            arpack.dsaupd(ido, "G", n, "LM", nev, tol, resid, ncv, v, n, iparam, ipntr, workd, workl, lworkl, info);
            if (ido.val == -1 || ido.val == 1) {
                int from = ipntr[ido.val == -1 ? 0 : 2] - 1;
                for (int i = 0; i < n; i++) {
                    input[i] = ido.val == -1 ? m[i] * workd[from + i] : workd[from + i];
                }
                shifted.solve(input, output);
                System.arraycopy(output, 0, workd, ipntr[1] - 1, n);
                applications++;
                listener.operatorApplied(applications);
            } else if (ido.val == 2) {
                int from = ipntr[0] - 1;
                int to = ipntr[1] - 1;
                for (int i = 0; i < n; i++) {
                    workd[to + i] = m[i] * workd[from + i];
                }
            } else {
                break;
            }
        }
        // iparam(3) counts Lanczos passes: the first plus one per implicit restart, so on info = 1 it is
        // mxiter + 1 (the pass that found the limit exceeded)
        int restarts = Math.max(iparam[2] - 1, 0);
        int converged = iparam[4];
        if (info.val != 0) {
            throw new EigenSolverException(dsaupdMessage(info.val, converged, restarts, tolerance, ncv),
                    converged, restarts, tolerance, info.val);
        }
        boolean[] select = new boolean[ncv];
        double[] d = new double[nev];
        double[] z = new double[n * nev];
        intW ierr = new intW(0);
        arpack.dseupd(true, "A", select, d, z, n, shift, "G", n, "LM", new intW(nev), tol.val, resid, ncv, v, n,
                iparam, ipntr, workd, workl, lworkl, ierr);
        if (ierr.val != 0) {
            throw new EigenSolverException("ARPACK dseupd failed with ierr = " + ierr.val + " after " + restarts
                    + " restarts (" + converged + " of " + nev + " pairs converged to tolerance " + tolerance
                    + "); see the ARPACK Users' Guide for the code, and check the pencil is symmetric",
                    converged, restarts, tolerance, ierr.val);
        }
        return sortedRun(n, nev, d, z, applications, restarts);
    }

    private static ArpackRun sortedRun(int n, int nev, double[] d, double[] z, int applications, int restarts) {
        Integer[] order = new Integer[nev];
        for (int k = 0; k < nev; k++) {
            order[k] = k;
        }
        Arrays.sort(order, (i, j) -> Double.compare(d[i], d[j]));
        double[] values = new double[nev];
        double[][] vectors = new double[nev][];
        for (int k = 0; k < nev; k++) {
            values[k] = d[order[k]];
            vectors[k] = Arrays.copyOfRange(z, order[k] * n, (order[k] + 1) * n);
        }
        return new ArpackRun(values, vectors, applications, restarts);
    }

    private Eigenpairs checkedPairs(DMatrixSparseCSC a, double[] m, double shift, ArpackRun run) {
        double tolerance = settings.relativeTolerance();
        double aNorm = PencilResiduals.norm1(a);
        double mNorm = PencilResiduals.norm1(m);
        double limit = BACKWARD_ERROR_FACTOR * tolerance * (1 + Math.abs(shift) * mNorm / aNorm);
        double[] work = new double[m.length];
        double[] residuals = new double[run.values().length];
        for (int k = 0; k < residuals.length; k++) {
            double lambda = run.values()[k];
            double[] x = run.vectors()[k];
            double backward = PencilResiduals.backwardError(a, aNorm, m, mNorm, lambda, x, work);
            if (!(backward <= limit)) {
                throw new EigenSolverException("eigenpair " + k + " (lambda = " + lambda + ") has backward error "
                        + backward + " above " + limit + " although ARPACK converged in " + run.restarts()
                        + " restarts to tolerance " + tolerance + "; check that the factorization is of A - sigma M"
                        + " for sigma = " + shift, residuals.length, run.restarts(), tolerance, 0);
            }
            residuals[k] = PencilResiduals.relativeResidual(a, m, lambda, x, work);
        }
        return new Eigenpairs(run.values(), run.vectors(), residuals, run.operatorApplications());
    }

    private static String dsaupdMessage(int info, int converged, int restarts, double tolerance, int ncv) {
        String prefix = "ARPACK dsaupd stopped with info = " + info + ": " + converged + " pairs converged after "
                + restarts + " restarts to relative tolerance " + tolerance + " with " + ncv + " Lanczos vectors; ";
        return switch (info) {
            case 1 -> prefix + "raise maxRestarts or lanczosVectors, loosen the tolerance, or move the shift closer"
                    + " to the wanted eigenvalues";
            case 3 -> prefix + "no shifts could be applied during a restart; raise lanczosVectors";
            case -9999 -> prefix + "no Lanczos factorization could be built; change the seed or raise lanczosVectors";
            default -> prefix + "see the ARPACK Users' Guide (dsaupd) for this code";
        };
    }

    private static double[] startingVector(int n, long seed) {
        Random random = new Random(seed);
        double[] start = new double[n];
        for (int i = 0; i < n; i++) {
            start[i] = 2 * random.nextDouble() - 1;
        }
        return start;
    }

    }
