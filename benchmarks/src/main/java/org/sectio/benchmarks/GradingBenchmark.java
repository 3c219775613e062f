package org.sectio.benchmarks;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.GradingRule;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * Uniform against graded grids on two shapes with a 270° corner, where the field goes like r^(2/3):
 * the L-shaped region of three unit squares (lowest Dirichlet eigenvalue 9.6397238440, Fox, Henrici
 * &amp; Moler, SIAM J. Numer. Anal. 4 (1967) 89–102; Betcke &amp; Trefethen, SIAM Review 47 (2005)
 * 469–491), solved as the TM family, and a 20 × 10 mm double-ridge guide (TE10-like mode, against a
 * Richardson-extrapolated graded solve, i.e. self-convergence). Prints grid, unknowns, error and time
 * per solve, then the least-squares order of error against h = longer side / cells.
 *
 * <p>Run: {@code java -cp ... org.sectio.benchmarks.GradingBenchmark [--reach R] [--share S] [cells ...]}.
 */
public final class GradingBenchmark {

    /** λ1 of the L-shape, m⁻² (Betcke &amp; Trefethen 2005, §1, quoting Fox, Henrici &amp; Moler). */
    private static final double L_SHAPE_LAMBDA = 9.6397238440;

    private GradingBenchmark() {
    }

    /** @param args optional {@code --reach}, {@code --share}, then grid sizes (cells across) */
    public static void main(String[] args) {
        GradingRule rule = GradingRule.DEFAULT;
        List<Integer> sizes = new ArrayList<>();
        for (int k = 0; k < args.length; k++) {
            switch (args[k]) {
                case "--reach" -> rule = rule.withReachShare(Double.parseDouble(args[++k]));
                case "--share" -> rule = rule.withExponentShare(Double.parseDouble(args[++k]));
                default -> sizes.add(Integer.parseInt(args[k]));
            }
        }
        if (sizes.isEmpty()) {
            sizes = List.of(40, 80, 160, 320);
        }
        System.out.printf(Locale.ROOT, "rule: ratio %.2f, exponent share %.2f, reach share %.2f%n", rule.ratio(),
                rule.exponentShare(), rule.reachShare());
        CrossSection l = lShape();
        ModeSolver.solveOnGrid(l, GridPlanner.plan(l, 40, rule), settings(ModeFamily.TM), SolveProgress.SILENT); // JIT warm-up
        System.out.println("L-shape, TM, exact kc² = " + L_SHAPE_LAMBDA);
        compare(l, ModeFamily.TM, sizes, rule, L_SHAPE_LAMBDA);
        CrossSection ridge = doubleRidge();
        int finest = sizes.get(sizes.size() - 1);
        double fine = kcSquared(ridge, ModeFamily.TE, GridPlanner.plan(ridge, 2 * finest, rule));
        double finer = kcSquared(ridge, ModeFamily.TE, GridPlanner.plan(ridge, 4 * finest, rule));
        double reference = (4 * finer - fine) / 3;
        System.out.printf(Locale.ROOT, "double ridge, TE, reference kc² = %.10e (graded %d and %d, Richardson;"
                + " they differ by %.1e)%n", reference, 2 * finest, 4 * finest, Math.abs(finer - fine) / finer);
        compare(ridge, ModeFamily.TE, sizes, rule, reference);
    }

    private static void compare(CrossSection section, ModeFamily family, List<Integer> sizes, GradingRule rule,
                                double exact) {
        System.out.println("grid     cells   lines_x×y   unknowns  rel_error_kc²   seconds");
        for (String kind : List.of("uniform", "graded")) {
            List<double[]> fit = new ArrayList<>();
            for (int cells : sizes) {
                TensorGrid grid = kind.equals("uniform") ? TensorGrid.fitted(section.bounds(), cells)
                        : GridPlanner.plan(section, cells, rule);
                long start = System.nanoTime();
                ModeSet set = ModeSolver.solveOnGrid(section, grid, settings(family), SolveProgress.SILENT);
                double seconds = (System.nanoTime() - start) * 1e-9;
                double kc = set.modes().get(0).cutoffWavenumber();
                double error = Math.abs(kc * kc - exact) / exact;
                int unknowns = family == ModeFamily.TE ? set.grid().unknownsTE() : set.grid().unknownsTM();
                System.out.printf(Locale.ROOT, "%-8s %5d %6d×%-5d %9d %14.3e %9.2f%n", kind, cells, grid.cellsX(),
                        grid.cellsY(), unknowns, error, seconds);
                double longer = Math.max(section.bounds().width(), section.bounds().height());
                fit.add(new double[] {Math.log(longer / cells), Math.log(error)});
            }
            System.out.printf(Locale.ROOT, "%s: fitted order %.2f%n", kind, Measures.slope(fit));
        }
    }

    private static double kcSquared(CrossSection section, ModeFamily family, TensorGrid grid) {
        double kc = ModeSolver.solveOnGrid(section, grid, settings(family), SolveProgress.SILENT).modes().get(0)
                .cutoffWavenumber();
        return kc * kc;
    }

    private static SolveSettings settings(ModeFamily family) {
        return new SolveSettings(1, EnumSet.of(family), 100, Double.NaN, false, Runtime.getRuntime().availableProcessors());
    }

    /** The L of three unit squares (metres), turned 90° and shifted so nothing sits on the origin. */
    static CrossSection lShape() {
        double dx = 0.3;
        double dy = -0.2;
        return Shapes.polygon("L-shape", Outline.startAt(dx, dy).lineTo(dx, dy + 2).lineTo(dx - 1, dy + 2)
                .lineTo(dx - 1, dy + 1).lineTo(dx - 2, dy + 1).lineTo(dx - 2, dy));
    }

    /** 20 × 10 mm double-ridge guide, ridges 6 mm wide, 3 mm gap, centred. */
    static CrossSection doubleRidge() {
        double a = 20e-3;
        double b = 10e-3;
        double s = 6e-3;
        double d = 3e-3;
        double x0 = (a - s) / 2;
        double x1 = (a + s) / 2;
        double y0 = (b - d) / 2;
        double y1 = (b + d) / 2;
        return Shapes.polygon("double ridge", Outline.startAt(0, 0).lineTo(x0, 0).lineTo(x0, y0).lineTo(x1, y0)
                .lineTo(x1, 0).lineTo(a, 0).lineTo(a, b).lineTo(x1, b).lineTo(x1, y1).lineTo(x0, y1).lineTo(x0, b)
                .lineTo(0, b));
    }

}
