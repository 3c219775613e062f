package org.sectio.geometry.file;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.StringJoiner;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.family.FamilyParameter;
import org.sectio.geometry.family.GuideFamily;
import org.sectio.geometry.family.ParameterKind;

/**
 * A cross-section with named parameters that can be set, one guide per set of values: what sweeps,
 * sizing and tolerance studies vary. It is either a geometry file (its {@code "parameters"}, in the
 * file's units) or a built-in family (its parameters, lengths in mm and angles in degrees, as in a
 * file's {@code "family"} object). A family is read through the same file reader as a file that
 * writes every parameter, so a value that breaks a rule gets the same message either way.
 */
public final class GuideTemplate {

    private final String sourceName;
    private final String text;
    private final FileParameters parameters;

    private GuideTemplate(String sourceName, String text) throws SectionFileException {
        this.sourceName = sourceName;
        this.text = text;
        this.parameters = SectionFiles.parameters(sourceName, text);
    }

    /**
     * @param file a geometry file
     * @return a template over the parameters it defines
     * @throws IOException if the file cannot be read
     * @throws SectionFileException if it is not UTF-8 JSON or its unit or parameters are bad
     */
    public static GuideTemplate of(Path file) throws IOException, SectionFileException {
        return new GuideTemplate(file.toString(), SectionFiles.readText(file));
    }

    /**
     * @param sourceName the name to use in error messages
     * @param text a geometry document
     * @return a template over the parameters it defines
     * @throws SectionFileException if it is not JSON or its unit or parameters are bad
     */
    public static GuideTemplate of(String sourceName, String text) throws SectionFileException {
        return new GuideTemplate(sourceName, text);
    }

    /**
     * @param family a built-in family
     * @return a template over all its parameters at their defaults (lengths mm, angles degrees)
     */
    public static GuideTemplate of(GuideFamily family) {
        StringJoiner values = new StringJoiner(", ");
        StringJoiner uses = new StringJoiner(", ");
        for (FamilyParameter p : family.parameters()) {
            double shown = p.kind() == ParameterKind.LENGTH ? p.defaultValue() * 1e3
                    : p.kind() == ParameterKind.ANGLE ? Math.toDegrees(p.defaultValue()) : p.defaultValue();
            values.add("\"" + p.name() + "\": " + String.format(Locale.ROOT, "%.17g", shown));
            uses.add("\"" + p.name() + "\": \"" + p.name() + "\"");
        }
        String text = "{\"units\": \"mm\", \"parameters\": {" + values + "}, \"family\": {\"" + family.name()
                + "\": {" + uses + "}}}";
        try {
            return new GuideTemplate("family " + family.name(), text);
        } catch (SectionFileException e) {
            throw new IllegalStateException("the family " + family.name() + " does not read back: " + e.getMessage(), e);
        }
    }

    /** @return the file name (or "family <name>") used in messages */
    public String sourceName() {
        return sourceName;
    }

    /** @return the unit and the value of every parameter as the source writes it */
    public FileParameters parameters() {
        return parameters;
    }

    /**
     * @param settings new values by parameter name, in the source's units; others keep theirs
     * @return the cross-section with those values, in metres
     * @throws SectionFileException if a name is not a parameter, a value is not finite, or the values
     *     break a rule of the shape or family (one line naming the place)
     */
    public CrossSection build(Map<String, Double> settings) throws SectionFileException {
        return SectionFiles.parse(sourceName, text, settings);
    }
}
