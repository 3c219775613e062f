package org.sectio.cli;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.io.BandSweep;
import org.sectio.io.FrequencyReport;
import org.sectio.io.ModeCurve;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentifier;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.ModeSet;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAnalysis;
import org.sectio.physics.ModeAtFrequency;

/**
 * Analyses every mode of a solve at the requested frequencies: identifies the modes, prepares each
 * mode's field once ({@link ModeAnalysis#prepare}) and evaluates it at each frequency, and gathers
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
        List<Mode> modes = FrequencyReport.byCutoff(result);
        List<ModeIdentity> inSetOrder = ModeIdentifier.identify(section, result);
        List<ModeIdentity> identities = new ArrayList<>();
        List<ModeAnalysis> prepared = new ArrayList<>();
        List<String> failures = new ArrayList<>();
        for (Mode mode : modes) {
            identities.add(inSetOrder.get(result.modes().indexOf(mode)));
            try {
                prepared.add(ModeAnalysis.prepare(section, mode));
                failures.add(null);
            } catch (IllegalStateException e) {
                prepared.add(null);
                failures.add("could not be analysed on this grid (" + e.getMessage() + "); try other --cells");
            }
        }
        List<List<ModeAtFrequency>> figures = new ArrayList<>();
        if (HybridFrequencyAnalysis.applies(section)) {
            List<List<ModeAtFrequency>> scalar = scalarFigures(modes, prepared, failures, frequenciesHz, settings);
            figures = HybridFrequencyAnalysis.figures(section, modes, identities, frequenciesHz, settings, scalar);
            return new FrequencyReport(result, identities, settings, frequenciesHz, figures, GuideSummary.of(
                    new ModeSet(result.sectionName(), modes, result.grid(), result.timing()), identities));
        }
        for (double f : frequenciesHz) {
            List<ModeAtFrequency> row = new ArrayList<>();
            for (int k = 0; k < modes.size(); k++) {
                row.add(prepared.get(k) != null ? prepared.get(k).at(f, settings)
                        : unanalysed(modes.get(k), f, settings, failures.get(k)));
            }
            figures.add(row);
        }
        return new FrequencyReport(result, identities, settings, frequenciesHz, figures, GuideSummary.of(
                new ModeSet(result.sectionName(), modes, result.grid(), result.timing()), identities));
    }

    /** The figures of the scalar analysis at every frequency (what a homogeneously filled guide reports). */
    private static List<List<ModeAtFrequency>> scalarFigures(List<Mode> modes, List<ModeAnalysis> prepared,
            List<String> failures, double[] frequenciesHz, AnalysisSettings settings) {
        List<List<ModeAtFrequency>> figures = new ArrayList<>();
        for (double f : frequenciesHz) {
            List<ModeAtFrequency> row = new ArrayList<>();
            for (int k = 0; k < modes.size(); k++) {
                row.add(prepared.get(k) != null ? prepared.get(k).at(f, settings)
                        : unanalysed(modes.get(k), f, settings, failures.get(k)));
            }
            figures.add(row);
        }
        return figures;
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

    /**
     * The figures of a mode whose field could not be rebuilt at the walls: only the cutoff and the
     * wall metal's skin depth and surface resistance are known; the reason goes to the table's notes.
     */
    private static ModeAtFrequency unanalysed(Mode mode, double f, AnalysisSettings settings, String why) {
        double nan = Double.NaN;
        double fc = mode.cutoffFrequencyHz();
        return new ModeAtFrequency(mode.label(), f, fc, mode.family() == ModeFamily.TEM || f > fc, nan, nan, nan,
                nan, nan, nan, nan, nan, nan, nan, settings.conductor().skinDepth(f),
                settings.conductor().surfaceResistance(f, settings.rmsRoughnessMetres()), nan, nan, nan, nan, nan,
                nan, nan, nan, settings.definition(), nan, why);
    }

}
