package org.sectio.geometry.family;

import java.util.regex.Pattern;

/**
 * One named dimension or material property of a {@link GuideFamily}.
 *
 * @param name lowercase_with_underscores, as written in geometry files, e.g. {@code "ridge_width"}
 * @param description what it measures, for help texts and docs
 * @param defaultValue the value used when none is given, SI units (metres for lengths); finite
 * @param kind what it measures, which fixes its unit
 * @param rule the condition a value must meet, in words, e.g. {@code "> 0 and < height"}
 */
public record FamilyParameter(String name, String description, double defaultValue, ParameterKind kind,
        String rule) {

    private static final Pattern NAME = Pattern.compile("[a-z][a-z0-9]*(_[a-z0-9]+)*");

    /**
     * @throws IllegalArgumentException if the name is not lowercase_with_underscores, the default is
     *     not finite, or the description, kind or rule is missing
     */
    public FamilyParameter {
        if (name == null || !NAME.matcher(name).matches()) {
            throw new IllegalArgumentException("family parameter: name must be lowercase_with_underscores, got '"
                    + name + "'");
        }
        if (description == null || description.isBlank() || rule == null || rule.isBlank() || kind == null) {
            throw new IllegalArgumentException("family parameter " + name + ": description, kind and rule are required");
        }
        if (!Double.isFinite(defaultValue)) {
            throw new IllegalArgumentException("family parameter " + name + ": default must be finite, got "
                    + defaultValue);
        }
    }

    /** A length parameter; {@code defaultMetres} in metres. */
    static FamilyParameter length(String name, String description, double defaultMetres, String rule) {
        return new FamilyParameter(name, description, defaultMetres, ParameterKind.LENGTH, rule);
    }

    /** @return the default as shown to people, e.g. "22.86 mm" */
    public String shownDefault() {
        return kind.format(defaultValue);
    }
}
