package org.sectio.viewer.ui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.MenuButton;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Separator;
import javafx.scene.control.Spinner;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Stage;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.family.GuideFamily;
import org.sectio.geometry.family.StandardSize;
import org.sectio.geometry.family.StandardSizes;
import org.sectio.io.SweepCharts;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.Caution;
import org.sectio.physics.Conductor;
import org.sectio.physics.GuideSummary;
import org.sectio.viewer.model.FieldView;
import org.sectio.viewer.model.FileSectionEditor;
import org.sectio.viewer.model.SectionEditor;
import org.sectio.viewer.model.TableCsv;
import org.sectio.viewer.model.ViewerMemory;
import org.sectio.viewer.model.ViewerModel;
import org.sectio.viewer.model.ViewerModel.SolveState;

/**
 * The viewer's one window: the section's values and the solve controls on the left, the section
 * view and the two sweep charts in tabs, the mode table below them, a status line at the foot.
 * It only arranges controls and forwards to {@link ViewerModel}; every figure comes from the solver.
 */
public final class MainWindow {

    private static final String METAL_OF_FILE = "the section's metal (else copper)";

    private final ViewerModel model;
    private final ViewerMemory memory;
    private final Path memoryFile;
    private final ParameterForm form;
    private final SectionCanvas canvas;
    private final ModeTable table;
    private final ChartView dispersion = new ChartView(SweepCharts::dispersion);
    private final ChartView attenuation = new ChartView(SweepCharts::attenuation);
    private final Label sectionTitle = new Label();
    private final Label coordinates = new Label();
    private final Label message = new Label();
    private final Label stage = new Label();
    private final Label summary = new Label();
    private final Label frequencyError = new Label();
    private final Label bandError = new Label();
    private final ProgressBar progress = new ProgressBar(0);
    private final Button solve = new Button("Solve");
    private final Button cancel = new Button("Cancel");
    private final MenuButton recent = new MenuButton("Recent");
    private final SplitPane sides = new SplitPane();
    private final SplitPane viewsAndTable = new SplitPane();
    private Stage window;

    /**
     * @param model the viewer state
     * @param memory the remembered files and layout
     * @param memoryFile where to keep them when the window closes, or null not to keep them
     */
    public MainWindow(ViewerModel model, ViewerMemory memory, Path memoryFile) {
        this.model = model;
        this.memory = memory;
        this.memoryFile = memoryFile;
        this.form = new ParameterForm(model);
        this.canvas = new SectionCanvas(model, coordinates::setText);
        this.table = new ModeTable(model);
        model.addListener(this::changed);
    }

    /**
     * Builds the scene into a stage, restores the remembered layout and shows it.
     *
     * @param into the stage
     */
    public void show(Stage into) {
        window = into;
        BorderPane root = new BorderPane();
        root.getStyleClass().add("sectio-root");
        root.setTop(masthead());
        sides.getItems().addAll(sidePanel(), viewsAndTable);
        viewsAndTable.setOrientation(Orientation.VERTICAL);
        viewsAndTable.getItems().addAll(views(), tableBox());
        root.setCenter(sides);
        root.setBottom(statusLine());
        double[] w = memory.window();
        javafx.geometry.Rectangle2D screen = javafx.stage.Screen.getPrimary().getVisualBounds();
        Scene scene = new Scene(root, Math.min(w[2], screen.getWidth()), Math.min(w[3], screen.getHeight()));
        scene.getStylesheets().add(MainWindow.class.getResource("viewer.css").toExternalForm());
        into.setScene(scene);
        into.setTitle("Sectio · waveguide modes");
        if (Double.isFinite(w[0]) && Double.isFinite(w[1]) && screen.contains(w[0] + 40, w[1] + 20)) {
            into.setX(w[0]);
            into.setY(w[1]);
        }
        into.setMaximized(memory.maximized());
        sides.setDividerPositions(memory.sideDivider());
        viewsAndTable.setDividerPositions(memory.tableDivider());
        into.setOnHiding(e -> remember());
        rebuildRecent();
        changed(ViewerModel.Change.SECTION);
        changed(ViewerModel.Change.SOLVE_STATE);
        into.show();
    }

    /** @return the section view (for exports and tests) */
    public SectionCanvas sectionView() {
        return canvas;
    }

    /**
     * Opens a geometry file into the form; a file that cannot be read is reported on the status line.
     *
     * @param file the file
     */
    public void open(Path file) {
        try {
            FileSectionEditor editor = FileSectionEditor.open(file);
            memory.opened(file);
            rebuildRecent();
            model.setEditor(editor);
            message.setText(editor.isValid() ? "opened " + file : "");
        } catch (IOException e) {
            message.setText("cannot read geometry file " + file + ": " + e.getMessage());
        }
    }

    private Region masthead() {
        Label brand = new Label("Sectio");
        brand.getStyleClass().add("brand");
        Label what = new Label("modes of hollow metal guides");
        what.getStyleClass().add("brand-note");
        Button openButton = new Button("Open geometry…");
        openButton.setOnAction(e -> chooseFile());
        ComboBox<GuideFamily> families = new ComboBox<>();
        families.setPromptText("built-in family");
        families.getItems().addAll(GuideFamilies.all());
        families.setConverter(converter(GuideFamily::name));
        families.setOnAction(e -> {
            if (families.getValue() != null) {
                model.setEditor(SectionEditor.of(families.getValue()));
            }
        });
        ComboBox<StandardSize> sizes = new ComboBox<>();
        sizes.setPromptText("WR size");
        sizes.getItems().addAll(StandardSizes.all());
        sizes.setConverter(converter(StandardSize::designation));
        sizes.setOnAction(e -> {
            StandardSize s = sizes.getValue();
            if (s != null) {
                model.setEditor(SectionEditor.of(s));
                model.setFrequency(String.format(Locale.ROOT, "%.4g GHz", 0.5e-9 * (s.bandLowHz() + s.bandHighHz())));
            }
        });
        Button png = new Button("Save view as PNG…");
        png.setOnAction(e -> savePng());
        Button csv = new Button("Save table as CSV…");
        csv.setOnAction(e -> saveCsv());
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        HBox bar = new HBox(10, brand, what, gap, openButton, recent, families, sizes, new Separator(Orientation.VERTICAL),
                png, csv);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.getStyleClass().add("masthead");
        return bar;
    }

    private Region sidePanel() {
        sectionTitle.getStyleClass().add("section-title");
        sectionTitle.setWrapText(true);
        Label solveHead = new Label("Solve");
        solveHead.getStyleClass().add("panel-head");
        Spinner<Integer> modes = new Spinner<>(1, SolveSettings.MAX_MODES, model.choices().modeCount());
        modes.setId("modes");
        modes.setEditable(true);
        modes.setPrefWidth(96);
        Spinner<Integer> cells = new Spinner<>(SolveSettings.MIN_CELLS, SolveSettings.MAX_CELLS, model.choices().cells(), 20);
        cells.setId("cells");
        cells.setEditable(true);
        cells.setPrefWidth(96);
        CheckBox estimate = new CheckBox("estimate errors (second grid)");
        estimate.setSelected(model.choices().estimateError());
        Runnable apply = () -> model.setSolveSettings(modes.getValue(), cells.getValue(), estimate.isSelected());
        modes.valueProperty().addListener((o, a, b) -> apply.run());
        cells.valueProperty().addListener((o, a, b) -> {
            apply.run();
            canvas.redraw();
        });
        estimate.selectedProperty().addListener((o, a, b) -> apply.run());
        ComboBox<String> metal = new ComboBox<>();
        metal.getItems().add(METAL_OF_FILE);
        Conductor.builtIn().forEach(c -> metal.getItems().add(c.name()));
        metal.setValue(METAL_OF_FILE);
        metal.setMaxWidth(190);
        metal.setOnAction(e -> model.setConductor(METAL_OF_FILE.equals(metal.getValue()) ? null
                : Conductor.named(metal.getValue())));
        GridPane settings = new GridPane();
        settings.setHgap(6);
        settings.setVgap(4);
        settings.addRow(0, new Label("modes"), modes);
        settings.addRow(1, new Label("cells across"), cells);
        settings.add(estimate, 0, 2, 2, 1);
        settings.addRow(3, new Label("wall metal"), metal);
        solve.setId("solve");
        solve.setDefaultButton(true);
        solve.setOnAction(e -> model.solve());
        cancel.setId("cancel");
        cancel.setOnAction(e -> model.cancel());
        progress.setId("progress");
        progress.setMaxWidth(Double.MAX_VALUE);
        stage.getStyleClass().add("stage-text");
        stage.setWrapText(true);
        Label sectionHead = new Label("Cross-section");
        sectionHead.getStyleClass().add("panel-head");
        VBox panel = new VBox(8, sectionHead, sectionTitle, form, new Separator(), solveHead, settings,
                new HBox(8, solve, cancel), progress, stage);
        panel.setPadding(new Insets(10));
        panel.getStyleClass().add("side-panel");
        ScrollPane scroll = new ScrollPane(panel);
        scroll.setFitToWidth(true);
        scroll.setMinWidth(250);
        return scroll;
    }

    private Region views() {
        ComboBox<FieldView> view = new ComboBox<>();
        view.setId("view");
        view.getItems().addAll(FieldView.values());
        view.setValue(model.view());
        view.setOnAction(e -> model.setView(view.getValue()));
        CheckBox grid = new CheckBox("grid and cut cells");
        grid.setId("grid");
        grid.selectedProperty().addListener((o, a, b) -> model.setShowGrid(b));
        Button fit = new Button("Fit");
        fit.setOnAction(e -> canvas.refit());
        HBox tools = new HBox(10, new Label("show"), view, grid, fit, new Label("wheel: zoom · drag: pan · double click: fit"));
        tools.setAlignment(Pos.CENTER_LEFT);
        tools.getStyleClass().add("view-tools");
        BorderPane section = new BorderPane(canvas);
        section.setTop(tools);
        dispersion.setId("dispersion-chart");
        attenuation.setId("attenuation-chart");
        TabPane tabs = new TabPane(new Tab("Section and field", section), new Tab("Dispersion β(f)", dispersion),
                new Tab("Attenuation α(f)", attenuation));
        tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        return tabs;
    }

    private Region tableBox() {
        TextField frequency = new TextField(model.inputs().frequencyText());
        frequency.setId("frequency");
        frequency.setPrefColumnCount(8);
        frequency.setOnAction(e -> model.setFrequency(frequency.getText()));
        frequency.focusedProperty().addListener((o, a, focused) -> {
            if (!focused && !frequency.getText().equals(model.inputs().frequencyText())) {
                model.setFrequency(frequency.getText());
            }
        });
        TextField band = new TextField(model.inputs().bandText());
        band.setPromptText("automatic, or 8GHz:12GHz:41");
        band.setPrefColumnCount(16);
        band.setOnAction(e -> model.setBand(band.getText()));
        frequencyError.getStyleClass().add("field-error");
        bandError.getStyleClass().add("field-error");
        HBox controls = new HBox(8, new Label("figures at"), frequency, frequencyError, new Label("   chart band"), band,
                bandError);
        controls.setAlignment(Pos.CENTER_LEFT);
        summary.getStyleClass().add("summary");
        summary.setWrapText(true);
        Label caution = new Label(Caution.TEXT);
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);
        caution.setMinHeight(Region.USE_PREF_SIZE);
        summary.setMinHeight(Region.USE_PREF_SIZE);
        VBox box = new VBox(6, controls, table, summary, caution);
        VBox.setVgrow(table, Priority.ALWAYS);
        box.setPadding(new Insets(6, 8, 6, 8));
        return box;
    }

    private Region statusLine() {
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        message.setId("message");
        HBox line = new HBox(10, coordinates, gap, message);
        line.getStyleClass().add("status-line");
        return line;
    }

    private void changed(ViewerModel.Change change) {
        switch (change) {
            case SECTION -> {
                form.update();
                sectionTitle.setText(model.editor().title() + (model.editor().section() != null
                        ? "\n" + model.editor().section().name() : ""));
                canvas.update();
                if (model.outcome() != null && model.outcome().section() != model.editor().section()) {
                    message.setText("the table and charts are of the previous cross-section: solve again for this one");
                }
            }
            case SOLVE_STATE, PROGRESS -> {
                boolean running = model.state() == SolveState.RUNNING;
                cancel.setDisable(!running);
                progress.setProgress(running ? model.progress() : model.state() == SolveState.DONE ? 1 : 0);
                stage.setText(running ? model.stage() : "");
                if (change == ViewerModel.Change.SOLVE_STATE) {
                    message.setText(model.message());
                }
            }
            case RESULT -> {
                table.update();
                summary.setText(summaryText());
            }
            case FIGURES -> {
                table.update();
                frequencyError.setText(model.inputs().frequencyError());
                canvas.redraw();
            }
            case SWEEP -> {
                dispersion.show(model.sweep());
                attenuation.show(model.sweep());
                bandError.setText(model.inputs().bandError());
            }
            case SELECTION -> {
                table.update();
                canvas.update();
            }
            case VIEW -> canvas.redraw();
        }
    }

    private String summaryText() {
        if (model.outcome() == null) {
            return "";
        }
        GuideSummary g = model.outcome().summary();
        StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "dominant %s, fc %.6f GHz", g.dominantLabel(),
                g.dominant().cutoffFrequencyHz() * 1e-9));
        g.firstHigher().ifPresent(next -> s.append(String.format(Locale.ROOT, "   ·   first higher %s, fc %.6f GHz",
                g.nextLabel(), next.cutoffFrequencyHz() * 1e-9)));
        if (Double.isFinite(g.singleModeLowHz()) && Double.isFinite(g.singleModeHighHz())) {
            s.append(String.format(Locale.ROOT, "   ·   single-mode band %.4f … %.4f GHz (shaded in the charts)",
                    g.singleModeLowHz() * 1e-9, g.singleModeHighHz() * 1e-9));
        }
        return s.toString();
    }

    private void chooseFile() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Open a geometry file");
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Sectio geometry (*.json)", "*.json"));
        memory.recent().stream().map(Path::getParent).filter(p -> p != null && Files.isDirectory(p)).findFirst()
                .ifPresent(dir -> chooser.setInitialDirectory(dir.toFile()));
        java.io.File chosen = chooser.showOpenDialog(window);
        if (chosen != null) {
            open(chosen.toPath());
        }
    }

    private void rebuildRecent() {
        recent.getItems().clear();
        for (Path p : memory.recent()) {
            MenuItem item = new MenuItem(p.getFileName() + "   " + p.getParent());
            item.setOnAction(e -> open(p));
            recent.getItems().add(item);
        }
        recent.setDisable(recent.getItems().isEmpty());
    }

    private void savePng() {
        Path file = saveTarget("Save the section view", "PNG picture (*.png)", "*.png", "sectio-view.png");
        if (file != null) {
            try {
                FxImages.writePng(canvas.snapshot(), file);
                message.setText("view written to " + file);
            } catch (IOException e) {
                message.setText("cannot write " + file + ": " + e.getMessage());
            }
        }
    }

    private void saveCsv() {
        if (model.rows().isEmpty()) {
            message.setText("nothing to save yet: solve first");
            return;
        }
        Path file = saveTarget("Save the mode table", "CSV table (*.csv)", "*.csv", "sectio-modes.csv");
        if (file != null) {
            try {
                TableCsv.write(model.rows(), file);
                message.setText("table written to " + file);
            } catch (IOException e) {
                message.setText("cannot write " + file + ": " + e.getMessage());
            }
        }
    }

    private Path saveTarget(String title, String what, String pattern, String name) {
        FileChooser chooser = new FileChooser();
        chooser.setTitle(title);
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter(what, pattern));
        chooser.setInitialFileName(name);
        java.io.File chosen = chooser.showSaveDialog(window);
        return chosen == null ? null : chosen.toPath();
    }

    private void remember() {
        double[] d = sides.getDividerPositions();
        double[] t = viewsAndTable.getDividerPositions();
        memory.layout(window.getX(), window.getY(), window.getWidth(), window.getHeight(), window.isMaximized(),
                d.length > 0 ? d[0] : Double.NaN, t.length > 0 ? t[0] : Double.NaN);
        if (memoryFile != null) {
            try {
                memory.save(memoryFile);
            } catch (IOException e) {
                System.err.println("sectio view: cannot keep the window layout in " + memoryFile + ": " + e.getMessage());
            }
        }
    }

    private static <T> javafx.util.StringConverter<T> converter(java.util.function.Function<T, String> name) {
        return new javafx.util.StringConverter<>() {
            @Override
            public String toString(T value) {
                return value == null ? "" : name.apply(value);
            }

            @Override
            public T fromString(String text) {
                return null;
            }
        };
    }
}
