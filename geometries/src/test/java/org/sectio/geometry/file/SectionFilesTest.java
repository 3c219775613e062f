package org.sectio.geometry.file;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;

class SectionFilesTest {

    @TempDir
    Path folder;

    @Test
    void theWr90ExampleIsTheEiaInnerRectangleInMetres() throws Exception {
        CrossSection section = SectionFiles.read(Path.of("examples", "corvel-x-band-feed.json"));
        Bounds box = section.bounds();
        assertEquals(0.02286, box.width(), 1e-15);
        assertEquals(0.01016, box.height(), 1e-15);
        assertEquals(0.0, box.minX(), 0.0);
        assertEquals("Corvel Ridge observatory, X-band feed throat (WR-90)", section.name());
    }

    @Test
    void theCircularExampleIsACircleOfTheGivenRadius() throws Exception {
        CrossSection section = SectionFiles.read(Path.of("examples", "corvel-rotary-joint.json"));
        Bounds box = section.bounds();
        assertEquals(-0.0119, box.minX(), 1e-15);
        assertEquals(0.0238, box.width(), 1e-15);
        assertEquals(0.0238, box.height(), 1e-15);
        assertTrue(section.contains(0.0119 * Math.cos(0.7) * 0.999, 0.0119 * Math.sin(0.7) * 0.999));
        assertFalse(section.contains(0.0119 * 0.72, 0.0119 * 0.72));
    }

    @Test
    void inchesAndMilsAreConvertedExactlyToMetres() throws Exception {
        CrossSection inches = read("{\"units\": \"in\", \"wall\": {\"rectangle\": {\"width\": 0.9, \"height\": 0.4}}}");
        assertEquals(0.02286, inches.bounds().width(), 1e-15);
        assertEquals(0.01016, inches.bounds().height(), 1e-15);
        CrossSection mils = read("{\"units\": \"mil\", \"wall\": {\"circle\": {\"radius\": 500}}}");
        assertEquals(0.0254, mils.bounds().width(), 1e-15);
        CrossSection metres = read("{\"units\": \"m\", \"wall\": {\"circle\": {\"radius\": 0.5, \"centre\": [1, 2]}}}");
        assertEquals(0.5, metres.bounds().minX(), 1e-15);
        assertEquals(1.5, metres.bounds().minY(), 1e-15);
    }

    @Test
    void aMissingNameFallsBackToADescriptionOfTheShape() throws Exception {
        assertEquals("rectangle 22.86 × 10.16 mm",
                read("{\"wall\": {\"rectangle\": {\"width\": 22.86, \"height\": 10.16}}}").name());
    }

    @Test
    void anOutlineOfLinesAndArcsEnclosesTheExpectedArea() throws Exception {
        // a 20 × 10 mm stadium half: flat bottom, semicircular top end on the right
        CrossSection section = read("""
                {"wall": {"outline": {"start": [0, 0], "steps": [
                  {"line_to": [20, 0]},
                  {"arc_to": [20, 10], "sweep_degrees": 180},
                  {"line_to": [0, 10]}
                ]}}}""");
        Bounds box = section.bounds();
        assertEquals(0.025, box.maxX(), 1e-12);
        assertEquals(0.010, box.height(), 1e-12);
        assertTrue(section.contains(0.0245, 0.005));
        assertFalse(section.contains(0.0245, 0.0095));
        assertEquals("outline of 3 steps", section.name());
    }

    @Test
    void aNegativeWidthIsReportedAtItsValueWithThePath() {
        assertError("{\"wall\": {\"rectangle\": {\"width\": -2, \"height\": 10}}}",
                "bad.json:1:34: $.wall.rectangle.width: must be a positive length in mm, got -2");
    }

    @Test
    void aZeroRadiusIsRejected() {
        assertError("{\"wall\": {\"circle\": {\"radius\": 0}}}",
                "bad.json:1:32: $.wall.circle.radius: must be a positive length in mm, got 0");
    }

    @Test
    void notANumberIsRejectedAsNotFinite() {
        assertError("{\"wall\": {\"circle\": {\"radius\": NaN}}}",
                "bad.json:1:32: $.wall.circle.radius: expected a finite number, got NaN");
    }

    @Test
    void aBooleanWhereANumberBelongsIsAWrongType() {
        assertError("{\n  \"wall\": {\"rectangle\": {\"width\": true, \"height\": 10}}\n}",
                "bad.json:2:35: $.wall.rectangle.width: expected a number or an expression string, got true");
    }

    @Test
    void aMissingKeyIsReportedAtTheObjectThatLacksIt() {
        assertError("{\"wall\": {\"rectangle\": {\"width\": 22.86}}}",
                "bad.json:1:24: $.wall.rectangle: missing key \"height\"");
    }

    @Test
    void aMissingWallIsReportedAtTheTopLevel() {
        assertError("{\"name\": \"nothing\"}", "bad.json:1:1: $: missing key \"wall\" (or \"family\" or \"standard\")");
    }

    @Test
    void anUnknownKeyIsReportedAtTheKeyWithTheAllowedOnes() {
        assertError("{\"wall\": {\"rectangle\": {\"width\": 1, \"hieght\": 2}}}",
                "bad.json:1:37: $.wall.rectangle.hieght: unknown key \"hieght\", expected one of \"width\", \"height\", \"centre\", \"rotate_degrees\", \"corner_radius\"");
    }

    @Test
    void anUnknownShapeIsReportedWithTheKnownShapes() {
        assertError("{\"wall\": {\"hexagon\": {\"side\": 1}}}",
                "bad.json:1:11: $.wall.hexagon: unknown key \"hexagon\", expected one of \"rectangle\", \"circle\", \"ellipse\", \"outline\", \"svg_path\", \"union\", \"difference\", \"intersection\"");
    }

    @Test
    void twoShapesInOneWallAreRejected() {
        assertError("{\"wall\": {\"circle\": {\"radius\": 1}, \"rectangle\": {\"width\": 1, \"height\": 1}}}",
                "bad.json:1:10: $.wall: expected exactly one shape key (\"rectangle\", \"circle\", \"ellipse\", \"outline\", \"svg_path\", \"union\", \"difference\", \"intersection\"), got 2");
    }

    @Test
    void anUnknownUnitIsRejectedWithTheAcceptedOnes() {
        assertError("{\"units\": \"cm\", \"wall\": {\"circle\": {\"radius\": 1}}}",
                "bad.json:1:11: $.units: unknown units \"cm\", expected one of \"mm\", \"m\", \"in\", \"mil\"");
    }

    @Test
    void anEmptyStepListIsRejected() {
        assertError("{\"wall\": {\"outline\": {\"start\": [0, 0], \"steps\": []}}}",
                "bad.json:1:49: $.wall.outline.steps: expected at least one step, got an empty array");
    }

    @Test
    void anArcWithoutASweepIsAMissingKeyOnItsStep() {
        assertError("{\"wall\": {\"outline\": {\"start\": [0, 0], \"steps\": [{\"line_to\": [1, 0]}, {\"arc_to\": [0, 1]}]}}}",
                "bad.json:1:71: $.wall.outline.steps[1]: missing key \"sweep_degrees\"");
    }

    @Test
    void aStepThatGoesNowhereIsRejectedAtTheStep() {
        assertError("{\"wall\": {\"outline\": {\"start\": [0, 0], \"steps\": [{\"line_to\": [0, 0]}]}}}",
                "bad.json:1:50: $.wall.outline.steps[0]: the step ends where it starts, expected an end point"
                        + " different from the previous one");
    }

    @Test
    void aPointOfThreeNumbersIsRejected() {
        assertError("{\"wall\": {\"circle\": {\"radius\": 1, \"centre\": [0, 0, 0]}}}",
                "bad.json:1:45: $.wall.circle.centre: expected a point [x, y] of two numbers, got 3 numbers");
    }

    @Test
    void anOutlineWithoutAreaIsRejectedAtItsSteps() {
        assertError("{\"wall\": {\"outline\": {\"start\": [0, 0], \"steps\": [{\"line_to\": [1, 0]}]}}}",
                "bad.json:1:49: $.wall.outline.steps: the closed outline is not a valid wall: outline encloses no area");
    }

    @Test
    void brokenJsonIsReportedWithTheLocationOfTheFault() throws Exception {
        SectionFileException e = error("{\"wall\": {\"circle\": {\"radius\": 1,}}}");
        assertTrue(e.getMessage().startsWith(folder + "/bad.json:1:34: $.wall.circle: not valid JSON: "), e.getMessage());
        assertFalse(e.getMessage().contains("\n"));
    }

    @Test
    void aDuplicateKeyIsRejected() throws Exception {
        SectionFileException e = error("{\"wall\": {\"circle\": {\"radius\": 1, \"radius\": 2}}}");
        assertTrue(e.getMessage().matches(java.util.regex.Pattern.quote(folder + "/bad.json:1:")
                + "\\d+: \\$\\.wall\\.circle: not valid JSON: .*radius.*"), e.getMessage());
    }

    @Test
    void anEmptyFileIsRejected() {
        assertError("", "bad.json:1:1: $: the file is empty, expected a JSON object");
    }

    @Test
    void aTopLevelArrayIsRejected() {
        assertError("[1, 2]", "bad.json:1:1: $: expected a JSON object with a \"wall\", a \"family\" or a \"standard\", got an array");
    }

    @Test
    void textAfterTheTopLevelObjectIsRejected() {
        assertError("{\"wall\": {\"circle\": {\"radius\": 1}}} {}",
                "bad.json:1:37: $: unexpected text after the end of the top-level value");
    }

    @Test
    void theErrorCarriesItsPartsSeparately() throws Exception {
        SectionFileException e = error("{\"wall\": {\"circle\": {\"radius\": -1}}}");
        assertEquals(folder.resolve("bad.json").toString(), e.file());
        assertEquals(1, e.line());
        assertEquals(32, e.column());
        assertEquals("$.wall.circle.radius", e.jsonPath());
        assertEquals("must be a positive length in mm, got -1", e.problem());
    }

    @Test
    void aMissingFileIsAnIoErrorNotAFormatError() {
        assertThrows(NoSuchFileException.class, () -> SectionFiles.read(folder.resolve("absent.json")));
    }

    @Test
    void textThatIsNotUtf8IsRejected() throws Exception {
        Path file = folder.resolve("bad.json");
        Files.write(file, new byte[] {'{', (byte) 0xff, (byte) 0xfe, '}'});
        SectionFileException e = assertThrows(SectionFileException.class, () -> SectionFiles.read(file));
        assertEquals(file + ":1:1: $: not UTF-8 text, expected a UTF-8 JSON file", e.getMessage());
    }

    private CrossSection read(String text) throws IOException, SectionFileException {
        Path file = folder.resolve("good.json");
        Files.writeString(file, text);
        return SectionFiles.read(file);
    }

    private SectionFileException error(String text) throws IOException {
        Path file = folder.resolve("bad.json");
        Files.writeString(file, text);
        return assertThrows(SectionFileException.class, () -> SectionFiles.read(file));
    }

    private void assertError(String text, String expectedAfterFolder) {
        try {
            SectionFileException e = error(text);
            assertEquals(folder + "/" + expectedAfterFolder, e.getMessage());
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }
}
