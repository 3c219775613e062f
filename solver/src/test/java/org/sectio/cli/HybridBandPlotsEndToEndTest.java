package org.sectio.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.file.SectionFiles;
import org.sectio.io.SweepCharts;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * `solve --band … --plots DIR` on a partly filled guide (the slab_loaded family, 20 × 10 mm, εr = 4 slab
 * 5 mm thick from x = 5 mm, copper walls): the hybrid rows now carry the wall loss, so the attenuation
 * chart is written and no "no mode propagates" note is printed; a band where nothing propagates still
 * gets that note, which is then true. The accuracy of the figures themselves is checked in
 * {@code org.sectio.physics.HybridSlabLoadedWallLossTest} against the exact LSE and LSM fields.
 */
class HybridBandPlotsEndToEndTest {

    private static Path slab(Path dir) throws Exception {
        Path file = dir.resolve("slab.json");
        Files.writeString(file, "{\"name\": \"Corvel Ridge observatory, test slab\", \"units\": \"mm\", \"family\":"
                + " {\"slab_loaded\": {\"width\": 20, \"height\": 10, \"slab_width\": 5, \"slab_centre\": -2.5,"
                + " \"permittivity\": 4, \"loss_tangent\": 0}}}");
        return file;
    }

    @Test
    void aPartlyFilledGuideGetsItsAttenuationChartAndNoFalseNote(@TempDir Path dir) throws Exception {
        Path plots = dir.resolve("charts");
        CapturedRun run = CapturedRun.of("solve", slab(dir).toString(), "--cells", "40", "-n", "2", "--band",
                "9GHz:13GHz:3", "--plots", plots.toString(), "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        for (String name : new String[] {SweepCharts.DISPERSION_FILE, SweepCharts.ATTENUATION_FILE}) {
            BufferedImage image = ImageIO.read(plots.resolve(name).toFile());
            assertEquals(900, image.getWidth(), name);
        }
        assertFalse(run.err().contains("not written"), run.err());
        JsonNode frequencies = new ObjectMapper().readTree(run.out()).get("frequencies");
        assertEquals(3, frequencies.size());
        for (JsonNode at : frequencies) {
            JsonNode first = at.get("modes").get(0);
            assertTrue(first.get("propagating").asBoolean(), first.toString());
            double alphaC = first.get("conductor_loss_np_per_m").asDouble(Double.NaN);
            // copper walls on a 20 × 10 mm guide: some 0.01 to 0.1 Np/m (the empty WR-90 has 0.013 at 10 GHz)
            assertTrue(alphaC > 0.005 && alphaC < 0.2, first.toString());
            assertTrue(first.get("impedance_pv_ohm").asDouble(Double.NaN) > 0, first.toString());
            assertTrue(first.get("limitation").asText().contains("wall loss from the wall H"), first.toString());
        }
    }

    @Test
    void aBandWhereNothingPropagatesSaysSo(@TempDir Path dir) throws Exception {
        Path plots = dir.resolve("charts");
        CapturedRun run = CapturedRun.of("solve", slab(dir).toString(), "--cells", "40", "-n", "2", "--band",
                "1GHz:2GHz:2", "--plots", plots.toString(), "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(Files.exists(plots.resolve(SweepCharts.DISPERSION_FILE)));
        assertFalse(Files.exists(plots.resolve(SweepCharts.ATTENUATION_FILE)));
        assertTrue(run.err().contains("no mode propagates in the band: " + SweepCharts.ATTENUATION_FILE
                + " not written"), run.err());
    }

    /**
     * A cutoff table of TE modes only gives the grid through the cell centres; rebuilt line by line, the
     * last line of the slab-loaded example's default grid fell 1.3e-17 m short of the wall, the hybrid
     * solve refused the grid ("does not cover the cross-section") and {@code --band … -n 3} failed.
     */
    @Test
    void theGridRebuiltFromTeModesIsTheCutoffGridAndCoversTheSection() throws Exception {
        CrossSection section = SectionFiles.read(Path.of("..", "geometries", "examples",
                "corvel-family-slab-loaded.json"));
        TensorGrid planned = GridPlanner.plan(section, SolveSettings.DEFAULT_CELLS);
        List<Mode> te = ModeSolver.solveOnGrid(section, planned, new SolveSettings(1, EnumSet.of(ModeFamily.TE),
                SolveSettings.DEFAULT_CELLS, Double.NaN, false, 1), SolveProgress.SILENT).modes();
        TensorGrid rebuilt = HybridFrequencyAnalysis.gridOf(section, te);
        for (int axis = 0; axis < 2; axis++) {
            double[] a = axis == 0 ? planned.xLines() : planned.yLines();
            double[] b = axis == 0 ? rebuilt.xLines() : rebuilt.yLines();
            assertEquals(a.length, b.length);
            for (int k = 0; k < a.length; k++) {
                assertEquals(a[k], b[k], 1e-12 * (a[a.length - 1] - a[0]), "axis " + axis + " line " + k);
            }
        }
        CutCells.of(section, rebuilt); // refuses a grid that does not cover the section
    }
}
