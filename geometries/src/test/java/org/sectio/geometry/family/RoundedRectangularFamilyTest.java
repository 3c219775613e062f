package org.sectio.geometry.family;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.sectio.geometry.family.FamilyAssertions.assertRefused;

import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.WallPiece;

/**
 * The rounded rectangle against elementary geometry: each corner of radius r loses (1 − π/4) r² of
 * area and 2r − πr/2 of wall, so area ab − (4 − π) r² and perimeter 2(a + b) − (8 − 2π) r; at r = b/2
 * the stadium, area (a − b) b + π b²/4 and perimeter 2(a − b) + π b; a rounded corner's wall lies on
 * the circle (x − xc)² + (y − yc)² = r².
 */
class RoundedRectangularFamilyTest {

    /** Green's-theorem areas of exact segments and arcs: measured ≤ 4e-16 relative, bound 2e-15. */
    private static final double AREA_ACCURACY = 2e-15;

    private static final double A = 22.86e-3;
    private static final double B = 10.16e-3;

    private static GuideSection rounded(double r) {
        return GuideFamilies.byName("rounded_rectangular").build(Map.of("width", A, "height", B, "corner_radius", r));
    }

    @Test
    @DisplayName("Area is ab − (4 − π) r² and perimeter 2(a + b) − (8 − 2π) r for radii across the allowed range")
    void areaAndPerimeterFollowTheCornerFormula() {
        for (double r : new double[] {0.25e-3, 1e-3, 3.3e-3, 5.0e-3}) {
            GuideSection s = rounded(r);
            // measured: area ≤ 4e-16 relative, perimeter ≤ 5e-16 relative
            assertEquals(A * B - (4 - Math.PI) * r * r, s.interior().area(), AREA_ACCURACY * A * B, "r = " + r);
            assertEquals(2 * (A + B) - (8 - 2 * Math.PI) * r, WallMeasures.length(s.wallPieces()), WallMeasures.RELATIVE_ACCURACY * (2 * (A + B) - (8 - 2 * Math.PI) * r), "r = " + r);
            assertEquals(4, WallMeasures.straightCount(s.wallPieces()), "four straight sides, r = " + r);
        }
    }

    @Test
    @DisplayName("Radius 0 gives exactly the pieces of the plain rectangle, hence the same area and crossings")
    void radiusZeroIsThePlainRectangle() {
        GuideSection plain = GuideFamilies.byName("rectangular").build(Map.of("width", A, "height", B));
        GuideSection sharp = rounded(0);
        assertEquals(plain.wallPieces(), sharp.wallPieces());
        assertEquals(plain.interior().area(), sharp.interior().area(), 0.0);
        for (double y : new double[] {-5.0e-3, 0, 4.9e-3}) {
            assertArrayEquals(plain.wallCrossingsAtY(y), sharp.wallCrossingsAtY(y), 0.0);
        }
    }

    @Test
    @DisplayName("A line through a rounded corner crosses the wall where the corner circle says")
    void cornerWallLiesOnItsCircle() {
        double r = 3e-3;
        GuideSection s = rounded(r);
        double yc = B / 2 - r;
        for (double y : new double[] {yc + 0.1e-3, yc + 1.7e-3, yc + 2.95e-3}) {
            double half = A / 2 - r + Math.sqrt(r * r - (y - yc) * (y - yc));
            assertArrayEquals(new double[] {-half, half}, s.wallCrossingsAtY(y), 1e-16, "y = " + y);
            assertArrayEquals(new double[] {-half, half}, s.wallCrossingsAtY(-y), 1e-16, "y = " + -y);
        }
        assertFalse(s.contains(A / 2 - 0.2e-3, B / 2 - 0.2e-3), "the corner itself is metal now");
        assertTrue(s.contains(A / 2 - 0.2e-3, 0), "the middle of the side wall is unchanged");
    }

    @Test
    @DisplayName("Radius half the short side is the stadium: two straight sides, area (a − b) b + πb²/4, perimeter 2(a − b) + πb")
    void halfTheShortSideGivesTheStadium() {
        GuideSection s = rounded(B / 2);
        assertEquals((A - B) * B + Math.PI * B * B / 4, s.interior().area(), AREA_ACCURACY * A * B);
        assertEquals(2 * (A - B) + Math.PI * B, WallMeasures.length(s.wallPieces()), WallMeasures.RELATIVE_ACCURACY * (2 * (A - B) + Math.PI * B));
        assertEquals(2, WallMeasures.straightCount(s.wallPieces()), "the narrow walls vanish");
        assertTrue(WallMeasures.shortestChord(s.wallPieces()) > 1e-3 * B, "no zero-length piece at the vanished sides");
        assertArrayEquals(new double[] {-A / 2, A / 2}, s.wallCrossingsAtY(1e-9), 1e-15, "the ends are reached at y = 0");
    }

    @Test
    @DisplayName("A square with radius half its side is a circle of four quarter arcs and no straight piece")
    void squareWithFullRadiusIsACircle() {
        double side = 10e-3;
        GuideSection s = GuideFamilies.byName("rounded_rectangular")
                .build(Map.of("width", side, "height", side, "corner_radius", side / 2));
        assertEquals(Math.PI * side * side / 4, s.interior().area(), AREA_ACCURACY * side * side);
        assertEquals(0, WallMeasures.straightCount(s.wallPieces()));
        for (WallPiece p : s.wallPieces()) {
            double mid = 0.5 * (p.startParameter() + p.endParameter());
            assertEquals(side / 2, Math.hypot(p.x(mid), p.y(mid)), 1e-17, "every piece lies on the circle");
        }
    }

    @Test
    @DisplayName("Each rule of rounded_rectangular is enforced with a message naming the bound in mm")
    void roundedRectangleRules() {
        assertRefused("rounded_rectangular", Map.of("width", 0.0), "rounded_rectangular: width must be > 0, got 0 mm");
        assertRefused("rounded_rectangular", Map.of("height", 0.0), "rounded_rectangular: height must be > 0, got 0 mm");
        assertRefused("rounded_rectangular", Map.of("corner_radius", 5.1e-3),
                "rounded_rectangular: corner_radius must be ≥ 0 and ≤ half the shorter side (5.08 mm), got 5.1 mm");
        assertRefused("rounded_rectangular", Map.of("corner_radius", -0.1e-3),
                "rounded_rectangular: corner_radius must be ≥ 0 and ≤ half the shorter side (5.08 mm), got -0.1 mm");
        assertRefused("rounded_rectangular", Map.of("width", 8e-3, "corner_radius", 4.5e-3),
                "rounded_rectangular: corner_radius must be ≥ 0 and ≤ half the shorter side (4 mm), got 4.5 mm");
    }
}
