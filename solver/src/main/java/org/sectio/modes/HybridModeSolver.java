package org.sectio.modes;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import org.ejml.data.DMatrixSparseCSC;
import org.sectio.eigen.ArnoldiPairs;
import org.sectio.eigen.ComplexInverseIteration;
import org.sectio.eigen.EigenSolverException;
import org.sectio.eigen.MultifrontalLU;
import org.sectio.eigen.ThickRestartArnoldi;
import org.sectio.geometry.CrossSection;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;
import org.sectio.operator.LossMap;
import org.sectio.operator.PermittivityMap;
import org.sectio.operator.TransverseFieldAssembler;
import org.sectio.operator.YeePencil;

/**
 * Hybrid modes of a partially filled guide at a frequency: the propagation constants β of the modes
 * with the largest β² (propagating first, then the least evanescent) and their full fields.
 *
 * <p>The steps: plan and cut the grid as the scalar solver does ({@link GridPlanner}, {@link CutCells}) →
 * assemble the transverse-H operator L once ({@link TransverseFieldAssembler}) and order its lattice
 * once (nested dissection) → per frequency, factor τI − A(k0) = L + diag(τ − k0² εr) by
 * multifrontal LU ({@link MultifrontalLU}) → thick-restart Arnoldi on (τI − A)⁻¹ (the eigenvalues of A nearest the target τ, by default just above
 * k0² max εr, are the largest β²) → with lossy materials, refine each pair by complex inverse
 * iteration from the lossless one → rebuild the fields. A band sweep ({@link HybridSweep}) keeps the
 * assembly and the ordering and starts each Arnoldi run from the previous frequency's eigenvectors.
 */
public final class HybridModeSolver {

    /** Default target τ = k0² max εr (1 + this). */
    public static final double TARGET_MARGIN = 1e-2;
    private static final double ARNOLDI_TOLERANCE = 1e-11;
    private static final int MAX_RESTARTS = 400;
    private static final long SEED = 20_261_202L;

    private HybridModeSolver() {
    }

    /**
     * The hybrid modes at one frequency on the planned grid.
     *
     * @param section the cross-section (metres)
     * @param frequencyHz f &gt; 0, Hz
     * @param settings modes (count) and cells across are used
     * @param progress told of each stage
     * @return the modes, largest Re β² first
     * @throws SolveException if the problem cannot be solved as asked
     */
    public static HybridModeSet solve(CrossSection section, double frequencyHz, SolveSettings settings,
                                      SolveProgress progress) {
        return prepare(section, GridPlanner.plan(section, settings.cellsAcross()), settings.threads())
                .solveAt(frequencyHz, settings.modeCount(), Double.NaN, List.of(), progress);
    }

    /**
     * Cuts the grid and assembles the frequency-independent part of the operator; factorizations
     * and solves use all cores.
     *
     * @param section the cross-section
     * @param grid a grid covering it
     * @return the prepared problem, reusable at any frequency (and from several threads)
     * @throws SolveException if a material is magnetic or the grid is too coarse
     */
    public static Prepared prepare(CrossSection section, TensorGrid grid) {
        return prepare(section, grid, Runtime.getRuntime().availableProcessors());
    }

    /**
     * Cuts the grid and assembles the frequency-independent part of the operator.
     *
     * @param section the cross-section
     * @param grid a grid covering it
     * @param threads worker threads of the factorization and the solves, ≥ 1 (results do not depend on it)
     * @return the prepared problem, reusable at any frequency (and from several threads)
     * @throws SolveException if a material is magnetic or the grid is too coarse
     * @throws IllegalArgumentException if threads &lt; 1
     */
    public static Prepared prepare(CrossSection section, TensorGrid grid, int threads) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        long t0 = System.nanoTime();
        CutCells cells = CutCells.of(section, grid);
        PermittivityMap medium;
        try {
            medium = PermittivityMap.of(section, grid);
        } catch (IllegalArgumentException e) {
            throw new SolveException(e.getMessage(), e);
        }
        YeePencil pencil = TransverseFieldAssembler.assemble(cells, medium, LossMap.of(section, grid));
        if (pencil.size() < 8) {
            throw new SolveException("hybrid modes: the grid has only " + pencil.size() + " edge unknowns; use more"
                    + " cells across");
        }
        MultifrontalLU.Analysis symbolic = MultifrontalLU.Analysis.of(pencil.operatorReal(), pencil.latticeColumn(),
                pencil.latticeRow());
        GridSummary summary = new GridSummary(grid.cellsX(), grid.cellsY(), grid.x(1) - grid.x(0),
                grid.y(1) - grid.y(0), pencil.edges().cellCount(), pencil.edges().nodes().unknowns());
        return new Prepared(section.name(), pencil, symbolic, summary, (System.nanoTime() - t0) * 1e-9, threads);
    }

    /** A cut and assembled cross-section; {@link #solveAt} may be called for any number of frequencies. */
    public static final class Prepared {

        private final String sectionName;
        private final YeePencil pencil;
        private final MultifrontalLU.Analysis symbolic;
        private final GridSummary grid;
        private final double assemblySeconds;
        private final int threads;

        Prepared(String sectionName, YeePencil pencil, MultifrontalLU.Analysis symbolic, GridSummary grid,
                 double assemblySeconds, int threads) {
            this.threads = threads;
            this.sectionName = sectionName;
            this.pencil = pencil;
            this.symbolic = symbolic;
            this.grid = grid;
            this.assemblySeconds = assemblySeconds;
        }

        /** @return the operator parts (shared; do not modify) */
        public YeePencil pencil() {
            return pencil;
        }

        /** @return the number of entries L and U will hold (from the symbolic analysis) */
        public long factorEntries() {
            return 2 * symbolic.symbolic().factorNonZeros() - pencil.size();
        }

        /** @return seconds spent cutting, assembling and ordering */
        public double assemblySeconds() {
            return assemblySeconds;
        }

        /**
         * @param frequencyHz f &gt; 0, Hz
         * @param count modes wanted, 1 … order − 3
         * @param targetBetaSquared τ, rad²/m², or NaN for k0² max εr (1 + {@link HybridModeSolver#TARGET_MARGIN})
         * @param starts modes of a nearby frequency on this same grid whose eigenvectors start Arnoldi
         * @param progress told of each stage
         * @return the count modes nearest τ, largest Re β² first
         * @throws SolveException if the factorization or the iteration fails
         */
        public HybridModeSet solveAt(double frequencyHz, int count, double targetBetaSquared, List<HybridMode> starts,
                                     SolveProgress progress) {
            if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
                throw new IllegalArgumentException("frequency must be finite and > 0 Hz, got " + frequencyHz);
            }
            int n = pencil.size();
            if (count < 1 || count > n - 3) {
                throw new SolveException("hybrid modes: " + count + " modes asked of " + n + " edge unknowns; ask for"
                        + " fewer modes or use more cells across");
            }
            long t0 = System.nanoTime();
            double k0 = 2 * Math.PI * frequencyHz / ModeSolver.SPEED_OF_LIGHT;
            double tau = Double.isNaN(targetBetaSquared)
                    ? k0 * k0 * pencil.maximumPermittivity() * (1 + TARGET_MARGIN) : targetBetaSquared;
            progress.report(String.format(Locale.ROOT, "hybrid: factorizing %d edge unknowns at %.6g GHz", n,
                    frequencyHz * 1e-9), 0.1);
            MultifrontalLU lu = symbolic.factor(pencil.shiftedReal(k0, tau), threads);
            long t1 = System.nanoTime();
            double[][] startVectors = starts.stream().map(HybridMode::edgeVectorReal).toArray(double[][]::new);
            int basis = Math.min(n - 1, Math.max(2 * count + 10, 30));
            ArnoldiPairs pairs;
            try {
                pairs = ThickRestartArnoldi.largest(lu::solve, n, count, basis, ARNOLDI_TOLERANCE, MAX_RESTARTS,
                        startVectors, SEED);
            } catch (EigenSolverException e) {
                throw new SolveException("hybrid modes at " + frequencyHz + " Hz: " + e.getMessage(), e);
            }
            DMatrixSparseCSC aRe = operator(k0, false);
            DMatrixSparseCSC aIm = pencil.lossy() ? operator(k0, true) : null;
            int found = pairs.count();
            double[][] values = new double[found][];
            double[][][] vectors = new double[found][][];
            for (int p = 0; p < found; p++) {
                double tr = pairs.valueReal()[p];
                double ti = pairs.valueImaginary()[p];
                double t2 = tr * tr + ti * ti;
                double lr = tau - tr / t2;
                double li = ti / t2;
                double[] xr = pairs.vectorReal()[p];
                double[] xi = pairs.vectorImaginary()[p];
                if (aIm != null) {
                    progress.report("hybrid: complex refinement of mode " + (p + 1), 0.5 + 0.4 * p / pairs.count());
                    ComplexInverseIteration.Pair c;
                    try {
                        c = ComplexInverseIteration.near(aRe, aIm, lr, li, xr, xi, symbolic, 1e-11, 30);
                    } catch (EigenSolverException e) {
                        throw new SolveException("hybrid modes, lossy refinement: " + e.getMessage(), e);
                    }
                    lr = c.valueReal();
                    li = c.valueImaginary();
                    xr = c.vectorReal();
                    xi = c.vectorImaginary();
                }
                values[p] = new double[] {lr, li};
                vectors[p] = new double[][] {xr, xi};
            }
            IntStream indices = IntStream.range(0, found);
            List<HybridMode> modes = new ArrayList<>((threads > 1 ? indices.parallel() : indices)
                    .mapToObj(p -> mode(k0, values[p][0], values[p][1], vectors[p][0], vectors[p][1], aRe, aIm))
                    .toList());
            modes.sort(Comparator.comparingDouble(HybridMode::betaSquaredReal).reversed());
            List<HybridMode> numbered = new ArrayList<>();
            for (int k = 0; k < modes.size(); k++) {
                numbered.add(modes.get(k).withIndex(k + 1));
            }
            long t2 = System.nanoTime();
            progress.report("done", 1.0);
            return new HybridModeSet(sectionName, frequencyHz, numbered, grid, n, tau,
                    new SolveTiming(0, (t1 - t0) * 1e-9, (t2 - t1) * 1e-9, (t2 - t0) * 1e-9), pairs.applications());
        }

        private HybridMode mode(double k0, double lr, double li, double[] xr, double[] xi, DMatrixSparseCSC aRe,
                                DMatrixSparseCSC aIm) {
            double residual = relativeResidual(aRe, aIm, lr, li, xr, xi);
            HybridFields.Rebuilt rebuilt = HybridFields.of(pencil, xr, xi, lr, li, k0);
            double[] beta = HybridFields.beta(lr, li);
            boolean propagating = lr > 0;
            return new HybridMode(1, lr, li, propagating ? beta[0] : Math.max(0, beta[0]), -beta[1], propagating,
                    residual, rebuilt.magneticShare(), rebuilt.field(), xr, xi);
        }

        /** A = k0² E − L, real or imaginary part, as a new matrix. */
        private DMatrixSparseCSC operator(double k0, boolean imaginary) {
            DMatrixSparseCSC l = imaginary ? pencil.operatorImaginary() : pencil.operatorReal();
            double[] eps = imaginary ? pencil.edgePermittivityImaginary() : pencil.edgePermittivityReal();
            DMatrixSparseCSC a = l.copy();
            for (int c = 0; c < a.numCols; c++) {
                for (int p = a.col_idx[c]; p < a.col_idx[c + 1]; p++) {
                    a.nz_values[p] = -a.nz_values[p] + (a.nz_rows[p] == c ? k0 * k0 * eps[c] : 0);
                }
            }
            return a;
        }
    }

    /** ‖A x − λ x‖₂ / (‖A‖₁ ‖x‖₂) for complex A = Ar + j Ai (Ai may be null), λ and x. */
    static double relativeResidual(DMatrixSparseCSC ar, DMatrixSparseCSC ai, double lr, double li, double[] xr,
                                   double[] xi) {
        int n = ar.numCols;
        double[] rr = new double[n];
        double[] ri = new double[n];
        double norm = 0;
        for (int c = 0; c < n; c++) {
            double column = 0;
            for (int p = ar.col_idx[c]; p < ar.col_idx[c + 1]; p++) {
                int r = ar.nz_rows[p];
                double a = ar.nz_values[p];
                double b = ai == null ? 0 : ai.nz_values[p];
                rr[r] += a * xr[c] - b * xi[c];
                ri[r] += a * xi[c] + b * xr[c];
                column += Math.sqrt(a * a + b * b);
            }
            norm = Math.max(norm, column);
        }
        double r2 = 0;
        double x2 = 0;
        for (int k = 0; k < n; k++) {
            double er = rr[k] - (lr * xr[k] - li * xi[k]);
            double ei = ri[k] - (lr * xi[k] + li * xr[k]);
            r2 += er * er + ei * ei;
            x2 += xr[k] * xr[k] + xi[k] * xi[k];
        }
        return Math.sqrt(r2 / x2) / norm;
    }
}
