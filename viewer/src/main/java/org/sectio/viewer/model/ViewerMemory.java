package org.sectio.viewer.model;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.sectio.io.AtomicFile;

/**
 * What the viewer remembers between runs: the last opened geometry files, newest first, and the window
 * layout. Kept as a small JSON file, {@code $XDG_CONFIG_HOME/sectio/viewer.json} (or
 * {@code ~/.config/sectio/viewer.json}; the system property {@code sectio.viewer.memory} names another
 * file). A missing or unreadable file gives the defaults; it is written whole or not at all.
 */
public final class ViewerMemory {

    /** Most files remembered. */
    public static final int MAX_RECENT = 8;

    private static final ObjectMapper JSON = new ObjectMapper();

    private final List<Path> recent = new ArrayList<>();
    /** Window position and size, px; NaN when not known. */
    private double x = Double.NaN;
    private double y = Double.NaN;
    private double width = 1280;
    private double height = 820;
    private boolean maximized;
    private double sideDivider = 0.25;
    private double tableDivider = 0.62;

    /** @return the file of the memory for this user */
    public static Path defaultFile() {
        String chosen = System.getProperty("sectio.viewer.memory");
        if (chosen != null && !chosen.isBlank()) {
            return Path.of(chosen);
        }
        String config = System.getenv("XDG_CONFIG_HOME");
        Path base = config != null && !config.isBlank() ? Path.of(config)
                : Path.of(System.getProperty("user.home"), ".config");
        return base.resolve("sectio").resolve("viewer.json");
    }

    /**
     * @param file the memory file
     * @return what it holds, or the defaults when it is missing or not readable
     */
    public static ViewerMemory load(Path file) {
        ViewerMemory m = new ViewerMemory();
        try {
            JsonNode root = JSON.readTree(Files.readString(file, StandardCharsets.UTF_8));
            for (JsonNode f : root.path("recent_files")) {
                if (f.isTextual() && m.recent.size() < MAX_RECENT) {
                    m.recent.add(Path.of(f.textValue()));
                }
            }
            JsonNode w = root.path("window");
            m.x = w.path("x").asDouble(Double.NaN);
            m.y = w.path("y").asDouble(Double.NaN);
            m.width = Math.max(640, w.path("width").asDouble(m.width));
            m.height = Math.max(480, w.path("height").asDouble(m.height));
            m.maximized = w.path("maximized").asBoolean(false);
            m.sideDivider = fraction(w.path("side_divider").asDouble(m.sideDivider), m.sideDivider);
            m.tableDivider = fraction(w.path("table_divider").asDouble(m.tableDivider), m.tableDivider);
        } catch (IOException | RuntimeException unreadable) {
            return new ViewerMemory();
        }
        return m;
    }

    private static double fraction(double v, double fallback) {
        return v > 0.05 && v < 0.95 ? v : fallback;
    }

    /**
     * @param file where to keep it; its folder is created when missing
     * @throws IOException if it cannot be written
     */
    public void save(Path file) throws IOException {
        ObjectNode root = JSON.createObjectNode();
        ArrayNode files = root.putArray("recent_files");
        recent.forEach(p -> files.add(p.toString()));
        ObjectNode w = root.putObject("window");
        if (Double.isFinite(x) && Double.isFinite(y)) {
            w.put("x", x).put("y", y);
        }
        w.put("width", width).put("height", height).put("maximized", maximized).put("side_divider", sideDivider)
                .put("table_divider", tableDivider);
        Path folder = file.toAbsolutePath().getParent();
        Files.createDirectories(folder);
        byte[] bytes = root.toPrettyString().getBytes(StandardCharsets.UTF_8);
        AtomicFile.write(file, out -> out.write(bytes));
    }

    /** @param file a geometry file just opened: it goes first, duplicates and the oldest beyond 8 are dropped */
    public void opened(Path file) {
        Path absolute = file.toAbsolutePath().normalize();
        recent.remove(absolute);
        recent.add(0, absolute);
        while (recent.size() > MAX_RECENT) {
            recent.remove(recent.size() - 1);
        }
    }

    /** @return the last opened files, newest first */
    public List<Path> recent() {
        return List.copyOf(recent);
    }

    /** @return {x, y, width, height} of the window, px (x and y NaN when not known) */
    public double[] window() {
        return new double[] {x, y, width, height};
    }

    /** @return whether the window was maximized */
    public boolean maximized() {
        return maximized;
    }

    /** @return the divider between the form and the views, 0 … 1 */
    public double sideDivider() {
        return sideDivider;
    }

    /** @return the divider between the views and the mode table, 0 … 1 */
    public double tableDivider() {
        return tableDivider;
    }

    /** Records the window layout. */
    public void layout(double wx, double wy, double w, double h, boolean max, double side, double table) {
        x = wx;
        y = wy;
        width = w;
        height = h;
        maximized = max;
        sideDivider = fraction(side, sideDivider);
        tableDivider = fraction(table, tableDivider);
    }
}
