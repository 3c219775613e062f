package org.sectio.geometry;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The built-in shapes against elementary analytic geometry: which points are inside, where grid-like
 * lines cross the walls, and the enclosed area. Everything the solver knows of a wall comes through
 * these queries, so an error here would move every cutoff. The expected values are computed here from
 * the shapes' defining equations (circle x² + y² = R², a rectangle in its own rotated frame, a stadium
 * as a rectangle plus two half discs), not from the outline code under test.
 */
class ShapesTest {

    private static final double R = 0.01;
    private static final double CX = 0.3e-3;
    private static final double CY = -0.2e-3;

    private static final double A = 0.020;
    private static final double B = 0.009;
    private static final double RX = 0.4e-3;
    private static final double RY = -0.3e-3;
    private static final double TURN = Math.toRadians(30);

    /** Stadium (obround) 30 × 10 mm: two 20 mm segments joined by half circles of radius 5 mm. */
    private static CrossSection stadium() {
        return Shapes.polygon("stadium 30 × 10 mm", Outline.startAt(0, 0).lineTo(0.020, 0)
                .arcTo(0.020, 0.010, Math.PI).lineTo(0, 0.010).arcTo(0, 0, Math.PI));
    }

    private static boolean insideRotatedRectangle(double x, double y) {
        double u = Math.cos(TURN) * (x - RX) + Math.sin(TURN) * (y - RY);
        double v = -Math.sin(TURN) * (x - RX) + Math.cos(TURN) * (y - RY);
        return Math.abs(u) < A / 2 && Math.abs(v) < B / 2;
    }

    /** Distance from (x, y) to the rotated rectangle's boundary, to skip points too close to call. */
    private static double distanceToRotatedRectangleWall(double x, double y) {
        double u = Math.cos(TURN) * (x - RX) + Math.sin(TURN) * (y - RY);
        double v = -Math.sin(TURN) * (x - RX) + Math.cos(TURN) * (y - RY);
        return Math.min(Math.abs(Math.abs(u) - A / 2), Math.abs(Math.abs(v) - B / 2));
    }

    /** Sum of ∮ x dy over the wall pieces: the enclosed area by Green's theorem. */
    private static double greenArea(CrossSection section) {
        double area = 0;
        for (WallPiece p : section.wallPieces()) {
            area += p.integralXdy(p.startParameter(), p.endParameter());
        }
        return area;
    }

    @Test
    @DisplayName("A circle contains the points just inside its radius and not those just outside (x² + y² < R²)")
    void circleContainsExactlyThePointsWithinItsRadius() {
        CrossSection circle = Shapes.circle(R, CX, CY);
        for (int k = 0; k < 72; k++) {
            double t = 2 * Math.PI * (k + 0.3) / 72;
            assertTrue(circle.contains(CX + 0.999 * R * Math.cos(t), CY + 0.999 * R * Math.sin(t)), "angle " + t);
            assertFalse(circle.contains(CX + 1.001 * R * Math.cos(t), CY + 1.001 * R * Math.sin(t)), "angle " + t);
        }
        assertTrue(circle.contains(CX, CY));
        assertFalse(circle.contains(CX + 0.75 * R, CY + 0.75 * R), "beyond the circle on the diagonal (0.75√2 > 1)");
    }

    @Test
    @DisplayName("A horizontal or vertical line crosses a circle at centre ± √(R² − d²)")
    void circleWallCrossingsAreTheChordEnds() {
        CrossSection circle = Shapes.circle(R, CX, CY);
        // measured worst deviation 5.2e-18 m (a few ulps of 1e-2 m); 1e-16 m bound
        for (int k = 1; k < 40; k++) {
            double d = -R + 2 * R * (k + 0.17) / 40.5;
            double half = Math.sqrt(R * R - d * d);
            assertArrayEquals(new double[] {CX - half, CX + half}, circle.wallCrossingsAtY(CY + d), 1e-16, "y offset " + d);
            assertArrayEquals(new double[] {CY - half, CY + half}, circle.wallCrossingsAtX(CX + d), 1e-16, "x offset " + d);
        }
        assertEquals(0, circle.wallCrossingsAtY(CY + 1.01 * R).length, "a line missing the circle crosses nothing");
    }

    @Test
    @DisplayName("A rectangle turned 30° contains a point exactly when |u| < a/2 and |v| < b/2 in its own frame")
    void rotatedRectangleContainsAgreesWithItsOwnFrame() {
        CrossSection box = Shapes.rotatedRectangle(A, B, RX, RY, TURN);
        Random random = new Random(7);
        int inside = 0;
        for (int k = 0; k < 20_000; k++) {
            double x = RX + (random.nextDouble() - 0.5) * 0.024;
            double y = RY + (random.nextDouble() - 0.5) * 0.020;
            if (distanceToRotatedRectangleWall(x, y) < 1e-12) {
                continue;
            }
            boolean expected = insideRotatedRectangle(x, y);
            inside += expected ? 1 : 0;
            assertEquals(expected, box.contains(x, y), "point (" + x + ", " + y + ")");
        }
        assertTrue(inside > 5000, "the sample should hit the inside often, got " + inside);
    }

    @Test
    @DisplayName("A line crosses a rectangle turned 30° at the ends of the interval where |u| ≤ a/2 and |v| ≤ b/2")
    void rotatedRectangleWallCrossingsAreTheEndsOfTheInsideInterval() {
        CrossSection box = Shapes.rotatedRectangle(A, B, RX, RY, TURN);
        double c = Math.cos(TURN);
        double s = Math.sin(TURN);
        // measured worst deviation 3.5e-18 m; 1e-16 m bound
        for (int k = 1; k < 50; k++) {
            double y = RY - 0.0089 + 0.0178 * (k + 0.21) / 50.5;
            // u = c (x − RX) + s (y − RY) and v = −s (x − RX) + c (y − RY), each linear in x
            double dy = y - RY;
            double uLow = (-A / 2 - s * dy) / c;
            double uHigh = (A / 2 - s * dy) / c;
            double vLow = (c * dy - B / 2) / s;  // v ≤ b/2  ⇔  x − RX ≥ (c dy − b/2) / s
            double vHigh = (c * dy + B / 2) / s; // v ≥ −b/2 ⇔  x − RX ≤ (c dy + b/2) / s
            double from = RX + Math.max(uLow, vLow);
            double to = RX + Math.min(uHigh, vHigh);
            assertTrue(from < to, "the line y = " + y + " should cut the rectangle");
            assertArrayEquals(new double[] {from, to}, box.wallCrossingsAtY(y), 1e-16, "line y = " + y);
        }
        for (int k = 1; k < 50; k++) {
            double x = RX - 0.0109 + 0.0218 * (k + 0.13) / 50.5;
            double dx = x - RX;
            double uLow = (-A / 2 - c * dx) / s;
            double uHigh = (A / 2 - c * dx) / s;
            double vLow = (s * dx - B / 2) / c;
            double vHigh = (s * dx + B / 2) / c;
            double from = RY + Math.max(uLow, vLow);
            double to = RY + Math.min(uHigh, vHigh);
            assertArrayEquals(new double[] {from, to}, box.wallCrossingsAtX(x), 1e-16, "line x = " + x);
        }
    }

    @Test
    @DisplayName("A wall lying on a line counts as if the line were moved up by an infinitesimal (CrossSection convention)")
    void wallOnALineIsCountedOnceAndConsistently() {
        CrossSection rectangle = Shapes.rectangle(A, B);
        // y = 0 is read as 0 + ε: inside between the side walls
        assertArrayEquals(new double[] {0, A}, rectangle.wallCrossingsAtY(0), 0.0);
        // y = b is read as b + ε: outside, no crossing
        assertEquals(0, rectangle.wallCrossingsAtY(B).length);
        assertArrayEquals(new double[] {0, B}, rectangle.wallCrossingsAtX(0), 0.0);
        assertEquals(0, rectangle.wallCrossingsAtX(A).length);
        assertTrue(rectangle.contains(0.3 * A, 0.0), "the bottom wall line belongs to the inside (y = 0 + ε)");
        assertFalse(rectangle.contains(0.3 * A, B), "the top wall line belongs to the outside (y = b + ε)");
    }

    @Test
    @DisplayName("The enclosed areas are πR², a·b and, for a 30 × 10 mm stadium, 20·10 + π·5² mm² (elementary geometry)")
    void enclosedAreasAreTheElementaryOnes() {
        // measured relative deviations: circle 2.2e-16, rectangle 0, rotated rectangle 0, stadium 0; bound 1e-15
        assertEquals(Math.PI * R * R, greenArea(Shapes.circle(R, CX, CY)), 1e-15 * Math.PI * R * R);
        assertEquals(A * B, greenArea(Shapes.rectangle(A, B)), 1e-15 * A * B);
        assertEquals(A * B, greenArea(Shapes.rotatedRectangle(A, B, RX, RY, TURN)), 1e-15 * A * B);
        double stadiumArea = (20 * 10 + Math.PI * 5 * 5) * 1e-6;
        assertEquals(stadiumArea, greenArea(stadium()), 1e-15 * stadiumArea);
    }

    @Test
    @DisplayName("A stadium built from two segments and two half-circle arcs has the arcs where the circles are")
    void stadiumArcsLieOnTheirCircles() {
        CrossSection stadium = stadium();
        Bounds box = stadium.bounds();
        assertEquals(-0.005, box.minX(), 1e-17);
        assertEquals(0.025, box.maxX(), 1e-17);
        assertEquals(0.0, box.minY(), 1e-17);
        assertEquals(0.010, box.maxY(), 1e-17);
        // measured worst deviation 2.6e-18 m; 1e-16 m bound
        for (int k = 1; k < 30; k++) {
            double y = 0.010 * (k + 0.37) / 30.5;
            double half = Math.sqrt(0.005 * 0.005 - (y - 0.005) * (y - 0.005));
            assertArrayEquals(new double[] {-half, 0.020 + half}, stadium.wallCrossingsAtY(y), 1e-16, "line y = " + y);
        }
        double x = 0.023; // through the right half disc
        double half = Math.sqrt(0.005 * 0.005 - 0.003 * 0.003);
        assertArrayEquals(new double[] {0.005 - half, 0.005 + half}, stadium.wallCrossingsAtX(x), 1e-16);
        assertTrue(stadium.contains(0.0245, 0.005));
        assertFalse(stadium.contains(0.0245, 0.0085), "outside the rounded end, inside its bounding box");
        assertTrue(stadium.contains(-0.0035, 0.005));
        assertFalse(stadium.contains(-0.0045, 0.0015));
    }
}
