package org.sectio.geometry.expr;

import java.util.Arrays;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The functions an expression may call. A fixed table: an expression can name nothing else, so a
 * geometry file cannot reach any code beyond this arithmetic. Angles are in radians.
 */
public enum Function {
    /** Square root; the argument must be ≥ 0. */
    SQRT("sqrt", 1),
    /** Sine of an angle in radians. */
    SIN("sin", 1),
    /** Cosine of an angle in radians. */
    COS("cos", 1),
    /** Tangent of an angle in radians. */
    TAN("tan", 1),
    /** atan2(y, x): the angle of the point (x, y), radians in (−π, π]. */
    ATAN2("atan2", 2),
    /** Absolute value. */
    ABS("abs", 1),
    /** The smaller of two values. */
    MIN("min", 2),
    /** The larger of two values. */
    MAX("max", 2);

    private final String word;
    private final int arity;

    Function(String word, int arity) {
        this.word = word;
        this.arity = arity;
    }

    /** @return the name used in expressions, e.g. {@code "atan2"} */
    public String word() {
        return word;
    }

    /** @return how many arguments it takes */
    public int arity() {
        return arity;
    }

    /** @return the function called {@code word}, if any */
    public static Optional<Function> named(String word) {
        return Arrays.stream(values()).filter(f -> f.word.equals(word)).findFirst();
    }

    /** @return the accepted names, quoted and comma-separated */
    public static String words() {
        return Arrays.stream(values()).map(f -> "\"" + f.word + "\"").collect(Collectors.joining(", "));
    }

    /** Applies the function; the caller checks that the result is finite. */
    double apply(double[] a) {
        return switch (this) {
            case SQRT -> Math.sqrt(a[0]);
            case SIN -> Math.sin(a[0]);
            case COS -> Math.cos(a[0]);
            case TAN -> Math.tan(a[0]);
            case ATAN2 -> Math.atan2(a[0], a[1]);
            case ABS -> Math.abs(a[0]);
            case MIN -> Math.min(a[0], a[1]);
            case MAX -> Math.max(a[0], a[1]);
        };
    }
}
