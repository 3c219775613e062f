package org.sectio.modes;

import java.util.ArrayList;
import java.util.List;

/**
 * Closed-form cutoff wavenumbers of the air-filled rectangle and circle, ascending within one family
 * (degenerate modes listed once per field pattern, as the solver reports them). Rectangle: kc =
 * π√((m/a)² + (n/b)²), TE with m + n ≥ 1, TM with m, n ≥ 1; circle: kc = j′nm / R (TE), jnm / R (TM),
 * twice for n ≥ 1 (cos nφ and sin nφ) (Pozar, Microwave Engineering, 4th ed., §3.3–3.4).
 */
final class ClosedFormCutoffs {

    private ClosedFormCutoffs() {
    }

    /** @return the TE or TM cutoffs of an a × b rectangle, rad/m, ascending (the lowest few dozen) */
    static List<Double> rectangle(double a, double b, ModeFamily family) {
        List<Double> out = new ArrayList<>();
        int first = family == ModeFamily.TE ? 0 : 1;
        for (int m = first; m <= 8; m++) {
            for (int n = first; n <= 8; n++) {
                if (m + n > 0) {
                    out.add(Math.PI * Math.hypot(m / a, n / b));
                }
            }
        }
        out.sort(null);
        return out;
    }

    /** @return the TE or TM cutoffs of a circle of radius r, rad/m, ascending (n ≤ 5, m ≤ 2) */
    static List<Double> circle(double r, ModeFamily family) {
        List<Double> out = new ArrayList<>();
        for (int n = 0; n <= 5; n++) {
            for (int m = 1; m <= 2; m++) {
                double x = family == ModeFamily.TE ? CircularGuideCutoffTest.besselDerivativeZero(n, m)
                        : CircularGuideCutoffTest.besselZero(n, m);
                out.add(x / r);
                if (n > 0) {
                    out.add(x / r);
                }
            }
        }
        out.sort(null);
        return out;
    }
}
