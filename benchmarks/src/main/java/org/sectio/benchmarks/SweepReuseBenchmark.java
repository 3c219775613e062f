package org.sectio.benchmarks;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSession;
import org.sectio.modes.SolveSettings;

/**
 * What re-use between consecutive points of a sweep saves on one thread, as a sweep runs them (one
 * solve thread per point, error estimate on): each sweep is solved with nothing shared,
 * with the symbolic analysis shared ({@link SolveSession#create()}), and with the analysis and the last
 * eigenvectors as the Lanczos start ({@link SolveSession#createWarm()}). Prints the CPU time of each, the
 * speed-up over no re-use, how many factorizations found their pattern remembered, and the largest
 * relative difference of any cutoff from the run without re-use. A fourth variant runs as
 * {@code sectio sweep} does by default: warm, with a fresh session every 8 points (chains). The
 * variants are interleaved and repeated and the least CPU time of each is kept (the JVM's CPU time
 * over all its threads, which a machine shared with other jobs disturbs far less than wall time).
 *
 * <p>Two sweeps: the broad side a of a rectangle (b = 10.16 mm fixed, a = 22.0 … 24.0 mm), where the
 * pattern repeats only while the planned cell counts stay the same, and the radius of a circle, which
 * scales the whole plan, so every point has the pattern of the first.
 *
 * <p>Run: {@code java -cp ... org.sectio.benchmarks.SweepReuseBenchmark [cells] [points] [modes] [repeats]}
 * (default 200 cells across, 21 points, 6 modes of both families, 3 repeats). For CHAINS_OF_8 the
 * counts shown are those of its first chain.
 */
public final class SweepReuseBenchmark {

    private SweepReuseBenchmark() {
    }

    /** @param args cells across, points per sweep, modes, repeats */
    public static void main(String[] args) {
        int cells = args.length > 0 ? Integer.parseInt(args[0]) : 200;
        int points = args.length > 1 ? Integer.parseInt(args[1]) : 21;
        int modes = args.length > 2 ? Integer.parseInt(args[2]) : 6;
        int repeats = args.length > 3 ? Integer.parseInt(args[3]) : 3;
        SolveSettings settings = new SolveSettings(modes, EnumSet.of(ModeFamily.TE, ModeFamily.TM), cells, Double.NaN,
                true, 1);
        System.out.printf(Locale.ROOT, "%d cells across, %d points per sweep, %d modes of TE and TM, error estimate on,"
                + " 1 thread; variants interleaved, best of %d%n", cells, points, modes, repeats);
        // warm the JIT so the first variant is not mostly compilation
        run(settings, a -> Shapes.rectangle(a, 0.01016), 0.0220, 0.0240, Math.max(3, points / 4), Variant.NONE);
        System.out.println("sweep                      variant      best_cpu_s  cpu_s/pt  speed-up  analyses_reused"
                + "  warm_starts  max_rel_diff");
        report("rectangle a 22-24 mm", settings, a -> Shapes.rectangle(a, 0.01016), 0.0220, 0.0240, points, repeats);
        report("circle R 9-11 mm", settings, r -> Shapes.circle(r, 0.0, 0.0), 0.009, 0.011, points, repeats);
    }

    /** NONE: nothing shared; ANALYSIS: one analysis-only session; WARM: one warm session; CHAINS: warm, fresh every 8 points (as `sweep` runs). */
    private enum Variant { NONE, ANALYSIS, WARM, CHAINS_OF_8 }

    private record Run(List<ModeSet> results, double seconds, SolveSession session) {
    }

    private static void report(String name, SolveSettings settings, DoubleFunction<CrossSection> shape, double from,
                               double to, int points, int repeats) {
        Variant[] variants = Variant.values();
        Run[] best = new Run[variants.length];
        for (int r = 0; r < repeats; r++) {
            for (int v = 0; v < variants.length; v++) {
                System.gc();
                Run run = run(settings, shape, from, to, points, variants[v]);
                if (best[v] == null || run.seconds() < best[v].seconds()) {
                    best[v] = run;
                }
            }
        }
        Run base = best[0];
        for (int v = 0; v < variants.length; v++) {
            Run r = best[v];
            double diff = 0;
            for (int p = 0; p < points; p++) {
                var ref = base.results().get(p).modes();
                var got = r.results().get(p).modes();
                for (int k = 0; k < ref.size(); k++) {
                    double kc = ref.get(k).cutoffWavenumber();
                    diff = Math.max(diff, Math.abs(got.get(k).cutoffWavenumber() - kc) / kc);
                }
            }
            System.out.printf(Locale.ROOT, "%-26s %-12s %9.2f %8.3f %9.2f %16s %12s %13.1e%n", name, variants[v],
                    r.seconds(), r.seconds() / points, base.seconds() / r.seconds(),
                    r.session() == null ? "-" : r.session().analysesReused() + "/"
                            + (r.session().analysesReused() + r.session().analysesMade()),
                    r.session() == null ? "-" : Integer.toString(r.session().warmStarts()), diff);
        }
    }

    private static Run run(SolveSettings settings, DoubleFunction<CrossSection> shape, double from, double to,
                           int points, Variant variant) {
        SolveSession session = switch (variant) {
            case NONE -> null;
            case ANALYSIS -> SolveSession.create();
            case WARM, CHAINS_OF_8 -> SolveSession.createWarm();
        };
        SolveSession first = session;
        List<ModeSet> results = new ArrayList<>();
        long start = processCpuNanos();
        for (int p = 0; p < points; p++) {
            if (variant == Variant.CHAINS_OF_8 && p > 0 && p % 8 == 0) {
                session = SolveSession.createWarm();
            }
            double value = from + (to - from) * p / (points - 1);
            results.add(ModeSolver.solve(shape.apply(value), settings, SolveProgress.SILENT, session));
        }
        return new Run(results, (processCpuNanos() - start) * 1e-9, first);
    }

    /** CPU time of this JVM, all threads: steadier than wall time on a machine shared with other jobs. */
    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }
}
