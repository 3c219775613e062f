package org.sectio.cli;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.io.BandSweep;
import org.sectio.io.FrequencyReport;
import org.sectio.io.ModeCurve;
import org.sectio.modes.ModeSet;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAtFrequency;
import org.sectio.physics.PreparedModes;

/**
 * Analyses every mode of a solve at the requested frequencies: {@link PreparedModes} identifies the
 * modes and prepares each mode's field once, then evaluates it at each frequency, and gathers
 * the result as a {@link FrequencyReport} (for the tables) and a {@link BandSweep} (for the charts).
 * A partly filled guide's modes above cutoff are hybrid: there {@link HybridFrequencyAnalysis} solves
 * the full-vector problem at each frequency instead.
 */
final class FrequencyAnalysis {

    private FrequencyAnalysis() {
    }

    /**
     * @param section the cross-section solved
     * @param result its modes
     * @param frequenciesHz where to analyse them, Hz, ascending
     * @param settings how
     * @return the report, modes lowest cutoff first
     * @throws IllegalArgumentException if the settings do not fit the guide (e.g. a voltage path outside it)
     */
    static FrequencyReport analyse(CrossSection section, ModeSet result, double[] frequenciesHz,
                                   AnalysisSettings settings) {
        PreparedModes prepared = new PreparedModes(section, result, "try other --cells");
        List<List<ModeAtFrequency>> figures = prepared.figures(frequenciesHz, settings);
        if (HybridFrequencyAnalysis.applies(section)) {
            figures = HybridFrequencyAnalysis.figures(section, prepared.modes(), prepared.identities(), frequenciesHz,
                    settings, figures);
        }
        return new FrequencyReport(result, prepared.identities(), settings, frequenciesHz, figures, prepared.summary());
    }

    /**
     * Why a sweep has no loss to chart: no mode propagates anywhere in it, or the modes that do have no
     * computed loss (their rows' notes say why).
     *
     * @param report a sweep report
     * @return the reason, a phrase without a full stop
     */
    static String noLossReason(FrequencyReport report) {
        List<String> propagating = new ArrayList<>();
        for (int k = 0; k < report.identities().size(); k++) {
            for (List<ModeAtFrequency> row : report.figures()) {
                if (row.get(k).propagating()) {
                    propagating.add(report.identities().get(k).label());
                    break;
                }
            }
        }
        return propagating.isEmpty() ? "no mode propagates in the band"
                : "no loss is computed for the propagating modes (" + String.join(", ", propagating)
                        + "; see the notes under the table)";
    }

    /**
     * @param report a sweep report
     * @return β and α_c + α_d of every mode over the sweep (NaN where cut off or unavailable), for the charts
     */
    static BandSweep sweep(FrequencyReport report) {
        double[] f = report.frequenciesHz();
        List<ModeCurve> curves = new ArrayList<>();
        for (int k = 0; k < report.identities().size(); k++) {
            double[] beta = new double[f.length];
            double[] loss = new double[f.length];
            for (int i = 0; i < f.length; i++) {
                ModeAtFrequency at = report.figures().get(i).get(k);
                beta[i] = at.propagating() ? at.phaseConstant() : Double.NaN;
                loss[i] = at.propagating() ? at.conductorAttenuationDbPerMetre() + at.dielectricAttenuationDbPerMetre()
                        : Double.NaN;
            }
            curves.add(new ModeCurve(report.identities().get(k).label(), beta, loss));
        }
        GuideSummary guide = report.summary();
        return new BandSweep(report.modes().sectionName(), f, curves, guide.singleModeLowHz(),
                guide.singleModeHighHz());
    }
}
