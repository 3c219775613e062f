package org.sectio.benchmarks;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.family.GuideFamily;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * Default accuracy of every built-in family at its default parameters: for the first six modes of
 * {@link SolveSettings#defaults()}, the error against a self-convergence reference (order-2 Richardson
 * extrapolation of 400 and 800 cells across, with that reference's own 2|Δ|/3 estimate), the printed
 * estimate ÷ true error, and what {@code targetRelativeError = 1e-5} does: the grid it picks, its worst
 * error against the same reference, and the time. Families may be named as arguments (default: all).
 * Heavy (minutes); the unit test DefaultAccuracyTest holds a subset.
 */
public final class DefaultAccuracyBenchmark {

    private static final int SHOWN = 6;

    private DefaultAccuracyBenchmark() {
    }

    /** @param args family names, or none for all */
    public static void main(String[] args) {
        List<GuideFamily> families = args.length == 0 ? GuideFamilies.all()
                : java.util.Arrays.stream(args).map(GuideFamilies::byName).toList();
        System.out.println("family                 mode   error@200  estimate  est/true  ref-est   | 1e-5: cells  worst-error  time");
        for (GuideFamily family : families) {
            GuideSection section = family.buildDefault();
            long start = System.nanoTime();
            ModeSet defaults = ModeSolver.solve(section, SolveSettings.defaults(), SolveProgress.SILENT);
            double defaultSeconds = seconds(start);
            ModeSet fine = reference(section, 400);
            ModeSet finest = reference(section, 800);
            start = System.nanoTime();
            ModeSet targeted = ModeSolver.solve(section, new SolveSettings(SHOWN, EnumSet.allOf(ModeFamily.class), 200,
                    1e-5, true, Runtime.getRuntime().availableProcessors()), SolveProgress.SILENT);
            double targetSeconds = seconds(start);
            double worstTargeted = 0;
            for (Mode m : targeted.modes()) {
                worstTargeted = Math.max(worstTargeted, Math.abs(value(m) / extrapolated(fine, finest, m) - 1));
            }
            for (Mode m : defaults.modes().subList(0, SHOWN)) {
                double exact = extrapolated(fine, finest, m);
                double error = Math.abs(value(m) / exact - 1);
                double referenceEstimate = 2 * Math.abs(value(find(finest, m)) - value(find(fine, m))) / (3 * exact);
                System.out.printf(Locale.ROOT, "%-22s %-6s %9.2e %9.2e %8.2f %9.2e%s%n", family.name(), m.label(), error,
                        m.relativeErrorEstimate(), m.relativeErrorEstimate() / error, referenceEstimate,
                        error <= 1e-4 && m.relativeErrorEstimate() >= error && m.relativeErrorEstimate() <= 10 * error
                                ? "" : "   << MISSES");
            }
            System.out.printf(Locale.ROOT, "%-22s default %.1f s on %d × %d | 1e-5: %d × %d cells, worst %.2e%s, %.1f s%n%n",
                    family.name(), defaultSeconds, defaults.grid().cellsX(), defaults.grid().cellsY(),
                    targeted.grid().cellsX(), targeted.grid().cellsY(), worstTargeted,
                    worstTargeted <= 1e-5 ? "" : " << MISSES", targetSeconds);
        }
    }

    private static ModeSet reference(GuideSection section, int cells) {
        return ModeSolver.solve(section, new SolveSettings(SHOWN + 2, EnumSet.allOf(ModeFamily.class), cells, Double.NaN,
                false, Runtime.getRuntime().availableProcessors()), SolveProgress.SILENT);
    }

    private static double extrapolated(ModeSet fine, ModeSet finest, Mode m) {
        double k800 = value(find(finest, m));
        return k800 + (k800 - value(find(fine, m))) / 3;
    }

    private static Mode find(ModeSet set, Mode like) {
        return set.modes().stream().filter(m -> m.family() == like.family() && m.index() == like.index()).findFirst()
                .orElseThrow(() -> new IllegalStateException(like.label() + " missing from the reference"));
    }

    private static double value(Mode m) {
        return m.family() == ModeFamily.TEM ? m.characteristicImpedanceOhms() : m.cutoffWavenumber();
    }

    private static double seconds(long start) {
        return (System.nanoTime() - start) * 1e-9;
    }
}
