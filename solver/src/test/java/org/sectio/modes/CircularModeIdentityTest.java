package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.TensorGrid;

/**
 * Textbook indices of circular-guide modes found from the computed fields, against the closed form:
 * TE_nm has kc R = j′_nm and TM_nm has kc R = j_nm, every n ≥ 1 mode a degenerate pair (Pozar,
 * Microwave Engineering, 4th ed., §3.4). The zeros come from Commons Math's BesselJ and a Brent root
 * finder ({@link CircularGuideCutoffTest}, which checks them against Abramowitz &amp; Stegun Table 9.5).
 * Each family is solved on its own so that the lists reach radial index 2 (TE12, TE02, TM02).
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class CircularModeIdentityTest {

    private static final double R = 0.010;
    /** Off the origin, so nothing depends on the centre's coordinates. */
    private final CrossSection circle = Shapes.circle(R, 0.3e-3, -0.2e-3);

    /** The lowest modes on a 100-cell grid shifted off the circle's centre and extreme points. */
    private ModeSet solve(int count, Set<ModeFamily> families) {
        return ModeSolver.solveOnGrid(circle, TensorGrid.shifted(circle.bounds(), 100, 0.37, 0.61),
                new SolveSettings(count, families, 100, Double.NaN, false, 2), SolveProgress.SILENT);
    }

    private record Expected(int n, int m, double zero) {
    }

    /** The lowest {@code count} modes of one family, with multiplicity (two for n ≥ 1), ascending. */
    private static List<Expected> expected(ModeFamily family, int count) {
        List<Expected> all = new ArrayList<>();
        for (int n = 0; n <= 8; n++) {
            for (int m = 1; m <= 3; m++) {
                double zero = family == ModeFamily.TE ? CircularGuideCutoffTest.besselDerivativeZero(n, m)
                        : CircularGuideCutoffTest.besselZero(n, m);
                all.add(new Expected(n, m, zero));
                if (n > 0) {
                    all.add(new Expected(n, m, zero));
                }
            }
        }
        all.sort(Comparator.comparingDouble(Expected::zero));
        return all.subList(0, count);
    }

    private void assertIndices(ModeFamily family, int count) {
        ModeSet set = solve(count, EnumSet.of(family));
        List<Expected> want = expected(family, count);
        List<ModeIdentity> ids = ModeIdentifier.identify(circle, set);
        for (int k = 0; k < count; k++) {
            ModeIdentity id = ids.get(k);
            Expected e = want.get(k);
            assertEquals(GuideShape.CIRCULAR, id.shape());
            assertEquals(e.n() + "," + e.m(), id.firstIndex() + "," + id.secondIndex(),
                    family + " mode " + (k + 1) + " (" + id.label() + ", kc R = " + set.modes().get(k).cutoffWavenumber() * R
                            + ", expected " + e.zero() + ")");
            // measured purity ≥ 0.99999887 over these 24 modes at 100 cells
            assertTrue(id.indexPurity() > 0.9999, id.label() + " purity " + id.indexPurity());
        }
    }

    @Test
    @DisplayName("The sixteen lowest TE modes of a circle are TE11×2, TE21×2, TE01, TE31×2, TE41×2, TE12×2, TE51×2, TE22×2, TE02 by their fields")
    void teModesGetTheirBesselIndices() {
        assertIndices(ModeFamily.TE, 16);
    }

    @Test
    @DisplayName("The eight lowest TM modes of a circle are TM01, TM11×2, TM21×2, TM02, TM31×2 by their fields")
    void tmModesGetTheirBesselIndices() {
        assertIndices(ModeFamily.TM, 8);
    }

    @Test
    @DisplayName("Both members of the TE11 doublet are labelled TE11 (circular)")
    void bothMembersOfTheDoubletShareTheLabel() {
        ModeSet set = solve(3, EnumSet.of(ModeFamily.TE, ModeFamily.TM));
        List<ModeIdentity> ids = ModeIdentifier.identify(circle, set);
        assertEquals("TE11 (circular)", ids.get(0).label());
        assertEquals("TE11 (circular)", ids.get(1).label());
        assertEquals("TM01 (circular)", ids.get(2).label());
        assertTrue(ids.get(0).sameTextbookMode(ids.get(1)));
    }
}
