package org.sectio.geometry.file;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.GuideSection;

/**
 * Parameters, expressions, families, standard sizes, combinations, inner conductors, dielectrics and
 * SVG paths in geometry files: what they build (against elementary geometry) and the exact one-line
 * error of every fault, with its line, column and JSON path.
 */
class SectionFilesFormatTwoTest {

    private static GuideSection read(String text) throws SectionFileException {
        return (GuideSection) SectionFiles.parse("f.json", text);
    }

    private static String error(String text) {
        SectionFileException e = assertThrows(SectionFileException.class, () -> SectionFiles.parse("f.json", text));
        assertFalse(e.getMessage().contains("\n"));
        return e.getMessage();
    }

    @Test
    void parametersMayUseEachOtherInAnyOrder() throws Exception {
        CrossSection s = read("{\"parameters\": {\"b\": \"a/2\", \"a\": 22.86},"
                + " \"wall\": {\"rectangle\": {\"width\": \"a\", \"height\": \"b - 1.27\"}}}");
        assertEquals(0.02286, s.bounds().width(), 1e-15);
        assertEquals(0.01016, s.bounds().height(), 1e-15);
    }

    @Test
    void aParameterUsedAsALengthIsInTheFilesUnits() throws Exception {
        CrossSection s = read("{\"units\": \"in\", \"parameters\": {\"r\": 0.25}, \"wall\": {\"circle\": {\"radius\": \"2*r\"}}}");
        assertEquals(0.0254, s.bounds().width(), 1e-15);
    }

    @Test
    void anUndefinedParameterIsReportedAtItsCharacterInTheString() {
        assertEquals("f.json:1:35: $.parameters.b: in the expression \"a + c\" at character 5: undefined parameter"
                + " \"c\", expected one of \"a\", \"b\", \"pi\"",
                error("{\"parameters\": {\"a\": 1, \"b\": \"a + c\"}, \"wall\": {\"circle\": {\"radius\": 1}}}"));
    }

    @Test
    void anUndefinedNameInAShapeValueIsReportedThere() {
        assertEquals("f.json:1:33: $.wall.circle.radius: in the expression \"rr\" at character 1: undefined parameter"
                + " \"rr\", expected a number (no parameters are defined)",
                error("{\"wall\": {\"circle\": {\"radius\": \"rr\"}}}"));
    }

    @Test
    void aCycleAmongParametersIsReportedWithItsPath() {
        assertEquals("f.json:1:22: $.parameters.a: the parameters depend on each other in a cycle a → b → c → a,"
                + " expected each to be computable from the others",
                error("{\"parameters\": {\"a\": \"b\", \"b\": \"c + 1\", \"c\": \"2*a\"}, \"wall\": {\"circle\": {\"radius\": 1}}}"));
    }

    @Test
    void aSyntaxErrorInAnExpressionPointsAtTheCharacter() {
        assertEquals("f.json:2:42: $.wall.rectangle.width: in the expression \"(3 + 4\" at character 7: the expression"
                + " ends too early, expected \")\" to close the \"(\" at character 1",
                error("{\n  \"wall\": {\"rectangle\": {\"width\": \"(3 + 4\", \"height\": 1}}}"));
    }

    @Test
    void aReservedParameterNameIsRejected() {
        assertTrue(error("{\"parameters\": {\"pi\": 3}, \"wall\": {\"circle\": {\"radius\": 1}}}")
                .startsWith("f.json:1:23: $.parameters.pi: the parameter name \"pi\" is reserved"));
    }

    @Test
    void aNegativeExpressionValueIsANegativeDimension() {
        assertEquals("f.json:1:34: $.wall.rectangle.width: must be a positive length in mm, got \"1 - 3\" = -2.0",
                error("{\"wall\": {\"rectangle\": {\"width\": \"1 - 3\", \"height\": 1}}}"));
    }

    @Test
    void aCentredTurnedRectangleHasTheRotatedBox() throws Exception {
        CrossSection s = read("{\"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10, \"centre\": [5, 5], \"rotate_degrees\": 90}}}");
        assertEquals(0.010, s.bounds().width(), 1e-12);
        assertEquals(0.020, s.bounds().height(), 1e-12);
        assertEquals(0.0, s.bounds().minX(), 1e-12);
    }

    @Test
    void roundedCornersRemoveFourTimesTheCornerWedge() throws Exception {
        GuideSection s = read("{\"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10, \"corner_radius\": 2}}}");
        assertEquals((200 - (4 - Math.PI) * 4) * 1e-6, s.interior().area(), 1e-15);
    }

    @Test
    void aCornerRadiusLargerThanHalfTheSideIsRejected() {
        assertEquals("f.json:1:69: $.wall.rectangle.corner_radius: the corner radius 6 mm is larger than half the"
                + " shorter side (5 mm), expected at most that",
                error("{\"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10, \"corner_radius\": 6}}}"));
    }

    @Test
    void anEllipseEnclosesPiAB() throws Exception {
        GuideSection s = read("{\"wall\": {\"ellipse\": {\"semi_axes\": [4, 2], \"centre\": [1, 1], \"rotate_degrees\": 30}}}");
        assertEquals(Math.PI * 8e-6, s.interior().area(), 1e-15);
    }

    @Test
    void aDifferenceCutsANotchOutOfTheWall() throws Exception {
        GuideSection s = read("{\"wall\": {\"difference\": [{\"rectangle\": {\"width\": 20, \"height\": 10}},"
                + " {\"rectangle\": {\"width\": 4, \"height\": 3, \"centre\": [10, 10]}}]}}");
        assertEquals((200 - 4 * 1.5) * 1e-6, s.interior().area(), 1e-15);
        assertFalse(s.contains(0.010, 0.0095));
        assertTrue(s.contains(0.010, 0.008));
    }

    @Test
    void aUnionAndAnIntersectionCombineOverlappingShapes() throws Exception {
        GuideSection u = read("{\"wall\": {\"union\": [{\"rectangle\": {\"width\": 10, \"height\": 10}},"
                + " {\"rectangle\": {\"width\": 10, \"height\": 10, \"centre\": [10, 5]}}]}}");
        assertEquals(150e-6, u.interior().area(), 1e-15);
        GuideSection i = read("{\"wall\": {\"intersection\": [{\"rectangle\": {\"width\": 10, \"height\": 10}},"
                + " {\"circle\": {\"radius\": 10}}]}}");
        assertEquals(Math.PI * 25e-6, i.interior().area(), 1e-14);
    }

    @Test
    void aDifferenceThatLeavesNothingIsRejected() {
        assertTrue(error("{\"wall\": {\"difference\": [{\"circle\": {\"radius\": 1}}, {\"circle\": {\"radius\": 2}}]}}")
                .startsWith("f.json:1:53: $.wall.difference[1]: the difference becomes empty with this shape"));
    }

    @Test
    void aSelfIntersectingOutlineIsRejectedAtItsSteps() {
        String m = error("{\"wall\": {\"outline\": {\"start\": [0, 0], \"steps\": [{\"line_to\": [10, 10]},"
                + " {\"line_to\": [10, 0]}, {\"line_to\": [0, 6]}]}}}");
        assertTrue(m.startsWith("f.json:1:49: $.wall.outline.steps: the outline crosses itself"), m);
    }

    @Test
    void aClosingStepThatCrossesTheOutlineIsASelfIntersection() {
        // ends at (0, 10) away from the start: the straight closing step to (0, 0) crosses the first step
        String m = error("{\"wall\": {\"outline\": {\"start\": [0, 0], \"steps\": [{\"line_to\": [10, 10]},"
                + " {\"line_to\": [-5, 5]}, {\"line_to\": [5, 0]}, {\"line_to\": [0, 10]}]}}}");
        assertTrue(m.startsWith("f.json:1:49: $.wall.outline.steps: the outline crosses itself"), m);
    }

    @Test
    void anInnerConductorBecomesASecondConductor() throws Exception {
        GuideSection s = read("{\"wall\": {\"circle\": {\"radius\": 3.5}}, \"inner_conductors\": [{\"circle\": {\"radius\": 1.52}}]}");
        assertEquals(2, s.conductors().size());
        assertEquals(Math.PI * (3.5 * 3.5 - 1.52 * 1.52) * 1e-6, s.interior().area(), 1e-14);
        assertFalse(s.contains(0, 0));
    }

    @Test
    void anInnerConductorTouchingTheWallIsRejected() {
        String m = error("{\"wall\": {\"circle\": {\"radius\": 3}}, \"inner_conductors\": [{\"circle\": {\"radius\": 1, \"centre\": [2, 0]}}]}");
        assertTrue(m.startsWith("f.json:1:58: $.inner_conductors[0]: the inner conductor touches or leaves the outer wall at"), m);
    }

    @Test
    void anInnerConductorOutsideTheWallIsRejected() {
        String m = error("{\"wall\": {\"circle\": {\"radius\": 3}}, \"inner_conductors\": [{\"circle\": {\"radius\": 1, \"centre\": [9, 0]}}]}");
        assertTrue(m.startsWith("f.json:1:58: $.inner_conductors[0]: the inner conductor touches or leaves the outer wall"), m);
    }

    @Test
    void dielectricsAndFillingCarryTheirMaterials() throws Exception {
        GuideSection s = read("{\"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10}}, \"dielectrics\": [{\"name\": \"PTFE slab\","
                + " \"shape\": {\"rectangle\": {\"width\": 2, \"height\": 10, \"centre\": [10, 5]}}, \"permittivity\": 2.05,"
                + " \"loss_tangent\": 0.0002}], \"filling\": {\"permittivity\": 1.0006}}");
        assertEquals(2.05, s.materialAt(0.010, 0.005).relativePermittivity());
        assertEquals(0.0002, s.materialAt(0.010, 0.005).lossTangent());
        assertEquals(1.0006, s.materialAt(0.002, 0.005).relativePermittivity());
        assertEquals("PTFE slab", s.dielectrics().get(0).name());
    }

    @Test
    void overlappingDielectricsAreRejected() {
        String m = error("{\"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10}}, \"dielectrics\": ["
                + "{\"shape\": {\"rectangle\": {\"width\": 4, \"height\": 4}}, \"permittivity\": 2},"
                + "{\"shape\": {\"rectangle\": {\"width\": 4, \"height\": 4, \"centre\": [3, 3]}}, \"permittivity\": 3}]}");
        assertTrue(m.contains("$.dielectrics[1].shape: the dielectric region overlaps \"dielectric 1\""), m);
    }

    @Test
    void aDielectricOutsideTheGuideIsRejected() {
        String m = error("{\"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10}}, \"dielectrics\": ["
                + "{\"shape\": {\"circle\": {\"radius\": 3}}, \"permittivity\": 2}]}");
        assertTrue(m.contains("$.dielectrics[0].shape: the dielectric region has"), m);
    }

    @Test
    void aPermittivityBelowOneIsRejected() {
        assertTrue(error("{\"wall\": {\"circle\": {\"radius\": 1}}, \"filling\": {\"permittivity\": 0.5}}")
                .endsWith("$.filling.permittivity: expected a relative permittivity ≥ 1, got 0.5"));
    }

    @Test
    void aFamilyIsBuiltFromValuesInTheFilesUnits() throws Exception {
        GuideSection s = read("{\"units\": \"in\", \"family\": {\"rectangular\": {\"width\": 0.9, \"height\": 0.4}}}");
        assertEquals(0.02286, s.bounds().width(), 1e-15);
    }

    @Test
    void anUnknownFamilyListsTheKnownOnes() {
        String m = error("{\"family\": {\"triple_ridge\": {}}}");
        assertTrue(m.startsWith("f.json:1:13: $.family.triple_ridge: unknown key \"triple_ridge\", expected one of"
                + " \"rectangular\", \"rounded_rectangular\""), m);
    }

    @Test
    void aRidgeGapOfZeroIsReportedAtTheFamilyObject() {
        String m = error("{\"family\": {\"double_ridge\": {\"gap\": 0}}}");
        assertTrue(m.startsWith("f.json:1:29: $.family.double_ridge: "), m);
        assertTrue(m.contains("gap"), m);
    }

    @Test
    void aRidgeWiderThanTheGuideIsReportedAtTheFamilyObject() {
        String m = error("{\"family\": {\"single_ridge\": {\"width\": 20, \"ridge_width\": 25}}}");
        assertTrue(m.startsWith("f.json:1:29: $.family.single_ridge: "), m);
        assertTrue(m.contains("ridge_width"), m);
    }

    @Test
    void anUnknownFamilyParameterIsAnUnknownKey() {
        assertTrue(error("{\"family\": {\"circular\": {\"diameter\": 3}}}")
                .startsWith("f.json:1:26: $.family.circular.diameter: unknown key \"diameter\", expected one of \"radius\""));
    }

    @Test
    void aStandardSizeIsTheInnerRectangleOfItsDesignation() throws Exception {
        GuideSection s = read("{\"standard\": \"WR-90\"}");
        assertEquals(0.02286, s.bounds().width(), 1e-15);
        assertEquals(0.01016, s.bounds().height(), 1e-15);
        GuideSection r = read("{\"standard\": \"WR-90\", \"rounded_corners\": 1}");
        assertEquals(0.02286 * 0.01016 - (4 - Math.PI) * 1e-6, r.interior().area(), 1e-15);
    }

    @Test
    void anUnknownStandardSizeNamesTheNearestOnes() {
        String m = error("{\"standard\": \"WR-91\"}");
        assertTrue(m.startsWith("f.json:1:14: $.standard: unknown standard rectangular size 'WR-91'; nearest: "), m);
    }

    @Test
    void anSvgPathWallWithAHoleHasTwoConductors() throws Exception {
        GuideSection s = read("{\"wall\": {\"svg_path\": {\"d\": \"M 0 0 H 10 V 10 H 0 Z M 4 4 H 6 V 6 H 4 Z\"}}}");
        assertEquals(2, s.conductors().size());
        assertEquals(96e-6, s.interior().area(), 1e-15);
        assertEquals(-0.010, s.bounds().minY(), 1e-15);
    }

    @Test
    void aFaultInSvgPathDataPointsAtItsCharacterInTheFile() {
        assertEquals("f.json:1:40: $.wall.svg_path.d: in the path data at character 11: unknown path command"
                + " \"K\", expected one of M L H V C S Q T A Z (or their lower-case relative forms)",
                error("{\"wall\": {\"svg_path\": {\"d\": \"M 0 0 H 1 K\"}}}"));
    }

    @Test
    void anUnknownTopLevelFieldIsRejected() {
        assertTrue(error("{\"wall\": {\"circle\": {\"radius\": 1}}, \"colour\": \"red\"}")
                .startsWith("f.json:1:37: $.colour: unknown key \"colour\", expected one of \"name\", \"units\""));
    }

    @Test
    void aWallTogetherWithAFamilyIsRejected() {
        assertEquals("f.json:1:1: $: expected one of \"wall\", \"family\" or \"standard\", got \"wall\", \"standard\"",
                error("{\"wall\": {\"circle\": {\"radius\": 1}}, \"standard\": \"WR-90\"}"));
    }
}
