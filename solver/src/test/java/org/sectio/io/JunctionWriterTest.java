package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.sectio.physics.Caution;

/**
 * The junction report layouts on hand-built steps. Hand values for a 2:1 impedance step (Pozar,
 * Microwave Engineering, 4th ed., §2.3): Γ = (2 − 1)/(2 + 1) = 1/3, VSWR = (1 + 1/3)/(1 − 1/3) = 2,
 * RL = −20 log10(1/3) = 9.542 dB, |Γ|² = 1/9 = 11.11 %.
 */
class JunctionWriterTest {

    private static JunctionReport report(double za, double zb) {
        return new JunctionReport("guide a", "TE10", 6.557e9, "guide b", "TE10", 6.557e9, "pv",
                List.of(JunctionStep.of(10e9, za, zb)));
    }

    @Test
    void aTwoToOneStepPrintsGammaOneThirdVswrTwoAndReturnLossNinePointFiveFour() {
        String table = JunctionWriter.format(report(250, 500), TableFormat.TABLE);
        String row = table.lines().filter(l -> l.strip().startsWith("10.000000")).findFirst().orElseThrow();
        String[] cells = row.strip().split("\\s+");
        assertEquals(List.of("10.000000", "250.000", "500.000", "0.3333", "9.54", "2.0000", "11.111"), List.of(cells));
        assertTrue(table.contains("impedance-step estimate"), table);
        assertTrue(table.contains(Caution.TEXT), table);
    }

    @Test
    void aMatchedStepPrintsAnInfiniteReturnLossAndVswrOne() throws IOException {
        JunctionReport matched = report(400, 400);
        String table = JunctionWriter.format(matched, TableFormat.TABLE);
        String row = table.lines().filter(l -> l.strip().startsWith("10.000000")).findFirst().orElseThrow();
        assertEquals(List.of("10.000000", "400.000", "400.000", "0.0000", JunctionWriter.INFINITE, "1.0000", "0.000"),
                List.of(row.strip().split("\\s+")));
        JsonNode step = new ObjectMapper().readTree(JunctionWriter.format(matched, TableFormat.JSON)).get("steps").get(0);
        assertTrue(step.get("return_loss_db").isNull(), step.toString());
        assertEquals(1.0, step.get("vswr").asDouble(), 0);
        String csv = JunctionWriter.format(matched, TableFormat.CSV);
        assertEquals("1.0E10,400.0,400.0,0.0,inf,1.0,0.0", csv.lines().skip(1).findFirst().orElseThrow());
    }

    @Test
    void theJsonCarriesBothGuidesTheMethodAndTheCaution() throws IOException {
        JsonNode root = new ObjectMapper().readTree(JunctionWriter.format(report(250, 500), TableFormat.JSON));
        assertEquals("guide a", root.get("section_a").asText());
        assertEquals("TE10", root.get("mode_b").asText());
        assertEquals(Caution.TEXT, root.get("caution").asText());
        assertEquals(1.0 / 3, root.get("steps").get(0).get("reflection_coefficient").asDouble(), 1e-15);
        assertEquals(1.0 / 9, root.get("steps").get(0).get("reflected_power_fraction").asDouble(), 1e-15);
    }
}
