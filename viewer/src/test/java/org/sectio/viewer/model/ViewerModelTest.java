package org.sectio.viewer.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.modes.ModeSolver;
import org.sectio.physics.FrequencySpec;

/** The viewer's state with no window: edits, validation, solving, cancelling, the table. */
class ViewerModelTest {

    /** WR-90 inner broad side, m (EIA RS-261-B, as StandardSizes holds it). */
    private static final double A = 0.9 * 0.0254;

    private static ViewerModel direct(ViewerModel.Solver solver) {
        return new ViewerModel(solver, Runnable::run, Runnable::run);
    }

    @Test
    @DisplayName("editing a value rebuilds the outline at once and asks for a redraw")
    void editRedraws() {
        ViewerModel model = direct(ModeSolver::solve);
        List<ViewerModel.Change> heard = new ArrayList<>();
        model.addListener(heard::add);
        double before = model.editor().section().bounds().width();
        assertTrue(model.editParameter("width", "30"));
        assertEquals(List.of(ViewerModel.Change.SECTION), heard);
        assertNotEquals(before, model.editor().section().bounds().width());
        assertEquals(30e-3, model.editor().section().bounds().width(), 1e-12);
        assertTrue(model.editParameter("width", "1.2 in"), "a unit may follow the number");
        assertEquals(1.2 * 0.0254, model.editor().section().bounds().width(), 1e-12);
    }

    @Test
    @DisplayName("an invalid value carries the family's own message at its field and never reaches the solver")
    void invalidValueStopsAtTheForm() {
        AtomicInteger calls = new AtomicInteger();
        ViewerModel model = direct((s, settings, p) -> {
            calls.incrementAndGet();
            return ModeSolver.solve(s, settings, p);
        });
        assertFalse(model.editParameter("height", "-2"));
        String expected = assertThrows(IllegalArgumentException.class,
                () -> GuideFamilies.byName("rectangular").build(Map.of("height", -2e-3))).getMessage();
        ParameterEntry height = model.editor().entries().stream().filter(e -> e.name().equals("height")).findFirst()
                .orElseThrow();
        assertEquals(expected, height.error());
        assertNull(model.editor().section());
        assertFalse(model.solve());
        assertEquals(0, calls.get());
        assertTrue(model.message().contains(expected), model.message());
        assertFalse(model.editParameter("width", "wide"));
        assertTrue(model.editor().entries().get(0).error().startsWith("rectangular: width must be a number"));
    }

    @Test
    @DisplayName("a solve fills the table: WR-90 TE10 first, fc = c/2a (Pozar §3.3), then TE20 and TE01")
    void solveFillsTheTable() {
        ViewerModel model = direct(ModeSolver::solve);
        model.setSolveSettings(4, 48, false);
        List<ViewerModel.Change> heard = new ArrayList<>();
        model.addListener(heard::add);
        assertTrue(model.solve());
        assertEquals(ViewerModel.SolveState.DONE, model.state());
        assertTrue(heard.contains(ViewerModel.Change.RESULT));
        assertEquals(4, model.rows().size());
        ModeRow first = model.rows().get(0);
        assertEquals("TE10", first.label());
        // measured 1.8e-4 relative at 48 cells (second order: the README's 100-cell run is 4.2e-5 off)
        double exact = ModeSolver.SPEED_OF_LIGHT / (2 * A);
        assertEquals(exact, first.mode().cutoffFrequencyHz(), 3e-4 * exact);
        assertEquals("TE20", model.rows().get(1).label());
        assertEquals("TE01", model.rows().get(2).label());
        assertTrue(first.figures().propagating(), "10 GHz is above the TE10 cutoff");
        assertEquals(0, model.selectedRow());
        assertSame(model.outcome().modes().get(0), model.selectedMode());
        assertTrue(model.sweep() != null && model.sweep().hasSingleModeBand());
    }

    @Test
    @DisplayName("cancel: the running solve stops and its result is never applied")
    void cancelDropsTheResult() throws Exception {
        ExecutorService worker = Executors.newSingleThreadExecutor();
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        AtomicInteger finished = new AtomicInteger();
        List<Throwable> thrown = new ArrayList<>();
        ViewerModel model = new ViewerModel((s, settings, progress) -> {
            started.countDown();
            await(release);
            try {
                progress.report("after the cancel", 0.5);
            } catch (RuntimeException e) {
                thrown.add(e);
                throw e;
            }
            finished.incrementAndGet();
            return ModeSolver.solve(s, settings, progress);
        }, worker, Runnable::run);
        model.setSolveSettings(2, 24, false);
        assertTrue(model.solve());
        assertTrue(started.await(10, TimeUnit.SECONDS));
        model.cancel();
        release.countDown();
        worker.shutdown();
        assertTrue(worker.awaitTermination(30, TimeUnit.SECONDS));
        assertEquals(ViewerModel.SolveState.CANCELLED, model.state());
        assertNull(model.outcome());
        assertTrue(model.rows().isEmpty());
        assertEquals(0, finished.get(), "the progress callback stopped the solve");
        assertEquals(org.sectio.modes.SolveCancelledException.class, thrown.get(0).getClass());
    }

    @Test
    @DisplayName("a second solve cancels the first; only the second's result is shown")
    void secondSolveReplacesTheFirst() throws Exception {
        ExecutorService worker = Executors.newSingleThreadExecutor();
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        AtomicInteger solves = new AtomicInteger();
        ViewerModel model = new ViewerModel((s, settings, progress) -> {
            if (solves.incrementAndGet() == 1) {
                started.countDown();
                await(release);
            }
            return ModeSolver.solve(s, settings, progress);
        }, worker, Runnable::run);
        model.setSolveSettings(2, 24, false);
        assertTrue(model.solve());
        assertTrue(started.await(10, TimeUnit.SECONDS));
        model.editParameter("width", "30");
        CrossSection second = model.editor().section();
        assertTrue(model.solve());
        release.countDown();
        worker.shutdown();
        assertTrue(worker.awaitTermination(60, TimeUnit.SECONDS));
        assertEquals(ViewerModel.SolveState.DONE, model.state());
        assertSame(second, model.outcome().section());
        assertEquals(2, solves.get(), "the first solve was started, then abandoned at its first progress report");
    }

    @Test
    @DisplayName("the frequency field takes the command line's syntax and its messages")
    void frequencyField() {
        ViewerModel model = direct(ModeSolver::solve);
        assertTrue(model.setFrequency("9.5 GHz"));
        assertEquals(9.5e9, model.currentFrequency(), 1);
        assertFalse(model.setFrequency("fast"));
        String expected = assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parseFrequency("fast"))
                .getMessage();
        assertEquals(expected, model.inputs().frequencyError());
        assertTrue(Double.isNaN(model.currentFrequency()));
        assertFalse(model.setBand("12GHz:8GHz:5"));
        assertTrue(model.setBand("8GHz:12GHz:5"));
    }

    @Test
    @DisplayName("a geometry file's parameters are editable; the reader's message comes back at the field")
    void fileParameters() throws Exception {
        Path file = Path.of(System.getProperty("basedir", "."), "..", "geometries", "examples",
                "corvel-parameterized-ridge.json");
        FileSectionEditor editor = FileSectionEditor.open(file);
        assertTrue(editor.isValid(), editor.generalError());
        assertEquals("a", editor.entries().get(0).name());
        double width = editor.section().bounds().width();
        assertTrue(editor.edit("a", "30"));
        assertEquals(30e-3, editor.section().bounds().width(), 1e-12);
        assertNotEquals(width, editor.section().bounds().width());
        assertFalse(editor.edit("a", "a +"));
        assertTrue(editor.entries().get(0).hasError() || !editor.generalError().isEmpty());
        assertTrue(editor.edit("a", "22.86"));
        assertEquals(width, editor.section().bounds().width(), 1e-12);
    }

    @Test
    @DisplayName("the CSV of the table has one line per mode with SI units in its header")
    void tableCsv() {
        ViewerModel model = direct(ModeSolver::solve);
        model.setSolveSettings(3, 40, false);
        model.solve();
        String[] lines = TableCsv.text(model.rows()).split("\n");
        assertEquals(4, lines.length);
        assertEquals(TableCsv.HEADER, lines[0]);
        assertTrue(lines[1].startsWith("1,TE10,TE,1,"), lines[1]);
        assertEquals(TableCsv.HEADER.split(",").length, lines[1].split(",", -1).length);
    }

    private static void await(CountDownLatch latch) {
        try {
            latch.await(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
