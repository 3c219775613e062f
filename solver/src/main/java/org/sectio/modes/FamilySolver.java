package org.sectio.modes;

import java.util.ArrayList;
import java.util.List;
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
        return family == ModeFamily.TE ? NeumannCellAssembler.assemble(cells)
                : DirichletNodeAssembler.assemble(NodeLinks.of(cells));
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
        long t0 = System.nanoTime();
        LatticePencil pencil = pencil(family, cells);
        int n = pencil.size();
        boolean dropConstant = family == ModeFamily.TE;
        int wanted = count + (dropConstant ? 1 : 0);
        if (n < wanted + 2) {
            throw new SolveException(family + ": the grid has only " + n + " unknowns for " + count
                    + " modes; use more cells across");
        }
        double sigma = shift(family, cells.totalArea());
        long t1 = System.nanoTime();
        progress.report(family + ": factorizing " + n + " unknowns", progressFrom + 0.2 * (progressTo - progressFrom));
        SymmetricFactorization factor;
        try {
            factor = MultifrontalCholesky.factor(pencil.shifted(sigma), pencil.column(), pencil.row(), threads);
        } catch (NotPositiveDefiniteException e) {
            throw new SolveException(family + ": the shifted matrix is not positive definite (" + e.getMessage()
                    + "); the cross-section may have a disconnected or degenerate region", e);
        }
        long t2 = System.nanoTime();
        // a basis of 2·count + 10 (at least 30) vectors: fewer restarts, fewer solves (EigensolverBenchmark)
        ThickRestartLanczos lanczos = new ThickRestartLanczos(LanczosSettings.forCount(wanted)
                .withLanczosVectors(Math.min(n, Math.max(2 * wanted + 10, 30))));
        Eigenpairs pairs;
        try {
            pairs = lanczos.solve(pencil.stiffness(), pencil.mass(), sigma, factor, applications ->
                    progress.report(family + ": Lanczos step " + applications,
                            progressFrom + (0.5 + 0.5 * Math.min(1.0, applications / (3.0 * wanted)))
                                    * (progressTo - progressFrom)));
        } catch (EigenSolverException e) {
            throw new SolveException(family + ": " + e.getMessage(), e);
        }
        long t3 = System.nanoTime();
        double[] values = pairs.values();
        int first = 0;
        if (dropConstant) {
            // the constant Hz solves the Neumann problem with λ = 0 and is not a mode
            if (!(Math.abs(values[0]) < 1e-6 * Math.abs(values[1]))) {
                throw new SolveException("TE: expected one zero eigenvalue (the constant field), found λ₀ = "
                        + values[0] + ", λ₁ = " + values[1] + " rad²/m²; the guide may be split into parts");
            }
            if (Math.abs(values[1]) < 1e-6 * Math.abs(values[Math.min(2, values.length - 1)])) {
                throw new SolveException("TE: more than one zero eigenvalue; the cross-section falls apart into"
                        + " separate regions at this grid");
            }
            first = 1;
        }
        double[] residuals = pairs.relativeResiduals();
        List<Double> kc = new ArrayList<>();
        List<Double> res = new ArrayList<>();
        List<FieldMap> fields = new ArrayList<>();
        for (int k = first; k < values.length && kc.size() < count; k++) {
            kc.add(Math.sqrt(Math.max(0, values[k])));
            res.add(residuals[k]);
            fields.add(fieldOf(family, cells.grid(), pencil, pairs.vector(k)));
        }
        return new Result(family, kc.stream().mapToDouble(Double::doubleValue).toArray(),
                res.stream().mapToDouble(Double::doubleValue).toArray(), fields.toArray(FieldMap[]::new), n,
                (t1 - t0) * 1e-9, (t2 - t1) * 1e-9, (t3 - t2) * 1e-9);
    }

    /** Puts an eigenvector on the grid's cell centres (TE) or nodes (TM), scaled to a peak of +1. */
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
        for (int k = 0; k < vector.length; k++) {
            values[row[k] * xs.length + column[k]] = vector[k] / peak;
        }
        return new FieldMap(xs, ys, values);
    }

    private static double[] centres(double[] lines) {
        double[] c = new double[lines.length - 1];
        for (int k = 0; k < c.length; k++) {
            c[k] = 0.5 * (lines[k] + lines[k + 1]);
        }
        return c;
    }
}
