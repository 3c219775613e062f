package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.RealDistribution;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.physics.BandRule;

/**
 * A Monte Carlo run over the tolerances: every part draws each parameter's deviation from its
 * distribution ({@link ParameterTolerance}), with one seeded generator (Well19937c, Commons Math) drawn
 * in a fixed order before any solve, so that the same seed gives the same parts whatever the thread
 * count. Each part's quantities are either the linear estimate q0 + Σ ∂q/∂p_i δp_i from the
 * sensitivities (fast, the default) or a full solve of the part. Reports the spread of every quantity
 * and the share of parts whose usable band (1.25 fc1 … 0.95 fc2, {@link BandRule}, common practice)
 * still covers a required band.
 */
public final class MonteCarlo {

    private MonteCarlo() {
    }

    /**
     * The spread of one quantity.
     *
     * @param mean mean, SI
     * @param standardDeviation sample standard deviation
     * @param min smallest
     * @param max largest
     * @param p5 5th percentile (Commons Math's default estimate)
     * @param p50 median
     * @param p95 95th percentile
     * @param count parts with a value (NaN values left out)
     */
    public record Spread(double mean, double standardDeviation, double min, double max, double p5, double p50,
                         double p95, int count) {
    }

    /**
     * @param full true when every part was solved
     * @param parts the number of parts drawn
     * @param failed parts whose solve failed (full runs only)
     * @param spreads one per quantity
     * @param coveringShare share of parts (of those solved) whose usable band covers the required band, NaN when none asked
     * @param values the quantities of every part (rows: parts), NaN rows for failed parts
     * @param seconds wall-clock time of the run
     */
    public record Result(boolean full, int parts, int failed, List<Spread> spreads, double coveringShare,
                         List<double[]> values, double seconds) {
    }

    /**
     * @param tolerances the parameters' tolerances
     * @param parts how many parts, ≥ 1
     * @param seed the generator's seed
     * @return the deviations, parts × parameters, template units
     */
    public static double[][] draw(List<ParameterTolerance> tolerances, int parts, long seed) {
        RandomGenerator rng = new Well19937c(seed);
        List<RealDistribution> dists = new ArrayList<>();
        for (ParameterTolerance t : tolerances) {
            dists.add(t.distribution() == ParameterTolerance.Distribution.NORMAL
                    ? new NormalDistribution(rng, 0, t.plusMinus() / 3, NormalDistribution.DEFAULT_INVERSE_ABSOLUTE_ACCURACY)
                    : new UniformRealDistribution(rng, -t.plusMinus(), t.plusMinus()));
        }
        double[][] out = new double[parts][tolerances.size()];
        for (int s = 0; s < parts; s++) {
            for (int i = 0; i < dists.size(); i++) {
                out[s][i] = dists.get(i).sample();
            }
        }
        return out;
    }

    /**
     * @param solver the solver (threads = 1), used only when {@code full}
     * @param sensitivities the nominal values and derivatives (parameters in the tolerances' order)
     * @param tolerances one per sensitivity parameter
     * @param parts how many parts, ≥ 1
     * @param seed the generator's seed
     * @param full solve every part instead of the linear estimate
     * @param requiredLowHz the band to cover, or NaN for none
     * @param requiredHighHz its upper edge
     * @param threads parallel solves
     * @return the spreads
     */
    public static Result run(GuidePointSolver solver, SensitivityAnalysis.Result sensitivities,
                             List<ParameterTolerance> tolerances, int parts, long seed, boolean full,
                             double requiredLowHz, double requiredHighHz, int threads) {
        if (parts < 1) {
            throw new IllegalArgumentException("Monte Carlo needs at least 1 part, got " + parts);
        }
        long start = System.nanoTime();
        double[][] deviations = draw(tolerances, parts, seed);
        double[] q0 = sensitivities.nominalValues();
        List<double[]> values = new ArrayList<>();
        int failed = 0;
        if (full) {
            List<Map<String, Double>> sets = new ArrayList<>();
            for (double[] dev : deviations) {
                Map<String, Double> v = new LinkedHashMap<>(sensitivities.nominal().values());
                for (int i = 0; i < dev.length; i++) {
                    String name = tolerances.get(i).parameter();
                    v.put(name, v.get(name) + dev[i]);
                }
                sets.add(v);
            }
            for (PointBatch.Outcome o : PointBatch.solveAll(solver, sets, threads)) {
                if (o.point() == null) {
                    failed++;
                    double[] nan = new double[q0.length];
                    java.util.Arrays.fill(nan, Double.NaN);
                    values.add(nan);
                } else {
                    values.add(sensitivities.plan().values(o.point()));
                }
            }
        } else {
            for (double[] dev : deviations) {
                double[] q = q0.clone();
                for (int i = 0; i < dev.length; i++) {
                    double[] d = sensitivities.parameters().get(i).derivatives();
                    for (int k = 0; k < q.length; k++) {
                        q[k] += d[k] * dev[i];
                    }
                }
                values.add(q);
            }
        }
        List<QuantityPlan.Quantity> qs = sensitivities.plan().quantities();
        List<Spread> spreads = new ArrayList<>();
        for (int k = 0; k < q0.length; k++) {
            DescriptiveStatistics stats = new DescriptiveStatistics();
            for (double[] q : values) {
                if (Double.isFinite(q[k])) {
                    stats.addValue(q[k]);
                }
            }
            long n = stats.getN();
            spreads.add(n == 0 ? new Spread(Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, 0) : new Spread(stats.getMean(), n > 1 ? stats.getStandardDeviation() : 0, stats.getMin(),
                    stats.getMax(), stats.getPercentile(5), stats.getPercentile(50), stats.getPercentile(95), (int) n));
        }
        double share = Double.NaN;
        if (Double.isFinite(requiredLowHz)) {
            int low = indexOf(qs, QuantityPlan.Kind.BAND_LOW);
            int high = indexOf(qs, QuantityPlan.Kind.BAND_HIGH);
            int covering = 0;
            int counted = 0;
            for (double[] q : values) {
                if (Double.isFinite(q[low]) && Double.isFinite(q[high])) {
                    counted++;
                    if (BandRule.LOWER_FACTOR * q[low] <= requiredLowHz && BandRule.UPPER_FACTOR * q[high] >= requiredHighHz) {
                        covering++;
                    }
                }
            }
            share = counted == 0 ? Double.NaN : (double) covering / counted;
        }
        return new Result(full, parts, failed, spreads, share, values, (System.nanoTime() - start) * 1e-9);
    }

    private static int indexOf(List<QuantityPlan.Quantity> qs, QuantityPlan.Kind kind) {
        for (int k = 0; k < qs.size(); k++) {
            if (qs.get(k).kind() == kind) {
                return k;
            }
        }
        throw new IllegalStateException("no " + kind + " quantity");
    }
}
