package org.sectio.batch.size;

import java.util.Locale;
import org.sectio.geometry.file.LengthUnit;
import org.sectio.physics.GuideSummary;

/** The readable report of a sizing run: the request, the search, the value found and what it gives. */
public final class SizingReport {

    private SizingReport() {
    }

    /**
     * @param result a finished sizing
     * @return the report, lines ending in '\n'
     */
    public static String text(ParameterSizer.Result result) {
        ParameterSizer.Request r = result.request();
        SizeTarget t = r.target();
        String unit = unitOf(r);
        StringBuilder out = new StringBuilder();
        out.append("Sizing ").append(r.parameter()).append(" of ").append(r.template().sourceName())
                .append(" for ").append(t.describe()).append('\n');
        out.append(String.format(Locale.ROOT, "range %s … %s %s; grid %d cells across%s; %d solves%n",
                ParameterSizer.fmt(r.low()), ParameterSizer.fmt(r.high()), unit, result.cellsAcross(),
                r.cellsAcross() > 0 ? " (as given)" : String.format(Locale.ROOT, " (chosen for a relative accuracy of"
                        + " %.2g)", r.accuracy()), result.evaluations().size()));
        out.append(String.format(Locale.ROOT, "  %4s  %16s  %24s  %14s%n", "#", r.parameter() + " (" + unit + ")",
                t.quantityName().length() > 24 ? "quantity" : t.quantityName(), "error"));
        int k = 1;
        for (ParameterSizer.Evaluation e : result.evaluations()) {
            out.append(String.format(Locale.ROOT, "  %4d  %16.9g  %24s  %14s%n", k++, e.parameterValue(),
                    t.format(e.quantity()), Double.isFinite(e.absoluteError()) ? t.errorText(e.absoluteError(), e.quantity())
                    : "-"));
        }
        out.append(String.format(Locale.ROOT, "result: %s = %.9g %s ± %.2g %s (the quantity's error over its slope)%n",
                r.parameter(), result.value(), unit, result.uncertainty(), unit));
        out.append(String.format(Locale.ROOT, "  %s = %s (wanted %s), estimated error %s%n", t.quantityName(),
                t.format(result.quantity()), t.format(t.wanted()), t.errorText(result.quantityError(), result.quantity())));
        if (t instanceof SizeTarget.Coverage c) {
            double low = c.lowMargin(result.point());
            double high = c.highMargin(result.point());
            boolean covers = low >= 0 && high >= 0;
            out.append(String.format(Locale.ROOT, "  margins: %.3f %% below the band, %.3f %% above it: %s%n",
                    100 * Math.expm1(low), 100 * Math.expm1(high), covers ? "the usable band covers it"
                            : "the usable band does NOT cover it at any value with equal margins"));
        }
        GuideSummary s = result.point().summary();
        out.append(String.format(Locale.ROOT, "  dominant mode %s at %.6f GHz%s%n", s.dominantLabel(),
                s.singleModeLowHz() / 1e9, s.firstHigher().isPresent()
                        ? String.format(Locale.ROOT, "; first higher %s at %.6f GHz; usable band %.4f … %.4f GHz (1.25 fc1"
                        + " … 0.95 fc2, common practice)", s.nextLabel(), s.singleModeHighHz() / 1e9, s.usableLowHz() / 1e9,
                        s.usableHighHz() / 1e9) : ""));
        return out.toString();
    }

    /** @return the template's length unit (parameters that are angles are in degrees, ratios bare) */
    static String unitOf(ParameterSizer.Request r) {
        LengthUnit u = r.template().parameters().units();
        return u.keyword();
    }
}
