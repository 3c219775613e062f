package org.sectio.viewer.ui;

import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import org.sectio.physics.ModeAtFrequency;
import org.sectio.viewer.model.ModeRow;
import org.sectio.viewer.model.ViewerModel;

/**
 * The modes of the last solve, lowest cutoff first, with their figures at the chosen frequency.
 * Choosing a row draws that mode.
 */
final class ModeTable extends TableView<ModeRow> {

    private final ViewerModel model;
    private boolean updating;

    ModeTable(ViewerModel model) {
        this.model = model;
        setId("mode-table");
        setPlaceholder(new javafx.scene.control.Label("Solve to list the modes of this cross-section."));
        column("#", 36, r -> Integer.toString(r.number()));
        column("mode", 110, ModeRow::label);
        column("symmetry", 82, r -> r.identity().parityText());
        column("cutoff (GHz)", 100, r -> fixed(r.mode().cutoffFrequencyHz() * 1e-9, 6));
        column("est. error", 76, r -> sci(r.mode().relativeErrorEstimate()));
        column("state", 80, r -> r.figures().propagating() ? "propagates" : "cut off");
        column("β (rad/m)", 84, r -> r.figures().propagating() ? fixed(r.figures().phaseConstant(), 3) : "–");
        column("α (Np/m)", 80, r -> r.figures().propagating() ? "–" : fixed(r.figures().evanescentAttenuation(), 3));
        column("λg (mm)", 76, r -> fixed(r.figures().guideWavelength() * 1e3, 3));
        column("Zw (Ω)", 72, r -> fixed(r.figures().waveImpedanceOhms(), 2));
        column("Z (Ω)", 84, r -> impedance(r.figures()));
        column("α_c (dB/m)", 84, r -> fixed(r.figures().conductorAttenuationDbPerMetre(), 5));
        column("E_pk 1 W (kV/m)", 110, r -> fixed(r.figures().peakFieldPerRootWatt() * 1e-3, 4));
        column("P_rated (kW)", 96, r -> fixed(r.figures().ratedPowerWatts() * 1e-3, 1));
        getSelectionModel().selectedIndexProperty().addListener((o, a, b) -> {
            if (!updating) {
                model.select(b.intValue());
            }
        });
    }

    private void column(String title, double width, Function<ModeRow, String> text) {
        TableColumn<ModeRow, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setSortable(false);
        c.setCellValueFactory(cell -> new ReadOnlyStringWrapper(text.apply(cell.getValue())));
        getColumns().add(c);
    }

    /** Shows the model's rows and selection. */
    void update() {
        updating = true;
        try {
            setItems(FXCollections.observableArrayList(model.rows()));
            if (model.selectedRow() >= 0 && model.selectedRow() < model.rows().size()) {
                getSelectionModel().select(model.selectedRow());
            }
        } finally {
            updating = false;
        }
    }

    private static String impedance(ModeAtFrequency f) {
        if (!Double.isFinite(f.chosenImpedance())) {
            return "–";
        }
        String by = switch (f.chosenDefinition()) {
            case POWER_VOLTAGE -> "pv";
            case POWER_CURRENT -> "pi";
            case VOLTAGE_CURRENT -> "vi";
        };
        return fixed(f.chosenImpedance(), 2) + " " + by;
    }

    private static String fixed(double v, int digits) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + digits + "f", v) : "–";
    }

    private static String sci(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.1e", v) : "–";
    }
}
