package org.sectio.viewer.ui;

import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.sectio.viewer.model.ParameterEntry;
import org.sectio.viewer.model.SectionEditor;
import org.sectio.viewer.model.ViewerModel;

/**
 * The named values of the section being edited, one field each with its unit. Every keystroke goes
 * to the model, which rebuilds the outline at once; a value with a problem is marked and its message
 * shown right under it.
 */
final class ParameterForm extends VBox {

    private final ViewerModel model;
    private final GridPane grid = new GridPane();
    private final Label general = new Label();
    private SectionEditor shown;

    ParameterForm(ViewerModel model) {
        this.model = model;
        getStyleClass().add("parameter-form");
        grid.setHgap(6);
        grid.setVgap(2);
        general.getStyleClass().add("field-error");
        general.setWrapText(true);
        getChildren().addAll(grid, general);
        setSpacing(6);
        setPadding(new Insets(4, 0, 4, 0));
    }

    /** Rebuilds the fields for a new editor, or only the marks when the editor is the same. */
    void update() {
        SectionEditor editor = model.editor();
        if (editor != shown) {
            shown = editor;
            grid.getChildren().clear();
            int row = 0;
            for (ParameterEntry e : editor.entries()) {
                Label name = new Label(e.name().replace('_', ' '));
                name.getStyleClass().add("field-name");
                TextField field = new TextField(e.text());
                field.setId("parameter-" + e.name());
                field.setPrefColumnCount(9);
                field.setTooltip(new Tooltip(e.description()));
                field.textProperty().addListener((o, before, after) -> model.editParameter(e.name(), after));
                Label unit = new Label(e.unit());
                unit.getStyleClass().add("field-unit");
                Label error = new Label();
                error.setId("error-" + e.name());
                error.getStyleClass().add("field-error");
                error.setWrapText(true);
                error.setMaxWidth(260);
                grid.add(name, 0, row);
                grid.add(field, 1, row);
                grid.add(unit, 2, row);
                grid.add(error, 0, row + 1, 3, 1);
                row += 2;
            }
        }
        for (ParameterEntry e : editor.entries()) {
            TextField field = (TextField) lookup("#parameter-" + e.name());
            Label error = (Label) lookup("#error-" + e.name());
            if (field != null) {
                field.getStyleClass().remove("invalid");
                if (e.hasError()) {
                    field.getStyleClass().add("invalid");
                }
            }
            if (error != null) {
                error.setText(e.error());
                error.setManaged(e.hasError());
                error.setVisible(e.hasError());
            }
        }
        general.setText(editor.generalError());
        general.setManaged(!editor.generalError().isEmpty());
        general.setVisible(!editor.generalError().isEmpty());
    }
}
