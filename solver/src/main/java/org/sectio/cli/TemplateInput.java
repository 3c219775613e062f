package org.sectio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.sectio.batch.size.ParameterSizer;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.geometry.file.SectionFileException;

/**
 * The guide a batch command varies: a geometry file (its {@code "parameters"}, in its units) or a
 * built-in family ({@code --shape NAME}, lengths in mm, angles in degrees), with {@code --set NAME=VALUE}
 * overriding parameters for every solve. Every problem becomes a one-line message.
 */
final class TemplateInput {

    private TemplateInput() {
    }

    /**
     * @param file a geometry file, or null
     * @param shape a family name, or null
     * @return the template
     * @throws IllegalArgumentException if both or neither are given, or the input cannot be read
     */
    static GuideTemplate read(Path file, String shape) {
        if ((file == null) == (shape == null)) {
            throw new IllegalArgumentException("give either a geometry FILE or --shape NAME (a built-in family such as"
                    + " rectangular or double_ridge), not " + (file == null ? "neither" : "both"));
        }
        if (shape != null) {
            return GuideTemplate.of(GuideFamilies.byName(shape));
        }
        if (Files.isDirectory(file)) {
            throw new IllegalArgumentException("geometry file '" + file + "' is a folder, expected a JSON file");
        }
        try {
            return GuideTemplate.of(file);
        } catch (SectionFileException e) {
            throw new IllegalArgumentException(e.getMessage());
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot read geometry file: " + ErrorReporter.describe(e));
        }
    }

    /**
     * @param template the template the values are for
     * @param settings {@code NAME=VALUE} texts (picocli map), may be null
     * @return the values by name, in the given order
     * @throws IllegalArgumentException if a name is not a parameter or a value not a finite number
     */
    static Map<String, Double> values(GuideTemplate template, Map<String, String> settings) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (settings == null) {
            return out;
        }
        for (Map.Entry<String, String> e : settings.entrySet()) {
            ParameterSizer.requireParameter(template, e.getKey());
            out.put(e.getKey(), number("--set " + e.getKey(), e.getValue()));
        }
        return out;
    }

    /**
     * @param what the option, for the message
     * @param text a decimal number
     * @return it
     * @throws IllegalArgumentException if it is not a finite number
     */
    static double number(String what, String text) {
        try {
            double v = Double.parseDouble(text.strip());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException(what + ": '" + text + "' is not a finite number");
    }

    /**
     * @param option the option, for the message
     * @param text {@code LOW:HIGH}
     * @return {low, high}, not checked for order
     * @throws IllegalArgumentException if it is not two numbers separated by a colon
     */
    static double[] range(String option, String text) {
        String[] parts = text.split(":", -1);
        if (parts.length != 2) {
            throw new IllegalArgumentException(option + " '" + text + "': expected LOW:HIGH, e.g. 15:30");
        }
        return new double[] {number(option, parts[0]), number(option, parts[1])};
    }
}
