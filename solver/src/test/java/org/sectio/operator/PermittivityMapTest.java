package org.sectio.operator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.MaterialAreas;
import org.sectio.mesh.StaggeredGrids;
import org.sectio.mesh.TensorGrid;

/**
 * Material areas and the averaged permittivity against closed forms: the area of a disc (π r²,
 * exact for arcs by Green's theorem), and the means at a planar interface lying on a grid line — the
 * arithmetic mean (1 + εr)/2 of a node's dual cell cut in half and the harmonic mean 2/(1 + εr) of
 * εr⁻¹ along a link crossed at its midpoint (Farjadpour et al., Opt. Lett. 31 (2006) 2972, for a
 * normal along the link).
 */
class PermittivityMapTest {

    private static final double EPS = 4.0;

    private static CrossSection slab(double s1, double s2, Material material) {
        Region slab = Region.of(Outline.startAt(s1, 0).lineTo(s2, 0).lineTo(s2, 0.01).lineTo(s1, 0.01).close());
        Region inside = Region.of(Outline.startAt(0, 0).lineTo(0.02, 0).lineTo(0.02, 0.01).lineTo(0, 0.01).close());
        return new GuideSection("slab", inside, List.of(new Dielectric("slab", slab, material)), Material.AIR);
    }

    @Test
    void discAreaIsExactOnAnyGrid() {
        CrossSection disc = Shapes.circle(0.004, 0.3e-3, -0.2e-3);
        TensorGrid grid = TensorGrid.shifted(disc.bounds(), 37, 0.37, 0.61);
        double exact = Math.PI * 0.004 * 0.004;
        // measured: 2e-16 relative
        assertEquals(exact, MaterialAreas.of(disc.wallPieces(), grid).totalArea(), 1e-13 * exact);
        assertEquals(exact, MaterialAreas.of(disc.wallPieces(), StaggeredGrids.nodeDual(grid)).totalArea(), 1e-13 * exact);
    }

    @Test
    void anInterfaceOnAGridLineGivesTheArithmeticNodeMeanAndTheHarmonicLinkMean() {
        CrossSection guide = slab(0.005, 0.01, new Material(EPS, 1, 0));
        TensorGrid grid = TensorGrid.fitted(guide.bounds(), 40); // 0.5 mm cells: x = 5 mm is line 10
        PermittivityMap medium = PermittivityMap.of(guide, grid);
        assertEquals((1 + EPS) / 2, medium.nodeMean(10, 5), 1e-12);
        assertEquals(EPS, medium.nodeMean(15, 5), 1e-12);
        assertEquals(1.0, medium.nodeMean(5, 5), 1e-12);
        // vertical face 10 lies on the interface: its link runs half in air, half in the slab
        assertEquals(2 / (1 + EPS), medium.verticalFaceInverse(10, 5), 1e-12);
        // horizontal faces either side of the interface lie wholly in one material
        assertEquals(1.0, medium.horizontalFaceInverse(9, 5), 1e-12);
        assertEquals(1 / EPS, medium.horizontalFaceInverse(10, 5), 1e-12);
        assertEquals(1 / EPS, medium.verticalFaceInverse(15, 5), 1e-12);
        assertTrue(!medium.isUniform());
    }

    @Test
    void magneticMaterialsAreRefusedWithTheirName() {
        CrossSection guide = slab(0.005, 0.01, new Material(EPS, 2, 0));
        var e = assertThrows(IllegalArgumentException.class,
                () -> PermittivityMap.of(guide, TensorGrid.fitted(guide.bounds(), 20)));
        assertTrue(e.getMessage().contains("'slab'") && e.getMessage().contains("μr = 1"), e.getMessage());
    }
}
