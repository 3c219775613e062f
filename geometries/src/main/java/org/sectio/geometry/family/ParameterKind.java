package org.sectio.geometry.family;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * What a family parameter measures, which fixes its unit inside the program (SI) and how it is shown
 * to people (lengths in millimetres, angles in degrees).
 */
public enum ParameterKind {

    /** A length, stored in metres, shown in millimetres. */
    LENGTH,
    /** An angle, stored in radians, shown in degrees. */
    ANGLE,
    /** A dimensionless ratio of two lengths. */
    RATIO,
    /** A relative permittivity εr, dimensionless, ≥ 1. */
    PERMITTIVITY,
    /** A dielectric loss tangent tan δ, dimensionless, ≥ 0. */
    LOSS_TANGENT;

    private static final MathContext SHOWN_DIGITS = new MathContext(6);

    /**
     * Formats a value of this kind for a message: lengths as "10.16 mm", angles as "30°", the
     * dimensionless kinds as plain numbers, each to six significant digits without trailing zeros.
     *
     * @param siValue the value in SI units (metres, radians or dimensionless)
     * @return the value with its display unit; "NaN" or "Infinity" for a value that is not finite
     */
    public String format(double siValue) {
        return switch (this) {
            case LENGTH -> plain(siValue * 1e3) + " mm";
            case ANGLE -> plain(Math.toDegrees(siValue)) + "°";
            case RATIO, PERMITTIVITY, LOSS_TANGENT -> plain(siValue);
        };
    }

    /** @return {@code value} to six significant digits, trailing zeros dropped, never in exponent form */
    static String plain(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0) {
            return "0";
        }
        return new BigDecimal(value).round(SHOWN_DIGITS).stripTrailingZeros().toPlainString();
    }
}
