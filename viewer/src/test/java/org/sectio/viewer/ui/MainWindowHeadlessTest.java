package org.sectio.viewer.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import javafx.application.Platform;
import javafx.scene.control.ComboBox;
import javafx.scene.control.TableView;
import javafx.scene.image.WritableImage;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.sectio.io.ColourScale;
import org.sectio.modes.ModeSolver;
import org.sectio.viewer.model.FieldView;
import org.sectio.viewer.model.ModeRow;
import org.sectio.viewer.model.ViewerMemory;
import org.sectio.viewer.model.ViewerModel;
import org.sectio.viewer.render.ViewTransform;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The real window on the headless JavaFX platform (Monocle, software rendering): the default
 * cross-section (WR-90), a solve on a coarse grid through the Solve button, a mode chosen in the
 * table, and the section view snapshotted and checked against the TE10 closed form (Pozar, Microwave
 * Engineering, 4th ed., §3.3, from memory: |E_t| ∝ sin(πx/a), largest on the centre line, 0 at the
 * side walls). It also writes the README's screenshot: {@code target/viewer-screenshot.png} always,
 * and the file named by the system property {@code sectio.viewer.screenshot} when given.
 */
@ExtendWith(ApplicationExtension.class)
class MainWindowHeadlessTest {

    private ExecutorService worker;
    private ViewerModel model;
    private MainWindow window;
    private Stage stage;

    @Start
    void start(Stage into) throws Exception {
        worker = Executors.newSingleThreadExecutor();
        model = new ViewerModel(ModeSolver::solve, worker, Platform::runLater);
        model.setSolveSettings(8, 60, true);
        Path none = Files.createTempDirectory("sectio-viewer-test").resolve("viewer.json");
        window = new MainWindow(model, ViewerMemory.load(none), null);
        stage = into;
        window.show(into);
        into.setWidth(1240);
        into.setHeight(780);
    }

    @AfterEach
    void stop() {
        worker.shutdownNow();
    }

    @Test
    @DisplayName("open on WR-90, solve, pick TE10, snapshot: |E_t| peaks on the centre line and is 0 at the side walls")
    void solvePickAndSnapshot(FxRobot robot) throws Exception {
        robot.clickOn("#solve");
        WaitForAsyncUtils.waitFor(120, TimeUnit.SECONDS, () -> model.state() == ViewerModel.SolveState.DONE);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(8, model.rows().size());
        assertEquals("TE10", model.rows().get(0).label());

        @SuppressWarnings("unchecked")
        TableView<ModeRow> table = robot.lookup("#mode-table").queryAs(TableView.class);
        robot.interact(() -> table.getSelectionModel().select(2));
        assertEquals(2, model.selectedRow(), "choosing a row in the table chooses the mode");
        robot.interact(() -> table.getSelectionModel().select(0));
        assertEquals(0, model.selectedRow());
        @SuppressWarnings("unchecked")
        ComboBox<FieldView> view = robot.lookup("#view").queryAs(ComboBox.class);
        robot.interact(() -> view.getSelectionModel().select(FieldView.E_MAGNITUDE));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(FieldView.E_MAGNITUDE, model.view());

        WritableImage[] shot = new WritableImage[1];
        robot.interact(() -> shot[0] = window.sectionView().snapshot());
        BufferedImage image = FxImages.toAwt(shot[0]);
        Path target = Path.of(System.getProperty("basedir", "."), "target");
        Files.createDirectories(target);
        ImageIO.write(image, "png", target.resolve("viewer-field.png").toFile());

        ViewTransform t = window.sectionView().transform();
        double a = model.outcome().section().bounds().width();
        int row = (int) t.screenY(0);
        int centre = (int) t.screenX(0);
        int left = (int) Math.ceil(t.screenX(-a / 2)) + 1;
        int right = (int) Math.floor(t.screenX(a / 2)) - 2;
        assertTrue(right - left > 200, "the guide fills the view: " + (right - left) + " px across");
        // closed form at the pixel, through the colour scale; 4 units allow the lattice interpolation and 60 cells
        for (int c = left; c <= right; c += 5) {
            double exact = Math.sin(Math.PI * (t.worldX(c + 0.5) + a / 2) / a);
            int colour = image.getRGB(c, row) & 0xFFFFFF;
            assertTrue(gap(colour, ColourScale.rgb(exact)) <= 4,
                    String.format("column %d: %06x, closed form %.3f → %06x", c, colour, exact, ColourScale.rgb(exact)));
        }
        assertTrue(gap(image.getRGB(centre, row) & 0xFFFFFF, ColourScale.rgb(1)) <= 3, "peak on the centre line");
        assertTrue(gap(image.getRGB(left, row) & 0xFFFFFF, ColourScale.rgb(0)) <= 8, "zero at the left wall");
        assertTrue(gap(image.getRGB(right, row) & 0xFFFFFF, ColourScale.rgb(0)) <= 8, "zero at the right wall");

        // the dispersion chart of the band, with the single-mode band TE10 … TE20 shaded
        javafx.scene.control.TabPane tabs = robot.lookup(".tab-pane").queryAs(javafx.scene.control.TabPane.class);
        robot.interact(() -> tabs.getSelectionModel().select(1));
        WaitForAsyncUtils.waitForFxEvents();
        javafx.scene.image.ImageView chart = robot.lookup("#dispersion-chart .image-view").queryAs(javafx.scene.image.ImageView.class);
        assertTrue(chart.getImage() != null, "the dispersion chart is drawn");
        BufferedImage curves = FxImages.toAwt(chart.getImage());
        ImageIO.write(curves, "png", target.resolve("viewer-dispersion.png").toFile());
        int shaded = 0;
        for (int y = 0; y < curves.getHeight(); y += 3) {
            for (int x = 0; x < curves.getWidth(); x += 3) {
                shaded += (curves.getRGB(x, y) & 0xFFFFFF) == org.sectio.io.SeriesPalette.SHADING ? 1 : 0;
            }
        }
        assertTrue(shaded > 100, "the single-mode band is shaded: " + shaded + " sampled pixels");
        robot.interact(() -> tabs.getSelectionModel().select(0));
        WaitForAsyncUtils.waitForFxEvents();

        // the README's picture: the whole window, a higher mode with its E arrows over |E_t|
        int tm11 = indexOf("TM11");
        robot.interact(() -> {
            table.getSelectionModel().select(tm11);
            view.getSelectionModel().select(FieldView.E_ARROWS);
        });
        WaitForAsyncUtils.waitForFxEvents();
        WritableImage[] whole = new WritableImage[1];
        robot.interact(() -> whole[0] = stage.getScene().snapshot(null));
        FxImages.writePng(whole[0], target.resolve("viewer-screenshot.png"));
        String docs = System.getProperty("sectio.viewer.screenshot", "");
        if (!docs.isBlank()) {
            FxImages.writePng(whole[0], Path.of(docs));
        }
        assertEquals(1240, (int) whole[0].getWidth());
    }

    @Test
    @DisplayName("a built-in family from the chooser: the outline redraws at once; the grid shows its cut cells")
    void familyOutlineAndGrid(FxRobot robot) throws Exception {
        @SuppressWarnings("unchecked")
        ComboBox<org.sectio.geometry.family.GuideFamily> families = robot.lookup(".combo-box").queryAllAs(ComboBox.class)
                .stream().filter(c -> "built-in family".equals(c.getPromptText())).findFirst().orElseThrow();
        robot.interact(() -> families.getSelectionModel().select(org.sectio.geometry.family.GuideFamilies.byName("circular")));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("circular", model.editor().title());
        robot.interact(() -> model.setSolveSettings(8, 40, true));
        robot.interact(() -> robot.lookup("#grid").queryAs(javafx.scene.control.CheckBox.class).setSelected(true));
        WaitForAsyncUtils.waitForFxEvents();
        WritableImage[] shot = new WritableImage[1];
        robot.interact(() -> shot[0] = window.sectionView().snapshot());
        BufferedImage image = FxImages.toAwt(shot[0]);
        Path target = Path.of(System.getProperty("basedir", "."), "target");
        Files.createDirectories(target);
        ImageIO.write(image, "png", target.resolve("viewer-grid.png").toFile());
        ViewTransform t = window.sectionView().transform();
        double r = model.editor().section().bounds().width() / 2;
        // the inside of the circle is open (no mode drawn yet), the corner of its bounding box is metal
        int inside = 0;
        double lightest = 0;
        for (int dx = 0; dx < 9; dx++) { // the lightest pixel of a patch wider than a cell: not on a grid line
            int c = image.getRGB((int) t.screenX(0.3 * r) + dx, (int) t.screenY(0.1 * r) + dx) & 0xFFFFFF;
            if (ColourScale.toOklab(c)[0] > lightest) {
                lightest = ColourScale.toOklab(c)[0];
                inside = c;
            }
        }
        int corner = image.getRGB((int) t.screenX(-0.97 * r), (int) t.screenY(0.97 * r)) & 0xFFFFFF;
        assertTrue(gap(corner, org.sectio.viewer.render.FieldPicture.METAL & 0xFFFFFF) <= 40,
                String.format("corner %06x", corner));
        assertTrue(ColourScale.toOklab(inside)[0] > 0.85, String.format("inside %06x is light (open, thin grid lines)",
                inside));
        // cut cells are tinted amber: points 2 px inside the wall (most lie in a cut cell, 7.5 px wide here)
        int amber = 0;
        for (int k = 0; k < 64; k++) {
            double phi = 2 * Math.PI * k / 64;
            int c = image.getRGB((int) t.screenX(0.985 * r * Math.cos(phi)), (int) t.screenY(0.985 * r * Math.sin(phi)));
            int red = (c >> 16) & 0xFF;
            int blue = c & 0xFF;
            amber += red - blue > 25 ? 1 : 0;
        }
        assertTrue(amber > 20, "cut cells along the wall: " + amber + " of 64 points tinted");
    }

    private int indexOf(String label) {
        for (ModeRow r : model.rows()) {
            if (r.label().equals(label)) {
                return r.number() - 1;
            }
        }
        throw new AssertionError("no " + label + " among " + model.rows().stream().map(ModeRow::label).toList());
    }

    private static int gap(int a, int b) {
        int gap = 0;
        for (int shift = 0; shift <= 16; shift += 8) {
            gap = Math.max(gap, Math.abs(((a >> shift) & 0xFF) - ((b >> shift) & 0xFF)));
        }
        return gap;
    }
}
