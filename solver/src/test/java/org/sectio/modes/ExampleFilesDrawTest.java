package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.sectio.cli.SectioMain;

/**
 * Every geometry file shipped under geometries/examples/ solves through the command line, in process,
 * on a small grid, and each reported mode gets a readable PNG: the 8-byte PNG signature (ISO/IEC
 * 15948, §5.2), decodable by ImageIO, and not a single flat colour.
 */
class ExampleFilesDrawTest {

    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    @TempDir
    Path folder;

    static Stream<Path> exampleFiles() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("..", "geometries", "examples"))) {
            return files.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("exampleFiles")
    @DisplayName("Each example file solves at 40 cells and writes a valid, non-blank PNG per mode")
    void eachExampleSolvesAndDrawsItsModes(Path file) throws IOException {
        Path fields = folder.resolve("fields");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = SectioMain.run(new PrintWriter(out, true), new PrintWriter(err, true), "solve", file.toString(),
                "--cells", "40", "-n", "2", "--format", "json", "--fields", fields.toString());
        assertEquals(0, code, file + ": " + err);
        JsonNode modes = new ObjectMapper().readTree(out.toString()).get("modes");
        assertEquals(2, modes.size(), file + ": " + out);
        for (JsonNode mode : modes) {
            String stem = mode.get("family").asText().toLowerCase(Locale.ROOT) + "-" + mode.get("index").asInt();
            Path png = fields.resolve(stem + ".png");
            assertTrue(Files.isRegularFile(png), file + ": no " + png.getFileName());
            try (InputStream in = Files.newInputStream(png)) {
                assertArrayEquals(PNG_SIGNATURE, in.readNBytes(8), png + " signature");
            }
            BufferedImage image = ImageIO.read(png.toFile());
            assertNotNull(image, png + " does not decode");
            assertTrue(image.getWidth() > 0 && image.getHeight() > 0, png + " is empty");
            assertTrue(colours(image) > 2, png + " is a flat picture");
        }
    }

    private static int colours(BufferedImage image) {
        Set<Integer> seen = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 4) {
            for (int x = 0; x < image.getWidth(); x += 4) {
                seen.add(image.getRGB(x, y));
            }
        }
        return seen.size();
    }
}
