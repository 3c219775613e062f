package org.sectio.geometry.file;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.family.GuideFamily;

/**
 * Setting a file's parameters from outside, as batch work does: new values replace the written ones,
 * expressions follow them, and a name the file does not define, a non-finite value or a value that
 * breaks a shape's rule is one line naming the place. Expected sizes are elementary geometry.
 */
class SectionFilesSettingsTest {

    private static final String GUIDE = "{\"units\": \"mm\", \"parameters\": {\"a\": 22.86, \"b\": \"a / 2\"},\n"
            + " \"wall\": {\"rectangle\": {\"width\": \"a\", \"height\": \"b\"}}}";

    private static String error(String text, Map<String, Double> settings) {
        SectionFileException e = assertThrows(SectionFileException.class,
                () -> SectionFiles.parse("g.json", text, settings));
        assertFalse(e.getMessage().contains("\n"));
        return e.getMessage();
    }

    @Test
    void aSetValueReplacesTheWrittenOneAndExpressionsFollowIt() throws Exception {
        CrossSection s = SectionFiles.parse("g.json", GUIDE, Map.of("a", 30.0));
        assertEquals(0.030, s.bounds().width(), 1e-15);
        assertEquals(0.015, s.bounds().height(), 1e-15);
    }

    @Test
    void anExpressionParameterCanItselfBeSet() throws Exception {
        CrossSection s = SectionFiles.parse("g.json", GUIDE, Map.of("b", 5.0));
        assertEquals(0.02286, s.bounds().width(), 1e-15);
        assertEquals(0.005, s.bounds().height(), 1e-15);
    }

    @Test
    void noSettingsReadsTheFileAsWritten() throws Exception {
        assertEquals(SectionFiles.parse("g.json", GUIDE).bounds(), SectionFiles.parse("g.json", GUIDE, Map.of()).bounds());
    }

    @Test
    void theParametersAreListedInFileOrderInFileUnits() throws Exception {
        FileParameters p = SectionFiles.parameters("g.json", GUIDE);
        assertEquals(LengthUnit.MILLIMETRE, p.units());
        assertEquals(List.of("a", "b"), List.copyOf(p.values().keySet()));
        assertEquals(11.43, p.values().get("b"), 1e-12);
    }

    @Test
    void aNameTheFileDoesNotDefineIsReported() {
        assertEquals("g.json:1:31: $.parameters: no parameter \"gap\" to set, expected one of \"a\", \"b\"",
                error(GUIDE, Map.of("gap", 1.0)));
    }

    @Test
    void aFileWithoutParametersCannotBeSet() {
        assertEquals("g.json:1:1: $: no \"parameters\" to set \"a\" in, expected the file to define them under"
                + " \"parameters\"", error("{\"wall\": {\"circle\": {\"radius\": 1}}}", Map.of("a", 1.0)));
    }

    @Test
    void aNonFiniteValueIsReportedAtTheParameter() {
        assertEquals("g.json:1:37: $.parameters.a: the value set for \"a\" is NaN, expected a finite number",
                error(GUIDE, Map.of("a", Double.NaN)));
    }

    @Test
    void aValueThatBreaksAShapeRuleIsReportedWhereTheRuleApplies() {
        assertEquals("g.json:2:34: $.wall.rectangle.width: must be a positive length in mm, got \"a\" = -1.0",
                error(GUIDE, Map.of("a", -1.0)));
    }

    @Test
    void everyFamilyAsATemplateBuildsItsDefaultGuideExactly() throws Exception {
        for (GuideFamily family : GuideFamilies.all()) {
            GuideTemplate template = GuideTemplate.of(family);
            assertEquals(family.parameters().size(), template.parameters().values().size(), family.name());
            assertEquals(family.buildDefault().bounds(), template.build(Map.of()).bounds(), family.name());
        }
    }

    @Test
    void aFamilyTemplateTakesLengthsInMillimetres() throws Exception {
        GuideFamily rectangular = GuideFamilies.all().stream().filter(f -> f.name().equals("rectangular"))
                .findFirst().orElseThrow();
        CrossSection s = GuideTemplate.of(rectangular).build(Map.of("width", 40.0));
        assertEquals(0.040, s.bounds().width(), 1e-15);
    }

    @Test
    void aFamilyTemplatesBrokenRuleIsOneLine() {
        GuideFamily rectangular = GuideFamilies.all().stream().filter(f -> f.name().equals("rectangular"))
                .findFirst().orElseThrow();
        SectionFileException e = assertThrows(SectionFileException.class,
                () -> GuideTemplate.of(rectangular).build(Map.of("width", -3.0)));
        assertFalse(e.getMessage().contains("\n"));
        assertEquals(true, e.getMessage().startsWith("family rectangular:1:"), e.getMessage());
    }
}
