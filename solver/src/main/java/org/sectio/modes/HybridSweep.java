package org.sectio.modes;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import org.sectio.operator.YeePencil;

/**
 * Hybrid modes over a band, followed from frequency to frequency so that each dispersion curve is one
 * mode. Every frequency is solved on the same grid with the same assembled operator and
 * nested-dissection analysis, and Arnoldi starts from the previous frequency's eigenvectors. A mode
 * is matched to the curve whose last eigenvector it overlaps most, |⟨h_a, h_b⟩_W| / (‖h_a‖_W ‖h_b‖_W)
 * with the edge weights W = ℓ d (the discrete ∫ Ht·Ht* dA), greedily from the largest overlap down;
 * below {@value #MATCH_OVERLAP} a mode starts a new curve. Near a crossing the two fields differ in
 * pattern, so the overlap follows each through it where an ordering by β would swap them.
 */
public final class HybridSweep {

    /** Least overlap for a mode to continue a curve. */
    public static final double MATCH_OVERLAP = 0.5;

    /**
     * One tracked mode over the band; NaN where it was not among the computed modes.
     *
     * @param label e.g. "H-like 1", from the frequency where the curve starts (its index there)
     * @param phaseConstant β′ per frequency, rad/m
     * @param attenuation α per frequency, Np/m
     * @param modes the mode at each frequency, or null
     */
    public record Curve(String label, double[] phaseConstant, double[] attenuation, List<HybridMode> modes) {
    }

    /**
     * @param frequenciesHz the band, Hz
     * @param sets the solve at each frequency (modes by descending Re β²)
     * @param curves the tracked curves, ordered by where they start and then by β
     * @param assemblySeconds time spent cutting, assembling and analysing (once with reuse)
     * @param solveSeconds time of the frequency solves
     */
    public record Result(double[] frequenciesHz, List<HybridModeSet> sets, List<Curve> curves, double assemblySeconds,
                         double solveSeconds) {
    }

    private HybridSweep() {
    }

    /**
     * @param prepare makes the prepared problem (called once with reuse, at every frequency without)
     * @param frequenciesHz ascending, Hz
     * @param count modes per frequency
     * @param reuse whether to keep the assembly and analysis and start from the previous eigenvectors
     * @param progress told of each frequency
     * @return the sweep
     * @throws SolveException if a frequency cannot be solved
     */
    public static Result run(Supplier<HybridModeSolver.Prepared> prepare, double[] frequenciesHz, int count,
                             boolean reuse, SolveProgress progress) {
        long t0 = System.nanoTime();
        HybridModeSolver.Prepared prepared = prepare.get();
        double assembly = prepared.assemblySeconds();
        List<HybridModeSet> sets = new ArrayList<>();
        List<HybridMode> previous = List.of();
        for (int i = 0; i < frequenciesHz.length; i++) {
            if (!reuse && i > 0) {
                prepared = prepare.get();
                assembly += prepared.assemblySeconds();
            }
            progress.report(String.format(Locale.ROOT, "hybrid sweep: %d of %d", i + 1, frequenciesHz.length),
                    (double) i / frequenciesHz.length);
            HybridModeSet set = prepared.solveAt(frequenciesHz[i], count, Double.NaN, reuse ? previous : List.of(),
                    SolveProgress.SILENT);
            sets.add(set);
            previous = set.modes();
        }
        List<Curve> curves = track(prepared.pencil(), frequenciesHz, sets);
        double total = (System.nanoTime() - t0) * 1e-9;
        return new Result(frequenciesHz.clone(), sets, curves, assembly, total - assembly);
    }

    /** Follows the modes of successive sets by overlap (see the class comment). */
    static List<Curve> track(YeePencil pencil, double[] frequenciesHz, List<HybridModeSet> sets) {
        double[] w = pencil.edgeWeight();
        int points = frequenciesHz.length;
        List<HybridMode[]> paths = new ArrayList<>();
        List<HybridMode> last = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < points; i++) {
            List<HybridMode> modes = sets.get(i).modes();
            int c = last.size();
            double[][] overlap = new double[c][modes.size()];
            List<int[]> candidates = new ArrayList<>();
            for (int a = 0; a < c; a++) {
                for (int b = 0; b < modes.size(); b++) {
                    overlap[a][b] = overlap(last.get(a), modes.get(b), w);
                    if (overlap[a][b] >= MATCH_OVERLAP) {
                        candidates.add(new int[] {a, b});
                    }
                }
            }
            candidates.sort((p, q) -> Double.compare(overlap[q[0]][q[1]], overlap[p[0]][p[1]]));
            boolean[] curveTaken = new boolean[c];
            boolean[] modeTaken = new boolean[modes.size()];
            for (int[] pair : candidates) {
                if (!curveTaken[pair[0]] && !modeTaken[pair[1]]) {
                    curveTaken[pair[0]] = true;
                    modeTaken[pair[1]] = true;
                    paths.get(pair[0])[i] = modes.get(pair[1]);
                    last.set(pair[0], modes.get(pair[1]));
                }
            }
            for (int b = 0; b < modes.size(); b++) {
                if (!modeTaken[b]) {
                    HybridMode[] path = new HybridMode[points];
                    path[i] = modes.get(b);
                    paths.add(path);
                    last.add(modes.get(b));
                    labels.add(modes.get(b).label() + (i == 0 ? "" : String.format(Locale.ROOT, " from %.4g GHz",
                            frequenciesHz[i] * 1e-9)));
                }
            }
        }
        List<Curve> curves = new ArrayList<>();
        for (int k = 0; k < paths.size(); k++) {
            double[] beta = new double[points];
            double[] alpha = new double[points];
            Arrays.fill(beta, Double.NaN);
            Arrays.fill(alpha, Double.NaN);
            List<HybridMode> modes = new ArrayList<>();
            for (int i = 0; i < points; i++) {
                HybridMode m = paths.get(k)[i];
                modes.add(m);
                if (m != null) {
                    beta[i] = m.phaseConstant();
                    alpha[i] = m.attenuation();
                }
            }
            curves.add(new Curve(labels.get(k), beta, alpha, java.util.Collections.unmodifiableList(modes)));
        }
        return curves;
    }

    /** |⟨a, b⟩_W| / (‖a‖_W ‖b‖_W) for complex edge vectors. */
    static double overlap(HybridMode a, HybridMode b, double[] w) {
        double re = 0;
        double im = 0;
        double na = 0;
        double nb = 0;
        double[] ar = a.edgeVectorReal();
        double[] ai = a.edgeVectorImaginary();
        double[] br = b.edgeVectorReal();
        double[] bi = b.edgeVectorImaginary();
        for (int f = 0; f < w.length; f++) {
            re += w[f] * (ar[f] * br[f] + ai[f] * bi[f]);
            im += w[f] * (ar[f] * bi[f] - ai[f] * br[f]);
            na += w[f] * (ar[f] * ar[f] + ai[f] * ai[f]);
            nb += w[f] * (br[f] * br[f] + bi[f] * bi[f]);
        }
        return Math.hypot(re, im) / Math.sqrt(na * nb);
    }
}
