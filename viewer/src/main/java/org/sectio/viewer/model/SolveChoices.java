package org.sectio.viewer.model;

import java.util.EnumSet;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Conductor;

/**
 * How the viewer solves and analyses: modes per solve, grid, error estimate (all families, all
 * cores), and the wall metal of the figures: the one chosen, else the section's own, else copper, as
 * on the command line. Other analysis settings are the command line's defaults.
 */
public final class SolveChoices {

    private int modeCount = 10;
    private int cells = SolveSettings.DEFAULT_CELLS;
    private boolean estimateError = true;
    private Conductor conductor;

    /** @return modes per solve */
    public int modeCount() {
        return modeCount;
    }

    /** @return grid cells across the longer side */
    public int cells() {
        return cells;
    }

    /** @return whether the solve estimates each cutoff's error on a second grid */
    public boolean estimateError() {
        return estimateError;
    }

    /** @return the wall metal chosen, or null for the section's metal (copper when it names none) */
    public Conductor conductor() {
        return conductor;
    }

    /** @throws IllegalArgumentException with the solver's message if a value is out of range */
    void set(int count, int cellsAcross, boolean estimate) {
        settings(count, cellsAcross, estimate, 1);
        modeCount = count;
        cells = cellsAcross;
        estimateError = estimate;
    }

    void setConductor(Conductor metal) {
        conductor = metal;
    }

    /** @return the settings of a solve on all cores */
    SolveSettings settings() {
        return settings(modeCount, cells, estimateError, Math.max(1, Runtime.getRuntime().availableProcessors()));
    }

    private static SolveSettings settings(int count, int cellsAcross, boolean estimate, int threads) {
        return new SolveSettings(count, EnumSet.allOf(ModeFamily.class), cellsAcross, Double.NaN, estimate, threads);
    }

    /**
     * @param section the section analysed
     * @return the analysis settings of the table and charts
     */
    public AnalysisSettings analysisSettings(CrossSection section) {
        Conductor metal = conductor != null ? conductor
                : section.wallMetal(0).map(Conductor::of).orElse(Conductor.COPPER);
        return AnalysisSettings.defaults().withConductor(metal);
    }
}
