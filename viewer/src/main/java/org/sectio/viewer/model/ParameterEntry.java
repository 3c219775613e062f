package org.sectio.viewer.model;

/**
 * One editable value of the form: a family parameter or a number of a geometry file.
 *
 * @param name the parameter's name as written in files, e.g. "ridge_gap"
 * @param description what it measures, for the field's tooltip
 * @param unit the unit the text is read in when it carries none, e.g. "mm", "°", "" (dimensionless)
 * @param text the text as typed
 * @param error the one-line problem with this value, or "" when it is fine
 */
public record ParameterEntry(String name, String description, String unit, String text, String error) {

    /** @return whether this value has a problem */
    public boolean hasError() {
        return !error.isEmpty();
    }

    ParameterEntry withText(String newText) {
        return new ParameterEntry(name, description, unit, newText, "");
    }

    ParameterEntry withError(String problem) {
        return new ParameterEntry(name, description, unit, text, problem);
    }
}
