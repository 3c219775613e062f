package org.sectio.geometry.family;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Outline;

/**
 * The ridged families against elementary geometry. A ridge of width s and depth h removes s·h of the
 * rectangle's area and adds 2h of wall; each rounded corner of radius r (a tip corner rounded, or a
 * fillet at the foot) replaces two legs of length r by a quarter circle, changing the wall by
 * −(2 − π/2) r and the area by +(1 − π/4) r² (tip corner: metal removed) or −(1 − π/4) r² (fillet:
 * metal added). A single or double ridge in a × b with gap d thus has area ab − s(b − d) + n(1 − π/4)
 * (rc² − rf²), n = 2 or 4. Wall crossings come from the same construction by hand: at distance u
 * from its wall a ridge's metal reaches {@link #ridgeHalfWidth} from its centre line.
 */
class RidgedFamiliesTest {

    /** Green's-theorem areas of exact segments and arcs: measured ≤ 4e-16 relative, bound 2e-15. */
    private static final double AREA_ACCURACY = 2e-15;

    private static final double A = 22.86e-3;
    private static final double B = 10.16e-3;
    private static final double QUARTER_CORNER = 1 - Math.PI / 4;
    private static final double LEGS_MINUS_ARC = 2 - Math.PI / 2;

    private static GuideSection build(String family, Map<String, Double> values) {
        return GuideFamilies.byName(family).build(values);
    }

    private static Map<String, Double> ridged(double s, double d, double rc, double rf) {
        return Map.of("width", A, "height", B, "ridge_width", s, "gap", d, "ridge_corner_radius", rc, "fillet_radius", rf);
    }

    /** Half the width of the ridge's metal at distance u from its wall (0 ≤ u ≤ depth). */
    static double ridgeHalfWidth(double w, double depth, double rc, double rf, double u) {
        if (u < rf) {
            return w + rf - Math.sqrt(rf * rf - (rf - u) * (rf - u));
        }
        if (u > depth - rc) {
            double v = u - (depth - rc);
            return w - rc + Math.sqrt(rc * rc - v * v);
        }
        return w;
    }

    /** How far the ridge's metal stands out of its wall at lateral distance q from its centre line. */
    static double ridgeReach(double w, double depth, double rc, double rf, double q) {
        if (q <= w - rc) {
            return depth;
        }
        if (q <= w) {
            double v = q - (w - rc);
            return depth - rc + Math.sqrt(rc * rc - v * v);
        }
        if (q < w + rf) {
            double v = w + rf - q;
            return rf - Math.sqrt(rf * rf - v * v);
        }
        return 0;
    }

    @Test
    @DisplayName("A sharp single ridge has area ab − s(b − d), wall 2(a + b) + 2(b − d), and the pieces of the hand-built polygon")
    void sharpSingleRidgeIsTheNotchedRectangle() {
        double s = 5.715e-3;
        double d = 3e-3;
        GuideSection ridge = build("single_ridge", ridged(s, d, 0, 0));
        assertEquals(A * B - s * (B - d), ridge.interior().area(), AREA_ACCURACY * A * B);
        assertEquals(2 * (A + B) + 2 * (B - d), WallMeasures.length(ridge.wallPieces()), 1e-14 * A);
        // the ridge hangs from the top wall; its tip is at b/2 − (b − d), written as the family writes it
        double tip = B / 2 - (B - d);
        var polygon = Outline.startAt(-A / 2, -B / 2).lineTo(A / 2, -B / 2).lineTo(A / 2, B / 2).lineTo(s / 2, B / 2)
                .lineTo(s / 2, tip).lineTo(-s / 2, tip).lineTo(-s / 2, B / 2).lineTo(-A / 2, B / 2).close();
        assertEquals(polygon, ridge.wallPieces());
        assertArrayEquals(new double[] {-A / 2, A / 2}, ridge.wallCrossingsAtY(-B / 2 + d / 2), 0.0, "in the gap");
        assertArrayEquals(new double[] {-A / 2, -s / 2, s / 2, A / 2}, ridge.wallCrossingsAtY(tip + 1e-3), 0.0, "beside the ridge");
    }

    @Test
    @DisplayName("A rounded, filleted single ridge follows the area and wall-length formulas and its corners lie on their circles")
    void roundedSingleRidgeFollowsTheFormulas() {
        double s = 6e-3;
        double d = 2.5e-3;
        double rc = 1.2e-3;
        double rf = 0.8e-3;
        GuideSection ridge = build("single_ridge", ridged(s, d, rc, rf));
        double area = A * B - s * (B - d) + 2 * QUARTER_CORNER * (rc * rc - rf * rf);
        assertEquals(area, ridge.interior().area(), AREA_ACCURACY * A * B);
        double wall = 2 * (A + B) + 2 * (B - d) - 2 * LEGS_MINUS_ARC * (rc + rf);
        assertEquals(wall, WallMeasures.length(ridge.wallPieces()), WallMeasures.RELATIVE_ACCURACY * wall);
        double depth = B - d;
        for (double u : new double[] {0.1e-3, 0.5e-3, 0.79e-3, 3e-3, depth - 1.1e-3, depth - 0.6e-3, depth - 0.05e-3}) {
            double x = ridgeHalfWidth(s / 2, depth, rc, rf, u);
            assertArrayEquals(new double[] {-A / 2, -x, x, A / 2}, ridge.wallCrossingsAtY(B / 2 - u), 1e-16, "u = " + u);
        }
    }

    @Test
    @DisplayName("A double ridge has area ab − s(b − d) + 4(1 − π/4)(rc² − rf²) and mirror-image ridges about y = 0")
    void doubleRidgeFollowsTheFormulas() {
        double s = 5.715e-3;
        double d = 3e-3;
        double rc = 0.5e-3;
        double rf = 1e-3;
        GuideSection ridge = build("double_ridge", ridged(s, d, rc, rf));
        assertEquals(A * B - s * (B - d) + 4 * QUARTER_CORNER * (rc * rc - rf * rf), ridge.interior().area(), AREA_ACCURACY * A * B);
        double wall = 2 * (A + B) + 2 * (B - d) - 4 * LEGS_MINUS_ARC * (rc + rf);
        assertEquals(wall, WallMeasures.length(ridge.wallPieces()), WallMeasures.RELATIVE_ACCURACY * wall);
        double depth = (B - d) / 2;
        assertArrayEquals(new double[] {-A / 2, A / 2}, ridge.wallCrossingsAtY(0.4 * d), 0.0, "in the gap");
        for (double u : new double[] {0.2e-3, 0.9e-3, 2e-3, depth - 0.3e-3}) {
            double x = ridgeHalfWidth(s / 2, depth, rc, rf, u);
            assertArrayEquals(new double[] {-A / 2, -x, x, A / 2}, ridge.wallCrossingsAtY(B / 2 - u), 1e-16, "top, u = " + u);
            assertArrayEquals(new double[] {-A / 2, -x, x, A / 2}, ridge.wallCrossingsAtY(-B / 2 + u), 1e-16, "bottom, u = " + u);
        }
    }

    @Test
    @DisplayName("Ridges whose radii use the whole width, the whole depth or the whole wall beside them build without degenerate pieces")
    void limitingRadiiBuildCleanly() {
        double s = 6e-3;
        double d = 4e-3;
        double depth = (B - d) / 2; // 3.08 mm
        // the limiting radii are written as the family computes its bounds, so they meet them exactly;
        // a sharp double ridge has 12 straight pieces (2 side walls, and per ridge 2 wall parts, 2 flanks, 1 tip)
        record Limit(String what, Map<String, Double> values, long straightPieces) {
        }
        var cases = java.util.List.of(
                new Limit("semicircular tips (rc = s/2): no flat tip", ridged(s, d, s / 2, 0), 10),
                new Limit("radii filling the depth (rc + rf = depth): no flank", ridged(s, d, depth - 2e-3, 2e-3), 8),
                new Limit("fillets reaching the side walls (rf = (a − s)/2): no wall beside the ridge",
                        ridged(17.5e-3, d, 0.3e-3, (A - 17.5e-3) / 2), 8));
        for (Limit limit : cases) {
            Map<String, Double> v = limit.values();
            double rc = v.get("ridge_corner_radius");
            double rf = v.get("fillet_radius");
            double w = v.get("ridge_width");
            GuideSection ridge = build("double_ridge", v);
            assertTrue(WallMeasures.shortestChord(ridge.wallPieces()) > 1e-6 * A, limit.what());
            assertEquals(limit.straightPieces(), WallMeasures.straightCount(ridge.wallPieces()), limit.what());
            double area = A * B - w * (B - d) + 4 * QUARTER_CORNER * (rc * rc - rf * rf);
            assertEquals(area, ridge.interior().area(), AREA_ACCURACY * A * B, limit.what());
            double wall = 2 * (A + B) + 2 * (B - d) - 4 * LEGS_MINUS_ARC * (rc + rf);
            assertEquals(wall, WallMeasures.length(ridge.wallPieces()), WallMeasures.RELATIVE_ACCURACY * wall, limit.what());
        }
    }

    @Test
    @DisplayName("A quad ridge has area a² − 2s(a − g) + 8(1 − π/4)(rc² − rf²) and crossings from all four ridges")
    void quadRidgeFollowsTheFormulas() {
        double a = 20e-3;
        double s = 3e-3;
        double g = 8e-3;
        double rc = 1e-3;
        double rf = 2e-3;
        GuideSection quad = build("quad_ridge", Map.of("side", a, "ridge_width", s, "gap", g,
                "ridge_corner_radius", rc, "fillet_radius", rf));
        assertEquals(a * a - 2 * s * (a - g) + 8 * QUARTER_CORNER * (rc * rc - rf * rf), quad.interior().area(), AREA_ACCURACY * a * a);
        double depth = (a - g) / 2;
        double wall = 4 * a + 8 * depth - 8 * LEGS_MINUS_ARC * (rc + rf);
        assertEquals(wall, WallMeasures.length(quad.wallPieces()), WallMeasures.RELATIVE_ACCURACY * wall);
        for (double y : new double[] {0, 0.3e-3, 1.0e-3, 1.45e-3, 2.5e-3, 3.4e-3, 3.9e-3, 4.5e-3, 6e-3, 9e-3, 9.9e-3}) {
            double side = a / 2 - ridgeReach(s / 2, depth, rc, rf, Math.abs(y));
            double[] expected = y > g / 2
                    ? new double[] {-side, -ridgeHalfWidth(s / 2, depth, rc, rf, a / 2 - y),
                        ridgeHalfWidth(s / 2, depth, rc, rf, a / 2 - y), side}
                    : new double[] {-side, side};
            Arrays.sort(expected);
            assertArrayEquals(expected, quad.wallCrossingsAtY(y), 1e-15, "y = " + y);
            assertArrayEquals(expected, quad.wallCrossingsAtX(y), 1e-15, "x = " + y + " (fourfold symmetry)");
        }
    }

    @Test
    @DisplayName("Each rule of the single and double ridge is enforced with a message naming the bound in mm")
    void singleAndDoubleRidgeRules() {
        FamilyAssertions.assertRefused("single_ridge", Map.of("width", 0.0), "single_ridge: width must be > 0, got 0 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("height", 0.0), "single_ridge: height must be > 0, got 0 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("ridge_width", 22.86e-3),
                "single_ridge: ridge_width must be > 0 and < width (22.86 mm), got 22.86 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("ridge_width", 0.0),
                "single_ridge: ridge_width must be > 0 and < width (22.86 mm), got 0 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("gap", 0.0),
                "single_ridge: gap must be > 0 and < height (10.16 mm), got 0 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("gap", 10.16e-3),
                "single_ridge: gap must be > 0 and < height (10.16 mm), got 10.16 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("ridge_width", 12e-3, "fillet_radius", 6e-3),
                "single_ridge: fillet_radius must be ≥ 0, ≤ (width − ridge_width) / 2 (5.43 mm) and ≤ ridge depth (7.16 mm), got 6 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("fillet_radius", 7.5e-3),
                "single_ridge: fillet_radius must be ≥ 0, ≤ (width − ridge_width) / 2 (8.5725 mm) and ≤ ridge depth (7.16 mm), got 7.5 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("fillet_radius", -1e-3),
                "single_ridge: fillet_radius must be ≥ 0, ≤ (width − ridge_width) / 2 (8.5725 mm) and ≤ ridge depth (7.16 mm), got -1 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("ridge_corner_radius", 3e-3),
                "single_ridge: ridge_corner_radius must be ≥ 0, ≤ ridge_width / 2 (2.8575 mm) and ≤ ridge depth − fillet_radius (7.16 mm), got 3 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("ridge_corner_radius", 2.5e-3, "fillet_radius", 5e-3),
                "single_ridge: ridge_corner_radius must be ≥ 0, ≤ ridge_width / 2 (2.8575 mm) and ≤ ridge depth − fillet_radius (2.16 mm), got 2.5 mm");
        FamilyAssertions.assertRefused("single_ridge", Map.of("ridge_corner_radius", -0.5e-3),
                "single_ridge: ridge_corner_radius must be ≥ 0, ≤ ridge_width / 2 (2.8575 mm) and ≤ ridge depth − fillet_radius (7.16 mm), got -0.5 mm");
        FamilyAssertions.assertRefused("double_ridge", Map.of("gap", 0.0),
                "double_ridge: gap must be > 0 and < height (10.16 mm), got 0 mm");
        FamilyAssertions.assertRefused("double_ridge", Map.of("fillet_radius", 4e-3),
                "double_ridge: fillet_radius must be ≥ 0, ≤ (width − ridge_width) / 2 (8.5725 mm) and ≤ ridge depth (3.58 mm), got 4 mm");
        FamilyAssertions.assertRefused("double_ridge", Map.of("ridge_corner_radius", 2e-3, "fillet_radius", 2e-3),
                "double_ridge: ridge_corner_radius must be ≥ 0, ≤ ridge_width / 2 (2.8575 mm) and ≤ ridge depth − fillet_radius (1.58 mm), got 2 mm");
    }

    @Test
    @DisplayName("Each rule of the quad ridge is enforced with a message naming the bound in mm")
    void quadRidgeRules() {
        FamilyAssertions.assertRefused("quad_ridge", Map.of("side", 0.0), "quad_ridge: side must be > 0, got 0 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("gap", 20e-3), "quad_ridge: gap must be > 0 and < side (20 mm), got 20 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("gap", 0.0), "quad_ridge: gap must be > 0 and < side (20 mm), got 0 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("ridge_width", 4e-3),
                "quad_ridge: ridge_width must be > 0 and < gap (4 mm), got 4 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("ridge_width", 0.0),
                "quad_ridge: ridge_width must be > 0 and < gap (4 mm), got 0 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("fillet_radius", 8.5e-3),
                "quad_ridge: fillet_radius must be ≥ 0 and ≤ ridge depth (8 mm), got 8.5 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("ridge_corner_radius", 1.6e-3),
                "quad_ridge: ridge_corner_radius must be ≥ 0, ≤ ridge_width / 2 (1.5 mm) and ≤ ridge depth − fillet_radius (8 mm), got 1.6 mm");
        FamilyAssertions.assertRefused("quad_ridge", Map.of("ridge_corner_radius", 1e-3, "fillet_radius", 7.5e-3),
                "quad_ridge: ridge_corner_radius must be ≥ 0, ≤ ridge_width / 2 (1.5 mm) and ≤ ridge depth − fillet_radius (0.5 mm), got 1 mm");
    }
}
