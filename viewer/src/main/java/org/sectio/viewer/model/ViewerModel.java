package org.sectio.viewer.model;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicLong;
import org.sectio.geometry.CrossSection;
import org.sectio.io.BandSweep;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveCancelledException;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Conductor;

/**
 * The viewer's state, free of JavaFX so that it is tested without a window: the section being edited,
 * the solve settings, the running solve, its outcome, the mode table at the chosen frequency, the band
 * of the charts, the chosen mode and the field view. Listeners hear what changed and redraw.
 *
 * <p>Threads: every method is called on the UI thread. Solving and analysing run on {@code background}
 * (one thread, so a prepared mode analysis is never used by two threads); their results come back
 * through {@code ui}. Each solve has a number: starting another or cancelling makes the running one's
 * progress callback throw {@link SolveCancelledException}, and a result whose number is no longer
 * current is dropped, never applied.
 */
public final class ViewerModel {

    /** What changed, for the listeners. */
    public enum Change { SECTION, SOLVE_STATE, PROGRESS, RESULT, FIGURES, SWEEP, SELECTION, VIEW }

    /** Told of every change, on the UI thread. */
    @FunctionalInterface
    public interface Listener {
        /** @param change what changed */
        void changed(Change change);
    }

    /** The solve entry point, {@link ModeSolver#solve} in the program; a stand-in in tests. */
    @FunctionalInterface
    public interface Solver {
        /** As {@link ModeSolver#solve}. */
        ModeSet solve(CrossSection section, SolveSettings settings, SolveProgress progress);
    }

    /** Where a solve stands. */
    public enum SolveState { IDLE, RUNNING, DONE, CANCELLED, FAILED }

    private final Solver solver;
    private final Executor background;
    private final Executor ui;
    private final List<Listener> listeners = new ArrayList<>();
    private final AtomicLong solveNumber = new AtomicLong();
    private long figuresNumber;

    private SectionEditor editor = SectionEditor.standardDefault();
    private final SolveChoices choices = new SolveChoices();
    private final FrequencyInputs inputs = new FrequencyInputs();
    private SolveState state = SolveState.IDLE;
    private double progress;
    private String stage = "";
    private String message = "";
    private SolveOutcome outcome;
    private List<ModeRow> rows = List.of();
    private BandSweep sweep;
    private int selected = -1;
    private FieldView view = FieldView.LONGITUDINAL;
    private boolean showGrid;

    /**
     * @param solver the solve entry point
     * @param background runs solves and analyses, one at a time
     * @param ui runs result delivery on the UI thread
     */
    public ViewerModel(Solver solver, Executor background, Executor ui) {
        this.solver = solver;
        this.background = background;
        this.ui = ui;
    }

    /** @param listener told of every change from now on */
    public void addListener(Listener listener) {
        listeners.add(listener);
    }

    private void fire(Change change) {
        for (Listener l : List.copyOf(listeners)) {
            l.changed(change);
        }
    }

    // ---- the section -------------------------------------------------------------------------

    /** @return the editor of the section in the form */
    public SectionEditor editor() {
        return editor;
    }

    /**
     * Puts another section in the form; the previous outcome stays on screen until the next solve.
     *
     * @param next the editor to show
     */
    public void setEditor(SectionEditor next) {
        editor = next;
        fire(Change.SECTION);
    }

    /**
     * Changes one value of the form and rebuilds the outline at once.
     *
     * @param name the parameter
     * @param text its new text
     * @return whether the section is valid now
     */
    public boolean editParameter(String name, String text) {
        boolean valid = editor.edit(name, text);
        fire(Change.SECTION);
        return valid;
    }

    // ---- solve settings ----------------------------------------------------------------------

    /** @return modes, grid, error estimate and wall metal of the solves */
    public SolveChoices choices() {
        return choices;
    }

    /**
     * @param count modes, 1 … {@value SolveSettings#MAX_MODES}
     * @param cellsAcross grid, {@value SolveSettings#MIN_CELLS} … {@value SolveSettings#MAX_CELLS}
     * @param estimate whether to estimate errors
     * @throws IllegalArgumentException with the solver's message if a value is out of range
     */
    public void setSolveSettings(int count, int cellsAcross, boolean estimate) {
        choices.set(count, cellsAcross, estimate);
    }

    /** @param metal the wall metal, or null for the section's (else copper); re-evaluates the table */
    public void setConductor(Conductor metal) {
        choices.setConductor(metal);
        refreshFigures();
        refreshSweep();
    }

    // ---- solving -----------------------------------------------------------------------------

    /**
     * Starts a solve of the section in the form, cancelling one that runs.
     *
     * @return false (and a message) if the form has a problem; the solver is then not called
     */
    public boolean solve() {
        CrossSection section = editor.section();
        if (section == null) {
            message = "fix the marked values first: " + firstProblem();
            fire(Change.SOLVE_STATE);
            return false;
        }
        long number = solveNumber.incrementAndGet();
        SolveSettings settings = choices.settings();
        state = SolveState.RUNNING;
        progress = 0;
        stage = "queued";
        message = "";
        fire(Change.SOLVE_STATE);
        double f = currentFrequency();
        String band = inputs.bandError().isEmpty() ? inputs.bandText() : "";
        background.execute(() -> runSolve(number, section, settings, f, band));
        return true;
    }

    private void runSolve(long number, CrossSection section, SolveSettings settings, double f, String band) {
        if (solveNumber.get() != number) {
            return;
        }
        SolveProgress told = (what, fraction) -> {
            if (solveNumber.get() != number) {
                throw new SolveCancelledException("solve " + number + " cancelled");
            }
            ui.execute(() -> {
                if (solveNumber.get() == number && state == SolveState.RUNNING) {
                    stage = what;
                    progress = fraction;
                    fire(Change.PROGRESS);
                }
            });
        };
        try {
            ModeSet set = solver.solve(section, settings, told);
            told.report("identifying and analysing the modes", 1.0);
            SolveOutcome done = new SolveOutcome(section, set);
            AnalysisSettings analysis = choices.analysisSettings(section);
            List<ModeRow> table = Double.isNaN(f) ? List.of() : done.rowsAt(f, analysis);
            BandSweep curves = sweepOf(done, band, analysis);
            ui.execute(() -> apply(number, done, table, curves));
        } catch (SolveCancelledException cancelled) {
            // the solve that replaced it, or the cancel, has set the state already
        } catch (RuntimeException failed) { // SolveException, or a mode the analysis refuses
            ui.execute(() -> {
                if (solveNumber.get() == number) {
                    state = SolveState.FAILED;
                    message = failed.getMessage();
                    fire(Change.SOLVE_STATE);
                }
            });
        }
    }

    private void apply(long number, SolveOutcome done, List<ModeRow> table, BandSweep curves) {
        if (solveNumber.get() != number) {
            return; // cancelled or replaced: never shown
        }
        outcome = done;
        rows = table;
        sweep = curves;
        selected = done.modes().isEmpty() ? -1 : 0;
        state = SolveState.DONE;
        progress = 1;
        var t = done.modeSet().timing();
        var g = done.modeSet().grid();
        message = String.format(java.util.Locale.ROOT, "%d modes, grid %d × %d, %.2f s", done.modes().size(),
                g.cellsX(), g.cellsY(), t.totalSeconds());
        fire(Change.SOLVE_STATE);
        fire(Change.RESULT);
        fire(Change.FIGURES);
        fire(Change.SWEEP);
        fire(Change.SELECTION);
    }

    /** Cancels the running solve, if any: its result will not be applied. */
    public void cancel() {
        if (state != SolveState.RUNNING) {
            return;
        }
        solveNumber.incrementAndGet();
        state = SolveState.CANCELLED;
        message = "solve cancelled";
        fire(Change.SOLVE_STATE);
    }

    /** @return where the last solve stands */
    public SolveState state() {
        return state;
    }

    /** @return overall fraction done of the running solve, 0 … 1 */
    public double progress() {
        return progress;
    }

    /** @return what the running solve is doing */
    public String stage() {
        return stage;
    }

    /** @return the last message for the status line (failure, cancel, summary), or "" */
    public String message() {
        return message;
    }

    /** @return the outcome on screen, or null before the first solve */
    public SolveOutcome outcome() {
        return outcome;
    }

    // ---- frequency, table, band --------------------------------------------------------------

    /** @return the frequency of the table and the band of the charts, as typed, with their problems */
    public FrequencyInputs inputs() {
        return inputs;
    }

    /**
     * @param text e.g. "10 GHz" (the command line's frequency syntax)
     * @return whether it was read; the table is then re-evaluated in the background
     */
    public boolean setFrequency(String text) {
        boolean read = inputs.setFrequency(text);
        fire(Change.FIGURES);
        if (read) {
            refreshFigures();
        }
        return read;
    }

    /** @return the chosen frequency, Hz, or NaN while the text has a problem */
    public double currentFrequency() {
        return inputs.frequencyHz();
    }

    /**
     * @param text START:STOP:POINTS as on the command line, e.g. "8GHz:12GHz:41", or "" for automatic
     * @return whether it was read; the charts are then recomputed in the background
     */
    public boolean setBand(String text) {
        boolean read = inputs.setBand(text);
        fire(Change.SWEEP);
        if (read) {
            refreshSweep();
        }
        return read;
    }

    /** @return the mode table at the chosen frequency (empty before a solve) */
    public List<ModeRow> rows() {
        return rows;
    }

    /** @return the charts' figures, or null before a solve or when nothing propagates */
    public BandSweep sweep() {
        return sweep;
    }

    private void refreshFigures() {
        SolveOutcome on = outcome;
        double f = currentFrequency();
        if (on == null || Double.isNaN(f)) {
            return;
        }
        long number = ++figuresNumber;
        AnalysisSettings settings = choices.analysisSettings(on.section());
        background.execute(() -> {
            List<ModeRow> table = on.rowsAt(f, settings);
            ui.execute(() -> {
                if (outcome == on && number == figuresNumber) {
                    rows = table;
                    fire(Change.FIGURES);
                }
            });
        });
    }

    private void refreshSweep() {
        SolveOutcome on = outcome;
        if (on == null) {
            return;
        }
        String band = inputs.bandText();
        AnalysisSettings settings = choices.analysisSettings(on.section());
        background.execute(() -> {
            BandSweep curves = sweepOf(on, band, settings);
            ui.execute(() -> {
                if (outcome == on && band.equals(inputs.bandText())) {
                    sweep = curves;
                    fire(Change.SWEEP);
                }
            });
        });
    }

    private static BandSweep sweepOf(SolveOutcome on, String band, AnalysisSettings settings) {
        double[] f = FrequencyInputs.bandFrequencies(band, on);
        return f == null ? null : on.sweep(f, settings);
    }

    // ---- selection and view ------------------------------------------------------------------

    /** @return the chosen row, or −1 */
    public int selectedRow() {
        return selected;
    }

    /** @param row a row of {@link #rows()}, or −1 for none */
    public void select(int row) {
        int n = outcome == null ? 0 : outcome.modes().size();
        selected = row >= 0 && row < n ? row : -1;
        fire(Change.SELECTION);
    }

    /** @return the mode drawn, or null */
    public Mode selectedMode() {
        return outcome == null || selected < 0 ? null : outcome.modes().get(selected);
    }

    /** @return the field view */
    public FieldView view() {
        return view;
    }

    /** @param next the field view; no solve is needed */
    public void setView(FieldView next) {
        view = next;
        fire(Change.VIEW);
    }

    /** @return whether the grid (with its cut cells) is drawn over the outline */
    public boolean showGrid() {
        return showGrid;
    }

    /** @param show whether to draw the grid */
    public void setShowGrid(boolean show) {
        showGrid = show;
        fire(Change.VIEW);
    }

    private String firstProblem() {
        for (ParameterEntry e : editor.entries()) {
            if (e.hasError()) {
                return e.error();
            }
        }
        return editor.generalError();
    }

    /** @return the program's own solve entry point */
    public static Solver modeSolver() {
        return ModeSolver::solve;
    }
}
