package org.sectio.geometry.file;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
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
 * <p>Top-level keys: {@code "name"}, {@code "units"} (mm, m, in, mil), {@code "parameters"} (named numbers
 * or expressions), exactly one of {@code "wall"} (a shape: rectangle, circle, ellipse, outline, svg_path,
 * union, difference, intersection), {@code "family"} (a built-in family and its values) or
 * {@code "standard"} (a WR designation, with optional {@code "rounded_corners"}), and the optional
 * {@code "inner_conductors"}, {@code "dielectrics"}, {@code "filling"} and the wall metals {@code "conductor"}
 * and {@code "inner_conductor_metal"}. Every number may be an
 * expression string over the parameters. Faults are reported with a {@link SectionFileException} naming
 * the file, line, column and JSON path. All lengths are converted to metres. The full description is in
 * {@code docs/geometry-files.md}.
 */
public final class SectionFiles {

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
        return parse(file.toString(), readText(file));
    }

    /**
     * Reads a Sectio JSON file (geometry or sweep) as text.
     *
     * @param file the file; its name as given appears in error messages
     * @return its content
     * @throws IOException if the file cannot be opened or read
     * @throws SectionFileException if its content is not UTF-8
     */
    public static String readText(Path file) throws IOException, SectionFileException {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (CharacterCodingException e) {
            throw new SectionFileException(file.toString(), 1, 1, "$", "not UTF-8 text, expected a UTF-8 JSON file");
        }
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
        return parse(fileName, text, Map.of());
    }

    /**
     * Reads a geometry from text with some of its parameters set to other values, as a sweep does.
     *
     * @param fileName the name to use in error messages
     * @param text the JSON document
     * @param settings new values by parameter name, in the file's units; every name must be one the
     *     file defines under {@code "parameters"}, and expressions over it are computed from the new value
     * @return the cross-section it describes with those values, in metres
     * @throws SectionFileException if the text is not a valid geometry, a name is not one of its
     *     parameters, or the new values break a rule (reported where the rule's value is written)
     */
    public static CrossSection parse(String fileName, String text, Map<String, Double> settings)
            throws SectionFileException {
        LocatedDocument document = LocatedDocument.parse(fileName, text);
        return new GuideReader(settings).read(SectionNode.root(document));
    }

    /**
     * Reads only the unit and the parameters of a geometry file, without building its walls.
     *
     * @param fileName the name to use in error messages
     * @param text the JSON document
     * @return its unit and every parameter's resolved value (none if it has no {@code "parameters"})
     * @throws SectionFileException if the text is not JSON, the unit is unknown or a parameter is bad
     */
    public static FileParameters parameters(String fileName, String text) throws SectionFileException {
        SectionNode root = SectionNode.root(LocatedDocument.parse(fileName, text))
                .requireObject("a JSON object with a \"wall\", a \"family\" or a \"standard\"");
        LengthUnit unit = GuideReader.unit(root);
        Map<String, Double> values = root.has("parameters")
                ? ParameterTable.resolve(root.get("parameters").within(new Scope(unit, Map.of()))) : Map.of();
        return new FileParameters(unit, values);
    }
}
