package org.sectio.benchmarks;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * The whole solve pipeline on a circular guide of growing grids: the 10 lowest modes of one family,
 * no error estimate, as the command line would run it. Prints grid, unknowns, stage times, peak heap
 * and the largest residual, then the exponent p of a least-squares fit time ∝ N^p.
 *
 * <p>Run: {@code java -Xmx6g -cp ... org.sectio.benchmarks.SolveBenchmark [cells ...] [--family te|tm]}.
 * The target on a 2-core machine is the 1000-cell case in ≤ 8 s wall and ≤ 4 GB heap.
 */
public final class SolveBenchmark {

    private SolveBenchmark() {
    }

    /** @param args grid sizes (cells across the diameter), and optionally {@code --family te|tm} */
    public static void main(String[] args) {
        List<Integer> sizes = new ArrayList<>();
        EnumSet<ModeFamily> families = EnumSet.of(ModeFamily.TM, ModeFamily.TE);
        for (int k = 0; k < args.length; k++) {
            if (args[k].equals("--family")) {
                families = EnumSet.of(ModeFamily.valueOf(args[++k].toUpperCase(Locale.ROOT)));
            } else {
                sizes.add(Integer.parseInt(args[k]));
            }
        }
        if (sizes.isEmpty()) {
            sizes = List.of(125, 250, 500, 707, 1000);
        }
        CrossSection circle = Shapes.circle(0.01, 0.0, 0.0);
        int threads = Runtime.getRuntime().availableProcessors();
        System.out.printf(Locale.ROOT, "circle R = 10 mm, 10 lowest modes, %d threads, max heap %.1f GB%n", threads,
                Runtime.getRuntime().maxMemory() / 1e9);
        // warm the JIT on a small case so the first row is not mostly compilation
        ModeSolver.solve(circle, new SolveSettings(10, families, 120, Double.NaN, false, threads), SolveProgress.SILENT);
        System.out.println("family  cells  unknowns  assembly_s  factor_s  lanczos_s  total_s  peak_heap_GB  max_residual");
        for (ModeFamily family : families) {
            List<double[]> fit = new ArrayList<>();
            for (int cells : sizes) {
                System.gc();
                Measures.resetPeaks();
                ModeSet set = ModeSolver.solve(circle,
                        new SolveSettings(10, EnumSet.of(family), cells, Double.NaN, false, threads), SolveProgress.SILENT);
                double residual = set.modes().stream().mapToDouble(Mode::relativeResidual).max().orElse(Double.NaN);
                int unknowns = family == ModeFamily.TE ? set.grid().unknownsTE() : set.grid().unknownsTM();
                var t = set.timing();
                System.out.printf(Locale.ROOT, "%-6s %6d %9d %11.2f %9.2f %10.2f %8.2f %13.2f %13.1e%n", family, cells,
                        unknowns, t.assemblySeconds(), t.factorSeconds(), t.eigenSeconds(), t.totalSeconds(),
                        Measures.peakHeapBytes() / 1e9, residual);
                fit.add(new double[] {Math.log(unknowns), Math.log(t.totalSeconds())});
            }
            System.out.printf(Locale.ROOT, "%s: total time grows as N^%.2f over this range%n", family, Measures.slope(fit));
        }
    }



}
