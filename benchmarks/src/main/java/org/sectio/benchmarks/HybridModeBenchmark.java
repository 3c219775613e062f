package org.sectio.benchmarks;

import java.util.List;
import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.HybridMode;
import org.sectio.modes.HybridModeSet;
import org.sectio.modes.HybridModeSolver;
import org.sectio.modes.HybridSweep;
import org.sectio.modes.SolveProgress;

/**
 * The full-vector hybrid-mode solver on a slab-loaded rectangle (20 × 10 mm, εr = 4 slab over
 * 5 … 10 mm, full height): one frequency with 8 modes on a 400 × 200-cell grid (target ≤ 3 s on
 * 2 cores; six runs, the first also pays for the JIT, the median of the other five is the figure), then a band sweep with and without reuse of the assembly, the nested-dissection analysis
 * and the previous eigenvectors as Arnoldi starts. Prints stage times, unknowns, factor size and the
 * largest residual; the machine is shared, so compare the ratios of one run.
 *
 * <p>Run: {@code java -Xmx6g -cp ... org.sectio.benchmarks.HybridModeBenchmark [cells] [sweepCells] [points]}
 * (defaults 400, 200, 101).
 */
public final class HybridModeBenchmark {

    private HybridModeBenchmark() {
    }

    static CrossSection slabGuide() {
        double a = 0.02;
        double b = 0.01;
        Region slab = Region.of(Outline.startAt(a / 4, 0).lineTo(a / 2, 0).lineTo(a / 2, b).lineTo(a / 4, b).close());
        Region inside = Region.of(Outline.startAt(0, 0).lineTo(a, 0).lineTo(a, b).lineTo(0, b).close());
        return new GuideSection("slab-loaded rectangle", inside,
                List.of(new Dielectric("slab", slab, new Material(4.0, 1, 0))), Material.AIR);
    }

    /** @param args cells across for the single solve, cells across for the sweep, sweep points */
    public static void main(String[] args) {
        int cells = args.length > 0 ? Integer.parseInt(args[0]) : 400;
        int sweepCells = args.length > 1 ? Integer.parseInt(args[1]) : 200;
        int points = args.length > 2 ? Integer.parseInt(args[2]) : 101;
        CrossSection guide = slabGuide();
        System.out.printf(Locale.ROOT, "slab-loaded 20 x 10 mm, eps 4, 8 modes at 12 GHz, %d cores, max heap %.1f GB%n",
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() / 1e9);
        HybridModeSolver.prepare(guide, TensorGrid.fitted(guide.bounds(), 100)).solveAt(12e9, 8, Double.NaN, List.of(),
                SolveProgress.SILENT);
        System.out.println("cells    grid  edges  assembly_s  factor_s  arnoldi_s  total_s  max_residual  solves  factor_entries");
        int runs = 6;
        double[] totals = new double[runs];
        for (int run = 0; run < runs; run++) {
            System.gc();
            long t0 = System.nanoTime();
            TensorGrid grid = TensorGrid.fitted(guide.bounds(), cells);
            HybridModeSolver.Prepared prepared = HybridModeSolver.prepare(guide, grid);
            HybridModeSet set = prepared.solveAt(12e9, 8, Double.NaN, List.of(), SolveProgress.SILENT);
            double total = (System.nanoTime() - t0) * 1e-9;
            totals[run] = total;
            double residual = set.modes().stream().mapToDouble(HybridMode::relativeResidual).max().orElse(Double.NaN);
            System.out.printf(Locale.ROOT, "%5d %4dx%-4d %6d %11.2f %9.2f %10.2f %8.2f %13.1e %7d %15d%n", cells, grid.cellsX(),
                    grid.cellsY(), set.edgeUnknowns(), prepared.assemblySeconds(), set.timing().factorSeconds(),
                    set.timing().eigenSeconds(), total, residual, set.operatorApplications(), prepared.factorEntries());
        }
        double[] warm = java.util.Arrays.copyOfRange(totals, 1, runs);
        java.util.Arrays.sort(warm);
        System.out.printf(Locale.ROOT, "single frequency: first run %.2f s, later runs median %.2f s, fastest %.2f s,"
                + " slowest %.2f s (target 3 s)%n", totals[0], warm[warm.length / 2], warm[0], warm[warm.length - 1]);
        double[] band = new double[points];
        for (int i = 0; i < points; i++) {
            band[i] = 8e9 + 8e9 * i / (points - 1);
        }
        TensorGrid sweepGrid = TensorGrid.fitted(guide.bounds(), sweepCells);
        System.out.printf(Locale.ROOT, "band sweep 8 ... 16 GHz, %d points, %d x %d cells, 8 modes%n", points,
                sweepGrid.cellsX(), sweepGrid.cellsY());
        System.out.println("reuse  assembly_s  solves_s  total_s  per_point_s  operator_solves  curves");
        double[] passes = new double[2];
        for (int pass = 0; pass < 2; pass++) {
            boolean reuse = pass == 0;
            System.gc();
            HybridSweep.Result r = HybridSweep.run(() -> HybridModeSolver.prepare(guide, sweepGrid), band, 8, reuse,
                    SolveProgress.SILENT);
            passes[pass] = r.assemblySeconds() + r.solveSeconds();
            int solves = r.sets().stream().mapToInt(HybridModeSet::operatorApplications).sum();
            System.out.printf(Locale.ROOT, "%-5s %11.2f %9.2f %8.2f %12.3f %16d %7d%n", reuse ? "yes" : "no",
                    r.assemblySeconds(), r.solveSeconds(), passes[pass], passes[pass] / points, solves,
                    r.curves().size());
        }
        System.out.printf(Locale.ROOT, "speed-up of reuse: %.2f%n", passes[1] / passes[0]);
    }
}
