package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.sectio.modes.GuideShape;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.ModeSet;
import org.sectio.modes.MirrorParity;
import org.sectio.modes.Parity;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Caution;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ImpedanceDefinition;
import org.sectio.physics.ModeAtFrequency;

/**
 * The frequency tables on hand-built figures of the TE10 and TE20 modes of an air-filled 22.86 ×
 * 10.16 mm guide at 10 GHz, from the closed forms of Pozar, Microwave Engineering, 4th ed., §3.3:
 * fc = c m/(2a), β = √(k² − kc²), λg = 2π/β, vp = c/√(1 − (fc/f)²), vg = c √(1 − (fc/f)²),
 * Z_TE = kη/β, and for TE10 P = E0² a b/(4 Z_TE) (so the peak field at 1 W is √(4 Z_TE/(ab)))
 * and Z_PV = 2 (b/a) Z_TE with V = E0 b across the centre. The loss figures are placeholders: the
 * writer only converts and lays them out.
 */
class FrequencyTableWriterTest {

    private static final double C = 299_792_458.0;
    private static final double ETA = 376.730313668;
    private static final double A = 0.02286;
    private static final double B = 0.01016;
    private static final double F = 10e9;

    private static double fc(int m) {
        return C * m / (2 * A);
    }

    private static ModeAtFrequency te10() {
        double k = 2 * Math.PI * F / C;
        double kc = Math.PI / A;
        double beta = Math.sqrt(k * k - kc * kc);
        double root = Math.sqrt(1 - Math.pow(fc(1) / F, 2));
        double zte = k * ETA / beta;
        double peak = Math.sqrt(4 * zte / (A * B));
        double breakdown = Math.pow(3e6 / peak, 2);
        return new ModeAtFrequency("TE 1", F, fc(1), true, beta, 0, 2 * Math.PI / beta, C / root, C * root, zte,
                0.0125, 0.0125 * 8.685889638065037, 0, 0, 6.6e-7, 0.026, peak, A / 2, B / 2, breakdown, breakdown / 4,
                2 * B / A * zte, Double.NaN, Double.NaN, ImpedanceDefinition.POWER_VOLTAGE, 2 * B / A * zte, "");
    }

    private static ModeAtFrequency te20() {
        double k = 2 * Math.PI * F / C;
        double kc = 2 * Math.PI / A;
        double nan = Double.NaN;
        return new ModeAtFrequency("TE 2", F, fc(2), false, 0, Math.sqrt(kc * kc - k * k), Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY, 0, nan, nan, nan, nan, nan, 6.6e-7, 0.026, nan, nan, nan, nan, nan, nan, nan,
                nan, ImpedanceDefinition.POWER_VOLTAGE, nan, "below cutoff: no power");
    }

    private static ModeIdentity identity(int m, Parity vertical, String label) {
        return new ModeIdentity(ModeFamily.TE, GuideShape.RECTANGULAR, m, 0, 1.0, new MirrorParity(vertical,
                vertical == Parity.EVEN ? 1.0 : -1.0), new MirrorParity(Parity.EVEN, 1.0), label);
    }

    private static FrequencyReport report(int points) {
        ModeSet set = SampleModes.rectangleModes();
        List<Mode> modes = FrequencyReport.byCutoff(set).subList(0, 2);
        ModeSet two = new ModeSet(set.sectionName(), modes, set.grid(), set.timing());
        List<ModeIdentity> ids = List.of(identity(1, Parity.ODD, "TE10"), identity(2, Parity.EVEN, "TE20"));
        double[] f = new double[points];
        for (int i = 0; i < points; i++) {
            f[i] = F + i * 1e9;
        }
        List<List<ModeAtFrequency>> figures = Collections.nCopies(points, List.of(te10(), te20()));
        return new FrequencyReport(two, ids, AnalysisSettings.defaults(), f, figures, GuideSummary.of(two, ids));
    }

    private static String[] row(String table, String startsWith) {
        return table.lines().filter(l -> l.startsWith(startsWith)).findFirst().orElseThrow().strip().split("\\s{2,}");
    }

    @Test
    void theTableShowsTe10WithClosedFormVelocitiesWavelengthAndImpedanceInDisplayUnits() {
        String table = FrequencyTableWriter.format(report(1), TableFormat.TABLE);
        String[] te10 = row(table, "1  TE10");
        double root = Math.sqrt(1 - Math.pow(fc(1) / F, 2));
        assertEquals("propagates", te10[5]);
        assertEquals(String.format(Locale.ROOT, "%.5f", 1 / root), te10[9], "vp/c");
        assertEquals(String.format(Locale.ROOT, "%.5f", root), te10[10], "vg/c");
        assertEquals(2 * Math.PI / te10().phaseConstant() * 1e3, Double.parseDouble(te10[8]), 1e-4, "λg in mm");
        assertEquals(2 * B / A * te10().waveImpedanceOhms(), Double.parseDouble(te10[17]), 1e-3, "Z_PV in ohm");
        assertEquals(te10().peakFieldPerRootWatt() / 1e3, Double.parseDouble(te10[14]), 1e-4, "peak field in kV/m");
        assertEquals("pv", te10[18]);
    }

    @Test
    void aCutOffModeShowsItsEvanescentAlphaAndTheReasonForTheMissingFigures() {
        String table = FrequencyTableWriter.format(report(1), TableFormat.TABLE);
        String[] te20 = row(table, "2  TE20");
        assertEquals("cut off", te20[5]);
        assertEquals("-", te20[6], "no β below cutoff");
        double k = 2 * Math.PI * F / C;
        assertEquals(Math.sqrt(Math.pow(2 * Math.PI / A, 2) - k * k), Double.parseDouble(te20[7]), 1e-4);
        assertTrue(table.contains("note: TE20: below cutoff: no power"), table);
    }

    @Test
    void theSkinDepthIsPrintedOnceAboveTheTableAndTheSummaryAndCautionFollowIt() {
        String table = FrequencyTableWriter.format(report(1), TableFormat.TABLE);
        assertEquals(1, table.split("skin depth", -1).length - 1, table);
        assertTrue(table.indexOf("skin depth") < table.indexOf("1  TE10"), table);
        assertTrue(table.contains("dominant mode      TE10"), table);
        assertTrue(table.contains("first higher mode  TE20"), table);
        assertTrue(table.contains("| cutoff"), table);
        assertTrue(table.indexOf(Caution.TEXT) > table.indexOf("Guide summary"), table);
    }

    @Test
    void aBandRunHasOneCsvRowPerFrequencyAndModeWithSiColumnNames() {
        String csv = FrequencyTableWriter.format(report(3), TableFormat.CSV);
        List<String> lines = csv.lines().toList();
        assertEquals(1 + 3 * 2, lines.size());
        List<String> header = List.of(lines.get(0).split(","));
        for (String key : List.of("frequency_hz", "phase_constant_rad_per_m", "conductor_loss_db_per_m",
                "peak_field_v_per_m_at_1w", "breakdown_power_w", "rated_power_w", "impedance_pv_ohm",
                "guide_wavelength_m", "dielectric_loss_db_per_m", "characteristic_impedance_ohm")) {
            assertTrue(header.contains(key), key + " missing from " + header);
        }
        String[] first = lines.get(1).split(",", -1);
        assertEquals(header.size(), first.length);
        assertEquals(te10().phaseConstant(), Double.parseDouble(first[header.indexOf("phase_constant_rad_per_m")]), 0);
        assertEquals("", lines.get(2).split(",", -1)[header.indexOf("impedance_pv_ohm")], "cut off: empty field");
        assertTrue(lines.get(5).startsWith("1.2E10,"), lines.get(5));
    }

    @Test
    void theJsonKeepsTheModesArrayAndAddsFrequenciesSummaryAndCaution() throws IOException {
        JsonNode root = new ObjectMapper().readTree(FrequencyTableWriter.format(report(2), TableFormat.JSON));
        assertEquals("TE", root.get("modes").get(0).get("family").asText());
        assertEquals("TE10", root.get("modes").get(0).get("name").asText());
        assertEquals("odd/even", root.get("modes").get(0).get("symmetry").asText());
        assertEquals(2, root.get("frequencies").size());
        JsonNode te10 = root.get("frequencies").get(1).get("modes").get(0);
        assertEquals(1.1e10, root.get("frequencies").get(1).get("frequency_hz").asDouble(), 0);
        assertEquals(te10().breakdownPowerWatts(), te10.get("breakdown_power_w").asDouble(), 0);
        assertTrue(root.get("frequencies").get(0).get("modes").get(1).get("impedance_pv_ohm").isNull());
        assertEquals("TE20", root.get("summary").get("next_mode").asText());
        assertEquals(1.25 * fc(1), root.get("summary").get("usable_low_hz").asDouble(), 1e-3);
        assertEquals(Caution.TEXT, root.get("caution").asText());
        assertEquals("copper", root.get("analysis").get("conductor").asText());
    }
}
