package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.TensorGrid;

/**
 * Textbook indices of rectangular-guide modes found from the computed fields, against the closed
 * form kc = π √((m/a)² + (n/b)²) with TE_mn (m, n ≥ 0, not both 0) and TM_mn (m, n ≥ 1) and the field
 * patterns Hz ∝ cos(mπx/a) cos(nπy/b), Ez ∝ sin(mπx/a) sin(nπy/b) (Pozar, Microwave Engineering,
 * 4th ed., §3.3). The expected lists are built here from the closed form and sorted by kc; within each
 * family the k-th computed mode must carry the k-th expected indices, so the TE11/TM11 degeneracy
 * (one kc, two families) is resolved by family, not by sort position.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class RectangularModeIdentityTest {

    /** A textbook mode: family, m, n and kc². */
    private record Expected(ModeFamily family, int m, int n, double kc2) {
    }

    /** The {@code count} lowest modes of an a × b rectangle from the closed form, ascending kc. */
    static List<int[]> expected(double a, double b, int count, ModeFamily family) {
        List<Expected> all = new ArrayList<>();
        for (int m = 0; m <= 12; m++) {
            for (int n = 0; n <= 12; n++) {
                double kc2 = Math.pow(m * Math.PI / a, 2) + Math.pow(n * Math.PI / b, 2);
                if (m + n > 0) {
                    all.add(new Expected(ModeFamily.TE, m, n, kc2));
                }
                if (m > 0 && n > 0) {
                    all.add(new Expected(ModeFamily.TM, m, n, kc2));
                }
            }
        }
        all.sort(Comparator.comparingDouble(Expected::kc2).thenComparing(Expected::family));
        List<int[]> out = new ArrayList<>();
        for (Expected e : all.subList(0, count)) {
            if (e.family() == family) {
                out.add(new int[] {e.m(), e.n()});
            }
        }
        return out;
    }

    private static void assertFamilyIndices(CrossSection section, ModeSet set, double a, double b) {
        List<ModeIdentity> ids = ModeIdentifier.identify(section, set);
        for (ModeFamily f : List.of(ModeFamily.TE, ModeFamily.TM)) {
            List<int[]> want = expected(a, b, set.modes().size(), f);
            List<ModeIdentity> got = new ArrayList<>();
            for (int k = 0; k < ids.size(); k++) {
                if (set.modes().get(k).family() == f) {
                    got.add(ids.get(k));
                }
            }
            assertEquals(want.size(), got.size(), f + " modes among the lowest " + set.modes().size());
            for (int k = 0; k < want.size(); k++) {
                ModeIdentity id = got.get(k);
                int m = want.get(k)[0];
                int n = want.get(k)[1];
                assertEquals(GuideShape.RECTANGULAR, id.shape());
                assertEquals(m + "," + n, id.firstIndex() + "," + id.secondIndex(), f + " mode " + (k + 1) + " ("
                        + id.label() + ")");
                // measured purity ≥ 0.99999999986 on both grids (the discrete modes are nearly the closed form)
                assertTrue(id.indexPurity() > 0.999, id.label() + " purity " + id.indexPurity());
                // cos(mπx/a) is even about x = a/2 for even m and odd for odd m; sin(mπx/a) the other way
                // round (the field patterns of Pozar §3.3); measured |agreement| ≥ 1 − 4e-6
                Parity aboutVertical = (m + (f == ModeFamily.TM ? 1 : 0)) % 2 == 0 ? Parity.EVEN : Parity.ODD;
                Parity aboutHorizontal = (n + (f == ModeFamily.TM ? 1 : 0)) % 2 == 0 ? Parity.EVEN : Parity.ODD;
                assertEquals(aboutVertical, id.aboutVertical().parity(), id.label() + " about x = a/2");
                assertEquals(aboutHorizontal, id.aboutHorizontal().parity(), id.label() + " about y = b/2");
                assertTrue(Math.abs(id.aboutVertical().agreement()) > 0.9999, id.label() + " " + id.aboutVertical());
                assertTrue(Math.abs(id.aboutHorizontal().agreement()) > 0.9999, id.label() + " " + id.aboutHorizontal());
            }
        }
    }

    @Test
    @DisplayName("The ten lowest modes of a 22.86 × 10.16 mm guide get the mn of the closed form, TE11 and TM11 included")
    void wr90LowestTenGetTheirTextbookIndices() {
        double a = 22.86e-3;
        double b = 10.16e-3;
        CrossSection guide = Shapes.rectangle(a, b);
        ModeSet set = ModeSolver.solve(guide, new SolveSettings(10, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 100,
                Double.NaN, false, 2), SolveProgress.SILENT);
        assertFamilyIndices(guide, set, a, b);
        assertEquals("TE10", ModeIdentifier.identify(guide, set.modes().get(0)).label());
        // the closed-form list itself: TE11 and TM11 share kc, and TE31/TM31 close the ten
        assertEquals(List.of("10", "20", "01", "11", "30", "21", "31"), expected(a, b, 10, ModeFamily.TE).stream()
                .map(mn -> "" + mn[0] + mn[1]).toList());
    }

    @Test
    @DisplayName("A 30 × 18 mm guide on a grid whose lines miss the walls has TE01 below TE20, and both are named so")
    void squatGuideOnAShiftedGridGetsItsIndices() {
        double a = 30e-3;
        double b = 18e-3;
        CrossSection guide = Shapes.rectangle(a, b);
        ModeSet set = ModeSolver.solveOnGrid(guide, TensorGrid.shifted(guide.bounds(), 90, 0.37, 0.61),
                new SolveSettings(8, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 90, Double.NaN, false, 2),
                SolveProgress.SILENT);
        assertFamilyIndices(guide, set, a, b);
        // (b/a)² = 0.36 < 1/4 fails, so TE01 (kc = π/b) lies below TE20 (kc = 2π/a)
        assertTrue(a / b < 2);
        assertEquals("TE01", ModeIdentifier.identify(guide, set.modes().get(1)).label());
    }
}
