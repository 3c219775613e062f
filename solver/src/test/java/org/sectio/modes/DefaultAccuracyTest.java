package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.GuideFamilies;

/**
 * The accuracy promised at the defaults: with {@link SolveSettings#defaults()} ({@link SolveSettings#DEFAULT_CELLS} cells across,
 * estimate on) each of the first six reported cutoffs of a family's default guide is within 1e-4 of the
 * converged value, and its printed estimate is between 1 and 10 times the true error. References:
 * rectangular kc = π√((m/a)² + (n/b)²) and circular kc = j′nm/R, jnm/R (Pozar, Microwave Engineering,
 * 4th ed., §3.3–3.4); the other families by self-convergence: the order-2 Richardson extrapolation of
 * 400 and 800 cells, kc(800) + (kc(800) − kc(400))/3, whose own estimate 2|Δ|/3 is quoted beside each
 * family. The elliptical, coaxial and
 * ridged families need 800-cell references of 7 s to 2 min each (CoaxialGuideTest holds coax to its
 * cross-product roots): they, and the 1e-5 target on every family, are in
 * the benchmark org.sectio.benchmarks.DefaultAccuracyBenchmark; here the 1e-5 target is checked on the
 * rectangle, against its closed form.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class DefaultAccuracyTest {

    private static final int SHOWN = 6;
    private static final java.util.Set<String> LIGHT_REFERENCES = java.util.Set.of("elliptical", "coaxial",
            "single_ridge", "double_ridge", "quad_ridge");

    /** Reference values by "family/cells" and then by mode label; only numbers are kept, not fields. */
    private final Map<String, Map<String, Double>> references = new HashMap<>();

    private static Map<String, Double> reference(GuideSection section, int cells) {
        ModeSet set = ModeSolver.solve(section, new SolveSettings(SHOWN + 2, EnumSet.allOf(ModeFamily.class), cells,
                Double.NaN, false, 2), SolveProgress.SILENT);
        Map<String, Double> values = new HashMap<>();
        for (Mode m : set.modes()) {
            values.put(m.label(), value(m));
        }
        return values;
    }

    private static double find(Map<String, Double> set, Mode like) {
        Double v = set.get(like.label());
        if (v == null) {
            throw new AssertionError(like.label() + " missing from the reference");
        }
        return v;
    }

    private static double value(Mode m) {
        return m.family() == ModeFamily.TEM ? m.characteristicImpedanceOhms() : m.cutoffWavenumber();
    }

    /** The converged cutoff (TEM: impedance) of a mode: a closed form where there is one, else Richardson. */
    private double converged(String family, GuideSection section, Mode mode) {
        if (family.equals("rectangular") && mode.family() != ModeFamily.TEM) {
            return ClosedFormCutoffs.rectangle(22.86e-3, 10.16e-3, mode.family()).get(mode.index() - 1);
        }
        if (family.equals("coaxial") && mode.family() == ModeFamily.TE && mode.index() <= 2) {
            // the TE11 doublet, against the J1'/Y1' cross-product root (Marcuvitz §2.4): its error changes
            // sign with h, so a Richardson reference is not good enough at the 1e-6 level it reaches
            return CoaxialGuideTest.te11(1.52e-3, 3.5e-3);
        }
        if (family.equals("circular")) {
            return ClosedFormCutoffs.circle(11.0e-3, mode.family()).get(mode.index() - 1);
        }
        // the families of the second sweep use references of 320/640 cells to keep the suite fast: at 640
        // cells their errors are ≤ (240/640)² × 1e-4 ≈ 1.4e-5 before extrapolation
        int finest = LIGHT_REFERENCES.contains(family) ? 640 : 800;
        Map<String, Double> fine = references.computeIfAbsent(family + "/" + finest / 2,
                k -> reference(section, finest / 2));
        Map<String, Double> best = references.computeIfAbsent(family + "/" + finest, k -> reference(section, finest));
        double kFinest = find(best, mode);
        return kFinest + (kFinest - find(fine, mode)) / 3;
    }

    /** One line per mode that misses the 1e-4 target or whose estimate is outside [1, 10] × the true error. */
    private List<String> defaultMisses(String family) {
        GuideSection section = GuideFamilies.byName(family).buildDefault();
        ModeSet set = ModeSolver.solve(section, SolveSettings.defaults(), SolveProgress.SILENT);
        List<String> misses = new ArrayList<>();
        for (Mode m : set.modes().subList(0, SHOWN)) {
            double exact = converged(family, section, m);
            double error = Math.abs(value(m) / exact - 1);
            double ratio = m.relativeErrorEstimate() / error;
            if (!(error <= 1e-4 && ratio >= 1 && ratio <= 10)) {
                misses.add(String.format(Locale.ROOT, "%s %s: error %.2e, estimate %.2e (ratio %.2f)", family,
                        m.label(), error, m.relativeErrorEstimate(), ratio));
            }
        }
        return misses;
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"rectangular", "circular", "rounded_rectangular", "slab_loaded",
        "slab_on_broad_wall"})
    @DisplayName("At the defaults the first six cutoffs are within 1e-4 and the estimate is 1 to 10 times the true error")
    void defaultsMeetTheirTarget(String family) {
        // measured at 200 cells (error / estimate ÷ true): rectangular ≤ 9.3e-5 / 2.00; circular ≤ 4.6e-5 /
        // 1.98–2.02; rounded ≤ 9.3e-5 / 2.00. With the slab faces cutting cells the dielectric families
        // failed the estimate (slab_loaded TE1 ratio 0.34; slab_on_broad_wall ratios 0.46–0.62, TE5 error
        // 1.1e-4); the grid planner now puts lines on straight dielectric faces (ratio 2.00) and the default
        // grid is 240 cells, which leaves every case above under 1e-4 (errors scale by (200/240)² ≈ 0.69).
        // References' own estimates at 800 cells ≤ 1.7e-5.
        List<String> misses = defaultMisses(family);
        assertTrue(misses.isEmpty(), String.join("\n", misses));
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"elliptical", "single_ridge", "double_ridge", "quad_ridge"})
    @DisplayName("At the defaults the first six cutoffs of the elliptical and ridged families are within 1e-4 with an honest estimate")
    void curvedCoaxialAndRidgedDefaultsMeetTheirTarget(String family) {
        // measured at 200 cells in DefaultAccuracyBenchmark (800-cell references): elliptical 4.7e-5,
        // coaxial 5.1e-5 (TEM 2.3e-5), single ridge 5.1e-5, double ridge 9.99e-5, quad ridge 9.1e-5,
        // estimate ÷ true 1.72–2.98; the default grid is now 240 cells (errors × ≈ 0.69)
        List<String> misses = defaultMisses(family);
        assertTrue(misses.isEmpty(), String.join("\n", misses));
    }

    @Test
    @DisplayName("At the defaults the coaxial guide's first six cutoffs (TEM impedance included) are within 1e-4 with an honest estimate")
    void coaxialDefaultsMeetTheirTarget() {
        // The TE11 doublet converges at an observed order of 1.2–1.4 (errors against the J1'/Y1' root
        // 3.4e-6, 2.5e-6, 1.07e-6, 4.1e-7 at 60, 120, 240, 480 cells); an estimate that assumed order 2
        // printed 9.52e-7 for the 1.07e-6 at 240 cells (ratio 0.87). With the order read off three grids
        // (RichardsonEstimate) it is bounded.
        List<String> misses = defaultMisses("coaxial");
        assertTrue(misses.isEmpty(), String.join("\n", misses));
    }

    @Test
    @DisplayName("At the defaults the rod-loaded circular guide's first six cutoffs are within 1e-4 with an honest estimate")
    void rodLoadedDefaultsMeetTheirTarget() {
        // the known gap (Hz converging at first order at the rod) was being fixed while this was written;
        // measured with the fix in the tree: errors ≤ 5.5e-5, estimate ÷ true 5.5–8.6 (the 100-cell
        // grid is pre-asymptotic; 400→800 steps shrink 3.5–4.8×, order ≈ 2); before the fix TE1 had
        // ratio 1.01. Disable here, naming the figures, if it regresses.
        List<String> misses = defaultMisses("rod_loaded_circular");
        assertTrue(misses.isEmpty(), String.join("\n", misses));
    }

    @Test
    @DisplayName("Asking for 1e-5 picks a grid on which the rectangle's three lowest cutoffs are within 1e-5 of the closed form")
    void anAccuracyOf1e5IsReached() {
        // measured: the pilot picks 720 × 320 cells; errors 7.9e-7 (TE10), 3.2e-6 (TE20), 4.0e-6 (TE01)
        GuideSection section = GuideFamilies.byName("rectangular").buildDefault();
        ModeSet set = ModeSolver.solve(section, new SolveSettings(3, EnumSet.allOf(ModeFamily.class), 200, 1e-5, true, 2),
                SolveProgress.SILENT);
        for (Mode m : set.modes()) {
            double exact = ClosedFormCutoffs.rectangle(22.86e-3, 10.16e-3, m.family()).get(m.index() - 1);
            double error = Math.abs(m.cutoffWavenumber() / exact - 1);
            assertTrue(error <= 1e-5, m.label() + " error " + error + " on " + set.grid().cellsX() + " cells");
        }
    }
}
