package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.batch.size.GuidePoint;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveException;
import org.sectio.physics.BoundaryPerturbation;

/**
 * Sensitivities dq/dp of every followed quantity to every parameter, by finite differences over full
 * solves, cross-checked for the cutoffs by the boundary-perturbation (Hadamard) formula from the nominal
 * fields ({@link BoundaryPerturbation}) wherever the parameter moves a wall.
 *
 * <p>The step. A solved cutoff carries a discretization error ε (the solver's two-grid estimate); a
 * difference quotient over a step h is only meaningful when the step moves the quantity by much more
 * than that: 2h|q'| ≥ K ε with K = {@value #SIGNAL_TO_NOISE}. (ε bounds the error of each value; the
 * part of it that differs between p − h and p + h on grids scaled with the guide is smaller, so this is
 * conservative.) A pilot central difference at h0 = 0.5 % of the parameter's scale (its value, or
 * 0.5 % of the largest parameter when it is 0) measures q'; the step is then raised to K ε / (2|q'|)
 * over the cutoffs that respond (2h0|q'| ≥ 3ε), capped at 2 % of the scale (reported, with the ratio
 * reached), so that ±2h stays a small change of the guide. A quantity that
 * moves by less than 3ε over the pilot step is insensitive: its derivative is below ε / (2h) in size.
 *
 * <p>Large steps cost no accuracy because the final derivative is Richardson-extrapolated: the central
 * difference D(h) = (q(p + h) − q(p − h)) / 2h has error c h² + O(h⁴), so (4 D(h) − D(2h)) / 3 is
 * fourth order (Richardson; e.g. Burden &amp; Faires, Numerical Analysis, §4.2, from memory), and
 * |D(h) − D(2h)| / 3 measures the O(h²) error of D(h), reported as the difference's own accuracy. Where
 * p − h breaks a rule of the shape (a corner radius of 0) the second-order forward difference
 * F(h) = (−3q(p) + 4q(p + h) − q(p + 2h)) / 2h takes its place, extrapolated the same way from h and 2h.
 *
 * <p>The Hadamard check measures the wall's normal displacement per unit parameter by building the guide
 * at p ± 1e-4 of the scale ({@link WallDisplacement}); it is skipped for guides with dielectric regions.
 */
public final class SensitivityAnalysis {

    /** Wanted ratio of the change a finite-difference step causes to the error of the value. */
    public static final double SIGNAL_TO_NOISE = 100;
    /** Pilot step as a share of the parameter's scale. */
    static final double PILOT_SHARE = 0.005;
    /** Largest step as a share of the scale. */
    static final double MAX_SHARE = 0.02;
    /** Geometry step of the wall displacement, as a share of the scale. */
    static final double GEOMETRY_SHARE = 1e-4;

    private SensitivityAnalysis() {
    }

    /**
     * The sensitivities to one parameter.
     *
     * @param parameter its name
     * @param value its nominal value, template units
     * @param step the finite-difference step h, template units
     * @param forward true when the one-sided (forward) formula was used
     * @param capped true when the wanted step was above the cap
     * @param derivatives dq/dp per quantity, SI units per template unit (NaN where not available)
     * @param truncation |D(h) − D(2h)| / 3 per quantity: the O(h²) error of the plain difference, which the
     *     extrapolated derivative removes
     * @param signalToNoise 2h|dq/dp| / ε per quantity (NaN where ε is unknown)
     * @param hadamard dq/dp by the boundary formula per quantity (cutoffs only; NaN elsewhere or when not applicable)
     */
    public record Parameter(String parameter, double value, double step, boolean forward, boolean capped,
                            double[] derivatives, double[] truncation, double[] signalToNoise, double[] hadamard) {
        public Parameter {
            derivatives = derivatives.clone();
            truncation = truncation.clone();
            signalToNoise = signalToNoise.clone();
            hadamard = hadamard.clone();
        }
    }

    /**
     * @param nominal the nominal solve
     * @param plan the quantities
     * @param nominalValues the plan's quantities at the nominal point
     * @param nominalErrors their errors
     * @param parameters one entry per varied parameter
     * @param hadamardNote why the Hadamard check was not made, or "" when it was
     */
    public record Result(GuidePoint nominal, QuantityPlan plan, double[] nominalValues, double[] nominalErrors,
                         List<Parameter> parameters, String hadamardNote) {
        public Result {
            nominalValues = nominalValues.clone();
            nominalErrors = nominalErrors.clone();
            parameters = List.copyOf(parameters);
        }
    }

    /**
     * @param solver the solver of every point (threads = 1 for parallel points)
     * @param nominal the nominal solve
     * @param plan the quantities to follow
     * @param parameters the parameters to differentiate by
     * @param threads parallel solves
     * @return the sensitivities
     * @throws SolveException if a difference point fails to solve
     */
    public static Result run(GuidePointSolver solver, GuidePoint nominal, QuantityPlan plan, List<String> parameters,
                             int threads) {
        double[] q0 = plan.values(nominal);
        double[] e0 = plan.errors(nominal);
        double largest = 0;
        for (double v : nominal.values().values()) {
            largest = Math.max(largest, Math.abs(v));
        }
        double[] scale = new double[parameters.size()];
        double[] pilot = new double[parameters.size()];
        for (int i = 0; i < scale.length; i++) {
            double v = nominal.values().get(parameters.get(i));
            scale[i] = v != 0 ? Math.abs(v) : PILOT_SHARE * largest;
            pilot[i] = PILOT_SHARE * scale[i];
        }
        List<double[][]> first = differences(solver, nominal, plan, parameters, pilot, q0, threads, false);
        double[] steps = new double[scale.length];
        boolean[] capped = new boolean[scale.length];
        boolean again = false;
        for (int i = 0; i < scale.length; i++) {
            double wanted = pilot[i];
            double[] d = first.get(i)[0];
            for (int k = 0; k < d.length; k++) {
                boolean responds = Double.isFinite(e0[k]) && Math.abs(2 * pilot[i] * d[k]) >= 3 * e0[k];
                if (responds) {
                    wanted = Math.max(wanted, SIGNAL_TO_NOISE * e0[k] / (2 * Math.abs(d[k])));
                }
            }
            capped[i] = wanted > MAX_SHARE * scale[i];
            steps[i] = Math.min(wanted, MAX_SHARE * scale[i]);
        }
        List<double[][]> fine = differences(solver, nominal, plan, parameters, steps, q0, threads, true);
        String note = nominal.section().dielectrics().isEmpty() ? ""
                : "not made: the guide has dielectric regions, whose interfaces the wall formula does not cover";
        List<BoundaryPerturbation> formulas = note.isEmpty() ? formulas(nominal, plan) : List.of();
        List<Parameter> out = new ArrayList<>();
        for (int i = 0; i < scale.length; i++) {
            String name = parameters.get(i);
            double[] d = fine.get(i)[0];
            double[] snr = new double[d.length];
            for (int k = 0; k < d.length; k++) {
                snr[k] = 2 * steps[i] * Math.abs(d[k]) / e0[k];
            }
            double[] hadamard = new double[d.length];
            java.util.Arrays.fill(hadamard, Double.NaN);
            if (note.isEmpty()) {
                hadamard = hadamard(solver, nominal, plan, formulas, name, GEOMETRY_SHARE * scale[i]);
            }
            out.add(new Parameter(name, nominal.values().get(name), steps[i], !buildable(solver, nominal, name,
                    -2 * steps[i]), capped[i], d, fine.get(i)[1], snr, hadamard));
        }
        return new Result(nominal, plan, q0, e0, out, note);
    }

    private static boolean buildable(GuidePointSolver solver, GuidePoint nominal, String name, double offset) {
        try {
            solver.template().build(shifted(nominal, name, offset));
            return true;
        } catch (SectionFileException e) {
            return false;
        }
    }

    private static Map<String, Double> shifted(GuidePoint nominal, String name, double offset) {
        Map<String, Double> v = new LinkedHashMap<>(nominal.values());
        v.put(name, v.get(name) + offset);
        return v;
    }

    /**
     * For every parameter {derivative, truncation estimate} per quantity: with {@code extrapolate} the
     * Richardson value from steps h and 2h (see the class comment), else the plain central difference.
     */
    private static List<double[][]> differences(GuidePointSolver solver, GuidePoint nominal, QuantityPlan plan,
                                                List<String> parameters, double[] steps, double[] q0, int threads,
                                                boolean extrapolate) {
        List<Map<String, Double>> sets = new ArrayList<>();
        boolean[] forward = new boolean[steps.length];
        double[][] offsets = new double[steps.length][];
        for (int i = 0; i < steps.length; i++) {
            String name = parameters.get(i);
            double h = steps[i];
            forward[i] = !buildable(solver, nominal, name, extrapolate ? -2 * h : -h);
            offsets[i] = forward[i] ? (extrapolate ? new double[] {h, 2 * h, 4 * h} : new double[] {h, 2 * h})
                    : (extrapolate ? new double[] {h, -h, 2 * h, -2 * h} : new double[] {h, -h});
            for (double o : offsets[i]) {
                sets.add(shifted(nominal, name, o));
            }
        }
        List<PointBatch.Outcome> solved = PointBatch.solveAll(solver, sets, threads);
        List<double[][]> out = new ArrayList<>();
        int next = 0;
        for (int i = 0; i < steps.length; i++) {
            double[][] q = new double[offsets[i].length][];
            for (int j = 0; j < q.length; j++) {
                PointBatch.Outcome o = solved.get(next++);
                if (o.point() == null) {
                    throw new SolveException("sensitivity to " + parameters.get(i) + " at an offset of "
                            + offsets[i][j] + ": " + o.failure());
                }
                q[j] = plan.values(o.point());
            }
            double h = steps[i];
            double[] d = new double[q0.length];
            double[] truncation = new double[q0.length];
            for (int k = 0; k < d.length; k++) {
                double small;
                double large;
                if (forward[i]) {
                    small = (-3 * q0[k] + 4 * q[0][k] - q[1][k]) / (2 * h);
                    large = extrapolate ? (-3 * q0[k] + 4 * q[1][k] - q[2][k]) / (4 * h) : small;
                } else {
                    small = (q[0][k] - q[1][k]) / (2 * h);
                    large = extrapolate ? (q[2][k] - q[3][k]) / (4 * h) : small;
                }
                d[k] = extrapolate ? (4 * small - large) / 3 : small;
                truncation[k] = Math.abs(small - large) / 3;
            }
            out.add(new double[][] {d, truncation});
        }
        return out;
    }

    /** The boundary formula of each followed cutoff's mode at the nominal point (null where not applicable). */
    private static List<BoundaryPerturbation> formulas(GuidePoint nominal, QuantityPlan plan) {
        List<BoundaryPerturbation> out = new ArrayList<>();
        for (QuantityPlan.Quantity q : plan.quantities()) {
            Mode m = switch (q.kind()) {
                case CUTOFF -> QuantityPlan.find(nominal, q.modeLabel());
                case BAND_LOW -> nominal.summary().dominant();
                case BAND_HIGH -> nominal.summary().firstHigher().orElse(null);
                default -> null;
            };
            out.add(m == null || m.cutoffFrequencyHz() == 0 ? null : BoundaryPerturbation.of(nominal.section(), m));
        }
        return out;
    }

    private static double[] hadamard(GuidePointSolver solver, GuidePoint nominal, QuantityPlan plan,
                                     List<BoundaryPerturbation> formulas, String name, double delta) {
        double[] out = new double[formulas.size()];
        java.util.Arrays.fill(out, Double.NaN);
        CrossSection plus;
        CrossSection minus;
        boolean central;
        try {
            plus = solver.template().build(shifted(nominal, name, delta));
            central = buildable(solver, nominal, name, -delta);
            minus = central ? solver.template().build(shifted(nominal, name, -delta)) : nominal.section();
        } catch (SectionFileException e) {
            return out;
        }
        double span = central ? 2 * delta : delta;
        Map<BoundaryPerturbation, double[]> displacement = new LinkedHashMap<>();
        for (int k = 0; k < out.length; k++) {
            BoundaryPerturbation f = formulas.get(k);
            if (f == null) {
                continue;
            }
            double[] dn = displacement.computeIfAbsent(f, g -> {
                double[] up = WallDisplacement.outward(g.wallX(), g.wallY(), plus);
                double[] down = WallDisplacement.outward(g.wallX(), g.wallY(), minus);
                double[] r = new double[up.length];
                for (int p = 0; p < r.length; p++) {
                    r[p] = (up[p] - down[p]) / span;
                }
                return r;
            });
            out[k] = f.cutoffWavenumberDerivative(dn) * ModeSolver.SPEED_OF_LIGHT / (2 * Math.PI);
        }
        return out;
    }
}
