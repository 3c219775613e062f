package org.sectio.geometry.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.sectio.geometry.family.FamilyAssertions.assertRefused;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;

/**
 * The dielectric-loaded families against elementary geometry: a slab's rectangle t × b at its stated
 * place, a layer a × t on the bottom wall, a rod's disc πr², a liner's annulus π(R² − (R − t)²); the
 * material is the one asked for inside and air outside.
 */
class LoadedFamiliesTest {

    /** Green's-theorem areas of exact segments and arcs: measured ≤ 4e-16 relative, bound 2e-15. */
    private static final double AREA_ACCURACY = 2e-15;

    private static final double A = 22.86e-3;
    private static final double B = 10.16e-3;

    private static GuideSection build(String family, Map<String, Double> values) {
        return GuideFamilies.byName(family).build(values);
    }

    @Test
    @DisplayName("A slab of width t centred at x = c fills exactly [c − t/2, c + t/2] × [−b/2, b/2] with the given material")
    void slabSitsWhereItsCentreSays() {
        GuideSection s = build("slab_loaded", Map.of("slab_width", 3e-3, "slab_centre", -4e-3, "permittivity", 9.8,
                "loss_tangent", 1e-4));
        assertEquals(A * B, s.interior().area(), AREA_ACCURACY * A * B, "the guide stays the plain rectangle");
        assertEquals(1, s.dielectrics().size());
        Dielectric slab = s.dielectrics().get(0);
        assertEquals(new Material(9.8, 1.0, 1e-4), slab.material());
        assertEquals(new Bounds(-5.5e-3, -B / 2, -2.5e-3, B / 2), slab.region().bounds());
        assertEquals(3e-3 * B, slab.region().area(), AREA_ACCURACY * 3e-3 * B);
        assertEquals(9.8, s.materialAt(-4e-3, 0.3e-3).relativePermittivity());
        assertSame(Material.AIR, s.materialAt(0, 0.3e-3));
        assertSame(Material.AIR, s.materialAt(-5.6e-3, 0.3e-3));
    }

    @Test
    @DisplayName("A slab pushed against a narrow wall shares that wall's line exactly")
    void slabAgainstTheWallTouchesIt() {
        double t = 2e-3;
        GuideSection s = build("slab_loaded", Map.of("slab_width", t, "slab_centre", (A - t) / 2));
        Bounds slab = s.dielectrics().get(0).region().bounds();
        assertEquals(A / 2, slab.maxX(), 0.0);
        assertEquals(A / 2 - t, slab.minX(), 1e-17, "a few ulps of 1e-2 m");
    }

    @Test
    @DisplayName("A layer on the broad wall fills [−a/2, a/2] × [−b/2, −b/2 + t]")
    void layerLiesOnTheBottomWall() {
        GuideSection s = build("slab_on_broad_wall", Map.of("slab_thickness", 1.5e-3));
        Bounds layer = s.dielectrics().get(0).region().bounds();
        assertEquals(new Bounds(-A / 2, -B / 2, A / 2, -B / 2 + 1.5e-3), layer);
        assertEquals(A * 1.5e-3, s.dielectrics().get(0).region().area(), AREA_ACCURACY * A * 1.5e-3);
        assertEquals(2.1, s.materialAt(0, -B / 2 + 1e-3).relativePermittivity());
        assertSame(Material.AIR, s.materialAt(0, 0));
    }

    @Test
    @DisplayName("A rod of radius r is a disc of area πr²; the guide around it is the circle πR²")
    void rodIsAConcentricDisc() {
        GuideSection s = build("rod_loaded_circular", Map.of());
        assertEquals(Math.PI * 11e-3 * 11e-3, s.interior().area(), AREA_ACCURACY * 121e-6);
        assertEquals(List.of("rod"), s.dielectrics().stream().map(Dielectric::name).toList());
        assertEquals(Math.PI * 9e-6, s.dielectrics().get(0).region().area(), AREA_ACCURACY * 9e-6);
        assertEquals(2.1, s.materialAt(2.9e-3, 0.1e-3).relativePermittivity());
        assertSame(Material.AIR, s.materialAt(3.1e-3, 0.1e-3));
    }

    @Test
    @DisplayName("A liner of thickness t is an annulus of area π(R² − (R − t)²) with a hole, air inside the hole")
    void linerIsAnAnnulus() {
        double r = 11e-3;
        double t = 1.5e-3;
        GuideSection s = build("rod_loaded_circular", Map.of("rod_radius", 0.0, "liner_thickness", t));
        assertEquals(List.of("liner"), s.dielectrics().stream().map(Dielectric::name).toList());
        var liner = s.dielectrics().get(0).region();
        assertEquals(2, liner.loops().size());
        assertEquals(Math.PI * (r * r - (r - t) * (r - t)), liner.area(), AREA_ACCURACY * r * r);
        assertEquals(2.1, s.materialAt(0, r - 0.5 * t).relativePermittivity());
        assertSame(Material.AIR, s.materialAt(0, 0));
    }

    @Test
    @DisplayName("A rod and a liner together are two dielectric regions of the same material")
    void rodAndLinerTogether() {
        GuideSection s = build("rod_loaded_circular", Map.of("rod_radius", 2e-3, "liner_thickness", 1e-3));
        assertEquals(List.of("rod", "liner"), s.dielectrics().stream().map(Dielectric::name).toList());
        assertSame(Material.AIR, s.materialAt(5e-3, 0));
    }

    @Test
    @DisplayName("Each rule of the loaded families is enforced with a one-line message")
    void loadedFamilyRules() {
        assertRefused("slab_loaded", Map.of("width", 0.0), "slab_loaded: width must be > 0, got 0 mm");
        assertRefused("slab_loaded", Map.of("height", 0.0), "slab_loaded: height must be > 0, got 0 mm");
        assertRefused("slab_loaded", Map.of("slab_width", 0.0), "slab_loaded: slab_width must be > 0 and ≤ width (22.86 mm), got 0 mm");
        assertRefused("slab_loaded", Map.of("slab_width", 23e-3), "slab_loaded: slab_width must be > 0 and ≤ width (22.86 mm), got 23 mm");
        assertRefused("slab_loaded", Map.of("slab_centre", 10.5e-3),
                "slab_loaded: slab_centre must be within ± (width − slab_width) / 2 (± 10.43 mm) so the slab stays inside, got 10.5 mm");
        assertRefused("slab_loaded", Map.of("slab_centre", -10.5e-3),
                "slab_loaded: slab_centre must be within ± (width − slab_width) / 2 (± 10.43 mm) so the slab stays inside, got -10.5 mm");
        assertRefused("slab_loaded", Map.of("permittivity", 0.9), "slab_loaded: permittivity must be ≥ 1 (relative permittivity), got 0.9");
        assertRefused("slab_loaded", Map.of("loss_tangent", -1e-4), "slab_loaded: loss_tangent must be ≥ 0 (loss tangent), got -0.0001");
        assertRefused("slab_on_broad_wall", Map.of("width", 0.0), "slab_on_broad_wall: width must be > 0, got 0 mm");
        assertRefused("slab_on_broad_wall", Map.of("height", 0.0), "slab_on_broad_wall: height must be > 0, got 0 mm");
        assertRefused("slab_on_broad_wall", Map.of("slab_thickness", 0.0),
                "slab_on_broad_wall: slab_thickness must be > 0 and ≤ height (10.16 mm), got 0 mm");
        assertRefused("slab_on_broad_wall", Map.of("slab_thickness", 10.2e-3),
                "slab_on_broad_wall: slab_thickness must be > 0 and ≤ height (10.16 mm), got 10.2 mm");
        assertRefused("slab_on_broad_wall", Map.of("permittivity", 0.5),
                "slab_on_broad_wall: permittivity must be ≥ 1 (relative permittivity), got 0.5");
        assertRefused("slab_on_broad_wall", Map.of("loss_tangent", -1.0),
                "slab_on_broad_wall: loss_tangent must be ≥ 0 (loss tangent), got -1");
        assertRefused("rod_loaded_circular", Map.of("radius", 0.0), "rod_loaded_circular: radius must be > 0, got 0 mm");
        assertRefused("rod_loaded_circular", Map.of("liner_thickness", 11e-3),
                "rod_loaded_circular: liner_thickness must be ≥ 0 and < radius (11 mm), got 11 mm");
        assertRefused("rod_loaded_circular", Map.of("liner_thickness", -1e-3),
                "rod_loaded_circular: liner_thickness must be ≥ 0 and < radius (11 mm), got -1 mm");
        assertRefused("rod_loaded_circular", Map.of("rod_radius", 12e-3),
                "rod_loaded_circular: rod_radius must be ≥ 0 and ≤ radius − liner_thickness (11 mm), got 12 mm");
        assertRefused("rod_loaded_circular", Map.of("rod_radius", 9e-3, "liner_thickness", 3e-3),
                "rod_loaded_circular: rod_radius must be ≥ 0 and ≤ radius − liner_thickness (8 mm), got 9 mm");
        assertRefused("rod_loaded_circular", Map.of("rod_radius", 0.0),
                "rod_loaded_circular: rod_radius must be > 0 when liner_thickness is 0 (a rod, a liner or both), got 0 mm");
        assertRefused("rod_loaded_circular", Map.of("permittivity", 0.99),
                "rod_loaded_circular: permittivity must be ≥ 1 (relative permittivity), got 0.99");
        assertRefused("rod_loaded_circular", Map.of("loss_tangent", -0.01),
                "rod_loaded_circular: loss_tangent must be ≥ 0 (loss tangent), got -0.01");
    }
}
