package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.batch.size.GuidePoint;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.batch.size.ParameterSizer;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;

/**
 * A whole tolerance study, in the order a manufacturing engineer asks: the nominal guide → the
 * sensitivity of every followed quantity to every parameter ({@link SensitivityAnalysis}) → the worst
 * case over the ± tolerances ({@link WorstCase}) → a Monte Carlo run ({@link MonteCarlo}).
 */
public final class ToleranceStudy {

    /** Modes solved beyond those followed, so that a followed mode stays in the solve when modes reorder. */
    static final int SPARE_MODES = 2;

    private ToleranceStudy() {
    }

    /**
     * What to study.
     *
     * @param template the guide
     * @param fixedValues parameters set for every solve, template units
     * @param sensitivityParameters the parameters to differentiate by (every toleranced one is added)
     * @param tolerances the ± tolerances (may be empty: sensitivities only)
     * @param modes how many modes to follow, 1 … 50
     * @param frequenciesHz where α_c and the impedance of the dominant mode are wanted (may be empty)
     * @param analysis conductor and impedance definition
     * @param cellsAcross the grid, or 0 to choose it from {@code accuracy}
     * @param accuracy the relative accuracy of the cutoffs that picks the grid when cellsAcross is 0
     * @param parts Monte Carlo parts, 0 for none
     * @param seed Monte Carlo seed
     * @param fullMonteCarlo solve every part instead of the linear estimate
     * @param requiredLowHz the band the usable band should cover, or NaN
     * @param requiredHighHz its upper edge
     * @param threads parallel solves, ≥ 1
     */
    public record Request(GuideTemplate template, Map<String, Double> fixedValues, List<String> sensitivityParameters,
                          List<ParameterTolerance> tolerances, int modes, double[] frequenciesHz,
                          AnalysisSettings analysis, int cellsAcross, double accuracy, int parts, long seed,
                          boolean fullMonteCarlo, double requiredLowHz, double requiredHighHz, int threads) {
        /** @throws IllegalArgumentException naming what is wrong: unknown parameter, repeated tolerance, bad count or band */
        public Request {
            fixedValues = Map.copyOf(fixedValues);
            sensitivityParameters = List.copyOf(sensitivityParameters);
            tolerances = List.copyOf(tolerances);
            frequenciesHz = frequenciesHz.clone();
            for (String p : sensitivityParameters) {
                ParameterSizer.requireParameter(template, p);
            }
            for (String p : fixedValues.keySet()) {
                ParameterSizer.requireParameter(template, p);
            }
            List<String> seen = new ArrayList<>();
            for (ParameterTolerance t : tolerances) {
                ParameterSizer.requireParameter(template, t.parameter());
                if (seen.contains(t.parameter())) {
                    throw new IllegalArgumentException("tolerance of " + t.parameter() + " given twice");
                }
                seen.add(t.parameter());
            }
            if (modes < 1 || modes > 50) {
                throw new IllegalArgumentException("modes to follow must be 1 … 50, got " + modes);
            }
            if (parts < 0 || parts > 1_000_000) {
                throw new IllegalArgumentException("Monte Carlo parts must be 0 … 1000000, got " + parts);
            }
            if (parts > 0 && tolerances.isEmpty()) {
                throw new IllegalArgumentException("Monte Carlo needs at least one tolerance (--tol NAME=PLUSMINUS)");
            }
            if (!Double.isNaN(requiredLowHz) && !(requiredLowHz > 0 && requiredHighHz > requiredLowHz
                    && Double.isFinite(requiredHighHz))) {
                throw new IllegalArgumentException("the required band must be F1:F2 with 0 < F1 < F2, got "
                        + requiredLowHz + " … " + requiredHighHz + " Hz");
            }
            if (threads < 1) {
                throw new IllegalArgumentException("threads must be at least 1, got " + threads);
            }
        }

        /** @return the sensitivity parameters followed by any toleranced one not among them */
        public List<String> parameters() {
            List<String> out = new ArrayList<>(sensitivityParameters);
            for (ParameterTolerance t : tolerances) {
                if (!out.contains(t.parameter())) {
                    out.add(t.parameter());
                }
            }
            return out;
        }
    }

    /**
     * @param request what was asked
     * @param cellsAcross the grid of every solve
     * @param sensitivities nominal values and derivatives
     * @param worstCase the extremes, or null without tolerances
     * @param monteCarlo the Monte Carlo run, or null without parts
     * @param tolerances the tolerances in the order of the derivative parameters used by worst case and Monte Carlo
     */
    public record Result(Request request, int cellsAcross, SensitivityAnalysis.Result sensitivities,
                         WorstCase.Result worstCase, MonteCarlo.Result monteCarlo, List<ParameterTolerance> tolerances) {
    }

    /**
     * @param request the study
     * @return its results
     * @throws SectionFileException if the nominal values break a rule of the shape
     * @throws org.sectio.modes.SolveException if a solve fails
     */
    public static Result run(Request request) throws SectionFileException {
        GuidePointSolver base = new GuidePointSolver(request.template(), request.fixedValues(),
                new SolveSettings(request.modes() + SPARE_MODES, EnumSet.of(ModeFamily.TE, ModeFamily.TM),
                        SolveSettings.DEFAULT_CELLS, Double.NaN, true, 1));
        int cells = request.cellsAcross() > 0 ? request.cellsAcross() : base.cellsFor(request.accuracy(), Map.of());
        GuidePointSolver solver = base.withCellsAcross(cells);
        GuidePoint nominal = solver.solve(Map.of());
        QuantityPlan plan = QuantityPlan.of(nominal, request.modes(), request.frequenciesHz(), request.analysis());
        List<String> parameters = request.parameters();
        SensitivityAnalysis.Result s = SensitivityAnalysis.run(solver, nominal, plan, parameters, request.threads());
        if (request.tolerances().isEmpty()) {
            return new Result(request, cells, s, null, null, List.of());
        }
        // worst case and Monte Carlo take the derivatives of the toleranced parameters, in their order
        Map<String, SensitivityAnalysis.Parameter> byName = new LinkedHashMap<>();
        s.parameters().forEach(p -> byName.put(p.parameter(), p));
        List<SensitivityAnalysis.Parameter> toleranced = new ArrayList<>();
        for (ParameterTolerance t : request.tolerances()) {
            toleranced.add(byName.get(t.parameter()));
        }
        SensitivityAnalysis.Result sub = new SensitivityAnalysis.Result(s.nominal(), s.plan(), s.nominalValues(),
                s.nominalErrors(), toleranced, s.hadamardNote());
        WorstCase.Result worst = WorstCase.of(solver, sub, request.tolerances(), request.threads());
        MonteCarlo.Result mc = request.parts() == 0 ? null : MonteCarlo.run(solver, sub, request.tolerances(),
                request.parts(), request.seed(), request.fullMonteCarlo(), request.requiredLowHz(),
                request.requiredHighHz(), request.threads());
        return new Result(request, cells, s, worst, mc, request.tolerances());
    }
}
