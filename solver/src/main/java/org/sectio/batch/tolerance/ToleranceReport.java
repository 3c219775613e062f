package org.sectio.batch.tolerance;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.sectio.physics.BandRule;

/** The readable report of a tolerance study: nominal, sensitivities with their checks, worst case, Monte Carlo. */
public final class ToleranceReport {

    private ToleranceReport() {
    }

    /**
     * @param r a finished study
     * @return the report, lines ending in '\n'
     */
    public static String text(ToleranceStudy.Result r) {
        StringBuilder out = new StringBuilder();
        ToleranceStudy.Request q = r.request();
        SensitivityAnalysis.Result s = r.sensitivities();
        List<QuantityPlan.Quantity> quantities = s.plan().quantities();
        String unit = q.template().parameters().units().keyword();
        out.append("Tolerance study of ").append(q.template().sourceName()).append('\n');
        out.append("nominal ").append(values(s.nominal().values())).append(" (lengths in ").append(unit)
                .append(", angles in degrees)\n");
        out.append(String.format(Locale.ROOT, "grid %d cells across%s; %d modes followed (TE and TM); %d parallel"
                + " solves, one solver each%n", r.cellsAcross(), q.cellsAcross() > 0 ? " (as given)"
                : String.format(Locale.ROOT, " (chosen for %.2g)", q.accuracy()), s.plan().modeLabels().size(),
                q.threads()));
        if (q.frequenciesHz().length > 0) {
            out.append("alpha_c and Z: dominant mode, ").append(q.analysis().conductor().name()).append(" walls, ")
                    .append(q.analysis().definition().name().toLowerCase(Locale.ROOT).replace('_', '-')).append(" impedance; their errors are not estimated by the"
                            + " solver\n");
        }
        out.append("\nNominal\n");
        out.append(String.format(Locale.ROOT, "  %-24s %16s %11s%n", "quantity", "value", "rel. error"));
        for (int k = 0; k < quantities.size(); k++) {
            QuantityPlan.Quantity qq = quantities.get(k);
            out.append(String.format(Locale.ROOT, "  %-24s %16s %11s%n", qq.name(), value(qq, s.nominalValues()[k]),
                    rel(s.nominalErrors()[k], s.nominalValues()[k])));
        }
        out.append("\nSensitivities per ").append(unit).append(" (per degree for angles): central differences of")
                .append(" full solves at ±h and ±2h, Richardson-extrapolated; h chosen so that 2h|dq/dp| ≥ ")
                .append(String.format(Locale.ROOT, "%.0f", SensitivityAnalysis.SIGNAL_TO_NOISE))
                .append(" × the quantity's error estimate (column s/n: that ratio at h; below 3: insensitive, the")
                .append(" derivative is noise). FD acc. = |D(h) − D(2h)|/3, the error the extrapolation removes.")
                .append(" Hadamard: the boundary-perturbation formula from the nominal fields")
                .append(s.hadamardNote().isEmpty() ? "" : " (" + s.hadamardNote() + ")").append(".\n");
        out.append(String.format(Locale.ROOT, "  %-14s %-24s %16s %12s %9s %16s %10s%n", "parameter", "quantity",
                "dq/dp", "FD acc.", "s/n", "Hadamard", "FD − H"));
        for (SensitivityAnalysis.Parameter p : s.parameters()) {
            out.append(String.format(Locale.ROOT, "  %s = %.6g %s, h = %.4g%s%s%n", p.parameter(), p.value(), unit,
                    p.step(), p.forward() ? ", forward differences (p − h is not a valid guide)" : "",
                    p.capped() ? ", step capped at 2 % of the value (s/n below the aim)" : ""));
            for (int k = 0; k < quantities.size(); k++) {
                QuantityPlan.Quantity qq = quantities.get(k);
                double d = p.derivatives()[k];
                double h = p.hadamard()[k];
                out.append(String.format(Locale.ROOT, "  %-14s %-24s %16s %12s %9s %16s %10s%n", "", qq.name(),
                        slope(qq, d), slope(qq, p.truncation()[k]), Double.isFinite(p.signalToNoise()[k])
                                ? String.format(Locale.ROOT, p.signalToNoise()[k] < 10 ? "%.1g" : "%.0f",
                                p.signalToNoise()[k]) : "-",
                        Double.isFinite(h) ? slope(qq, h) : "-", Double.isFinite(h) && d != 0 && p.signalToNoise()[k] >= 3
                                ? String.format(Locale.ROOT, "%.1e", Math.abs(d - h) / Math.abs(d)) : "-"));
            }
        }
        out.append(closePairs(s));
        if (s.hadamardNote().isEmpty() && !s.parameters().isEmpty()) {
            out.append("  (the Hadamard integral converges slowly where the field is singular, at sharp re-entrant"
                    + " corners such as a ridge's: there trust the finite difference)\n");
        }
        if (r.worstCase() != null) {
            WorstCase.Result w = r.worstCase();
            out.append("\nWorst case over ");
            for (ParameterTolerance t : r.tolerances()) {
                out.append(String.format(Locale.ROOT, "%s ± %.4g ", t.parameter(), t.plusMinus()));
            }
            out.append(w.byCorners() ? String.format(Locale.ROOT, "(all %d corners solved; linear estimate beside)%n",
                    w.corners().size()) : String.format(Locale.ROOT, "(linear from the sensitivities: more than %d"
                    + " parameters)%n", WorstCase.MAX_CORNER_PARAMETERS));
            out.append(String.format(Locale.ROOT, "  %-24s %16s %16s %16s %16s %16s%n", "quantity", "nominal", "low",
                    "high", "linear low", "linear high"));
            for (int k = 0; k < quantities.size(); k++) {
                QuantityPlan.Quantity qq = quantities.get(k);
                out.append(String.format(Locale.ROOT, "  %-24s %16s %16s %16s %16s %16s%n", qq.name(),
                        value(qq, s.nominalValues()[k]), value(qq, w.low()[k]), value(qq, w.high()[k]),
                        value(qq, w.linearLow()[k]), value(qq, w.linearHigh()[k])));
            }
            int low = quantities.size() - 2 - 2 * q.frequenciesHz().length;
            out.append(String.format(Locale.ROOT, "  single-mode band over the box: %.6f … %.6f GHz at worst"
                    + " (highest fc1 to lowest fc2); usable %.4f … %.4f GHz%n", w.high()[low] / 1e9, w.low()[low + 1] / 1e9,
                    BandRule.LOWER_FACTOR * w.high()[low] / 1e9, BandRule.UPPER_FACTOR * w.low()[low + 1] / 1e9));
        }
        if (r.monteCarlo() != null) {
            MonteCarlo.Result mc = r.monteCarlo();
            out.append(String.format(Locale.ROOT, "%nMonte Carlo: %d parts, seed %d, %s; %s%n", mc.parts(), q.seed(),
                    distributions(r.tolerances()), mc.full() ? "every part fully solved"
                            : "linearised from the sensitivities (add --full to solve every part)"));
            if (mc.failed() > 0) {
                out.append(String.format(Locale.ROOT, "  %d parts failed to build or solve and are left out%n", mc.failed()));
            }
            out.append(String.format(Locale.ROOT, "  %-24s %14s %12s %14s %14s %14s %14s %14s%n", "quantity", "mean",
                    "std", "min", "p5", "median", "p95", "max"));
            for (int k = 0; k < quantities.size(); k++) {
                QuantityPlan.Quantity qq = quantities.get(k);
                MonteCarlo.Spread sp = mc.spreads().get(k);
                out.append(String.format(Locale.ROOT, "  %-24s %14s %12s %14s %14s %14s %14s %14s%n", qq.name(),
                        value(qq, sp.mean()), value(qq, sp.standardDeviation()), value(qq, sp.min()), value(qq, sp.p5()),
                        value(qq, sp.p50()), value(qq, sp.p95()), value(qq, sp.max())));
            }
            if (Double.isFinite(q.requiredLowHz())) {
                out.append(String.format(Locale.ROOT, "  usable band (1.25 fc1 … 0.95 fc2, common practice) covers"
                        + " %.6g … %.6g GHz in %.2f %% of the parts%n", q.requiredLowHz() / 1e9, q.requiredHighHz() / 1e9,
                        100 * mc.coveringShare()));
            }
            out.append(String.format(Locale.ROOT, "  time %.2f s%n", mc.seconds()));
        }
        return out.toString();
    }

    /** Notes pairs of followed cutoffs of one family closer than 1e-3: their labels can swap across a step. */
    private static String closePairs(SensitivityAnalysis.Result s) {
        StringBuilder b = new StringBuilder();
        List<QuantityPlan.Quantity> qs = s.plan().quantities();
        double[] v = s.nominalValues();
        for (int i = 0; i < qs.size(); i++) {
            for (int j = i + 1; j < qs.size(); j++) {
                QuantityPlan.Quantity a = qs.get(i);
                QuantityPlan.Quantity c = qs.get(j);
                if (a.kind() == QuantityPlan.Kind.CUTOFF && c.kind() == QuantityPlan.Kind.CUTOFF
                        && a.modeLabel().substring(0, 2).equals(c.modeLabel().substring(0, 2))
                        && Math.abs(v[i] - v[j]) < 1e-3 * v[i]) {
                    b.append(String.format(Locale.ROOT, "  note: %s and %s lie within %.1e of each other: across a step"
                            + " they can exchange places, so their differences by label mix the two modes (the"
                            + " Hadamard column is each mode's own)%n", a.modeLabel(), c.modeLabel(),
                            Math.abs(v[i] - v[j]) / v[i]));
                }
            }
        }
        return b.toString();
    }

    private static String distributions(List<ParameterTolerance> ts) {
        StringBuilder b = new StringBuilder();
        for (ParameterTolerance t : ts) {
            if (b.length() > 0) {
                b.append(", ");
            }
            b.append(t.parameter()).append(' ').append(t.distribution() == ParameterTolerance.Distribution.NORMAL
                    ? "normal (±tol = ±3σ)" : "uniform over ±tol");
        }
        return b.toString();
    }

    private static String values(Map<String, Double> v) {
        StringBuilder b = new StringBuilder();
        v.forEach((k, x) -> b.append(b.length() == 0 ? "" : ", ").append(k).append(' ')
                .append(String.format(Locale.ROOT, "%.6g", x)));
        return b.toString();
    }

    private static String value(QuantityPlan.Quantity q, double v) {
        if (!Double.isFinite(v)) {
            return "-";
        }
        return String.format(Locale.ROOT, q.printUnit().equals("GHz") ? "%.6f %s" : "%.5g %s", v * q.printScale(),
                q.printUnit());
    }

    private static String slope(QuantityPlan.Quantity q, double v) {
        if (!Double.isFinite(v)) {
            return "-";
        }
        return q.printUnit().equals("GHz") ? String.format(Locale.ROOT, "%.6g MHz", v * 1e-6)
                : String.format(Locale.ROOT, "%.5g %s", v * q.printScale(), q.printUnit());
    }

    private static String rel(double error, double value) {
        return Double.isFinite(error) && value != 0 ? String.format(Locale.ROOT, "%.1e", error / Math.abs(value)) : "-";
    }
}
