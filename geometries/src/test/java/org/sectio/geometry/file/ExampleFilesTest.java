package org.sectio.geometry.file;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.GuideFamilies;

/**
 * Every file in {@code geometries/examples/} builds, names the Corvel Ridge observatory, and the ones
 * with simple geometry have the dimensions and areas elementary geometry gives.
 */
class ExampleFilesTest {

    private static final Path EXAMPLES = Path.of("examples");

    private static GuideSection load(String file) throws Exception {
        return (GuideSection) SectionFiles.read(EXAMPLES.resolve(file));
    }

    @Test
    void everyExampleFileBuildsAGuideOfTheObservatory() throws Exception {
        List<Path> files;
        try (Stream<Path> listing = Files.list(EXAMPLES)) {
            files = listing.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertTrue(files.size() >= 15, "examples found: " + files.size());
        for (Path file : files) {
            GuideSection guide = (GuideSection) SectionFiles.read(file);
            assertTrue(guide.name().startsWith("Corvel Ridge observatory, "), file + ": " + guide.name());
            assertTrue(guide.interior().area() > 0, file.toString());
        }
    }

    @Test
    void everyBuiltInFamilyHasAnExampleFile() throws Exception {
        for (var family : GuideFamilies.all()) {
            Path file = EXAMPLES.resolve("corvel-family-" + family.name().replace('_', '-') + ".json");
            assertTrue(Files.exists(file), "missing " + file);
            assertTrue(Files.readString(file).contains("\"" + family.name() + "\""), file.toString());
        }
    }

    @Test
    void theCoaxialExampleHasTwoConductorsAndTheAnnulusArea() throws Exception {
        GuideSection coax = load("corvel-family-coaxial.json");
        assertEquals(2, coax.conductors().size());
        assertEquals(Math.PI * (3.5 * 3.5 - 1.52 * 1.52) * 1e-6, coax.interior().area(), 1e-14);
    }

    @Test
    void theNotchedOutlineIsAStadiumWithATabAndANotch() throws Exception {
        // stadium 20 × 10 with a half disc of radius 5, plus a 5 × 4 tab, minus a 4 × 1.5 notch, mm²
        GuideSection wall = load("corvel-notched-outline.json");
        assertEquals((200 + 12.5 * Math.PI + 20 - 6) * 1e-6, wall.interior().area(), 1e-14);
        assertEquals(-0.005, wall.bounds().minX(), 1e-15);
        assertEquals(0.025, wall.bounds().maxX(), 1e-12);
    }

    @Test
    void theParameterizedRidgeHasItsComputedDimensions() throws Exception {
        GuideSection arm = load("corvel-parameterized-ridge.json");
        double a = 22.86;
        double b = a / 2.25;
        double ridge = a / 4;
        double depth = b - b / 3;
        assertEquals((a * b - ridge * depth) * 1e-6, arm.interior().area(), 1e-14);
        assertEquals(2.05, arm.materialAt(a / 2 * 1e-3, b / 12 * 1e-3).relativePermittivity());
        assertEquals(1.0, arm.materialAt(a / 8 * 1e-3, b / 2 * 1e-3).relativePermittivity());
    }

    @Test
    void theSvgThroatHasARoundEndAPostAndFlippedY() throws Exception {
        GuideSection throat = load("corvel-svg-feed-throat.json");
        assertEquals(2, throat.conductors().size());
        assertEquals(0.0, throat.bounds().minX(), 1e-15);
        assertEquals(0.020, throat.bounds().maxX(), 1e-15);
        assertEquals(-0.008, throat.bounds().minY(), 1e-15);
        assertEquals(0.0, throat.bounds().maxY(), 1e-15);
        assertTrue(!throat.contains(0.013, -0.004), "inside the tuning post");
    }
}
