package org.sectio.batch.size;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.SolveException;
import org.sectio.modes.SolveSettings;

/**
 * Sizes one parameter of a template so that a target is met: a bracketing root finder (the Nth-order
 * Brent method of Commons Math, {@link BracketingNthOrderBrentSolver}) on q(p) − q_wanted, each
 * evaluation a full solve.
 *
 * <p>Why the tolerances are what they are: the solved quantity carries its own discretization error ε
 * (the solver's two-grid estimate). Asking the root finder for a parameter more accurate than ε / |q'|
 * buys nothing, so it stops when the bracket is narrower than a tenth of that, or when |q − q_wanted|
 * is below a tenth of ε. The grid is chosen once, before the search, so that the quantities at both
 * ends of the range reach the requested relative accuracy; it then stays fixed, so that q(p) is a
 * smooth function of p and not one that jumps by its error when the grid changes.
 */
public final class ParameterSizer {

    /** Most solves one search may take (the bracket ends included). */
    public static final int MAX_EVALUATIONS = 60;
    /** Share of the solver error ε / |q'| the parameter is searched to. */
    static final double SEARCH_SHARE = 0.1;

    private ParameterSizer() {
    }

    /**
     * What to size and how.
     *
     * @param template the guide
     * @param fixedValues other parameters set for every solve (template units); names must exist
     * @param parameter the name of the parameter to size
     * @param low the lower end of its allowed range, in the template's units
     * @param high the upper end, &gt; low
     * @param target what to meet
     * @param accuracy the relative accuracy asked of the solved quantities (picks the grid), 1e-7 … 0.1;
     *     ignored when {@code cellsAcross} &gt; 0
     * @param cellsAcross a fixed grid (cells across), or 0 to choose it from {@code accuracy}
     * @param threads factorization threads per solve, ≥ 1
     */
    public record Request(GuideTemplate template, Map<String, Double> fixedValues, String parameter, double low, double high, SizeTarget target,
                          double accuracy, int cellsAcross, int threads) {
        /** @throws IllegalArgumentException if the parameter is unknown or the range is empty or reversed */
        public Request {
            fixedValues = Map.copyOf(fixedValues);
            requireParameter(template, parameter);
            for (String fixed : fixedValues.keySet()) {
                requireParameter(template, fixed);
            }
            if (!Double.isFinite(low) || !Double.isFinite(high)) {
                throw new IllegalArgumentException("range of " + parameter + ": ends must be finite, got " + low
                        + " … " + high);
            }
            if (!(high > low)) {
                throw new IllegalArgumentException("range of " + parameter + ": " + fmt(low) + " … " + fmt(high)
                        + (high == low ? " is empty" : " is reversed") + "; give LOW:HIGH with LOW < HIGH");
            }
            if (cellsAcross == 0 && !(accuracy >= 1e-7 && accuracy <= 0.1)) {
                throw new IllegalArgumentException("relative accuracy must be 1e-7 … 0.1, got " + accuracy);
            }
            if (cellsAcross != 0 && (cellsAcross < SolveSettings.MIN_CELLS || cellsAcross > SolveSettings.MAX_CELLS)) {
                throw new IllegalArgumentException("cells across must be " + SolveSettings.MIN_CELLS + " … "
                        + SolveSettings.MAX_CELLS + ", got " + cellsAcross);
            }
            if (threads < 1) {
                throw new IllegalArgumentException("threads must be at least 1, got " + threads);
            }
        }
    }

    /**
     * @param template a template
     * @param name a parameter name
     * @throws IllegalArgumentException naming the template's parameters, if it has none of that name
     */
    public static void requireParameter(GuideTemplate template, String name) {
        Map<String, Double> known = template.parameters().values();
        if (!known.containsKey(name)) {
            throw new IllegalArgumentException(template.sourceName() + ": no parameter '" + name
                    + "'; its parameters are " + (known.isEmpty() ? "none" : String.join(", ", known.keySet())));
        }
    }

    /**
     * One solve of the search.
     *
     * @param parameterValue the parameter, template units
     * @param quantity the target's quantity there
     * @param absoluteError its estimated error
     */
    public record Evaluation(double parameterValue, double quantity, double absoluteError) {
    }

    /**
     * The sized parameter.
     *
     * @param request what was asked
     * @param value the parameter value found, template units
     * @param uncertainty the parameter's uncertainty from the quantity's error, ε / |q'|, template units
     * @param point the guide solved at {@code value}
     * @param quantity the quantity there
     * @param quantityError its estimated absolute error
     * @param cellsAcross the grid of every solve
     * @param evaluations every solve of the search in order, the range ends first
     */
    public record Result(Request request, double value, double uncertainty, GuidePoint point, double quantity,
                         double quantityError, int cellsAcross, List<Evaluation> evaluations) {
        public Result {
            evaluations = List.copyOf(evaluations);
        }
    }

    /** Carries a checked failure out of the root finder's function. */
    private static final class Failure extends RuntimeException {
        Failure(SectionFileException cause) {
            super(cause.getMessage(), cause);
        }
    }

    /**
     * Sizes the parameter.
     *
     * @param request what to size
     * @return the value found, with the solve there and the search history
     * @throws IllegalArgumentException if the target cannot be bracketed in the range (naming the values
     *     reached at its ends) or the quantity is not defined at an end
     * @throws SectionFileException if an end of the range breaks a rule of the shape
     * @throws SolveException if a solve fails or the search does not converge
     */
    public static Result size(Request request) throws SectionFileException {
        SizeTarget target = request.target();
        SolveSettings base = new SolveSettings(target.modeCount(), target.families(), SolveSettings.DEFAULT_CELLS,
                Double.NaN, true, request.threads());
        GuidePointSolver solver = new GuidePointSolver(request.template(), request.fixedValues(), base);
        String name = request.parameter();
        int cells = request.cellsAcross() > 0 ? request.cellsAcross()
                : solver.cellsFor(request.accuracy(), Map.of(name, request.low()), Map.of(name, request.high()));
        GuidePointSolver fixed = solver.withCellsAcross(cells);
        Map<Double, GuidePoint> solved = new LinkedHashMap<>();
        List<Evaluation> history = new ArrayList<>();
        GuidePoint lowPoint = evaluate(fixed, request, request.low(), solved, history);
        GuidePoint highPoint = evaluate(fixed, request, request.high(), solved, history);
        double qLow = history.get(0).quantity();
        double qHigh = history.get(1).quantity();
        for (Evaluation e : history) {
            if (!Double.isFinite(e.quantity())) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "%s is not defined at %s = %s%s",
                        target.quantityName(), name, fmt(e.parameterValue()), notDefinedReason(target)));
            }
        }
        double wanted = target.wanted();
        if (Math.signum(qLow - wanted) == Math.signum(qHigh - wanted) && qLow != wanted) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "%s cannot be bracketed in %s %s … %s: %s reaches %s at %s and %s at %s; widen the range or"
                            + " change the target", target.describe(), name, fmt(request.low()), fmt(request.high()),
                    target.quantityName(), target.format(qLow), fmt(request.low()), target.format(qHigh),
                    fmt(request.high())));
        }
        double error = errorAt(target, fixed, lowPoint, request, cells);
        double errorHigh = errorAt(target, fixed, highPoint, request, cells);
        double epsilon = Math.max(finiteOr(error, 0), finiteOr(errorHigh, 0));
        double slope = (qHigh - qLow) / (request.high() - request.low());
        double parameterAccuracy = Math.max(SEARCH_SHARE * epsilon / Math.abs(slope),
                1e-12 * Math.max(Math.abs(request.low()), Math.abs(request.high())));
        BracketingNthOrderBrentSolver brent = new BracketingNthOrderBrentSolver(1e-14, parameterAccuracy,
                SEARCH_SHARE * epsilon, 5);
        double root;
        try {
            root = brent.solve(MAX_EVALUATIONS, p -> {
                try {
                    return target.quantity(evaluate(fixed, request, p, solved, history)) - wanted;
                } catch (SectionFileException e) {
                    throw new Failure(e);
                }
            }, request.low(), request.high(), AllowedSolution.ANY_SIDE);
        } catch (Failure f) {
            throw (SectionFileException) f.getCause();
        } catch (TooManyEvaluationsException e) {
            throw new SolveException("sizing " + name + " for " + target.describe() + " did not converge in "
                    + MAX_EVALUATIONS + " solves; the quantity may not be smooth in the range");
        }
        GuidePoint at = evaluate(fixed, request, root, solved, history);
        double q = target.quantity(at);
        double qError = errorAt(target, fixed, at, request, cells);
        double uncertainty = qError / Math.abs(localSlope(history, root, slope, request.high() - request.low()));
        return new Result(request, root, uncertainty, at, q, qError, cells, history);
    }

    private static String notDefinedReason(SizeTarget target) {
        if (target instanceof SizeTarget.Impedance) {
            return " (the dominant mode is cut off there, or the guide is partly filled)";
        }
        if (target instanceof SizeTarget.Cutoff) {
            return " (the solve holds fewer modes of that family)";
        }
        return " (the first higher mode is not among the solved modes)";
    }

    private static double finiteOr(double v, double fallback) {
        return Double.isFinite(v) ? v : fallback;
    }

    private static double errorAt(SizeTarget target, GuidePointSolver fixed, GuidePoint point, Request request,
                                  int cells) throws SectionFileException {
        GuidePoint coarse = null;
        if (target.needsCoarseSolve()) {
            coarse = fixed.withCellsAcross(Math.max(SolveSettings.MIN_CELLS, cells / 2)).solve(point.values());
        }
        return target.absoluteError(point, coarse);
    }

    private static GuidePoint evaluate(GuidePointSolver solver, Request request, double p,
                                       Map<Double, GuidePoint> solved, List<Evaluation> history)
            throws SectionFileException {
        GuidePoint known = solved.get(p);
        if (known != null) {
            return known;
        }
        GuidePoint point = solver.solve(Map.of(request.parameter(), p));
        solved.put(p, point);
        SizeTarget t = request.target();
        double q = t.quantity(point);
        history.add(new Evaluation(p, q, t.needsCoarseSolve() ? Double.NaN : t.absoluteError(point, null)));
        return point;
    }

    /**
     * dq/dp near the root: the secant of the nearest evaluations on either side that lie at least
     * 1e-4 of the range from it (closer ones differ by less than their error), else the range's secant.
     */
    private static double localSlope(List<Evaluation> history, double root, double fallback, double rangeWidth) {
        double gap = 1e-4 * rangeWidth;
        Evaluation below = null;
        Evaluation above = null;
        for (Evaluation e : history) {
            double d = e.parameterValue() - root;
            if (d < -gap && (below == null || d > below.parameterValue() - root)) {
                below = e;
            } else if (d > gap && (above == null || d < above.parameterValue() - root)) {
                above = e;
            }
        }
        if (below == null || above == null) {
            return fallback;
        }
        double s = (above.quantity() - below.quantity()) / (above.parameterValue() - below.parameterValue());
        return s != 0 && Double.isFinite(s) ? s : fallback;
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
