package org.sectio.geometry;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * Each outline check's one-line message, with the place in millimetres computed by hand from
 * elementary geometry: where two lines cross, where a circle touches a line it is tangent to.
 */
class OutlineChecksTest {

    private static final double MM = 1e-3;

    /** A closed chain of segments through the points, given in mm. */
    private static Loop polygon(double... mm) {
        List<WallPiece> pieces = new ArrayList<>();
        int n = mm.length / 2;
        for (int k = 0; k < n; k++) {
            int next = (k + 1) % n;
            pieces.add(new LineSegment(mm[2 * k] * MM, mm[2 * k + 1] * MM, mm[2 * next] * MM, mm[2 * next + 1] * MM));
        }
        return new Loop(pieces);
    }

    private static String message(Executable check) {
        return assertThrows(IllegalArgumentException.class, check).getMessage();
    }

    @Test
    @DisplayName("A loop crossing itself is reported with both pieces and the crossing point")
    void selfCrossingNamesPiecesAndPoint() {
        // piece 2 runs on y = 6 − 0.6x, piece 4 on y = x: they cross at x = 3.75
        Loop bow = polygon(0, 0, 10, 0, 0, 6, 10, 10); // equal lobes: its signed area is zero too
        assertEquals("outer wall crosses itself: pieces 2 and 4 of 4 meet at (3.75, 3.75) mm",
                message(() -> OutlineChecks.requireValid(bow, "outer wall")));
    }

    @Test
    @DisplayName("A loop touching itself at a vertex is reported as crossing itself there")
    void selfTouchAtAVertexIsReported() {
        // two triangles joined at (5, 5) and traversed as one loop
        Loop pinched = polygon(0, 0, 10, 0, 5, 5, 10, 10, 0, 10, 5, 5);
        assertEquals("ridge crosses itself: pieces 2 and 5 of 6 meet at (5, 5) mm",
                message(() -> OutlineChecks.requireNoSelfCrossing(pinched, "ridge")));
    }

    @Test
    @DisplayName("Two loops of a region that cross are reported with the first crossing point")
    void crossingLoopsAreReported() {
        Region overlapping = new Region(List.of(polygon(0, 0, 10, 0, 10, 10, 0, 10), polygon(8, 2, 14, 2, 14, 6, 8, 6)));
        assertEquals("guide: loops 1 and 2 cross or touch at (10, 2) mm",
                message(() -> OutlineChecks.requireValid(overlapping, "guide")));
    }

    @Test
    @DisplayName("A loop of zero area is reported with where it starts")
    void zeroAreaIsReported() {
        Loop flat = polygon(0, 0, 1, 1, 2, 2);
        assertEquals("septum encloses no area (it starts at (0, 0) mm)",
                message(() -> OutlineChecks.requireArea(flat, "septum")));
    }

    @Test
    @DisplayName("A piece of zero length is reported with its number and place")
    void zeroLengthPieceIsReported() {
        Loop stutter = polygon(0, 0, 10, 0, 10, 10, 10, 10 + 1e-12, 0, 10);
        assertEquals("outer wall: piece 3 of 5 has zero length at (10, 10) mm",
                message(() -> OutlineChecks.requireValid(stutter, "outer wall")));
    }

    @Test
    @DisplayName("A pin tangent to the outer wall is reported at the touching point")
    void pinTouchingTheWallIsReported() {
        Region box = Region.of(polygon(0, 0, 10, 0, 10, 5, 0, 5));
        Region pin = Region.of(Outline.circle(5 * MM, 3 * MM, 2 * MM)); // top of the circle at y = 3 + 2 = 5
        assertEquals("inner conductor 'pin' touches or leaves the outer wall at (5, 5) mm",
                message(() -> OutlineChecks.requireInside(pin, box, "inner conductor 'pin'")));
    }

    @Test
    @DisplayName("A pin wholly outside the outer wall is reported at a point of the pin")
    void pinOutsideTheWallIsReported() {
        Region box = Region.of(polygon(0, 0, 10, 0, 10, 5, 0, 5));
        Region pin = Region.of(Outline.circle(20 * MM, 3 * MM, 1 * MM)); // first quarter's middle: 45°
        double c = Math.sqrt(0.5);
        assertEquals("inner conductor 'pin' touches or leaves the outer wall at " + Millimetres.point((20 + c) * MM, (3 + c) * MM),
                message(() -> OutlineChecks.requireInside(pin, box, "inner conductor 'pin'")));
    }

    @Test
    @DisplayName("A pin clear of the outer wall, an elliptical coax and a ridged guide pass every check")
    void soundGeometriesPass() {
        Region box = Region.of(polygon(0, 0, 10, 0, 10, 5, 0, 5));
        Region pin = Region.of(Outline.circle(5 * MM, 2.5 * MM, 2 * MM));
        assertDoesNotThrow(() -> OutlineChecks.requireInside(pin, box, "inner conductor 'pin'"));
        Region ellipse = Region.of(Outline.ellipse(0, 0, 9 * MM, 4 * MM, 0.5));
        Region coax = Booleans.difference(ellipse, Region.of(Outline.circle(0, 0, 1.5 * MM))).orElseThrow();
        assertDoesNotThrow(() -> OutlineChecks.requireValid(coax, "elliptical coax"));
        Region ridged = Booleans.difference(box, Region.of(polygon(4, 0, 6, 0, 6, 2, 4, 2))).orElseThrow();
        assertDoesNotThrow(() -> OutlineChecks.requireValid(ridged, "ridged guide"));
    }
}
