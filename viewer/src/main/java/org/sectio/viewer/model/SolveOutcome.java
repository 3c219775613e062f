package org.sectio.viewer.model;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.io.BandSweep;
import org.sectio.io.ModeCurve;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeIdentifier;
import org.sectio.modes.ModeSet;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAnalysis;
import org.sectio.physics.ModeAtFrequency;
import org.sectio.physics.PreparedModes;

/**
 * A finished solve with everything the views need, made on the background thread: the modes lowest
 * cutoff first, their identities ({@link ModeIdentifier}), each mode's {@link ModeAnalysis} prepared
 * once, and the guide summary — the solver's {@link PreparedModes}, which the command line's frequency
 * tables use too; no physics is done here beyond calling those APIs.
 *
 * <p>Not thread-safe: a prepared {@link ModeAnalysis} keeps work arrays, so {@link #rowsAt} and
 * {@link #sweep} run on the viewer's one background thread only.
 */
public final class SolveOutcome {

    private final CrossSection section;
    private final PreparedModes prepared;

    /**
     * @param section the cross-section solved
     * @param modes its modes from {@code ModeSolver}
     */
    public SolveOutcome(CrossSection section, ModeSet modes) {
        this.section = section;
        this.prepared = new PreparedModes(section, modes, "try more cells");
    }

    /** @return the cross-section solved */
    public CrossSection section() {
        return section;
    }

    /** @return the solve as returned by the solver */
    public ModeSet modeSet() {
        return prepared.solved();
    }

    /** @return dominant mode, first higher mode, single-mode and usable band */
    public GuideSummary summary() {
        return prepared.summary();
    }

    /** @return the modes, lowest cutoff first */
    public List<Mode> modes() {
        return prepared.modes();
    }

    /**
     * @param frequencyHz f, Hz, &gt; 0
     * @param settings wall metal, roughness, breakdown, impedance definition
     * @return one row per mode, lowest cutoff first
     */
    public List<ModeRow> rowsAt(double frequencyHz, AnalysisSettings settings) {
        List<ModeRow> rows = new ArrayList<>();
        for (int k = 0; k < prepared.modes().size(); k++) {
            rows.add(new ModeRow(k + 1, prepared.modes().get(k), prepared.identities().get(k),
                    prepared.at(k, frequencyHz, settings)));
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
        for (int k = 0; k < prepared.modes().size(); k++) {
            double[] beta = new double[frequenciesHz.length];
            double[] loss = new double[frequenciesHz.length];
            for (int i = 0; i < frequenciesHz.length; i++) {
                ModeAtFrequency at = prepared.at(k, frequenciesHz[i], settings);
                beta[i] = at.propagating() ? at.phaseConstant() : Double.NaN;
                boolean clear = at.propagating() && frequenciesHz[i] >= LOSS_FROM * at.cutoffFrequencyHz();
                loss[i] = clear ? at.conductorAttenuationDbPerMetre() + at.dielectricAttenuationDbPerMetre() : Double.NaN;
            }
            curves.add(new ModeCurve(prepared.identities().get(k).label(), beta, loss));
        }
        GuideSummary summary = prepared.summary();
        return new BandSweep(prepared.solved().sectionName(), frequenciesHz, curves, summary.singleModeLowHz(),
                summary.singleModeHighHz());
    }
}
