package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.geometry.family.GuideFamilies;

/**
 * Shape recognition and mirror detection on cross-sections whose symmetry is known by construction.
 */
class SectionShapeTest {

    private static String describe(CrossSection section) {
        SectionShape s = SectionShape.of(section);
        return s.kind() + " " + s.mirroredAboutVertical() + "/" + s.mirroredAboutHorizontal();
    }

    @Test
    @DisplayName("A rectangle and an off-centre circle are recognized and mirror-symmetric about both centre lines")
    void plainShapesAreRecognized() {
        assertEquals("RECTANGULAR true/true", describe(Shapes.rectangle(22.86e-3, 10.16e-3)));
        assertEquals("CIRCULAR true/true", describe(Shapes.circle(0.01, 0.3e-3, -0.2e-3)));
    }

    @Test
    @DisplayName("A rectangle turned by 30° or rounded at the corners is not called rectangular")
    void turnedAndRoundedRectanglesAreOther() {
        // turned by 30°: symmetric only about its own axes, which are not the box's centre lines
        assertEquals("OTHER false/false", describe(Shapes.rotatedRectangle(0.02, 0.01, 0, 0, Math.toRadians(30))));
        assertEquals("OTHER true/true", describe(GuideFamilies.byName("rounded_rectangular").build(Map.of(
                "corner_radius", 1e-3))));
    }

    @Test
    @DisplayName("A single-ridge guide mirrors about its vertical centre line only; a coax about both")
    void ridgeAndCoax() {
        assertEquals("OTHER true/false", describe(GuideFamilies.byName("single_ridge").buildDefault()));
        assertEquals("OTHER true/true", describe(GuideFamilies.byName("double_ridge").buildDefault()));
        assertEquals("OTHER true/true", describe(GuideFamilies.byName("coaxial").buildDefault()));
    }

    @Test
    @DisplayName("A dielectric slab off the centre line breaks the vertical mirror of an otherwise symmetric guide")
    void offCentreSlabBreaksTheVerticalMirror() {
        assertEquals("OTHER true/true", describe(GuideFamilies.byName("slab_loaded").buildDefault()));
        assertEquals("OTHER false/true", describe(GuideFamilies.byName("slab_loaded").build(Map.of(
                "slab_centre", 4e-3))));
    }
}
