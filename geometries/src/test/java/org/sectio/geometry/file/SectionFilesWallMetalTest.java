package org.sectio.geometry.file;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.WallMetal;

/**
 * The wall-metal keys of geometry files ({@code "conductor"}, {@code "inner_conductor_metal"} and an
 * inner conductor's own {@code "conductor"}): which wall gets which metal, and the exact one-line error
 * of every fault with its line, column and JSON path. Built-in conductivities: Pozar, Microwave
 * Engineering, 4th ed., Appendix F (from memory).
 */
class SectionFilesWallMetalTest {

    private static final String COAX = "\"family\": {\"coaxial\": {\"outer_radius\": 3.5, \"inner_radius\": 1.52}}";
    private static final String PIN = "{\"circle\": {\"radius\": 1.52}}";

    private static CrossSection read(String text) throws SectionFileException {
        return SectionFiles.parse("f.json", text);
    }

    private static String error(String text) {
        SectionFileException e = assertThrows(SectionFileException.class, () -> SectionFiles.parse("f.json", text));
        assertFalse(e.getMessage().contains("\n"));
        return e.getMessage();
    }

    @Test
    void aFileWithoutConductorKeysGivesNoMetal() throws Exception {
        CrossSection s = read("{" + COAX + "}");
        assertTrue(s.wallMetal(0).isEmpty());
        assertTrue(s.wallMetal(1).isEmpty());
    }

    @Test
    void aBuiltInNameAtTheTopGivesEveryWallThatMetal() throws Exception {
        CrossSection s = read("{\"conductor\": \"Brass\", " + COAX + "}");
        assertSame(WallMetal.BRASS, s.wallMetal(0).orElseThrow());
        assertSame(WallMetal.BRASS, s.wallMetal(1).orElseThrow());
        assertEquals(2.564e7, s.wallMetal(1).orElseThrow().conductivity(), 0.0); // Pozar App. F, from memory
    }

    @Test
    void anObjectGivesAMetalOfOnesOwnWithExpressionsOverTheParameters() throws Exception {
        CrossSection s = read("{\"parameters\": {\"s\": 1.5e7}, \"conductor\": {\"name\": \"silver-plated bronze\","
                + " \"conductivity\": \"2 * s\", \"permeability\": 1.02}, \"wall\": {\"circle\": {\"radius\": 5}}}");
        WallMetal m = s.wallMetal(0).orElseThrow();
        assertEquals("silver-plated bronze", m.name());
        assertEquals(3e7, m.conductivity(), 0.0);
        assertEquals(1.02, m.relativePermeability(), 0.0);
        WallMetal unnamed = read("{\"conductor\": {\"conductivity\": 1e7}, \"wall\": {\"circle\": {\"radius\": 5}}}")
                .wallMetal(0).orElseThrow();
        assertEquals(WallMetal.user(1e7), unnamed);
    }

    @Test
    void theInnerConductorMetalOverridesTheWallsAndAnEntrysOwnOverridesBoth() throws Exception {
        CrossSection coax = read("{\"conductor\": \"copper\", \"inner_conductor_metal\": \"brass\", " + COAX + "}");
        assertSame(WallMetal.COPPER, coax.wallMetal(0).orElseThrow());
        assertSame(WallMetal.BRASS, coax.wallMetal(1).orElseThrow());
        CrossSection twin = read("{\"conductor\": \"copper\", \"inner_conductor_metal\": \"brass\","
                + " \"wall\": {\"rectangle\": {\"width\": 20, \"height\": 10}}, \"inner_conductors\": ["
                + "{\"circle\": {\"radius\": 1, \"centre\": [5, 5]}},"
                + " {\"shape\": {\"circle\": {\"radius\": 1, \"centre\": [15, 5]}}, \"conductor\": \"gold\"},"
                + " {\"shape\": {\"circle\": {\"radius\": 1, \"centre\": [10, 5]}}}]}");
        assertSame(WallMetal.COPPER, twin.wallMetal(0).orElseThrow());
        assertSame(WallMetal.BRASS, twin.wallMetal(1).orElseThrow(), "bare shape");
        assertSame(WallMetal.GOLD, twin.wallMetal(2).orElseThrow(), "its own metal");
        assertSame(WallMetal.BRASS, twin.wallMetal(3).orElseThrow(), "shape object without a metal");
        assertEquals(4, twin.conductors().size());
    }

    @Test
    void onlyTheEntryWithItsOwnMetalHasOneWhenNothingElseIsGiven() throws Exception {
        CrossSection s = read("{\"wall\": {\"circle\": {\"radius\": 3.5}}, \"inner_conductors\": [{\"shape\": " + PIN
                + ", \"conductor\": {\"conductivity\": 1.6e7}}]}");
        assertTrue(s.wallMetal(0).isEmpty());
        assertEquals(1.6e7, s.wallMetal(1).orElseThrow().conductivity(), 0.0);
    }

    @Test
    void anUnknownMetalNameIsReportedWithTheKnownOnes() {
        assertEquals("f.json:1:15: $.conductor: unknown conductor \"bronze\"; known: copper, silver, gold, aluminium,"
                + " brass", error("{\"conductor\": \"bronze\", " + COAX + "}"));
    }

    @Test
    void aConductivityThatIsNotPositiveOrNotANumberIsReportedAtIt() {
        assertEquals("f.json:1:32: $.conductor.conductivity: expected a conductivity > 0 S/m, got 0",
                error("{\"conductor\": {\"conductivity\": 0}, " + COAX + "}"));
        assertEquals("f.json:1:32: $.conductor.conductivity: expected a conductivity > 0 S/m, got \"-s\" = -2.0",
                error("{\"conductor\": {\"conductivity\": \"-s\"}, \"parameters\": {\"s\": 2}, " + COAX + "}"));
        assertEquals("f.json:1:32: $.conductor.conductivity: expected a finite number, got NaN",
                error("{\"conductor\": {\"conductivity\": NaN}, " + COAX + "}"));
        assertEquals("f.json:1:15: $.conductor: missing key \"conductivity\"",
                error("{\"conductor\": {\"name\": \"x\"}, " + COAX + "}"));
    }

    @Test
    void unknownKeysInAMetalOrAnEntryAndAWrongTypeAreReported() {
        assertEquals("f.json:1:37: $.conductor.sigma: unknown key \"sigma\", expected one of \"name\", \"conductivity\","
                + " \"permeability\"", error("{\"conductor\": {\"conductivity\": 1e7, \"sigma\": 1}, " + COAX + "}"));
        String entry = error("{\"wall\": {\"circle\": {\"radius\": 3.5}}, \"inner_conductors\": [{\"shape\": " + PIN
                + ", \"metal\": \"gold\"}]}");
        assertTrue(entry.startsWith("f.json:1:100: $.inner_conductors[0].metal: unknown key \"metal\", expected one of"
                + " \"shape\", \"conductor\""), entry);
        assertEquals("f.json:1:60: $.inner_conductors[0]: missing key \"shape\"", error("{\"wall\": {\"circle\":"
                + " {\"radius\": 3.5}}, \"inner_conductors\": [{\"conductor\": \"gold\"}]}"));
        assertEquals("f.json:1:15: $.conductor: expected a metal name such as \"copper\" or an object with"
                + " \"conductivity\" (S/m), got the number 5", error("{\"conductor\": 5, " + COAX + "}"));
    }

    @Test
    void anInnerConductorMetalWithoutAnInnerConductorIsRefused() {
        String m = error("{\"inner_conductor_metal\": \"brass\", \"wall\": {\"circle\": {\"radius\": 5}}}");
        assertEquals("f.json:1:27: $.inner_conductor_metal: the guide has no inner conductor, expected"
                + " \"inner_conductor_metal\" only with \"inner_conductors\" or a family that has one (coaxial)", m);
    }
}
