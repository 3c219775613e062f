package org.sectio.geometry.svg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.Loop;
import org.sectio.geometry.Shapes;

/**
 * SVG path data against the W3C SVG 1.1 specification (Second Edition): the command semantics of
 * §8.3.2–§8.3.8, the grammar of §8.3.9 and the arc conversion of Appendix F.6; areas against
 * elementary geometry. Unit: one user unit is one metre here (scale 1), no flip unless stated.
 */
class SvgPathsTest {

    private static List<SvgSubPath> read(String d) throws SvgPathException {
        return SvgPaths.read(d, 1.0, false, 1e-3);
    }

    private static double area(String d) throws SvgPathException {
        return read(d).get(0).loop().signedArea();
    }

    private static SvgPathException fault(String d) {
        return assertThrows(SvgPathException.class, () -> read(d));
    }

    @Test
    void aRectanglePathHasTheAreaOfTheBuiltInRectangle() throws Exception {
        double expected = Shapes.rectangle(22.86, 10.16).wallPieces().isEmpty() ? 0
                : new Loop(Shapes.rectangle(22.86, 10.16).wallPieces()).signedArea();
        assertEquals(expected, area("M 0 0 L 22.86 0 L 22.86 10.16 L 0 10.16 Z"), 1e-12);
        assertEquals(22.86 * 10.16, expected, 1e-12);
    }

    @Test
    void twoHalfCircleArcsReproduceTheCircleAreaPiRSquared() throws Exception {
        // §8.3.8: rx = ry = 5, sweep-flag 1; F.6.5 puts the centre at (5, 0)
        double a = area("M 0 0 A 5 5 0 0 1 10 0 A 5 5 0 0 1 0 0 Z");
        assertEquals(Math.PI * 25, a, 1e-12 * Math.PI * 25);
    }

    @Test
    void radiiTooSmallForTheEndPointsAreScaledUpAsInF66() throws Exception {
        // radius 1 cannot join points 10 apart: F.6.6 scales it to 5, giving half circles again
        assertEquals(Math.PI * 25, area("M 0 0 A 1 1 0 0 1 10 0 A 1 1 0 0 1 0 0"), 1e-12 * Math.PI * 25);
    }

    @Test
    void anEllipticalArcPairEnclosesPiAB() throws Exception {
        double a = area("M -4 0 A 4 2 0 0 1 4 0 A 4 2 0 0 1 -4 0 Z");
        assertEquals(Math.PI * 8, a, 1e-9 * Math.PI * 8);
    }

    @Test
    void aRotatedEllipticalArcKeepsItsArea() throws Exception {
        // the ellipse of semi-axes 4 and 2 turned by 30°: its end points at ±4 (cos 30°, sin 30°)
        double c = 4 * Math.cos(Math.toRadians(30));
        double s = 4 * Math.sin(Math.toRadians(30));
        String d = "M " + -c + " " + -s + " A 4 2 30 0 1 " + c + " " + s + " A 4 2 30 0 1 " + -c + " " + -s;
        assertEquals(Math.PI * 8, area(d), 1e-9 * Math.PI * 8);
    }

    /**
     * The standard four-cubic circle (control points at κ r along the tangents, κ = 0.5523) flattened at
     * tolerance t. The chords' end points lie on the convex Bézier curve, so the polygon is inside it and
     * each chord cuts off at most t × its length: 0 ≤ A_bez − A_poly ≤ t · P with P the curve's length,
     * at most 8 r (the curve lies in the square of its control points). A_bez is computed exactly by
     * Green's theorem, ∮ x dy, with 3-point Gauss–Legendre (exact: x y' has degree 5).
     */
    @Test
    void theFourCubicCircleFlattenedAtToleranceTIsWithinTTimesThePerimeterOfItsArea() throws Exception {
        double r = 10;
        double k = 0.5523 * r;
        String d = "M 10 0 C 10 " + k + " " + k + " 10 0 10 C " + -k + " 10 -10 " + k + " -10 0"
                + " C -10 " + -k + " " + -k + " -10 0 -10 C " + k + " -10 10 " + -k + " 10 0 Z";
        double exact = 4 * quarterArea(r, k);
        assertTrue(Math.abs(exact - Math.PI * r * r) < 1e-3 * Math.PI * r * r, "κ circle area " + exact);
        int previousVertices = 0;
        for (double t : new double[] {1e-1, 1e-3, 1e-5}) {
            Loop loop = SvgPaths.read(d, 1.0, false, t).get(0).loop();
            double polygon = loop.signedArea();
            assertTrue(polygon <= exact + 1e-12, "t = " + t + ": polygon outside the convex curve");
            assertTrue(exact - polygon <= t * 8 * r, "t = " + t + ": area error " + (exact - polygon));
            assertTrue(Math.abs(polygon - Math.PI * r * r) <= t * 8 * r + Math.abs(exact - Math.PI * r * r));
            assertTrue(loop.pieces().size() > previousVertices, "finer tolerance, more chords");
            previousVertices = loop.pieces().size();
        }
    }

    /** ∮ x dy along the cubic (r, 0), (r, k), (k, r), (0, r) — one quarter of the curve's area. */
    private static double quarterArea(double r, double k) {
        double[] px = {r, r, k, 0};
        double[] py = {0, k, r, r};
        double[] nodes = {-Math.sqrt(0.6), 0, Math.sqrt(0.6)};
        double[] weights = {5.0 / 9, 8.0 / 9, 5.0 / 9};
        double sum = 0;
        for (int i = 0; i < 3; i++) {
            double t = (nodes[i] + 1) / 2;
            double u = 1 - t;
            double x = u * u * u * px[0] + 3 * u * u * t * px[1] + 3 * u * t * t * px[2] + t * t * t * px[3];
            double dy = 3 * (u * u * (py[1] - py[0]) + 2 * u * t * (py[2] - py[1]) + t * t * (py[3] - py[2]));
            sum += weights[i] / 2 * x * dy;
        }
        // ∮ x dy over the closed quarter: the two axis legs add nothing (x = 0 on one, dy = 0 on the other)
        return sum;
    }

    @Test
    void relativeCommandsAreOffsetsFromTheCurrentPoint() throws Exception {
        assertEquals(area("M 1 1 L 4 1 L 4 3 L 1 3 Z"), area("m 1 1 l 3 0 l 0 2 l -3 0 z"), 0);
        assertEquals(area("M 1 1 L 4 1 L 4 3 L 1 3 Z"), area("M 1 1 h 3 v 2 H 1 z"), 0);
    }

    @Test
    void extraCoordinatePairsRepeatTheCommandAndAfterAMovetoTheyAreLines() throws Exception {
        // §8.3.2: "M 0 0 4 0 4 2" is M 0 0 L 4 0 L 4 2; "l 1 0 1 0" repeats l
        assertEquals(8, area("M 0 0 4 0 4 2 0 2 z"), 1e-15);
        assertEquals(8, area("m 0 0 2 0 l 1 0 1 0 0 2 h -4 z"), 1e-15);
    }

    @Test
    void numbersTakeEveryFormOfTheGrammar() throws Exception {
        // "0.5.5" is 0.5 then .5; "-.5" and "1e1" are numbers; a sign starts a new number without a space
        assertEquals(0.25, area("M0,0H.5V.5H0z"), 1e-15);
        assertEquals(0.125, area("M0 0L0.5.0L.5.5z"), 1e-15);
        assertEquals(area("M 0 0 L 10 0 L 10 10 Z"), area("M0-0L1e1,0,10-0,1e+1 10 z"), 1e-12);
        assertEquals(area("M 0 0 L -0.5 0 L -0.5 -0.5 Z"), area("M0 0L-.5 0-.5-.5z"), 1e-15);
    }

    @Test
    void arcFlagsMayBeWrittenWithoutSeparators() throws Exception {
        assertEquals(area("M 0 0 A 5 5 0 0 1 10 0 A 5 5 0 0 1 0 0 Z"), area("M0 0A5 5 0 0110 0A5 5 0 010 0Z"), 1e-12);
    }

    @Test
    void smoothCurvesReflectThePreviousControlPoint() throws Exception {
        // §8.3.6/§8.3.7: S and T mirror the previous second control point about the current point
        assertEquals(area("M 0 0 C 0 5 10 5 10 0 C 10 -5 0 -5 0 0 Z"), area("M 0 0 C 0 5 10 5 10 0 S 0 -5 0 0 Z"), 1e-12);
        assertEquals(area("M 0 0 Q 5 5 10 0 Q 15 -5 20 0 Z"), area("M 0 0 Q 5 5 10 0 T 20 0 Z"), 1e-12);
    }

    @Test
    void aQuadraticCurveEnclosesTwoThirdsOfItsControlTriangleBase() throws Exception {
        // the parabolic segment under Q (0,0) (5,10) (10,0) has area 2/3 · 10 · 5 (Archimedes)
        double a = SvgPaths.read("M 0 0 Q 5 10 10 0 Z", 1, false, 1e-9).get(0).loop().signedArea();
        assertEquals(100.0 / 3, Math.abs(a), 1e-6);
    }

    @Test
    void aSubPathWithoutZIsClosedByAStraightStep() throws Exception {
        assertEquals(area("M 0 0 L 3 0 L 3 3 Z"), area("M 0 0 L 3 0 L 3 3"), 0);
    }

    @Test
    void everySubPathBecomesALoop() throws Exception {
        List<SvgSubPath> paths = read("M 0 0 H 10 V 10 H 0 Z M 2 2 H 4 V 4 H 2 Z");
        assertEquals(2, paths.size());
        assertEquals(1, paths.get(0).position());
        assertEquals(23, paths.get(1).position());
        assertEquals(4, paths.get(1).loop().signedArea(), 1e-15);
    }

    @Test
    void flippingYMirrorsThePathAndScaleConvertsItsUnits() throws Exception {
        Bounds box = SvgPaths.read("M 0 0 H 10 V 5 H 0 Z", 1e-3, true, 1e-6).get(0).loop().bounds();
        assertEquals(-0.005, box.minY(), 1e-15);
        assertEquals(0.0, box.maxY(), 1e-15);
        assertEquals(0.010, box.maxX(), 1e-15);
    }

    @Test
    void anUnknownCommandLetterIsReportedAtItsCharacter() {
        SvgPathException e = fault("M 0 0 L 1 0 X 1 1 Z");
        assertEquals(13, e.position());
        assertEquals("unknown path command \"X\", expected one of M L H V C S Q T A Z (or their lower-case relative forms)",
                e.problem());
    }

    @Test
    void aMissingNumberIsReportedWhereItShouldBe() {
        SvgPathException e = fault("M 0 0 L 1 0 L 1 Z");
        assertEquals(17, e.position());
        assertEquals("command \"L\" is missing its y, expected a number, got \"Z\"", e.problem());
        assertEquals(8, fault("M 0 0 A").position(), "one past the end: the end of the path data");
    }

    @Test
    void aPathMustBeginWithAMoveto() {
        assertEquals("path data must begin with a moveto (M or m), got \"L\"", fault("  L 1 1").problem());
    }

    @Test
    void aBadArcFlagIsRejected() {
        SvgPathException e = fault("M 0 0 A 5 5 0 2 1 10 0");
        assertEquals(15, e.position());
        assertEquals("the large-arc-flag of command \"A\" must be 0 or 1, got \"2\"", e.problem());
    }

    @Test
    void aNumberAfterZIsRejected() {
        assertEquals(17, fault("M 0 0 H 1 V 1 Z 3").position());
    }

    @Test
    void aSubPathWithoutAreaIsReportedAtItsMoveto() {
        SvgPathException e = fault("M 0 0 H 1 V 1 Z M 5 5 H 6");
        assertEquals(17, e.position());
        assertEquals("the sub-path is not a valid wall: outline encloses no area", e.problem());
    }
}
