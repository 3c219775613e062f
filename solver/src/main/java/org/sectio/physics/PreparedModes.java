package org.sectio.physics;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentifier;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.ModeSet;

/**
 * The modes of a solve made ready for evaluation at many frequencies, as the command line's frequency
 * tables and the viewer both need them: lowest cutoff first, each identified ({@link ModeIdentifier})
 * and its wall fields rebuilt once ({@link ModeAnalysis#prepare}), with the guide summary. A mode
 * whose field cannot be rebuilt on this grid keeps only its cutoff and the wall metal's skin figures,
 * with the reason in its notes.
 *
 * <p>Not thread-safe: a prepared {@link ModeAnalysis} keeps work arrays.
 */
public final class PreparedModes {

    private final ModeSet solved;
    private final List<Mode> byCutoff;
    private final List<ModeIdentity> identities = new ArrayList<>();
    private final List<ModeAnalysis> analyses = new ArrayList<>();
    private final List<String> failures = new ArrayList<>();
    private final GuideSummary summary;

    /**
     * @param section the cross-section solved
     * @param solved its modes from {@code ModeSolver}
     * @param retryHint what to suggest when a mode cannot be analysed on this grid, e.g. "try other --cells"
     * @throws IllegalArgumentException if a mode cannot be analysed at all (e.g. a loss tangent ≥ 1)
     */
    public PreparedModes(CrossSection section, ModeSet solved, String retryHint) {
        this.solved = solved;
        this.byCutoff = solved.byCutoff();
        List<ModeIdentity> inSetOrder = ModeIdentifier.identify(section, solved);
        for (Mode mode : byCutoff) {
            identities.add(inSetOrder.get(solved.modes().indexOf(mode)));
            try {
                analyses.add(ModeAnalysis.prepare(section, mode));
                failures.add(null);
            } catch (IllegalStateException e) {
                analyses.add(null);
                failures.add("could not be analysed on this grid (" + e.getMessage() + "); " + retryHint);
            }
        }
        this.summary = GuideSummary.of(new ModeSet(solved.sectionName(), byCutoff, solved.grid(), solved.timing()),
                identities);
    }

    /** @return the solve as the solver returned it */
    public ModeSet solved() {
        return solved;
    }

    /** @return the modes, lowest cutoff first */
    public List<Mode> modes() {
        return Collections.unmodifiableList(byCutoff);
    }

    /** @return the identity of each mode, in the order of {@link #modes()} */
    public List<ModeIdentity> identities() {
        return Collections.unmodifiableList(identities);
    }

    /** @return dominant mode, first higher mode, single-mode and usable band */
    public GuideSummary summary() {
        return summary;
    }

    /**
     * @param k position in {@link #modes()}, 0-based
     * @param frequencyHz f, Hz, &gt; 0
     * @param settings wall metal, roughness, breakdown, impedance definition
     * @return the mode's figures at f
     * @throws IllegalArgumentException if the settings do not fit the guide (e.g. a voltage path outside it)
     */
    public ModeAtFrequency at(int k, double frequencyHz, AnalysisSettings settings) {
        ModeAnalysis a = analyses.get(k);
        return a != null ? a.at(frequencyHz, settings) : unanalysed(byCutoff.get(k), frequencyHz, settings,
                failures.get(k));
    }

    /**
     * @param frequenciesHz where, Hz
     * @param settings how
     * @return one row per frequency, one entry per mode in the order of {@link #modes()}
     */
    public List<List<ModeAtFrequency>> figures(double[] frequenciesHz, AnalysisSettings settings) {
        List<List<ModeAtFrequency>> figures = new ArrayList<>();
        for (double f : frequenciesHz) {
            List<ModeAtFrequency> row = new ArrayList<>();
            for (int k = 0; k < byCutoff.size(); k++) {
                row.add(at(k, f, settings));
            }
            figures.add(row);
        }
        return figures;
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
