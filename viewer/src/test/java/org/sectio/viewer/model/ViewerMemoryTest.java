package org.sectio.viewer.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The files and layout kept between runs. */
class ViewerMemoryTest {

    @Test
    @DisplayName("recent files newest first, no duplicates, at most 8; layout kept; a bad file gives the defaults")
    void roundTrip(@TempDir Path dir) throws Exception {
        ViewerMemory m = ViewerMemory.load(dir.resolve("missing.json"));
        assertTrue(m.recent().isEmpty());
        for (int k = 0; k < 10; k++) {
            m.opened(dir.resolve("guide-" + k + ".json"));
        }
        m.opened(dir.resolve("guide-5.json"));
        m.layout(10, 20, 1000, 700, false, 0.3, 0.55);
        Path file = dir.resolve("config").resolve("viewer.json");
        m.save(file);
        ViewerMemory back = ViewerMemory.load(file);
        assertEquals(ViewerMemory.MAX_RECENT, back.recent().size());
        assertEquals(dir.resolve("guide-5.json").toAbsolutePath(), back.recent().get(0));
        assertEquals(dir.resolve("guide-9.json").toAbsolutePath(), back.recent().get(1));
        assertArrayEquals(new double[] {10, 20, 1000, 700}, back.window());
        assertEquals(0.3, back.sideDivider());
        assertEquals(0.55, back.tableDivider());
        Files.writeString(file, "{ not json");
        assertTrue(ViewerMemory.load(file).recent().isEmpty());
    }
}
