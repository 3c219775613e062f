package org.sectio.cli;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A length as written on the command line: a decimal number with an optional exponent and an
 * optional unit, with or without a space: {@code 0.4um}, {@code 0.4 µm}, {@code 4e-7}, {@code 1.5mil}.
 * Units m, mm, um (or µm), nm, mil (0.0254 mm) and in (25.4 mm); no unit means metres.
 */
final class LengthText {

    private static final Pattern LENGTH = Pattern.compile(
            "([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*([A-Za-zµμ]*)");
    private static final String EXPECTED = "expected a number with an optional unit m, mm, um, nm, mil or in,"
            + " e.g. 0.4um or 4e-7";

    private LengthText() {
    }

    /**
     * @param option the option the text came with, for the message
     * @param text e.g. "0.4um"
     * @return the length, m, finite and ≥ 0
     * @throws IllegalArgumentException with a one-line message naming the option, the text and what was expected
     */
    static double parse(String option, String text) {
        String t = text == null ? "" : text.strip();
        Matcher m = LENGTH.matcher(t);
        if (!m.matches()) {
            throw new IllegalArgumentException(option + " " + t + ": " + EXPECTED);
        }
        double scale = switch (m.group(2).toLowerCase(Locale.ROOT)) {
            case "", "m" -> 1.0;
            case "mm" -> 1e-3;
            case "um", "µm", "μm" -> 1e-6;
            case "nm" -> 1e-9;
            case "mil" -> 25.4e-6;
            case "in" -> 25.4e-3;
            default -> throw new IllegalArgumentException(option + " " + t + ": unknown unit \"" + m.group(2) + "\"; "
                    + EXPECTED);
        };
        double value = Double.parseDouble(m.group(1)) * scale;
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(option + " " + t + ": must be finite and ≥ 0");
        }
        return value;
    }
}
