package org.sectio.benchmarks;

import java.util.Locale;
import org.sectio.eigen.Eigenpairs;
import org.sectio.eigen.IterationListener;
import org.sectio.eigen.LanczosSettings;
import org.sectio.eigen.MultifrontalCholesky;
import org.sectio.eigen.ShiftInvertLanczos;
import org.sectio.eigen.SymmetricFactorization;
import org.sectio.eigen.ThickRestartLanczos;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;
import org.sectio.operator.DirichletNodeAssembler;
import org.sectio.operator.LatticePencil;
import org.sectio.operator.NeumannCellAssembler;

/**
 * ARPACK's implicitly restarted Lanczos ({@link ShiftInvertLanczos}) against the thick-restart Lanczos
 * ({@link ThickRestartLanczos}) on the TM pencil of a disc of radius 10 mm, 10 lowest modes, with the
 * shift σ = ½ π j₀₁² / area (half the Faber–Krahn bound). Both use one multifrontal factorization of
 * {@code A − σM}; for each solver it prints the operator applications, the total seconds, the seconds
 * spent outside the factor solves (the eigensolver's own work), the largest relative residual, and the
 * largest relative eigenvalue difference between the two.
 *
 * <p>Run: {@code java -Xmx8g -cp ... org.sectio.benchmarks.EigensolverBenchmark [cells ...]
 * [--vectors m ...]}; default sizes 250 500 1000 cells across, basis sizes the default of
 * {@link LanczosSettings#forCount} and 30.
 *
 * <p>With {@code --te} it runs the TE (Neumann cell) pencil of the same disc instead, σ = −0.1 π j′₁₁² /
 * area, thick-restart Lanczos only, as the mode solver calls it: 11 pairs in a basis of 32 with the
 * zero one dropped afterwards ("plain"), against 10 pairs in a basis of 30 with the constant vector
 * deflated ("deflated"); best of 3 runs each, interleaved. It prints applications, seconds, seconds
 * outside the solves, the largest residual of the 10 modes and their largest relative difference.
 */
public final class EigensolverBenchmark {

    private static final double J01 = 2.404825557695773;
    private static final double J11_PRIME = 1.841183781340659;
    private static final int COUNT = 10;

    private EigensolverBenchmark() {
    }

    /** Counts the time spent inside the factor's solves. */
    private static final class TimedFactor implements SymmetricFactorization {
        private final SymmetricFactorization inner;
        private long nanos;

        TimedFactor(SymmetricFactorization inner) {
            this.inner = inner;
        }

        @Override
        public int size() {
            return inner.size();
        }

        @Override
        public void solve(double[] rightHandSide, double[] solution) {
            long t0 = System.nanoTime();
            inner.solve(rightHandSide, solution);
            nanos += System.nanoTime() - t0;
        }

        @Override
        public long factorNonZeros() {
            return inner.factorNonZeros();
        }
    }

    private record Row(String solver, int vectors, Eigenpairs pairs, double seconds, double solveSeconds) {
    }

    /** @param args cell counts across the diameter, then optionally {@code --vectors} and basis sizes */
    public static void main(String[] args) {
        java.util.List<Integer> sizes = new java.util.ArrayList<>();
        java.util.List<Integer> vectors = new java.util.ArrayList<>();
        boolean readingVectors = false;
        boolean te = false;
        for (String arg : args) {
            if (arg.equals("--te")) {
                te = true;
            } else if (arg.equals("--vectors")) {
                readingVectors = true;
            } else if (readingVectors) {
                vectors.add(Integer.parseInt(arg));
            } else {
                sizes.add(Integer.parseInt(arg));
            }
        }
        if (sizes.isEmpty()) {
            sizes = java.util.List.of(250, 500, 1000);
        }
        if (vectors.isEmpty()) {
            vectors = java.util.List.of(LanczosSettings.forCount(COUNT).lanczosVectors(), 30);
        }
        CrossSection disc = Shapes.circle(0.01, 0, 0);
        if (te) {
            System.out.printf(Locale.ROOT, "TE disc R = 10 mm, %d modes, %d processors%n", COUNT,
                    Runtime.getRuntime().availableProcessors());
            runTe(disc, 120, false);
            System.out.println("cells  unknowns  variant   ncv  applications  total_s  outside_solves_s  max_residual"
                    + "  max_rel_diff");
            for (int cells : sizes) {
                runTe(disc, cells, true);
            }
            return;
        }
        System.out.printf(Locale.ROOT, "TM disc R = 10 mm, %d modes, %d processors%n", COUNT,
                Runtime.getRuntime().availableProcessors());
        run(disc, 120, vectors, false);
        System.out.println("cells  unknowns  solver  ncv  applications  total_s  outside_solves_s  max_residual"
                + "  max_rel_diff_vs_arpack");
        for (int cells : sizes) {
            run(disc, cells, vectors, true);
        }
    }

    private static void run(CrossSection disc, int cellsAcross, java.util.List<Integer> vectors, boolean print) {
        CutCells cells = CutCells.of(disc, TensorGrid.fitted(disc.bounds(), cellsAcross));
        LatticePencil pencil = DirichletNodeAssembler.assemble(NodeLinks.of(cells));
        double sigma = 0.5 * Math.PI * J01 * J01 / cells.totalArea();
        TimedFactor factor = new TimedFactor(MultifrontalCholesky.factor(pencil.shifted(sigma), pencil.column(),
                pencil.row(), 2));
        java.util.List<Row> rows = new java.util.ArrayList<>();
        Eigenpairs reference = null;
        for (int m : vectors) {
            LanczosSettings settings = LanczosSettings.forCount(COUNT).withLanczosVectors(m);
            factor.nanos = 0;
            long t0 = System.nanoTime();
            Eigenpairs arpack = new ShiftInvertLanczos(settings).solve(pencil.stiffness(), pencil.mass(), sigma, factor);
            rows.add(new Row("arpack", m, arpack, (System.nanoTime() - t0) * 1e-9, factor.nanos * 1e-9));
            if (reference == null) {
                reference = arpack;
            }
            factor.nanos = 0;
            t0 = System.nanoTime();
            Eigenpairs thick = new ThickRestartLanczos(settings).solve(pencil.stiffness(), pencil.mass(), sigma, factor);
            rows.add(new Row("thick", m, thick, (System.nanoTime() - t0) * 1e-9, factor.nanos * 1e-9));
        }
        if (!print) {
            return;
        }
        for (Row row : rows) {
            double residual = 0;
            for (double r : row.pairs().relativeResiduals()) {
                residual = Math.max(residual, r);
            }
            double difference = 0;
            for (int k = 0; k < COUNT; k++) {
                double ref = reference.values()[k];
                difference = Math.max(difference, Math.abs(row.pairs().values()[k] - ref) / Math.abs(ref));
            }
            System.out.printf(Locale.ROOT, "%5d %9d  %-6s %4d %13d %8.2f %17.2f %13.1e %23.1e%n", cellsAcross,
                    pencil.size(), row.solver(), row.vectors(), row.pairs().operatorApplications(), row.seconds(),
                    row.seconds() - row.solveSeconds(), residual, difference);
        }
    }

    private static void runTe(CrossSection disc, int cellsAcross, boolean print) {
        CutCells cells = CutCells.of(disc, TensorGrid.fitted(disc.bounds(), cellsAcross));
        LatticePencil pencil = NeumannCellAssembler.assemble(cells);
        double sigma = -0.1 * Math.PI * J11_PRIME * J11_PRIME / cells.totalArea();
        TimedFactor factor = new TimedFactor(MultifrontalCholesky.factor(pencil.shifted(sigma), pencil.column(),
                pencil.row(), 2));
        double[] ones = new double[pencil.size()];
        java.util.Arrays.fill(ones, 1.0);
        Row[] best = new Row[2];
        for (int repeat = 0; repeat < 3; repeat++) {
            for (int variant = 0; variant < 2; variant++) {
                boolean deflate = variant == 1;
                int wanted = deflate ? COUNT : COUNT + 1;
                int m = Math.max(2 * wanted + 10, 30);
                ThickRestartLanczos solver = new ThickRestartLanczos(LanczosSettings.forCount(wanted)
                        .withLanczosVectors(m));
                factor.nanos = 0;
                long t0 = System.nanoTime();
                Eigenpairs pairs = solver.solve(pencil.stiffness(), pencil.mass(), sigma, factor,
                        IterationListener.NONE, deflate ? new double[][] {ones} : new double[0][]);
                Row row = new Row(deflate ? "deflated" : "plain", m, pairs, (System.nanoTime() - t0) * 1e-9,
                        factor.nanos * 1e-9);
                if (best[variant] == null || row.seconds() < best[variant].seconds()) {
                    best[variant] = row;
                }
            }
        }
        if (!print) {
            return;
        }
        for (Row row : best) {
            int first = row.solver().equals("plain") ? 1 : 0;
            int reference = best[0].solver().equals("plain") ? 1 : 0;
            double residual = 0;
            double difference = 0;
            for (int k = 0; k < COUNT; k++) {
                residual = Math.max(residual, row.pairs().relativeResiduals()[first + k]);
                double ref = best[0].pairs().values()[reference + k];
                difference = Math.max(difference, Math.abs(row.pairs().values()[first + k] - ref) / Math.abs(ref));
            }
            System.out.printf(Locale.ROOT, "%5d %9d  %-8s %4d %13d %8.2f %17.2f %13.1e %13.1e%n", cellsAcross,
                    pencil.size(), row.solver(), row.vectors(), row.pairs().operatorApplications(), row.seconds(),
                    row.seconds() - row.solveSeconds(), residual, difference);
        }
    }
}
