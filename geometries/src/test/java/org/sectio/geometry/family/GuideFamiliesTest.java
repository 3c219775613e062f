package org.sectio.geometry.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Loop;

/**
 * What every family promises, checked on every family's default guide: the registry finds it by
 * name, its parameters are documented and named for files, unknown names and non-finite values are
 * refused, its walls are counter-clockwise outside and clockwise around inner conductors, no piece is
 * degenerate, and dielectric regions lie inside the guide.
 */
class GuideFamiliesTest {

    private static final List<String> EXPECTED_NAMES = List.of("rectangular", "rounded_rectangular", "circular",
            "elliptical", "coaxial", "single_ridge", "double_ridge", "quad_ridge", "slab_loaded", "slab_on_broad_wall",
            "rod_loaded_circular");

    @Test
    @DisplayName("The registry holds the eleven built-in families under their file names, each once")
    void registryHoldsEveryFamilyOnce() {
        assertEquals(EXPECTED_NAMES, GuideFamilies.all().stream().map(GuideFamily::name).toList());
    }

    @Test
    @DisplayName("A family is found by its name whatever the letter case and surrounding spaces")
    void familyIsFoundByNameIgnoringCase() {
        for (GuideFamily family : GuideFamilies.all()) {
            assertSame(family, GuideFamilies.byName(family.name()));
            assertSame(family, GuideFamilies.byName("  " + family.name().toUpperCase() + " "));
        }
    }

    @Test
    @DisplayName("An unknown family name is refused with a message listing every known name")
    void unknownFamilyNameListsTheKnownOnes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> GuideFamilies.byName("triple_ridge"));
        assertEquals("unknown guide family 'triple_ridge'; known: " + String.join(", ", EXPECTED_NAMES), e.getMessage());
    }

    @Test
    @DisplayName("Every parameter has a file name, a description, a rule and a finite default; names are unique per family")
    void everyParameterIsDocumented() {
        for (GuideFamily family : GuideFamilies.all()) {
            assertFalse(family.description().isBlank(), family.name());
            assertFalse(family.parameters().isEmpty(), family.name());
            Set<String> names = new HashSet<>();
            for (FamilyParameter p : family.parameters()) {
                assertTrue(p.name().matches("[a-z][a-z0-9_]*"), p.name());
                assertTrue(names.add(p.name()), family.name() + " repeats " + p.name());
                assertFalse(p.rule().isBlank(), p.name());
                assertTrue(Double.isFinite(p.defaultValue()), p.name());
            }
            assertEquals(names, family.defaults().keySet(), family.name());
        }
    }

    @Test
    @DisplayName("A parameter record refuses a name that is not lowercase_with_underscores")
    void parameterNameMustSuitFiles() {
        assertThrows(IllegalArgumentException.class,
                () -> FamilyParameter.length("ridgeWidth", "width of the ridge", 1e-3, "> 0"));
        assertThrows(IllegalArgumentException.class,
                () -> FamilyParameter.length("ridge width", "width of the ridge", 1e-3, "> 0"));
        assertThrows(IllegalArgumentException.class,
                () -> FamilyParameter.length("gap", "the gap", Double.NaN, "> 0"));
    }

    @Test
    @DisplayName("Every family builds its defaults, and giving the defaults explicitly builds the same walls")
    void defaultsBuildAndEqualExplicitDefaults() {
        for (GuideFamily family : GuideFamilies.all()) {
            GuideSection implicit = family.buildDefault();
            GuideSection explicit = family.build(family.defaults());
            assertEquals(implicit.wallPieces(), explicit.wallPieces(), family.name());
            assertEquals(implicit.dielectrics(), explicit.dielectrics(), family.name());
        }
    }

    @Test
    @DisplayName("An unknown parameter name is refused with the family's parameter names")
    void unknownParameterIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GuideFamilies.byName("double_ridge").build(Map.of("gapp", 1e-3)));
        assertEquals("double_ridge: unknown parameter 'gapp'; known: width, height, ridge_width, gap, "
                + "ridge_corner_radius, fillet_radius", e.getMessage());
    }

    @Test
    @DisplayName("A value that is not a finite number is refused, naming the family and the parameter")
    void nonFiniteValueIsRefused() {
        for (GuideFamily family : GuideFamilies.all()) {
            String first = family.parameters().get(0).name();
            for (Double bad : new Double[] {Double.NaN, Double.POSITIVE_INFINITY, null}) {
                Map<String, Double> values = new HashMap<>();
                values.put(first, bad);
                IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> family.build(values));
                assertEquals(family.name() + ": " + first + " must be a finite number, got " + bad, e.getMessage());
            }
        }
    }

    @Test
    @DisplayName("Outer walls run counter-clockwise and inner conductors clockwise; only the coaxial line has two conductors")
    void loopOrientationAndConductorCount() {
        for (GuideFamily family : GuideFamilies.all()) {
            GuideSection section = family.buildDefault();
            List<Loop> conductors = section.conductors();
            assertEquals(family.name().equals("coaxial") ? 2 : 1, conductors.size(), family.name());
            assertTrue(conductors.get(0).signedArea() > 0, family.name() + " outer wall counter-clockwise");
            for (Loop inner : conductors.subList(1, conductors.size())) {
                assertTrue(inner.signedArea() < 0, family.name() + " inner conductor clockwise");
            }
        }
    }

    @Test
    @DisplayName("No wall piece of a default guide is shorter than a millionth of the guide's size")
    void noDegeneratePieces() {
        for (GuideFamily family : GuideFamilies.all()) {
            GuideSection section = family.buildDefault();
            Bounds b = section.bounds();
            double size = Math.max(b.width(), b.height());
            assertTrue(WallMeasures.shortestChord(section.wallPieces()) > 1e-6 * size, family.name());
        }
    }

    @Test
    @DisplayName("Every default guide is centred on the origin: its bounding box is symmetric about both axes")
    void guidesAreCentredOnTheOrigin() {
        for (GuideFamily family : GuideFamilies.all()) {
            Bounds b = family.buildDefault().bounds();
            assertEquals(0, b.minX() + b.maxX(), 1e-15, family.name());
            assertEquals(0, b.minY() + b.maxY(), 1e-15, family.name());
        }
    }

    @Test
    @DisplayName("Every point inside a dielectric region is inside the guide and carries that region's material")
    void dielectricRegionsLieInsideTheGuide() {
        Random random = new Random(11);
        int checked = 0;
        for (GuideFamily family : GuideFamilies.all()) {
            GuideSection section = family.buildDefault();
            for (Dielectric d : section.dielectrics()) {
                Bounds box = d.region().bounds();
                for (int k = 0; k < 4000; k++) {
                    double x = box.minX() + random.nextDouble() * box.width();
                    double y = box.minY() + random.nextDouble() * box.height();
                    if (d.region().contains(x, y)) {
                        checked++;
                        assertTrue(section.contains(x, y), family.name() + " at (" + x + ", " + y + ")");
                        assertSame(d.material(), section.materialAt(x, y), family.name());
                    }
                }
            }
        }
        assertTrue(checked > 5000, "the sample should hit the dielectrics often, got " + checked);
    }
}
