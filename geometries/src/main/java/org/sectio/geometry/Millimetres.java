package org.sectio.geometry;

import java.math.BigDecimal;
import java.math.MathContext;

/** Writes lengths held in metres as millimetres for error messages, to seven significant digits. */
final class Millimetres {

    private Millimetres() {
    }

    /** @return e.g. {@code "(1.5, -2.25) mm"} for the point (0.0015, −0.00225) m */
    static String point(double x, double y) {
        return "(" + length(x) + ", " + length(y) + ") mm";
    }

    /** @return the length in mm without a unit, e.g. {@code "22.86"} for 0.02286 m */
    static String length(double metres) {
        if (!Double.isFinite(metres)) {
            return Double.toString(metres);
        }
        BigDecimal mm = new BigDecimal(metres * 1e3).round(new MathContext(7)).stripTrailingZeros();
        return mm.signum() == 0 ? "0" : mm.toPlainString();
    }
}
