package org.sectio.viewer.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.WritableImage;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.GridPlanner;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.Mode;
import org.sectio.viewer.model.FieldView;
import org.sectio.viewer.model.ModeRow;
import org.sectio.viewer.model.ViewerModel;
import org.sectio.viewer.render.ColourBar;
import org.sectio.viewer.render.FieldPicture;
import org.sectio.viewer.render.ViewTransform;

/**
 * The section view: the outline with the metal around it, the chosen mode's field in the chosen view,
 * the grid with its cut cells on request, and the colour bar. Wheel zooms about the cursor, dragging
 * pans, a double click fits the section again; the coordinates under the cursor go to the status line.
 */
public final class SectionCanvas extends Region {

    /** Width kept free on the right for the colour bar, px. */
    static final double BAR_STRIP = 120;
    private static final Color INK = Color.web("#23272b");
    private static final Color WALL = Color.web("#3d4349");
    private static final Color GRID = Color.rgb(40, 70, 90, 0.35);
    private static final Color CUT = Color.rgb(214, 150, 54, 0.45);
    private static final Color ARROW = Color.web("#14202b");

    private final ViewerModel model;
    private final Canvas canvas = new Canvas();
    private final ViewTransform transform = new ViewTransform();
    private final Consumer<String> status;
    private FieldPicture picture;
    private CrossSection fittedTo;
    private TensorGrid grid;
    private List<double[]> cutCells = List.of();
    private String gridKey = "";
    private double dragX;
    private double dragY;

    /**
     * @param model the viewer state
     * @param status told the coordinates (and value) under the cursor
     */
    public SectionCanvas(ViewerModel model, Consumer<String> status) {
        this.model = model;
        this.status = status;
        getChildren().add(canvas);
        getStyleClass().add("section-canvas");
        setMinSize(200, 150);
        widthProperty().addListener((o, a, b) -> refit());
        heightProperty().addListener((o, a, b) -> refit());
        canvas.setOnScroll(e -> {
            transform.zoomAbout(e.getX(), e.getY(), Math.exp(e.getDeltaY() / 300));
            redraw();
        });
        canvas.setOnMousePressed(e -> {
            dragX = e.getX();
            dragY = e.getY();
        });
        canvas.setOnMouseDragged(e -> {
            transform.panBy(e.getX() - dragX, e.getY() - dragY);
            dragX = e.getX();
            dragY = e.getY();
            redraw();
        });
        canvas.setOnMouseClicked(e -> {
            if (e.getClickCount() == 2) {
                refit();
            }
        });
        canvas.setOnMouseMoved(e -> status.accept(describe(e.getX(), e.getY())));
    }

    @Override
    protected void layoutChildren() {
        canvas.setWidth(getWidth());
        canvas.setHeight(getHeight());
    }

    /** Fits the section into the view and redraws. */
    public void refit() {
        CrossSection s = model.editor().section();
        if (s != null && getWidth() > BAR_STRIP + 40 && getHeight() > 40) {
            transform.fit(s.bounds(), getWidth() - BAR_STRIP, getHeight() - 30, 28);
            transform.panBy(0, 30);
            fittedTo = s;
        }
        redraw();
    }

    /** Rebuilds the picture from the model (new section, result, selection) and redraws. */
    public void update() {
        CrossSection s = model.editor().section();
        Mode mode = model.selectedMode();
        boolean sameSection = model.outcome() != null && model.outcome().section() == s;
        picture = s == null ? null : new FieldPicture(s, sameSection ? mode : null);
        if (s != null && (fittedTo == null || !fittedTo.bounds().equals(s.bounds()))) {
            refit();
            return;
        }
        redraw();
    }

    /** @return the view as a picture, as exported */
    public WritableImage snapshot() {
        return canvas.snapshot(null, null);
    }

    /** @return the picture on screen, or null before a valid section */
    public FieldPicture picture() {
        return picture;
    }

    /** @return the view's map between the plane and the pixels */
    public ViewTransform transform() {
        return transform;
    }

    /** Draws everything again. */
    public void redraw() {
        int w = (int) Math.max(1, Math.round(canvas.getWidth()));
        int h = (int) Math.max(1, Math.round(canvas.getHeight()));
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.setFill(Color.web("#edebe6"));
        g.fillRect(0, 0, w, h);
        if (picture == null) {
            g.setFill(INK);
            g.setFont(Font.font(14));
            g.fillText("No valid cross-section: fix the marked values in the form.", 20, 30);
            return;
        }
        FieldView view = model.view();
        WritableImage image = new WritableImage(w, h);
        FxImages.put(image.getPixelWriter(), picture.raster(view, transform, w, h), w, h);
        g.drawImage(image, 0, 0);
        CrossSection s = picture.section();
        if (model.showGrid()) {
            drawGrid(g, s);
        }
        drawWalls(g, s);
        Mode mode = model.selectedMode();
        boolean drawsMode = model.outcome() != null && model.outcome().section() == s && mode != null;
        if (drawsMode) {
            if (view.arrows()) {
                drawArrows(g, view.electric(), w, h);
            } else if (view.lines()) {
                drawLines(g, view.electric());
            }
            drawColourBar(g, w, h, view);
        }
        drawTitle(g, s, drawsMode ? mode : null);
    }

    private void drawWalls(GraphicsContext g, CrossSection s) {
        g.setStroke(WALL);
        g.setLineWidth(2.2);
        Bounds b = s.bounds();
        for (double[] line : s.wallPolylines(Math.max(b.width(), b.height()) / 600)) {
            g.beginPath();
            for (int k = 0; k < line.length; k += 2) {
                double px = transform.screenX(line[k]);
                double py = transform.screenY(line[k + 1]);
                if (k == 0) {
                    g.moveTo(px, py);
                } else {
                    g.lineTo(px, py);
                }
            }
            g.stroke();
        }
    }

    private void drawGrid(GraphicsContext g, CrossSection s) {
        String key = System.identityHashCode(s) + "/" + model.choices().cells();
        if (!key.equals(gridKey)) {
            grid = GridPlanner.plan(s, model.choices().cells());
            CutCells cells = CutCells.of(s, grid);
            List<double[]> cut = new ArrayList<>();
            for (int j = 0; j < grid.cellsY(); j++) {
                for (int i = 0; i < grid.cellsX(); i++) {
                    double full = (grid.x(i + 1) - grid.x(i)) * (grid.y(j + 1) - grid.y(j));
                    double open = cells.cellArea(i, j);
                    if (open > 1e-12 * full && open < (1 - 1e-9) * full) {
                        cut.add(new double[] {grid.x(i), grid.y(j), grid.x(i + 1), grid.y(j + 1)});
                    }
                }
            }
            cutCells = cut;
            gridKey = key;
        }
        g.setFill(CUT);
        for (double[] c : cutCells) {
            double x0 = transform.screenX(c[0]);
            double y1 = transform.screenY(c[3]);
            g.fillRect(x0, y1, transform.screenX(c[2]) - x0, transform.screenY(c[1]) - y1);
        }
        double left0 = transform.screenX(grid.x(0));
        double cellPx = (transform.screenX(grid.x(grid.cellsX())) - left0) / grid.cellsX();
        // lines closer than a few pixels would hide the picture: fade them until zoomed in
        g.setStroke(GRID.deriveColor(0, 1, 1, Math.max(0.08, Math.min(1, (cellPx - 1.5) / 6))));
        g.setLineWidth(0.6);
        double top = transform.screenY(grid.y(grid.cellsY()));
        double bottom = transform.screenY(grid.y(0));
        double left = transform.screenX(grid.x(0));
        double right = transform.screenX(grid.x(grid.cellsX()));
        for (double x : grid.xLines()) {
            g.strokeLine(transform.screenX(x), top, transform.screenX(x), bottom);
        }
        for (double y : grid.yLines()) {
            g.strokeLine(left, transform.screenY(y), right, transform.screenY(y));
        }
    }

    private void drawArrows(GraphicsContext g, boolean electric, int w, int h) {
        double spacing = 26;
        g.setStroke(ARROW);
        g.setFill(ARROW);
        g.setLineWidth(1.3);
        for (double[] a : picture.arrows(electric, transform, (int) (w - BAR_STRIP), h, spacing)) {
            double x1 = a[0] + a[2];
            double y1 = a[1] + a[3];
            g.strokeLine(a[0], a[1], x1, y1);
            double len = Math.hypot(a[2], a[3]);
            double ux = a[2] / len;
            double uy = a[3] / len;
            double head = Math.min(7, 0.45 * len);
            g.fillPolygon(new double[] {x1, x1 - head * ux + 0.5 * head * uy, x1 - head * ux - 0.5 * head * uy},
                    new double[] {y1, y1 - head * uy - 0.5 * head * ux, y1 - head * uy + 0.5 * head * ux}, 3);
        }
    }

    private void drawLines(GraphicsContext g, boolean electric) {
        g.setStroke(ARROW);
        g.setLineWidth(1.4);
        for (double[] line : picture.fieldLines(electric)) {
            g.beginPath();
            for (int k = 0; k < line.length; k += 2) {
                double px = transform.screenX(line[k]);
                double py = transform.screenY(line[k + 1]);
                if (k == 0) {
                    g.moveTo(px, py);
                } else {
                    g.lineTo(px, py);
                }
            }
            g.stroke();
        }
    }

    private void drawColourBar(GraphicsContext g, int w, int h, FieldView view) {
        ModeRow row = model.selectedRow() >= 0 && model.selectedRow() < model.rows().size()
                ? model.rows().get(model.selectedRow()) : null;
        double peak = row == null ? Double.NaN : row.figures().peakFieldPerRootWatt();
        ColourBar bar = picture.colourBar(view, peak);
        int top = 56;
        int rows = Math.max(2, h - top - 40);
        double x = w - BAR_STRIP + 28;
        WritableImage strip = new WritableImage(16, rows);
        for (int r = 0; r < rows; r++) {
            int rgb = 0xFF000000 | bar.rgbAtRow(r, rows);
            for (int c = 0; c < 16; c++) {
                strip.getPixelWriter().setArgb(c, r, rgb);
            }
        }
        g.drawImage(strip, x, top);
        g.setStroke(INK);
        g.setLineWidth(1);
        g.strokeRect(x, top, 16, rows);
        g.setFill(INK);
        g.setFont(Font.font(11));
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.CENTER);
        for (int k = 0; k <= 4; k++) {
            int r = (int) Math.round(k * (rows - 1) / 4.0);
            double y = top + r;
            g.strokeLine(x + 16, y, x + 21, y);
            g.fillText(String.format(Locale.ROOT, "%.3g", bar.valueAtRow(r, rows)), x + 24, y);
        }
        g.setTextBaseline(VPos.BASELINE);
        g.setFont(Font.font(null, FontWeight.BOLD, 11));
        g.fillText(bar.caption(), w - BAR_STRIP + 4, top - 10);
    }

    private void drawTitle(GraphicsContext g, CrossSection s, Mode mode) {
        g.setFill(INK);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.BASELINE);
        g.setFont(Font.font(null, FontWeight.BOLD, 14));
        String text = s.name();
        if (mode != null) {
            ModeRow row = model.rows().size() > model.selectedRow() && model.selectedRow() >= 0
                    ? model.rows().get(model.selectedRow()) : null;
            String label = row != null ? row.label() : mode.label();
            text += String.format(Locale.ROOT, "   ·   %s   ·   fc %.6f GHz   ·   %s", label,
                    mode.cutoffFrequencyHz() * 1e-9, model.view().caption());
        }
        g.fillText(text, 14, 24);
    }

    private String describe(double px, double py) {
        double x = transform.worldX(px);
        double y = transform.worldY(py);
        String where = String.format(Locale.ROOT, "x %.3f mm   y %.3f mm", x * 1e3, y * 1e3);
        if (picture == null) {
            return where;
        }
        CrossSection s = picture.section();
        if (!s.contains(x, y)) {
            return where + "   (metal / outside)";
        }
        double v = picture.valueAt(model.view(), x, y);
        return Double.isNaN(v) ? where : where + String.format(Locale.ROOT, "   %s %.3f",
                model.view().paintsTransverseMagnitude() ? "|E_t|/peak" : "field/peak", v);
    }
}
