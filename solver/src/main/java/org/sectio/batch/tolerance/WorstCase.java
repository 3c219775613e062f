package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.modes.SolveException;

/**
 * The extremes of every followed quantity over the tolerance box nominal ± t_i. With few parameters
 * (at most {@value #MAX_CORNER_PARAMETERS}) every corner of the box is solved and the extremes are the
 * largest and smallest values found (exact for quantities monotone in each parameter over the box, which
 * cutoffs of such small changes are); with more, the linear estimate q0 ± Σ |∂q/∂p_i| t_i from the
 * sensitivities. The linear estimate is given in both cases, so the two can be compared.
 */
public final class WorstCase {

    /** Most parameters whose 2^n corners are solved. */
    public static final int MAX_CORNER_PARAMETERS = 4;

    private WorstCase() {
    }

    /**
     * @param byCorners true when the corners were solved
     * @param low smallest value per quantity, SI
     * @param high largest value per quantity
     * @param lowCorner for each quantity, the corner (signs per parameter, +1/−1) giving the smallest value, or null
     * @param highCorner the corner giving the largest value, or null
     * @param linearLow q0 − Σ |∂q/∂p_i| t_i
     * @param linearHigh q0 + Σ |∂q/∂p_i| t_i
     * @param corners every corner's sign pattern, in solve order (empty when linear)
     * @param cornerValues the quantities at each corner
     */
    public record Result(boolean byCorners, double[] low, double[] high, int[][] lowCorner, int[][] highCorner,
                         double[] linearLow, double[] linearHigh, List<int[]> corners, List<double[]> cornerValues) {
    }

    /**
     * @param solver the solver (threads = 1 for parallel corners)
     * @param sensitivities the nominal point and sensitivities (their parameters in the tolerances' order)
     * @param tolerances one per sensitivity parameter, same order
     * @param threads parallel solves
     * @return the extremes
     * @throws SolveException if a corner cannot be built or solved
     */
    public static Result of(GuidePointSolver solver, SensitivityAnalysis.Result sensitivities,
                            List<ParameterTolerance> tolerances, int threads) {
        double[] q0 = sensitivities.nominalValues();
        int n = tolerances.size();
        int m = q0.length;
        double[] linLow = q0.clone();
        double[] linHigh = q0.clone();
        for (int i = 0; i < n; i++) {
            double[] d = sensitivities.parameters().get(i).derivatives();
            for (int k = 0; k < m; k++) {
                double swing = Math.abs(d[k]) * tolerances.get(i).plusMinus();
                linLow[k] -= swing;
                linHigh[k] += swing;
            }
        }
        if (n > MAX_CORNER_PARAMETERS) {
            return new Result(false, linLow, linHigh, new int[m][], new int[m][], linLow, linHigh, List.of(), List.of());
        }
        List<int[]> corners = new ArrayList<>();
        List<Map<String, Double>> sets = new ArrayList<>();
        for (int c = 0; c < (1 << n); c++) {
            int[] signs = new int[n];
            Map<String, Double> v = new LinkedHashMap<>(sensitivities.nominal().values());
            for (int i = 0; i < n; i++) {
                signs[i] = (c >> i & 1) == 1 ? 1 : -1;
                ParameterTolerance t = tolerances.get(i);
                v.put(t.parameter(), v.get(t.parameter()) + signs[i] * t.plusMinus());
            }
            corners.add(signs);
            sets.add(v);
        }
        List<PointBatch.Outcome> solved = PointBatch.solveAll(solver, sets, threads);
        double[] low = new double[m];
        double[] high = new double[m];
        java.util.Arrays.fill(low, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(high, Double.NEGATIVE_INFINITY);
        int[][] lowAt = new int[m][];
        int[][] highAt = new int[m][];
        List<double[]> values = new ArrayList<>();
        for (int c = 0; c < solved.size(); c++) {
            PointBatch.Outcome o = solved.get(c);
            if (o.point() == null) {
                throw new SolveException("worst case: the corner " + sets.get(c) + " fails: " + o.failure());
            }
            double[] q = sensitivities.plan().values(o.point());
            values.add(q);
            for (int k = 0; k < m; k++) {
                if (q[k] < low[k]) {
                    low[k] = q[k];
                    lowAt[k] = corners.get(c);
                }
                if (q[k] > high[k]) {
                    high[k] = q[k];
                    highAt[k] = corners.get(c);
                }
            }
        }
        return new Result(true, low, high, lowAt, highAt, linLow, linHigh, corners, values);
    }
}
