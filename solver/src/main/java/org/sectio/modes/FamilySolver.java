package org.sectio.modes;

import org.ejml.data.DMatrixSparseCSC;
import org.sectio.eigen.Eigenpairs;
import org.sectio.eigen.EigenSolverException;
import org.sectio.eigen.LanczosSettings;
import org.sectio.eigen.MultifrontalCholesky;
import org.sectio.eigen.NotPositiveDefiniteException;
import org.sectio.eigen.ThickRestartLanczos;
import org.sectio.eigen.SymmetricFactorization;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;
import org.sectio.operator.DirichletNodeAssembler;
import org.sectio.operator.LatticePencil;
import org.sectio.operator.NeumannCellAssembler;
import org.sectio.operator.PermittivityMap;

/**
 * One family on one grid: assemble → shift → factor → Lanczos → fields. The steps of the method,
 * in order, with their timings.
 */
final class FamilySolver {

    /** Faber–Krahn: the lowest Dirichlet eigenvalue of a region of area S is at least π j₀₁² / S. */
    private static final double J01 = 2.404825557695773;
    /** Szegő–Weinberger: the lowest non-zero Neumann eigenvalue of area S is at most π j′₁₁² / S. */
    private static final double J11_PRIME = 1.841183781340659;

    /** A family's discrete modes on one grid, ascending. */
    record Result(ModeFamily family, double[] cutoffWavenumbers, double[] residuals, FieldMap[] fields,
                  int unknowns, double assemblySeconds, double factorSeconds, double eigenSeconds) {

        Result withExtraAssembly(double seconds) {
            return new Result(family, cutoffWavenumbers, residuals, fields, unknowns, assemblySeconds + seconds,
                    factorSeconds, eigenSeconds);
        }
    }

    private FamilySolver() {
    }

    /** Assembles the pencil of a family on cut cells. */
    static LatticePencil pencil(ModeFamily family, CutCells cells) {
        return pencil(family, cells, PermittivityMap.uniform(1.0));
    }

    /** Assembles the pencil of a family (TE: Hz, TM: Ez) at cutoff with the medium's εr; λ = k0². */
    static LatticePencil pencil(ModeFamily family, CutCells cells, PermittivityMap medium) {
        return family == ModeFamily.TE ? NeumannCellAssembler.assemble(cells, medium)
                : DirichletNodeAssembler.assemble(NodeLinks.of(cells), medium);
    }

    /**
     * A shift σ safely below the lowest wanted eigenvalue: for TM half the Faber–Krahn bound, for TE
     * (whose lowest eigenvalue is the constant's 0) minus a tenth of the Szegő–Weinberger bound.
     */
    static double shift(ModeFamily family, double openArea) {
        return family == ModeFamily.TM ? 0.5 * Math.PI * J01 * J01 / openArea
                : -0.1 * Math.PI * J11_PRIME * J11_PRIME / openArea;
    }

    static Result solve(ModeFamily family, CutCells cells, int count, int threads, SolveProgress progress,
                        double progressFrom, double progressTo) {
        return solve(family, cells, PermittivityMap.uniform(1.0), count, threads, progress, progressFrom, progressTo);
    }

    /** As above with dielectrics: eigenvalues are k0², and the shift is divided by the largest εr. */
    static Result solve(ModeFamily family, CutCells cells, PermittivityMap medium, int count, int threads,
                        SolveProgress progress, double progressFrom, double progressTo) {
        return solve(family, cells, medium, count, threads, progress, progressFrom, progressTo, null);
    }

    /**
     * As above, reusing what {@code session} remembers of this pattern (the symbolic analysis, and with
     * warm starts the last eigenvectors); null for a solve that shares nothing.
     */
    static Result solve(ModeFamily family, CutCells cells, PermittivityMap medium, int count, int threads,
                        SolveProgress progress, double progressFrom, double progressTo, SolveSession session) {
        long t0 = System.nanoTime();
        LatticePencil pencil = pencil(family, cells, medium);
        int n = pencil.size();
        // TE: the constant Hz solves the Neumann problem with λ = 0 and is not a mode; it is deflated
        double[][] deflated = family == ModeFamily.TE ? new double[][] {constant(n)} : new double[0][];
        if (n < count + deflated.length + 2) {
            throw new SolveException(family + ": the grid has only " + n + " unknowns for " + count
                    + " modes; use more cells across");
        }
        double sigma = shift(family, cells.totalArea()) / medium.maximum();
        long t1 = System.nanoTime();
        progress.report(family + ": factorizing " + n + " unknowns", progressFrom + 0.2 * (progressTo - progressFrom));
        SymmetricFactorization factor;
        DMatrixSparseCSC shifted = pencil.shifted(sigma);
        try {
            factor = session == null ? MultifrontalCholesky.factor(shifted, pencil.column(), pencil.row(), threads)
                    : session.analysis(family, shifted, pencil.column(), pencil.row()).factor(shifted, threads);
        } catch (NotPositiveDefiniteException e) {
            throw new SolveException(family + ": the shifted matrix is not positive definite (" + e.getMessage()
                    + "); the cross-section may have a disconnected or degenerate region", e);
        }
        long t2 = System.nanoTime();
        // a basis of 2·count + 10 (at least 30) vectors: fewer restarts, fewer solves (EigensolverBenchmark)
        ThickRestartLanczos lanczos = new ThickRestartLanczos(LanczosSettings.forCount(count)
                .withLanczosVectors(Math.min(n - deflated.length, Math.max(2 * count + 10, 30))));
        Eigenpairs pairs;
        double[] start = session == null ? null : session.start(family, shifted, pencil.column(), pencil.row());
        try {
            pairs = lanczos.solve(pencil.stiffness(), pencil.mass(), sigma, factor, applications ->
                    progress.report(family + ": Lanczos step " + applications,
                            progressFrom + (0.5 + 0.5 * Math.min(1.0, applications / (3.0 * count)))
                                    * (progressTo - progressFrom)), deflated, start);
        } catch (EigenSolverException e) {
            throw new SolveException(family + ": " + e.getMessage(), e);
        }
        long t3 = System.nanoTime();
        double[] values = pairs.values();
        if (session != null) {
            double[][] vectors = new double[values.length][];
            for (int k = 0; k < vectors.length; k++) {
                vectors[k] = pairs.vector(k);
            }
            session.rememberVectors(family, shifted, pencil.column(), pencil.row(), vectors);
        }
        if (family == ModeFamily.TE) {
            requireOneZero(values, sigma);
        }
        double[] residuals = pairs.relativeResiduals();
        FieldMap[] fields = new FieldMap[values.length];
        double[] kc = new double[values.length];
        for (int k = 0; k < values.length; k++) {
            kc[k] = Math.sqrt(Math.max(0, values[k]));
            fields[k] = fieldOf(family, cells.grid(), pencil, pairs.vector(k));
        }
        return new Result(family, kc, residuals, fields, n, (t1 - t0) * 1e-9, (t2 - t1) * 1e-9, (t3 - t2) * 1e-9);
    }

    /** The constant vector (all ones), the null vector of the Neumann cell Laplacian. */
    private static double[] constant(int n) {
        double[] ones = new double[n];
        java.util.Arrays.fill(ones, 1.0);
        return ones;
    }

    /**
     * Refuses a second zero eigenvalue of the TE pencil, the constant being deflated. The cell matrix is a
     * weighted graph Laplacian {@code Σ w (e_k − e_l)(e_k − e_l)ᵀ}, w > 0 over shared faces, whose null
     * space is spanned by the indicators of the connected components (F. Chung, <i>Spectral Graph
     * Theory</i>, AMS 1997, Lemma 1.7), so a returned λ₀ ≈ 0 means the cross-section falls apart into
     * separate regions. "≈ 0" is {@code |λ₀| < 10⁻⁶ max(|λ₁|, |σ|)}: the next value or, if it is a zero
     * as well or absent, the shift (a tenth of the Szegő–Weinberger bound of a connected region).
     *
     * @param values the TE eigenvalues found with the constant deflated, ascending, rad²/m²
     * @param sigma the shift, rad²/m²
     * @throws SolveException if λ₀ ≈ 0, with λ₀, λ₁ and σ in a one-line message
     */
    static void requireOneZero(double[] values, double sigma) {
        double next = values.length > 1 ? Math.abs(values[1]) : 0;
        if (Math.abs(values[0]) < 1e-6 * Math.max(next, Math.abs(sigma))) {
            throw new SolveException("TE: more than one zero eigenvalue (lambda0 = " + values[0] + ", next "
                    + (values.length > 1 ? values[1] : Double.NaN) + ", shift " + sigma + " rad²/m² with the constant"
                    + " field deflated); the cross-section falls apart into separate regions at this grid");
        }
    }

    /**
     * Puts an eigenvector on the grid's cell centres (TE) or nodes (TM, TEM), scaled to a peak of +1, with
     * each sample's weight in the discrete mass: the open cell area (TE, the pencil's M) or the dual-cell
     * area (TM, TEM: M without the ⟨εr⟩ factor), 0 outside.
     */
    static FieldMap fieldOf(ModeFamily family, TensorGrid grid, LatticePencil pencil, double[] vector) {
        double[] xs;
        double[] ys;
        if (family == ModeFamily.TE) {
            xs = centres(grid.xLines());
            ys = centres(grid.yLines());
        } else {
            xs = grid.xLines();
            ys = grid.yLines();
        }
        double[] values = new double[xs.length * ys.length];
        java.util.Arrays.fill(values, Double.NaN);
        double peak = 0;
        for (double v : vector) {
            if (Math.abs(v) > Math.abs(peak)) {
                peak = v;
            }
        }
        int[] column = pencil.column();
        int[] row = pencil.row();
        double[] weights = new double[values.length];
        double[] mass = pencil.mass();
        for (int k = 0; k < vector.length; k++) {
            int at = row[k] * xs.length + column[k];
            values[at] = vector[k] / peak;
            weights[at] = family == ModeFamily.TE ? mass[k]
                    : 0.25 * (grid.xStep(column[k], -1) + grid.xStep(column[k], +1))
                            * (grid.yStep(row[k], -1) + grid.yStep(row[k], +1));
        }
        return new FieldMap(xs, ys, values, weights);
    }

    private static double[] centres(double[] lines) {
        double[] c = new double[lines.length - 1];
        for (int k = 0; k < c.length; k++) {
            c[k] = 0.5 * (lines[k] + lines[k + 1]);
        }
        return c;
    }
}
