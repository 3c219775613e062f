package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;

class ModeTableWriterTest {

    @TempDir
    Path folder;

    private final ModeSet modes = SampleModes.rectangleModes();

    @Test
    void csvStartsWithTheExactHeaderOfSiColumnNames() {
        String[] lines = ModeTableWriter.format(modes, TableFormat.CSV).split("\n");
        assertEquals("number,family,index,cutoff_frequency_hz,cutoff_wavenumber_per_m,relative_error_estimate,residual,"
                + "characteristic_impedance_ohm",
                lines[0]);
        assertEquals(4, lines.length);
    }

    @Test
    void csvRowsComeLowestCutoffFirstAndReadBackToTheSameDoubles() {
        String[] lines = ModeTableWriter.format(modes, TableFormat.CSV).split("\n");
        String[] first = lines[1].split(",", -1);
        assertArrayEquals(new String[] {"1", "TE", "1"}, new String[] {first[0], first[1], first[2]});
        assertEquals(SampleModes.LIGHT_SPEED / (2 * 0.02286), Double.parseDouble(first[3]), 1e-3);
        assertEquals(Math.PI / 0.02286, Double.parseDouble(first[4]), 0.0);
        assertEquals(2.5e-6, Double.parseDouble(first[5]), 0.0);
        assertEquals(3.5e-13, Double.parseDouble(first[6]), 0.0);
        assertTrue(lines[2].startsWith("2,TE,2,"), lines[2]);
        assertTrue(lines[3].startsWith("3,TM,1,"), lines[3]);
    }

    @Test
    void csvLeavesTheEstimateFieldEmptyWhenNoEstimateWasMade() {
        String[] fields = ModeTableWriter.format(modes, TableFormat.CSV).split("\n")[2].split(",", -1);
        assertEquals(8, fields.length);
        assertEquals("", fields[5]);
        assertEquals("", fields[7], "a TE mode has no characteristic impedance");
    }

    /** A coaxial line's TEM mode in front of the rectangle's modes: zero cutoff, impedance in Ω. */
    private static ModeSet withTem() {
        ModeSet rect = SampleModes.rectangleModes();
        java.util.List<Mode> all = new java.util.ArrayList<>(rect.modes());
        all.add(new Mode(ModeFamily.TEM, 1, 0.0, 0.0, 1e-14, 2e-5, SampleModes.smallField(), 41.58883083359672));
        return new ModeSet(rect.sectionName(), all, rect.grid(), rect.timing());
    }

    @Test
    void aTemModeComesFirstWithZeroCutoffAndItsImpedanceInEveryFormat() throws IOException {
        ModeSet tem = withTem();
        String[] csv = ModeTableWriter.format(tem, TableFormat.CSV).split("\n")[1].split(",", -1);
        assertArrayEquals(new String[] {"1", "TEM", "1", "0", "0"}, java.util.Arrays.copyOf(csv, 5));
        assertEquals(41.58883083359672, Double.parseDouble(csv[7]), 0.0);
        JsonNode first = new ObjectMapper().readTree(ModeTableWriter.format(tem, TableFormat.JSON)).get("modes").get(0);
        assertEquals("TEM", first.get("family").asText());
        assertEquals(0.0, first.get("cutoff_frequency_hz").asDouble(), 0.0);
        assertEquals(41.58883083359672, first.get("characteristic_impedance_ohm").asDouble(), 0.0);
        JsonNode second = new ObjectMapper().readTree(ModeTableWriter.format(tem, TableFormat.JSON)).get("modes").get(1);
        assertTrue(second.get("characteristic_impedance_ohm").isNull());
        String[] table = ModeTableWriter.format(tem, TableFormat.TABLE).split("\n");
        assertEquals("  #  family  index    cutoff (GHz)      kc (rad/m)  rel. error   residual    Z0 (ohm)", table[2]);
        assertEquals("  1  TEM         1               0               0     2.0e-05    1.0e-14     41.5888", table[3]);
        assertEquals("  2  TE          1       6.5571404      137.427500     2.5e-06    3.5e-13           -", table[4]);
    }

    @Test
    void jsonReadsBackWithTheSectionGridTimingAndModesInCutoffOrder() throws IOException {
        JsonNode root = new ObjectMapper().readTree(ModeTableWriter.format(modes, TableFormat.JSON));
        assertEquals("rectangle 22.86 × 10.16 mm", root.get("section").asText());
        JsonNode grid = root.get("grid");
        assertEquals(200, grid.get("cells_x").asInt());
        assertEquals(89, grid.get("cells_y").asInt());
        assertEquals(1.143e-4, grid.get("cell_width_m").asDouble(), 0.0);
        assertEquals(1.1416e-4, grid.get("cell_height_m").asDouble(), 0.0);
        assertEquals(17_890, grid.get("unknowns_te").asInt());
        assertEquals(17_402, grid.get("unknowns_tm").asInt());
        JsonNode timing = root.get("timing");
        assertEquals(0.125, timing.get("assembly_s").asDouble(), 0.0);
        assertEquals(0.5, timing.get("factor_s").asDouble(), 0.0);
        assertEquals(0.75, timing.get("eigen_s").asDouble(), 0.0);
        assertEquals(1.5, timing.get("total_s").asDouble(), 0.0);
        JsonNode list = root.get("modes");
        assertEquals(3, list.size());
        List<String> labels = new ArrayList<>();
        list.forEach(m -> labels.add(m.get("family").asText() + " " + m.get("index").asInt()));
        assertEquals(List.of("TE 1", "TE 2", "TM 1"), labels);
        JsonNode first = list.get(0);
        assertEquals(Math.PI / 0.02286, first.get("cutoff_wavenumber_per_m").asDouble(), 0.0);
        assertEquals(modes.modes().get(1).cutoffFrequencyHz(), first.get("cutoff_frequency_hz").asDouble(), 0.0);
        assertEquals(3.5e-13, first.get("residual").asDouble(), 0.0);
        assertEquals(2.5e-6, first.get("relative_error_estimate").asDouble(), 0.0);
    }

    @Test
    void jsonModesCarryTheAgreedKeysAndANullEstimateWhenNoneWasMade() throws IOException {
        JsonNode second = new ObjectMapper().readTree(ModeTableWriter.format(modes, TableFormat.JSON)).get("modes").get(1);
        List<String> keys = new ArrayList<>();
        second.fieldNames().forEachRemaining(keys::add);
        assertTrue(keys.containsAll(Set.of("family", "index", "cutoff_wavenumber_per_m", "cutoff_frequency_hz",
                "residual", "relative_error_estimate")), keys.toString());
        assertTrue(second.get("relative_error_estimate").isNull());
    }

    @Test
    void theTableNamesSectionAndGridAndEndsWithTheTiming() {
        String[] lines = ModeTableWriter.format(modes, TableFormat.TABLE).split("\n");
        assertEquals("Modes of rectangle 22.86 × 10.16 mm", lines[0]);
        assertEquals("grid 200 × 89 cells of 0.11430 × 0.11416 mm; unknowns TE 17890, TM 17402", lines[1]);
        assertEquals("  #  family  index    cutoff (GHz)      kc (rad/m)  rel. error   residual", lines[2]);
        assertEquals("  1  TE          1       6.5571404      137.427500     2.5e-06    3.5e-13", lines[3]);
        assertEquals("  2  TE          2      13.1142808      274.855000           -    3.5e-13", lines[4]);
        assertEquals("  3  TM          1      16.1450858      338.375977     1.3e-05    3.5e-13", lines[5]);
        assertEquals("time 1.500 s: assembly 0.125 s, factorization 0.500 s, eigenvalues 0.750 s", lines[6]);
        assertEquals(7, lines.length);
    }

    @Test
    void everyTableRowIsAsWideAsTheColumnHeader() {
        String[] lines = ModeTableWriter.format(modes, TableFormat.TABLE).split("\n");
        for (int k = 3; k <= 5; k++) {
            assertEquals(lines[2].length(), lines[k].length(), lines[k]);
        }
    }

    @Test
    void writingToAFileReplacesItWholeAndLeavesNoTemporaryFile() throws IOException {
        Path file = folder.resolve("modes.csv");
        Files.writeString(file, "an older, longer table that must vanish entirely\n".repeat(20));
        ModeTableWriter.write(modes, TableFormat.CSV, file);
        assertEquals(ModeTableWriter.format(modes, TableFormat.CSV), Files.readString(file, StandardCharsets.UTF_8));
        try (Stream<Path> entries = Files.list(folder)) {
            assertEquals(List.of(file), entries.toList());
        }
    }

    @Test
    void aWriteThatFailsHalfwayKeepsThePreviousFileAndCleansUp() throws IOException {
        Path file = folder.resolve("modes.txt");
        Files.writeString(file, "previous results\n");
        assertThrows(IOException.class, () -> AtomicFile.write(file, out -> {
            out.write("partial".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        assertEquals("previous results\n", Files.readString(file));
        try (Stream<Path> entries = Files.list(folder)) {
            assertEquals(List.of(file), entries.toList());
        }
    }
}
