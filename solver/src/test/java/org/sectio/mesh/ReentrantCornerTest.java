package org.sectio.mesh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Shapes;

/**
 * Re-entrant corner detection against plane geometry worked out by hand: an L has one 270° corner, a
 * double-ridge guide four (the ridge tips), convex shapes none; where a quarter circle leaves a
 * straight wall at a right turn the interior angle is 270° as well. The singular exponent is π/ω
 * (the edge condition: Meixner, IEEE Trans. Antennas Propag. AP-20 (1972) 442–446, §II; for 270°,
 * 2/3).
 */
class ReentrantCornerTest {

    /** Tangents come from a chord of 1e-6 of the parameter range; measured angle error 7.9e-7 rad where the arc leaves the segment. */
    private static final double ANGLE_TOLERANCE = 1e-5;

    @Test
    @DisplayName("The L-shape has exactly one re-entrant corner, of 270°, at its inner vertex, with exponent 2/3")
    void lShapeHasOneCornerOf270Degrees() {
        List<ReentrantCorner> corners = ReentrantCorner.of(CornerShapes.lShape());
        assertEquals(1, corners.size(), corners.toString());
        assertEquals(CornerShapes.L_CORNER_X, corners.get(0).x(), 1e-15);
        assertEquals(CornerShapes.L_CORNER_Y, corners.get(0).y(), 1e-15);
        assertEquals(1.5 * Math.PI, corners.get(0).interiorAngle(), 1e-12);
        assertEquals(2.0 / 3.0, corners.get(0).singularExponent(), 1e-12);
    }

    @Test
    @DisplayName("The double-ridge guide has its four re-entrant corners at the ridge tips and none at the ridge feet")
    void doubleRidgeHasFourCornersAtTheRidgeTips() {
        List<ReentrantCorner> corners = ReentrantCorner.of(CornerShapes.doubleRidge());
        assertEquals(4, corners.size(), corners.toString());
        for (ReentrantCorner c : corners) {
            assertTrue(Math.abs(c.x() - 7e-3) < 1e-15 || Math.abs(c.x() - 13e-3) < 1e-15, c.toString());
            assertTrue(Math.abs(c.y() - 3.5e-3) < 1e-15 || Math.abs(c.y() - 6.5e-3) < 1e-15, c.toString());
            assertEquals(1.5 * Math.PI, c.interiorAngle(), 1e-12);
        }
    }

    @Test
    @DisplayName("A circle and a turned rectangle, being convex, have no re-entrant corner")
    void convexShapesHaveNone() {
        assertTrue(ReentrantCorner.of(Shapes.circle(0.01, 0.3e-3, -0.2e-3)).isEmpty());
        assertTrue(ReentrantCorner.of(Shapes.rotatedRectangle(0.02, 0.009, 0.4e-3, -0.3e-3, Math.toRadians(30)))
                .isEmpty());
    }

    @Test
    @DisplayName("Where a quarter circle turns off a straight wall to the right the corner is found with 270°")
    void cornerBetweenSegmentAndArcIsFound() {
        // [0,2] × [0,1] plus the quarter disc of radius 1 about (0, 1): heading west along y = 1 into
        // (1, 1), the arc leaves heading north, a right turn by 90°; at (0, 2) it turns left (convex)
        CrossSection shape = Shapes.polygon("slab with a quarter disc", Outline.startAt(0, 0).lineTo(2, 0)
                .lineTo(2, 1).lineTo(1, 1).arcTo(0, 2, 0.5 * Math.PI).lineTo(0, 0));
        List<ReentrantCorner> corners = ReentrantCorner.of(shape);
        assertEquals(1, corners.size(), corners.toString());
        assertEquals(1.0, corners.get(0).x(), 1e-15);
        assertEquals(1.0, corners.get(0).y(), 1e-15);
        assertEquals(1.5 * Math.PI, corners.get(0).interiorAngle(), ANGLE_TOLERANCE);
    }

    @Test
    @DisplayName("A corner with an interior angle of at most 180° is refused")
    void convexAngleIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new ReentrantCorner(0, 0, Math.PI));
        assertThrows(IllegalArgumentException.class, () -> new ReentrantCorner(0, 0, 2.1 * Math.PI));
        assertThrows(IllegalArgumentException.class, () -> new ReentrantCorner(Double.NaN, 0, 1.5 * Math.PI));
    }
}
