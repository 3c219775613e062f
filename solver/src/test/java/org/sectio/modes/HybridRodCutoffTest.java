package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.mesh.TensorGrid;

/**
 * The circular guide with a concentric dielectric rod of {@link DielectricRodGuideTest} (εr = 4, r0 =
 * 0.4 R, off the grid's lines): the frequency at which the dominant hybrid mode's β² passes through 0
 * must be the scalar TE11-like cutoff of the library on the same grid, and both must approach the
 * Bessel-function cutoff of that class (its Hz match of order n = 1; Collin, Field Theory of Guided
 * Waves, ch. 6, and Harrington §5 for the rod-loaded guide, from memory). The cutoff of this solver is
 * found by secant iteration in k0² on β²(k0) of the dominant mode. The two discrete cutoffs differ
 * because the scalar Hz scheme carries the off-diagonal smoothed εr⁻¹ tensor at the curved interface
 * and the vector scheme only the diagonal one.
 */
class HybridRodCutoffTest {

    /** β² nearest 0 at k0, from shift-invert about τ = 0.05 k0² (off the singular point β² = 0). */
    private static double betaSquaredNearZero(HybridModeSolver.Prepared prepared, double k0) {
        double f = k0 * ModeSolver.SPEED_OF_LIGHT / (2 * Math.PI);
        double best = Double.NaN;
        for (HybridMode m : prepared.solveAt(f, 3, 0.05 * k0 * k0, List.of(), SolveProgress.SILENT).modes()) {
            if (Double.isNaN(best) || Math.abs(m.betaSquaredReal()) < Math.abs(best)) {
                best = m.betaSquaredReal();
            }
        }
        return best;
    }

    /** k0 at which a β² passes through 0 near a guess, by secant steps in k0² from ±1 % around it. */
    static double hybridCutoff(HybridModeSolver.Prepared prepared, double guess) {
        double ua = Math.pow(0.99 * guess, 2);
        double ub = Math.pow(1.01 * guess, 2);
        double ga = betaSquaredNearZero(prepared, Math.sqrt(ua));
        double gb = betaSquaredNearZero(prepared, Math.sqrt(ub));
        for (int it = 0; it < 8 && Math.abs(gb) > 1e-10 * ub; it++) {
            double uc = ub - gb * (ub - ua) / (gb - ga);
            ua = ub;
            ga = gb;
            ub = uc;
            gb = betaSquaredNearZero(prepared, Math.sqrt(ub));
        }
        return Math.sqrt(ub);
    }

    @Test
    void hybridModesReachBetaZeroAtTheScalarCutoffsOfBothFamilies() {
        CrossSection guide = DielectricRodGuideTest.rodGuide();
        double exactTe = DielectricRodGuideTest.hzCutoff(1, 4.0);
        int[] cells = {48, 96};
        double[] teGap = new double[cells.length];
        double[] tmGap = new double[cells.length];
        StringBuilder report = new StringBuilder();
        for (int k = 0; k < cells.length; k++) {
            TensorGrid grid = TensorGrid.shifted(guide.bounds(), cells[k], 0.37, 0.61);
            ModeSet scalar = ModeSolver.solveOnGrid(guide, grid, new SolveSettings(3,
                    EnumSet.of(ModeFamily.TE, ModeFamily.TM), cells[k], Double.NaN, false, 1), SolveProgress.SILENT);
            double te = scalar.modes().stream().filter(m -> m.family() == ModeFamily.TE).findFirst().orElseThrow()
                    .cutoffWavenumber();
            double tm = scalar.modes().stream().filter(m -> m.family() == ModeFamily.TM).findFirst().orElseThrow()
                    .cutoffWavenumber();
            HybridModeSolver.Prepared prepared = HybridModeSolver.prepare(guide, grid);
            double hybridTe = hybridCutoff(prepared, te);
            double hybridTm = hybridCutoff(prepared, tm);
            teGap[k] = Math.abs(hybridTe / te - 1);
            tmGap[k] = Math.abs(hybridTm / tm - 1);
            report.append(String.format(Locale.ROOT, "%d cells: TE11-like scalar %.8f, hybrid %.8f (Bessel %.8f), gap"
                    + " %.2e; TM01-like scalar %.8f, hybrid %.8f, gap %.2e rad/m%n", cells[k], te, hybridTe, exactTe,
                    teGap[k], tm, hybridTm, tmGap[k]));
        }
        System.out.print(report);
        // TM: the Ez part of the vector scheme is the scalar Ez pencil exactly; measured gaps 1.2e-14 and 3.9e-14
        assertTrue(tmGap[0] < 1e-8 && tmGap[1] < 1e-8, report.toString());
        // TE: the scalar Hz scheme has the off-diagonal tensor term, the vector one not; measured gaps 1.33e-3 (48)
        // and 6.6e-4 (96 cells), first order, as the vector TE11-like error against Bessel (−1.5e-3, −7.2e-4)
        assertTrue(teGap[1] < teGap[0] && teGap[1] < 1e-3, report.toString());
    }

    /**
     * The HE11-type pair of the rod-loaded circle is degenerate (two polarizations); on a grid shifted
     * off the guide's axes the discrete pair splits slightly and the projected Arnoldi matrix once
     * made Commons Math's Schur iteration give up (the fallback of SmallEigen now takes over). Both
     * copies must come out, converged.
     */
    @Test
    void bothPolarizationsOfTheDominantPairOnAShiftedGrid() {
        CrossSection guide = DielectricRodGuideTest.rodGuide();
        HybridModeSolver.Prepared prepared = HybridModeSolver.prepare(guide,
                TensorGrid.shifted(guide.bounds(), 80, 0.37, 0.61));
        List<HybridMode> modes = prepared.solveAt(12e9, 8, Double.NaN, List.of(), SolveProgress.SILENT).modes();
        double first = modes.get(0).phaseConstant();
        double second = modes.get(1).phaseConstant();
        // measured: 274.979 and 274.973 rad/m (split 2.2e-5), the next mode at 218.73 rad/m
        assertTrue(Math.abs(first / second - 1) < 1e-3 && modes.get(2).phaseConstant() < 0.9 * second,
                "β of the first three: " + first + ", " + second + ", " + modes.get(2).phaseConstant());
        for (HybridMode m : modes) {
            assertTrue(m.relativeResidual() < 1e-10, m.label() + " residual " + m.relativeResidual());
        }
    }
}
