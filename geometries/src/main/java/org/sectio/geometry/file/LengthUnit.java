package org.sectio.geometry.file;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;

/** The length units a geometry file may declare in its {@code "units"} key; mm when absent. */
public enum LengthUnit {
    /** Millimetres, the default. */
    MILLIMETRE("mm", 1e-3),
    /** Metres. */
    METRE("m", 1.0),
    /** Inches, 25.4 mm exactly. */
    INCH("in", 0.0254),
    /** Thousandths of an inch, 25.4 µm exactly. */
    MIL("mil", 25.4e-6);

    private final String keyword;
    private final double metres;

    LengthUnit(String keyword, double metres) {
        this.keyword = keyword;
        this.metres = metres;
    }

    /** @return the word used in files, e.g. {@code "mm"} */
    public String keyword() {
        return keyword;
    }

    /**
     * @param length a length in this unit
     * @return the same length in metres
     */
    public double toMetres(double length) {
        return length * metres;
    }

    /**
     * @param metres a length in metres
     * @return it in this unit for a message, six significant digits, e.g. {@code "2.5 mm"}
     */
    public String shown(double metres) {
        double value = metres / this.metres;
        String digits = Double.isFinite(value) && value != 0
                ? new java.math.BigDecimal(value).round(new java.math.MathContext(6)).stripTrailingZeros().toPlainString()
                : Double.toString(value).replace(".0", "");
        return digits + " " + keyword;
    }

    /**
     * @param keyword a word from a file, e.g. {@code "in"}
     * @return the unit it names, or empty if it names none
     */
    public static Optional<LengthUnit> forKeyword(String keyword) {
        return Arrays.stream(values()).filter(u -> u.keyword.equals(keyword)).findFirst();
    }

    /** @return the accepted words, e.g. {@code "mm", "m", "in", "mil"} */
    public static String keywords() {
        return Arrays.stream(values()).map(u -> "\"" + u.keyword + "\"").collect(Collectors.joining(", "));
    }
}
