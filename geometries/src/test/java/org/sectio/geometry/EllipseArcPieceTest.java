package org.sectio.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Elliptical wall pieces against the ellipse's defining equation: the area πab (Archimedes), crossings
 * with grid-like lines as roots of the quadratic that the conic u²/a² + v²/b² = 1 becomes on a line,
 * monotonicity of every piece, and the SVG endpoint-to-centre conversion (W3C SVG 1.1, F.6.5–F.6.6)
 * through arcs whose enclosed area is elementary.
 */
class EllipseArcPieceTest {

    private static final double A = 0.012;
    private static final double B = 0.005;
    private static final double CX = 0.7e-3;
    private static final double CY = -0.4e-3;
    private static final double[] TURNS = {0, 0.3, 0.5 * Math.PI, 1.234, -2.5};

    @Test
    @DisplayName("A whole ellipse encloses πab whether or not it is turned")
    void wholeEllipseEnclosesPiAB() {
        // measured worst relative deviation 2.2e-16; bound 1e-14
        for (double turn : TURNS) {
            CrossSection e = Shapes.ellipse(A, B, CX, CY, turn);
            double area = WallCrossings.signedArea(e.wallPieces());
            assertEquals(Math.PI * A * B, area, 1e-14 * Math.PI * A * B, "turn " + turn);
        }
    }

    @Test
    @DisplayName("Every piece of a turned ellipse is monotone in x and in y")
    void everyPieceIsMonotone() {
        for (double turn : TURNS) {
            for (WallPiece p : Shapes.ellipse(A, B, CX, CY, turn).wallPieces()) {
                assertTrue(p instanceof EllipseArcPiece);
                assertMonotone(p, "turn " + turn);
            }
        }
    }

    @Test
    @DisplayName("Horizontal and vertical lines cross a turned ellipse at the roots of the conic's quadratic")
    void crossingsAreTheRootsOfTheQuadratic() {
        double turn = 0.7;
        CrossSection e = Shapes.ellipse(A, B, CX, CY, turn);
        double c = Math.cos(turn);
        double s = Math.sin(turn);
        // (c²/a² + s²/b²) X² + 2cs(1/a² − 1/b²) XY + (s²/a² + c²/b²) Y² = 1, X = x − cx, Y = y − cy
        double pxx = c * c / (A * A) + s * s / (B * B);
        double pxy = 2 * c * s * (1 / (A * A) - 1 / (B * B));
        double pyy = s * s / (A * A) + c * c / (B * B);
        double extentY = 1 / Math.sqrt(pyy - pxy * pxy / (4 * pxx));
        double extentX = 1 / Math.sqrt(pxx - pxy * pxy / (4 * pyy));
        double worst = 0;
        for (int k = 1; k < 50; k++) {
            double yOff = extentY * (-1 + 2.0 * (k + 0.31) / 50.5);
            double[] expected = roots(pxx, pxy * yOff, pyy * yOff * yOff - 1, CX);
            double[] got = e.wallCrossingsAtY(CY + yOff);
            assertEquals(2, got.length, "y offset " + yOff);
            worst = Math.max(worst, Math.max(Math.abs(got[0] - expected[0]), Math.abs(got[1] - expected[1])));
            double xOff = extentX * (-1 + 2.0 * (k + 0.29) / 50.5);
            expected = roots(pyy, pxy * xOff, pxx * xOff * xOff - 1, CY);
            got = e.wallCrossingsAtX(CX + xOff);
            assertEquals(2, got.length, "x offset " + xOff);
            worst = Math.max(worst, Math.max(Math.abs(got[0] - expected[0]), Math.abs(got[1] - expected[1])));
        }
        // measured worst 6.9e-18 m (lines kept off the tangent points, where both formulas lose digits); bound 1e-15 m
        assertTrue(worst < 1e-15, "worst crossing deviation " + worst + " m");
    }

    @Test
    @DisplayName("The inverse parameter of every piece returns the parameter it came from")
    void inverseParametersRoundTrip() {
        for (WallPiece p : Shapes.ellipse(A, B, CX, CY, 2.2).wallPieces()) {
            for (int k = 1; k < 20; k++) {
                double t = p.startParameter() + (p.endParameter() - p.startParameter()) * k / 20.0;
                // measured worst 7.8e-17 m; bound 1e-15 m (1e-13 of the semi-axis)
                assertEquals(p.y(t), p.y(p.parameterAtX(p.x(t))), 1e-15, "piece " + p);
                assertEquals(p.x(t), p.x(p.parameterAtY(p.y(t))), 1e-15, "piece " + p);
            }
        }
    }

    @Test
    @DisplayName("An elliptical arc to the opposite vertex bounds half the ellipse, on the side its flags choose")
    void halfEllipseArcBoundsHalfTheArea() {
        double turn = 0.4;
        double ux = A * Math.cos(turn);
        double uy = A * Math.sin(turn);
        for (boolean ccw : new boolean[] {true, false}) {
            List<WallPiece> loop = Outline.startAt(CX + ux, CY + uy)
                    .ellipticalArcTo(CX - ux, CY - uy, A, B, turn, false, ccw).close();
            // measured worst relative deviation 6.7e-16; bound 1e-14
            assertEquals(0.5 * Math.PI * A * B, WallCrossings.signedArea(loop), 1e-14 * A * B);
            double nx = -Math.sin(turn) * B / 2;
            double ny = Math.cos(turn) * B / 2;
            // counter-clockwise from the +a vertex passes the +b side of the ellipse
            assertEquals(ccw, WallCrossings.contains(loop, CX + nx, CY + ny));
            assertEquals(!ccw, WallCrossings.contains(loop, CX - nx, CY - ny));
            for (WallPiece p : loop) {
                assertMonotone(p, "half ellipse");
            }
        }
    }

    @Test
    @DisplayName("The large-arc flag picks the three-quarter arc about the other centre")
    void largeArcFlagPicksTheOtherCentre() {
        // quarter: centre (0, 0); three quarters: centre (a, b), area a·b + 3πab/4
        double quarter = WallCrossings.signedArea(Outline.startAt(0, 0).lineTo(A, 0)
                .ellipticalArcTo(0, B, A, B, 0, false, true).close());
        double large = WallCrossings.signedArea(Outline.startAt(0, 0).lineTo(A, 0)
                .ellipticalArcTo(0, B, A, B, 0, true, true).close());
        assertEquals(0.25 * Math.PI * A * B, quarter, 1e-14 * A * B);
        assertEquals(A * B + 0.75 * Math.PI * A * B, large, 1e-14 * A * B);
    }

    @Test
    @DisplayName("Semi-axes too short to join the end points are scaled up until they just do")
    void shortSemiAxesAreScaledUp() {
        // a circle of radius 1 mm asked to join points 4 mm apart becomes the half circle of radius 2 mm
        List<WallPiece> loop = Outline.startAt(0, 0).ellipticalArcTo(0.004, 0, 0.001, 0.001, 0.3, false, true).close();
        assertEquals(0.5 * Math.PI * 4e-6, WallCrossings.signedArea(loop), 1e-14 * 4e-6);
        assertFalse(WallCrossings.contains(loop, 0.002, 0.001), "the counter-clockwise half from (0,0) to (4,0) mm lies below");
        assertTrue(WallCrossings.contains(loop, 0.002, -0.001));
    }

    @Test
    @DisplayName("An ellipse with a non-positive semi-axis is refused with the value named")
    void badSemiAxisIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Shapes.ellipse(0.01, -0.002, 0, 0, 0));
        assertEquals("semi-axis y must be a positive length in metres, got -0.002", e.getMessage());
        IllegalArgumentException arc = assertThrows(IllegalArgumentException.class,
                () -> Outline.startAt(0, 0).ellipticalArcTo(0.002, 0.001, 0, 0.001, 0, false, true));
        assertEquals("elliptical arc to (2, 1) mm needs finite positive semi-axes and rotation, got 0 × 1 mm turned 0.0 rad",
                arc.getMessage());
    }

    private static double[] roots(double p, double q, double r, double shift) {
        double d = Math.sqrt(q * q - 4 * p * r);
        double lo = (-q - d) / (2 * p);
        double hi = (-q + d) / (2 * p);
        return new double[] {shift + lo, shift + hi};
    }

    static void assertMonotone(WallPiece p, String what) {
        int n = 400;
        double sx = Math.signum(p.endX() - p.startX());
        double sy = Math.signum(p.endY() - p.startY());
        double px = p.startX();
        double py = p.startY();
        for (int k = 1; k <= n; k++) {
            double t = k == n ? p.endParameter() : p.startParameter() + (p.endParameter() - p.startParameter()) * k / n;
            double x = p.x(t);
            double y = p.y(t);
            double slack = 1e-18;
            assertTrue(sx * (x - px) >= -slack && sy * (y - py) >= -slack, what + ": not monotone at t = " + t);
            px = x;
            py = y;
        }
    }
}
