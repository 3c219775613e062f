package org.sectio.mesh;

/**
 * The wanted cell size along one axis: a base size H everywhere, shrinking toward the coordinates of
 * re-entrant corners by the law of {@link GradingRule} (the smallest over all corners applies).
 *
 * <p>Everything in metres. The size is a continuous, piecewise smooth function of the coordinate,
 * bounded below by the smallest first cell s₀ of any corner, so the line placement that integrates
 * its reciprocal is well defined.
 */
final class CornerSpacing {

    private final double base;
    private final double reach;
    private final double growth;
    private final double[] centres;
    private final double[] exponents;
    private final double[] smallest;

    /**
     * @param base H, the size away from corners, m, &gt; 0
     * @param centres the corner coordinates on this axis, m
     * @param singularExponents λ of each corner
     * @param rule the grading law
     * @param reach R, m, &gt; 0
     */
    CornerSpacing(double base, double[] centres, double[] singularExponents, GradingRule rule, double reach) {
        if (!(base > 0) || !(reach > 0)) {
            throw new IllegalArgumentException("base size and reach must be positive, got " + base + ", " + reach);
        }
        if (centres.length != singularExponents.length) {
            throw new IllegalArgumentException(centres.length + " corner coordinates but "
                    + singularExponents.length + " exponents");
        }
        this.base = base;
        this.reach = reach;
        this.growth = Math.log(1 / rule.ratio());
        this.centres = centres.clone();
        this.exponents = new double[centres.length];
        this.smallest = new double[centres.length];
        for (int c = 0; c < centres.length; c++) {
            double mu = rule.exponentShare() * Math.min(1.0, singularExponents[c]);
            exponents[c] = mu;
            smallest[c] = Math.min(base, reach * Math.pow(mu * base / reach, 1 / mu));
        }
    }

    /** @return the base size H, m */
    double base() {
        return base;
    }

    /** @return whether the size is the base size H all over [a, b], m (no corner reaches it) */
    boolean uniformBetween(double a, double b) {
        for (int c = 0; c < centres.length; c++) {
            double gap = centres[c] < a ? a - centres[c] : centres[c] > b ? centres[c] - b : 0;
            // s < H exactly where the radical term (d < R) or the geometric term (d < (H − s₀)/ln(1/σ)) is below H
            if (gap < Math.max(reach, (base - smallest[c]) / growth)) {
                return false;
            }
        }
        return true;
    }

    /** @return the wanted cell size at coordinate v, m */
    double at(double v) {
        double s = base;
        for (int c = 0; c < centres.length; c++) {
            double d = Math.abs(v - centres[c]);
            double radical = base * Math.pow(d / reach, 1 - exponents[c]);
            double geometric = smallest[c] + growth * d;
            s = Math.min(s, Math.max(smallest[c], Math.min(radical, geometric)));
        }
        return s;
    }
}
