package org.sectio.viewer.ui;

import java.util.function.Function;
import javafx.scene.control.Label;
import javafx.scene.image.ImageView;
import javafx.scene.layout.StackPane;
import org.sectio.io.BandSweep;
import org.sectio.io.ChartGeometry;
import org.sectio.io.ChartRenderer;
import org.sectio.io.LineChart;

/**
 * One sweep chart (dispersion or attenuation) as the command line draws it ({@link ChartRenderer},
 * axes with units, the single-mode band shaded), redrawn to the pane's size.
 */
final class ChartView extends StackPane {

    private final ImageView image = new ImageView();
    private final Label empty = new Label("Solve to draw this chart; the band is set below the table.");
    private final Function<BandSweep, LineChart> chart;
    private BandSweep sweep;

    ChartView(Function<BandSweep, LineChart> chart) {
        this.chart = chart;
        getStyleClass().add("chart-view");
        getChildren().addAll(image, empty);
        setMinSize(100, 100);
        widthProperty().addListener((o, a, b) -> redraw());
        heightProperty().addListener((o, a, b) -> redraw());
    }

    void show(BandSweep next) {
        sweep = next;
        redraw();
    }

    private void redraw() {
        empty.setVisible(sweep == null);
        if (sweep == null || getWidth() < 10 || getHeight() < 10) {
            image.setImage(null);
            return;
        }
        int w = (int) Math.max(ChartGeometry.MIN_WIDTH, Math.min(ChartGeometry.MAX_WIDTH, getWidth() - 8));
        int h = (int) Math.max(ChartGeometry.MIN_HEIGHT, Math.min(ChartGeometry.MAX_HEIGHT, getHeight() - 8));
        try {
            image.setImage(FxImages.toFx(ChartRenderer.render(chart.apply(sweep), w, h)));
        } catch (IllegalArgumentException nothingToDraw) {
            image.setImage(null);
            empty.setText(nothingToDraw.getMessage());
            empty.setVisible(true);
        }
    }
}
