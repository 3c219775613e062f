package org.sectio.viewer.model;

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
 * A finished solve with everything the views need, made on the background thread: the modes lowest
 * cutoff first, their identities ({@link ModeIdentifier}), each mode's {@link ModeAnalysis} prepared
 * once, and the guide summary. Evaluating at a frequency follows the command line's frequency
 * analysis step for step; no physics is done here beyond calling those APIs.
 *
 * <p>Not thread-safe: a prepared {@link ModeAnalysis} keeps work arrays, so {@link #rowsAt} and
 * {@link #sweep} run on the viewer's one background thread only.
 */
public final class SolveOutcome {

    private final CrossSection section;
    private final ModeSet modes;
    private final List<Mode> byCutoff;
    private final List<ModeIdentity> identities = new ArrayList<>();
    private final List<ModeAnalysis> analyses = new ArrayList<>();
    private final List<String> failures = new ArrayList<>();
    private final GuideSummary summary;

    /**
     * @param section the cross-section solved
     * @param modes its modes from {@code ModeSolver}
     */
    public SolveOutcome(CrossSection section, ModeSet modes) {
        this.section = section;
        this.modes = modes;
        this.byCutoff = FrequencyReport.byCutoff(modes);
        List<ModeIdentity> inSetOrder = ModeIdentifier.identify(section, modes);
        for (Mode mode : byCutoff) {
            identities.add(inSetOrder.get(modes.modes().indexOf(mode)));
            try {
                analyses.add(ModeAnalysis.prepare(section, mode));
                failures.add("");
            } catch (IllegalStateException | IllegalArgumentException e) {
                analyses.add(null);
                failures.add("could not be analysed on this grid (" + e.getMessage() + "); try more cells");
            }
        }
        this.summary = GuideSummary.of(new ModeSet(modes.sectionName(), byCutoff, modes.grid(), modes.timing()),
                identities);
    }

    /** @return the cross-section solved */
    public CrossSection section() {
        return section;
    }

    /** @return the solve as returned by the solver */
    public ModeSet modeSet() {
        return modes;
    }

    /** @return dominant mode, first higher mode, single-mode and usable band */
    public GuideSummary summary() {
        return summary;
    }

    /** @return the modes, lowest cutoff first */
    public List<Mode> modes() {
        return byCutoff;
    }

    /**
     * @param frequencyHz f, Hz, &gt; 0
     * @param settings wall metal, roughness, breakdown, impedance definition
     * @return one row per mode, lowest cutoff first
     */
    public List<ModeRow> rowsAt(double frequencyHz, AnalysisSettings settings) {
        List<ModeRow> rows = new ArrayList<>();
        for (int k = 0; k < byCutoff.size(); k++) {
            rows.add(new ModeRow(k + 1, byCutoff.get(k), identities.get(k), at(k, frequencyHz, settings)));
        }
        return rows;
    }

    /** Loss is left out of the charts below this multiple of a mode's cutoff (see {@link #sweep}). */
    public static final double LOSS_FROM = 1.05;

    /**
     * β and α_c + α_d of every mode over a band, as the command line's sweep charts draw them, except
     * that a mode's loss is left out below {@value #LOSS_FROM} times its cutoff: there it rises without
     * bound, the perturbation estimate stops holding (common practice), and a single point would set
     * the scale of the whole chart.
     *
     * @param frequenciesHz ascending, at least two, Hz
     * @param settings as for {@link #rowsAt}
     * @return the sweep with the single-mode band
     */
    public BandSweep sweep(double[] frequenciesHz, AnalysisSettings settings) {
        List<ModeCurve> curves = new ArrayList<>();
        for (int k = 0; k < byCutoff.size(); k++) {
            double[] beta = new double[frequenciesHz.length];
            double[] loss = new double[frequenciesHz.length];
            for (int i = 0; i < frequenciesHz.length; i++) {
                ModeAtFrequency at = at(k, frequenciesHz[i], settings);
                beta[i] = at.propagating() ? at.phaseConstant() : Double.NaN;
                boolean clear = at.propagating() && frequenciesHz[i] >= LOSS_FROM * at.cutoffFrequencyHz();
                loss[i] = clear ? at.conductorAttenuationDbPerMetre() + at.dielectricAttenuationDbPerMetre() : Double.NaN;
            }
            curves.add(new ModeCurve(identities.get(k).label(), beta, loss));
        }
        return new BandSweep(modes.sectionName(), frequenciesHz, curves, summary.singleModeLowHz(),
                summary.singleModeHighHz());
    }

    private ModeAtFrequency at(int k, double f, AnalysisSettings settings) {
        ModeAnalysis a = analyses.get(k);
        if (a != null) {
            return a.at(f, settings);
        }
        Mode mode = byCutoff.get(k);
        double nan = Double.NaN;
        return new ModeAtFrequency(mode.label(), f, mode.cutoffFrequencyHz(),
                mode.family() == ModeFamily.TEM || f > mode.cutoffFrequencyHz(), nan, nan, nan, nan, nan, nan, nan,
                nan, nan, nan, settings.conductor().skinDepth(f),
                settings.conductor().surfaceResistance(f, settings.rmsRoughnessMetres()), nan, nan, nan, nan, nan, nan,
                nan, nan, settings.definition(), nan, failures.get(k));
    }
}
