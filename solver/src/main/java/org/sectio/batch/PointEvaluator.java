package org.sectio.batch;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveException;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSession;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAnalysis;

/**
 * Solves one sweep point and turns the result into its record: build the cross-section for the point's
 * values → solve through {@link ModeSolver} (one thread) → take the figures of the {@link RecordPlan}.
 * A point whose values the shape refuses, or whose solve or analysis fails, becomes a failed record
 * with the one-line reason; nothing is thrown for it.
 */
final class PointEvaluator {

    private final SweepDefinition sweep;
    private final SolveSettings settings;

    /**
     * @param sweep the sweep
     * @param threadsPerPoint solver threads of each point's solve (records do not depend on it)
     */
    PointEvaluator(SweepDefinition sweep, int threadsPerPoint) {
        this.sweep = sweep;
        SolveSettings s = sweep.solve();
        this.settings = new SolveSettings(s.modeCount(), s.families(), s.cellsAcross(), s.targetRelativeError(),
                s.estimateError(), threadsPerPoint);
    }

    /**
     * @param index the point's index
     * @param session this thread's session, or null
     * @return the point's record, failed or not
     */
    PointRecord evaluate(int index, SolveSession session) {
        SweepPoint point = sweep.point(index);
        List<Double> values = new ArrayList<>(point.values().values());
        try {
            CrossSection section = sweep.geometry().build(sweep.settingsAt(point));
            ModeSet set = ModeSolver.solve(section, settings, SolveProgress.SILENT, session);
            return new PointRecord(index, sweep.pointCount(), values, false, figures(section, set), "");
        } catch (SectionFileException e) {
            // a family's document is made by GuideTemplate, so only the problem means something to the user
            boolean family = sweep.geometry().sourceName().startsWith("family ");
            return failed(index, values, family ? e.problem() : "geometry " + e.jsonPath() + ": " + e.problem());
        } catch (SolveException | IllegalArgumentException | IllegalStateException e) {
            return failed(index, values, e.getMessage());
        } catch (OutOfMemoryError e) {
            return failed(index, values, "out of memory; use fewer cells or a larger heap");
        } catch (RuntimeException e) {
            return failed(index, values, "internal error (" + e.getClass().getSimpleName() + "): " + e.getMessage());
        }
    }

    private PointRecord failed(int index, List<Double> values, String reason) {
        return new PointRecord(index, sweep.pointCount(), values, true, List.of(),
                reason == null || reason.isBlank() ? "failed without a message" : reason);
    }

    private List<Object> figures(CrossSection section, ModeSet set) {
        RecordPlan plan = sweep.record();
        List<Mode> modes = set.modes();
        List<Object> out = new ArrayList<>();
        for (int k = 0; k < plan.cutoffs(); k++) {
            Mode m = k < modes.size() ? modes.get(k) : null;
            out.add(m == null ? null : m.label());
            out.add(m == null ? null : m.cutoffFrequencyHz());
            if (plan.errorEstimates()) {
                out.add(m == null ? null : m.relativeErrorEstimate());
            }
        }
        if (plan.singleModeBand()) {
            GuideSummary summary = GuideSummary.of(set);
            out.add(summary.singleModeLowHz());
            out.add(summary.singleModeHighHz());
            out.add(summary.usableLowHz());
            out.add(summary.usableHighHz());
        }
        addAtFrequencies(out, section, modes, plan.attenuationModes(), plan.attenuationHz(), true);
        addAtFrequencies(out, section, modes, plan.impedanceModes(), plan.impedanceHz(), false);
        return out;
    }

    private void addAtFrequencies(List<Object> out, CrossSection section, List<Mode> modes, List<Integer> numbers,
                                  List<Double> frequencies, boolean attenuation) {
        for (int number : numbers) {
            if (number > modes.size()) {
                frequencies.forEach(f -> out.add(null));
                continue;
            }
            ModeAnalysis analysis = ModeAnalysis.prepare(section, modes.get(number - 1));
            for (double f : frequencies) {
                var at = analysis.at(f, sweep.analysis());
                out.add(attenuation ? at.conductorAttenuationDbPerMetre() : at.chosenImpedance());
            }
        }
    }

    /** @return a short text of the point's values, e.g. "gap = 2.5, width = 18" (for log lines) */
    String describe(int index) {
        StringBuilder text = new StringBuilder();
        sweep.point(index).values().forEach((name, v) -> text.append(text.length() == 0 ? "" : ", ")
                .append(name).append(" = ").append(String.format(Locale.ROOT, "%.6g", v)));
        return text.toString();
    }
}
