package org.sectio.geometry.file;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.CrossSection;

/**
 * Reads cross-sections from Sectio geometry files: UTF-8 JSON documents of the form
 *
 * <pre>{@code
 * {
 *   "name": "feed horn throat",
 *   "units": "mm",
 *   "wall": {"rectangle": {"width": 22.86, "height": 10.16}}
 * }
 * }</pre>
 *
 * <p>Top-level keys: {@code "name"} (string, optional), {@code "units"} ({@code "mm"} when absent,
 * or {@code "m"}, {@code "in"}, {@code "mil"}) and {@code "wall"} (required), an object with exactly
 * one shape key:
 * <ul>
 *   <li>{@code {"rectangle": {"width": a, "height": b}}}, lower-left corner at the origin;</li>
 *   <li>{@code {"circle": {"radius": r, "centre": [x, y]}}}, centre optional (origin);</li>
 *   <li>{@code {"outline": {"start": [x, y], "steps": [step, ...]}}} with each step
 *       {@code {"line_to": [x, y]}} or {@code {"arc_to": [x, y], "sweep_degrees": s}} (counter-clockwise
 *       positive, 0 &lt; |s| &lt; 360); the outline is closed back to the start.</li>
 * </ul>
 * Unknown keys, missing keys, wrong types, non-finite numbers and zero or negative sizes are
 * rejected with a {@link SectionFileException} naming the file, line, column and JSON path.
 * All lengths are converted to metres. The full description is in {@code docs/geometry-files.md}.
 */
public final class SectionFiles {

    private static final Map<String, WallShape> SHAPES = shapes();

    private SectionFiles() {
    }

    /**
     * Reads a geometry file.
     *
     * @param file the file; its name as given appears in error messages
     * @return the cross-section it describes, in metres
     * @throws IOException if the file cannot be opened or read
     * @throws SectionFileException if its content is not a valid geometry (including text that is not UTF-8)
     */
    public static CrossSection read(Path file) throws IOException, SectionFileException {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (CharacterCodingException e) {
            throw new SectionFileException(file.toString(), 1, 1, "$", "not UTF-8 text, expected a UTF-8 JSON file");
        }
        return parse(file.toString(), text);
    }

    /**
     * Reads a geometry from text already in memory.
     *
     * @param fileName the name to use in error messages
     * @param text the JSON document
     * @return the cross-section it describes, in metres
     * @throws SectionFileException if the text is not a valid geometry
     */
    public static CrossSection parse(String fileName, String text) throws SectionFileException {
        LocatedDocument document = LocatedDocument.parse(fileName, text);
        SectionNode root = SectionNode.root(document).requireObject("a JSON object with a \"wall\"");
        root.allowOnly("name", "units", "wall");
        String name = root.has("name") ? root.get("name").text().strip() : null;
        if (name != null && name.isEmpty()) {
            throw root.get("name").problem("expected a non-empty name, got an empty string");
        }
        LengthUnit unit = LengthUnit.MILLIMETRE;
        if (root.has("units")) {
            SectionNode unitNode = root.get("units");
            String word = unitNode.text();
            unit = LengthUnit.forKeyword(word).orElseThrow(() -> unitNode.problem(
                    "unknown units \"" + word + "\", expected one of " + LengthUnit.keywords()));
        }
        SectionNode wall = root.get("wall").requireObject("an object with one shape key");
        List<String> keys = wall.keys();
        String[] known = SHAPES.keySet().toArray(String[]::new);
        if (keys.size() != 1) {
            throw wall.problem("expected exactly one shape key (" + SectionNode.quoted(known) + "), got "
                    + keys.size());
        }
        wall.allowOnly(known);
        String shape = keys.get(0);
        return SHAPES.get(shape).read(wall.get(shape), unit, name);
    }

    private static Map<String, WallShape> shapes() {
        Map<String, WallShape> shapes = new LinkedHashMap<>();
        shapes.put("rectangle", new RectangleWall());
        shapes.put("circle", new CircleWall());
        shapes.put("outline", new OutlineWall());
        return shapes;
    }
}
