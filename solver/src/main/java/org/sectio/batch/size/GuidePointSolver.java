package org.sectio.batch.size;

import java.util.Map;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveException;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.GuideSummary;

/**
 * Builds a template's guide for a set of parameter values and solves it with fixed settings: the one
 * piece that sizing and tolerance studies repeat many times. Immutable and safe to share between
 * threads (every call builds and solves on its own).
 *
 * <p>Batch work keeps one grid density for all points of a study, chosen once ({@link #cellsFor}):
 * a grid chosen per point would make a cutoff jump by its own error from point to point, which a root
 * finder or a finite difference would read as a change of the guide.
 */
public final class GuidePointSolver {

    /** Cells across of the pilot solve that measures the error (as {@code ModeSolver} does for a target). */
    static final int PILOT_CELLS = ModeSolver.PILOT_CELLS;

    private final GuideTemplate template;
    private final Map<String, Double> fixedValues;
    private final SolveSettings settings;

    /**
     * @param template the guide with its parameters
     * @param fixedValues values set at every point (template units), under those a point sets; copied
     * @param settings modes, families, grid (cells across), error estimate and threads of every solve
     */
    public GuidePointSolver(GuideTemplate template, Map<String, Double> fixedValues, SolveSettings settings) {
        this.template = template;
        this.fixedValues = Map.copyOf(fixedValues);
        this.settings = settings;
    }

    /** @return the template */
    public GuideTemplate template() {
        return template;
    }

    /** @return the solve settings */
    public SolveSettings settings() {
        return settings;
    }

    /** @return this solver on another grid */
    public GuidePointSolver withCellsAcross(int cells) {
        return new GuidePointSolver(template, fixedValues, settings.withCellsAcross(cells));
    }

    /**
     * @param values parameter values by name, in the template's units; others keep theirs
     * @return the solved guide
     * @throws SectionFileException if the values break a rule of the shape (one line naming the place)
     * @throws SolveException if the solve fails
     */
    public GuidePoint solve(Map<String, Double> values) throws SectionFileException {
        Map<String, Double> all = merged(values);
        CrossSection section = template.build(all);
        ModeSet modes = ModeSolver.solve(section, settings, SolveProgress.SILENT);
        return new GuidePoint(all, section, modes, GuideSummary.of(modes));
    }

    /** @return every parameter: the template's values, the fixed values over them and {@code values} over those */
    public Map<String, Double> merged(Map<String, Double> values) {
        Map<String, Double> all = new java.util.LinkedHashMap<>(template.parameters().values());
        all.putAll(fixedValues);
        all.putAll(values);
        return all;
    }

    /**
     * The cells across that give every solved cutoff the relative error {@code target} at all the given
     * parameter sets: a pilot solve at {@value #PILOT_CELLS} cells measures the error estimate, and second
     * order convergence scales it as (pilot / cells)², with the margin {@code ModeSolver} uses (1.15).
     *
     * @param target the wanted relative error of the cutoffs, 1e-7 … 0.1
     * @param points the parameter sets the study will visit (e.g. the ends of a range)
     * @return cells across, at least the pilot's
     * @throws SectionFileException if a parameter set breaks a rule of the shape
     * @throws SolveException if a pilot fails or the target needs more than {@link SolveSettings#MAX_CELLS}
     */
    @SafeVarargs
    public final int cellsFor(double target, Map<String, Double>... points) throws SectionFileException {
        if (!(target >= 1e-7 && target <= 0.1)) {
            throw new IllegalArgumentException("relative accuracy must be 1e-7 … 0.1, got " + target);
        }
        SolveSettings pilot = new SolveSettings(settings.modeCount(), settings.families(), PILOT_CELLS, Double.NaN,
                true, settings.threads());
        double worst = 0;
        for (Map<String, Double> values : points) {
            CrossSection section = template.build(merged(values));
            for (Mode m : ModeSolver.solve(section, pilot, SolveProgress.SILENT).modes()) {
                if (Double.isFinite(m.relativeErrorEstimate())) {
                    worst = Math.max(worst, m.relativeErrorEstimate());
                }
            }
        }
        return ModeSolver.cellsForError(worst, target);
    }
}
