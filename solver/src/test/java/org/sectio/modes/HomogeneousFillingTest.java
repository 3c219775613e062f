package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.geometry.WallPiece;
import org.sectio.mesh.TensorGrid;

/**
 * A guide filled with one material εr has the air-filled guide's kc and fc = c kc / (2π √εr)
 * (Pozar, Microwave Engineering, 4th ed., §3.3, for the filled rectangular guide). The discrete
 * pencils are the air pencils with A scaled by 1/εr (Hz) or M by εr (Ez), so the cutoff frequencies
 * must agree with fc(air)/√εr to round-off, whether εr is the filling or a dielectric region covering
 * the whole interior (an off-centre circle on a shifted grid, so that the region's boundary cuts cells).
 */
class HomogeneousFillingTest {

    private static final Material GLASS = new Material(2.25, 1, 0);

    private static List<Mode> solve(CrossSection section, TensorGrid grid) {
        return ModeSolver.solveOnGrid(section, grid,
                new SolveSettings(8, EnumSet.of(ModeFamily.TE, ModeFamily.TM), 60, Double.NaN, false, 2),
                SolveProgress.SILENT).modes();
    }

    private static void assertScaled(List<Mode> air, List<Mode> filled) {
        assertEquals(air.size(), filled.size());
        for (int k = 0; k < air.size(); k++) {
            assertEquals(air.get(k).family(), filled.get(k).family());
            // measured: agreement to 3e-15 (filling) and 5e-15 (region) relative, round-off of pencil and Lanczos
            assertEquals(air.get(k).cutoffFrequencyHz() / 1.5, filled.get(k).cutoffFrequencyHz(),
                    1e-12 * air.get(k).cutoffFrequencyHz(), air.get(k).label());
        }
    }

    @Test
    void aFillingScalesEveryCutoffFrequencyByOneOverSqrtEpsilon() {
        List<WallPiece> wall = Outline.startAt(0, 0).lineTo(0.02286, 0).lineTo(0.02286, 0.01016).lineTo(0, 0.01016).close();
        CrossSection air = new GuideSection("air", Region.of(wall), List.of(), Material.AIR);
        CrossSection filled = new GuideSection("filled", Region.of(wall), List.of(), GLASS);
        TensorGrid grid = TensorGrid.fitted(air.bounds(), 60);
        assertScaled(solve(air, grid), solve(filled, grid));
    }

    @Test
    void aRegionCoveringTheInteriorActsAsTheFilling() {
        List<WallPiece> wall = org.sectio.geometry.Shapes.circle(0.01, 0.3e-3, -0.2e-3).wallPieces();
        CrossSection air = new GuideSection("air", Region.of(wall), List.of(), Material.AIR);
        CrossSection covered = new GuideSection("covered", Region.of(wall),
                List.of(new Dielectric("all of it", Region.of(wall), GLASS)), Material.AIR);
        TensorGrid grid = TensorGrid.shifted(air.bounds(), 60, 0.37, 0.61);
        assertScaled(solve(air, grid), solve(covered, grid));
    }
}
