package org.sectio.io;

import java.util.ArrayList;
import java.util.List;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.ModeSet;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAtFrequency;

/**
 * The modes of a solve analysed at one or more frequencies, as {@link FrequencyTableWriter} prints it.
 * Modes are listed lowest cutoff first ({@link #modesByCutoff()}); {@code identities} and each entry of
 * {@code figures} follow that order.
 *
 * @param modes the solve
 * @param identities one per mode, in cutoff order; copied
 * @param settings the analysis settings used
 * @param frequenciesHz the frequencies, Hz, ascending, at least one; copied
 * @param figures per frequency, one {@link ModeAtFrequency} per mode in cutoff order; copied
 * @param summary the dominant and first higher mode and the bands of the guide
 */
public record FrequencyReport(ModeSet modes, List<ModeIdentity> identities, AnalysisSettings settings,
                              double[] frequenciesHz, List<List<ModeAtFrequency>> figures, GuideSummary summary) {

    /**
     * Validates and copies the components.
     *
     * @param modes as in the record description
     * @param identities as in the record description
     * @param settings as in the record description
     * @param frequenciesHz as in the record description
     * @param figures as in the record description
     * @param summary as in the record description
     * @throws IllegalArgumentException if a component is missing or the counts do not match
     */
    public FrequencyReport {
        if (modes == null || identities == null || settings == null || frequenciesHz == null || figures == null
                || summary == null) {
            throw new IllegalArgumentException("a frequency report needs the modes, identities, settings,"
                    + " frequencies, figures and summary");
        }
        int count = modes.modes().size();
        if (identities.size() != count || frequenciesHz.length == 0 || figures.size() != frequenciesHz.length) {
            throw new IllegalArgumentException("frequency report: " + count + " modes, " + identities.size()
                    + " identities, " + frequenciesHz.length + " frequencies and " + figures.size()
                    + " rows of figures do not match");
        }
        List<List<ModeAtFrequency>> copied = new ArrayList<>();
        for (List<ModeAtFrequency> row : figures) {
            if (row == null || row.size() != count) {
                throw new IllegalArgumentException("frequency report: every frequency needs figures for all " + count
                        + " modes");
            }
            copied.add(List.copyOf(row));
        }
        identities = List.copyOf(identities);
        frequenciesHz = frequenciesHz.clone();
        figures = List.copyOf(copied);
    }

    /** @return a copy of the frequencies, Hz */
    @Override
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }

    /** @return the modes lowest cutoff first, the order of the identities and figures */
    public List<Mode> modesByCutoff() {
        return byCutoff(modes);
    }

    /**
     * @param modes a solve
     * @return its modes lowest cutoff first (a stable sort: equal cutoffs keep the solve's order)
     */
    public static List<Mode> byCutoff(ModeSet modes) {
        return modes.byCutoff();
    }

    /** @return true for more than one frequency */
    public boolean isSweep() {
        return frequenciesHz.length > 1;
    }
}
