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

/**
 * The plain families against elementary geometry: area a·b and perimeter 2(a + b) of a rectangle,
 * πR² and 2πR of a circle, πab of an ellipse and its perimeter by the Gauss–Kummer series,
 * π(R² − r²) of the coaxial annulus; wall crossings from each curve's equation.
 */
class PlainFamiliesTest {

    /** Green's-theorem areas of exact segments and arcs: measured ≤ 4e-16 relative, bound 2e-15. */
    private static final double AREA_ACCURACY = 2e-15;

    private static GuideSection build(String family, Map<String, Double> values) {
        return GuideFamilies.byName(family).build(values);
    }

    @Test
    @DisplayName("The default rectangle is WR-90, 22.86 × 10.16 mm, centred: area ab, perimeter 2(a + b), walls at ±a/2 and ±b/2")
    void rectangleDefaultsToWr90Centred() {
        GuideSection s = build("rectangular", Map.of());
        double a = 22.86e-3;
        double b = 10.16e-3;
        assertEquals(a * b, s.interior().area(), AREA_ACCURACY * a * b);
        assertEquals(2 * (a + b), WallMeasures.length(s.wallPieces()), 1e-15 * (a + b));
        assertEquals(4, s.wallPieces().size());
        assertArrayEquals(new double[] {-a / 2, a / 2}, s.wallCrossingsAtY(0.3e-3), 0.0);
        assertArrayEquals(new double[] {-b / 2, b / 2}, s.wallCrossingsAtX(-0.7e-3), 0.0);
    }

    @Test
    @DisplayName("A circle of radius R has area πR², perimeter 2πR and crossings ±√(R² − y²)")
    void circleMatchesItsEquation() {
        double r = 7e-3;
        GuideSection s = build("circular", Map.of("radius", r));
        assertEquals(Math.PI * r * r, s.interior().area(), AREA_ACCURACY * r * r);
        assertEquals(2 * Math.PI * r, WallMeasures.length(s.wallPieces()), WallMeasures.RELATIVE_ACCURACY * (2 * Math.PI * r));
        for (double y : new double[] {-6.9e-3, -2.1e-3, 0.4e-3, 5.5e-3}) {
            double half = Math.sqrt(r * r - y * y);
            assertArrayEquals(new double[] {-half, half}, s.wallCrossingsAtY(y), 1e-16, "y = " + y);
        }
    }

    @Test
    @DisplayName("An ellipse of semi-axes a, b has area πab, the Gauss–Kummer perimeter and crossings ±a√(1 − y²/b²)")
    void ellipseMatchesItsEquation() {
        double a = 12e-3;
        double b = 8e-3;
        GuideSection s = build("elliptical", Map.of());
        assertEquals(Math.PI * a * b, s.interior().area(), AREA_ACCURACY * a * b);
        // the exact perimeter as the Gauss–Kummer series π(a + b) Σ C(1/2, n)² hⁿ, h = ((a − b)/(a + b))²
        double h = Math.pow((a - b) / (a + b), 2);
        double sum = 0;
        double coefficient = 1; // C(1/2, n)
        for (int n = 0; n < 30; n++) {
            sum += coefficient * coefficient * Math.pow(h, n);
            coefficient *= (0.5 - n) / (n + 1);
        }
        double perimeter = Math.PI * (a + b) * sum;
        assertEquals(perimeter, WallMeasures.length(s.wallPieces()), WallMeasures.RELATIVE_ACCURACY * perimeter);
        for (double y : new double[] {-7.9e-3, -3.3e-3, 0.2e-3, 6.1e-3}) {
            double half = a * Math.sqrt(1 - y * y / (b * b));
            assertArrayEquals(new double[] {-half, half}, s.wallCrossingsAtY(y), 1e-16, "y = " + y);
        }
        for (double x : new double[] {-11.5e-3, 1.7e-3, 9.9e-3}) {
            double half = b * Math.sqrt(1 - x * x / (a * a));
            assertArrayEquals(new double[] {-half, half}, s.wallCrossingsAtX(x), 1e-16, "x = " + x);
        }
    }

    @Test
    @DisplayName("Equal semi-axes give the circle's area πR²")
    void ellipseWithEqualAxesIsACircle() {
        GuideSection s = build("elliptical", Map.of("semi_major", 5e-3, "semi_minor", 5e-3));
        assertEquals(Math.PI * 25e-6, s.interior().area(), AREA_ACCURACY * 25e-6);
    }

    @Test
    @DisplayName("A coaxial line has area π(R² − r²), wall length 2π(R + r), and a line through the axis crosses at ±r and ±R")
    void coaxialIsAnAnnulusWithTwoConductors() {
        double outer = 3.5e-3;
        double inner = 1.52e-3;
        GuideSection s = build("coaxial", Map.of());
        assertEquals(Math.PI * (outer * outer - inner * inner), s.interior().area(), AREA_ACCURACY * outer * outer);
        assertEquals(2 * Math.PI * (outer + inner), WallMeasures.loopsLength(s.conductors()), WallMeasures.RELATIVE_ACCURACY * (2 * Math.PI * (outer + inner)));
        assertEquals(2 * Math.PI * inner, WallMeasures.length(s.conductors().get(1).pieces()), WallMeasures.RELATIVE_ACCURACY * (2 * Math.PI * inner));
        assertArrayEquals(new double[] {-outer, -inner, inner, outer}, s.wallCrossingsAtY(1e-9), 1e-15);
        assertFalse(s.contains(0, 0), "the axis is inside the centre conductor");
        assertTrue(s.contains(0.5 * (inner + outer), 0), "between the conductors is inside");
    }

    @Test
    @DisplayName("The default coaxial line is the 50 Ω air line of the closed form Z0 = 60 Ω · ln(R/r)")
    void coaxialDefaultIsFiftyOhms() {
        Map<String, Double> d = GuideFamilies.byName("coaxial").defaults();
        assertEquals(50.0, 60 * Math.log(d.get("outer_radius") / d.get("inner_radius")), 0.1);
    }

    @Test
    @DisplayName("Each rule of the plain families is enforced with a one-line message naming family, parameter, rule and value in mm")
    void plainFamilyRules() {
        assertRefused("rectangular", Map.of("width", 0.0), "rectangular: width must be > 0, got 0 mm");
        assertRefused("rectangular", Map.of("height", -1e-3), "rectangular: height must be > 0, got -1 mm");
        assertRefused("circular", Map.of("radius", 0.0), "circular: radius must be > 0, got 0 mm");
        assertRefused("elliptical", Map.of("semi_major", 0.0), "elliptical: semi_major must be > 0, got 0 mm");
        assertRefused("elliptical", Map.of("semi_minor", 13e-3),
                "elliptical: semi_minor must be > 0 and ≤ semi_major (12 mm), got 13 mm");
        assertRefused("elliptical", Map.of("semi_minor", 0.0),
                "elliptical: semi_minor must be > 0 and ≤ semi_major (12 mm), got 0 mm");
        assertRefused("coaxial", Map.of("outer_radius", 0.0), "coaxial: outer_radius must be > 0, got 0 mm");
        assertRefused("coaxial", Map.of("inner_radius", 3.5e-3),
                "coaxial: inner_radius must be > 0 and < outer_radius (3.5 mm), got 3.5 mm");
        assertRefused("coaxial", Map.of("inner_radius", 0.0),
                "coaxial: inner_radius must be > 0 and < outer_radius (3.5 mm), got 0 mm");
    }
}
