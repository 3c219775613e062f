package org.sectio.batch.tolerance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sectio.modes.ModeSolver;

/**
 * The corner-radius study on WR-90's inner size (a = 22.86 mm, b = 10.16 mm, EIA). References: at
 * radius 0 the rectangle, fc(TE10) = c/2a, fc(TE20) = c/a, fc(TE01) = c/2b (Pozar, Microwave
 * Engineering, 4th ed., §3.3); at small radii the cavity shape perturbation (Pozar §6.8, from memory):
 * metal in the four corner pieces of area (1 − π/4) r² each raises TE10 by Δkc/kc = 4 (1 − π/4) r² / (a b).
 */
class CornerRadiusStudyTest {

    private static final double A = 22.86e-3;
    private static final double B = 10.16e-3;
    private static CornerRadiusStudy.Result result;

    @BeforeAll
    static void run() {
        result = CornerRadiusStudy.run(A, B, 1.0e-3, 3, 3, 120, 2);
    }

    @Test
    @DisplayName("At radius 0 the study gives the rectangle's TE10, TE20 and TE01 (Pozar §3.3)")
    void sharpCornersAreTheRectangle() {
        double c = ModeSolver.SPEED_OF_LIGHT;
        assertEquals(List.of("TE10", "TE20", "TE01"), result.modeNames());
        CornerRadiusStudy.Row sharp = result.rows().get(0);
        double[] exact = {c / (2 * A), c / A, c / (2 * B)};
        for (int k = 0; k < 3; k++) {
            // the estimate is within 10 × the true error on aligned rectangles (ErrorEstimateTest)
            assertEquals(exact[k], sharp.cutoffsHz()[k], sharp.largestRelativeError() * exact[k], result.modeNames().get(k));
        }
        assertEquals(1.25 * c / (2 * A), sharp.usableLowHz(), 2 * sharp.largestRelativeError() * sharp.usableLowHz());
    }

    @Test
    @DisplayName("TE10 rises with the radius as the shape perturbation says, Δkc/kc = 4(1 − π/4) r²/(ab) (Pozar §6.8)")
    void smallRadiiFollowThePerturbation() {
        double base = result.rows().get(0).cutoffsHz()[0];
        for (int j = 1; j < 3; j++) {
            CornerRadiusStudy.Row row = result.rows().get(j);
            double r = row.radiusMetres();
            double perturbation = 4 * (1 - Math.PI / 4) * r * r / (A * B);
            double change = row.cutoffsHz()[0] / base - 1;
            System.out.printf("r = %.2f mm: change %.4e, perturbation %.4e (%.2e)%n", r * 1e3, change, perturbation,
                    Math.abs(change / perturbation - 1));
            // measured at 120 cells: 1.1e-3 at 0.5 mm and 2.5e-3 at 1 mm (second-order terms and the grid error)
            assertEquals(perturbation, change, 0.01 * perturbation);
        }
    }

    @Test
    @DisplayName("The study writes a table, a CSV with one row per radius and a PNG chart")
    void writesTableCsvAndChart(@TempDir Path dir) throws Exception {
        String csv = CornerRadiusOutput.csv(result);
        String[] lines = csv.split("\n");
        assertEquals("radius_m,cutoff_hz_TE10,cutoff_hz_TE20,cutoff_hz_TE01,single_mode_low_hz,single_mode_high_hz,"
                + "usable_low_hz,usable_high_hz,largest_relative_error_estimate", lines[0]);
        assertEquals(4, lines.length);
        assertTrue(lines[3].startsWith("1.000000000e-03,"), lines[3]);
        assertTrue(CornerRadiusOutput.table(result).contains("    1.0000"));
        Path png = dir.resolve("corners.png");
        CornerRadiusOutput.writePlot(result, png);
        assertTrue(ImageIO.read(png.toFile()).getWidth() > 0);
        assertEquals(List.of(png), Files.list(dir).toList(), "no temporary file left beside it");
    }

    @Test
    @DisplayName("A radius over half the short side and too few points are refused in one line")
    void badInputsAreRefused() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> CornerRadiusStudy.run(A, B, 6e-3, 3, 3, 40, 1))
                .getMessage().contains("≤ half the shorter side (5.08000 mm), got 6.00000 mm"));
        assertThrows(IllegalArgumentException.class, () -> CornerRadiusStudy.run(A, B, 1e-3, 1, 3, 40, 1));
        assertThrows(IllegalArgumentException.class, () -> CornerRadiusStudy.run(-A, B, 1e-3, 3, 3, 40, 1));
    }
}
