package org.sectio.modes;

/**
 * The error estimate printed beside each cutoff, from the same quantity on three nested grids (spacing
 * h, 2h, 4h). With a convergence order p the error of the fine value is |q(h) − q(2h)| / (2^p − 1). The
 * schemes are second order, but on curved walls a first-order part of the cut-cell error, small in
 * size, can dominate a cutoff whose h² part is smaller still (the coaxial TE11 doublet: errors 3.4e-6,
 * 2.5e-6, 1.07e-6 and 4.1e-7 at 60, 120, 240 and 480 cells, an observed order of 1.2 to 1.4, where
 * assuming 2 under-reported the 240-cell error by 13 %). So the order is read off the three grids,
 * p = log₂(|q(2h) − q(4h)| / |q(h) − q(2h)|), and held to [1, pMax]: a value below 1, or differences of
 * opposite sign (convergence not yet monotone), take 1; a value above pMax is taken as pMax because
 * the scheme promises no more. Without the coarsest grid the order is pMax. The result carries a
 * safety factor of 2 because cut cells make one grid's error fluctuate about its trend.
 */
final class RichardsonEstimate {

    private static final double SAFETY = 2.0;
    private static final double LOWEST_ORDER = 1.0;

    private RichardsonEstimate() {
    }

    /**
     * @param fine the value on the grid of spacing h (not 0)
     * @param coarse the value on the grid of spacing 2h
     * @param coarsest the value on the grid of spacing 4h, or NaN when that grid was not solved
     * @param maximumOrder the order the scheme promises, 1 … 2
     * @return the estimated relative error of {@code fine}, ≥ 0; NaN if {@code coarse} is NaN
     */
    static double relativeError(double fine, double coarse, double coarsest, double maximumOrder) {
        double step = fine - coarse;
        double order = Double.isNaN(coarsest) ? maximumOrder : observedOrder(step, coarse - coarsest, maximumOrder);
        return SAFETY * Math.abs(step) / ((Math.pow(2, order) - 1) * Math.abs(fine));
    }

    private static double observedOrder(double fineStep, double coarseStep, double maximumOrder) {
        if (fineStep == 0) {
            return maximumOrder;
        }
        if (Math.signum(fineStep) != Math.signum(coarseStep)) {
            return LOWEST_ORDER;
        }
        double p = Math.log(Math.abs(coarseStep / fineStep)) / Math.log(2);
        return Math.max(LOWEST_ORDER, Math.min(maximumOrder, p));
    }
}
