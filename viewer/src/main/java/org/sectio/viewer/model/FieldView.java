package org.sectio.viewer.model;

/** What the section view paints for the chosen mode. Switching needs no new solve. */
public enum FieldView {
    /** Hz (TE), Ez (TM) or the potential (TEM) in the diverging colour scale. */
    LONGITUDINAL("longitudinal field (Hz / Ez)"),
    /** |E_t| in the sequential half of the colour scale. */
    E_MAGNITUDE("transverse |E|"),
    /** Arrows of E_t over |E_t|. */
    E_ARROWS("E arrows"),
    /** Arrows of H_t over the longitudinal field. */
    H_ARROWS("H arrows"),
    /** Lines of force of E_t over |E_t|. */
    E_LINES("E field lines"),
    /** Lines of force of H_t over the longitudinal field. */
    H_LINES("H field lines");

    private final String caption;

    FieldView(String caption) {
        this.caption = caption;
    }

    /** @return the name shown in the view chooser */
    public String caption() {
        return caption;
    }

    /** @return whether the colour under the overlay is |E_t| (else the longitudinal field) */
    public boolean paintsTransverseMagnitude() {
        return this == E_MAGNITUDE || this == E_ARROWS || this == E_LINES;
    }

    /** @return whether arrows or lines are drawn of E_t (true) or H_t (false); meaningless for the plain views */
    public boolean electric() {
        return this == E_ARROWS || this == E_LINES || this == E_MAGNITUDE;
    }

    /** @return whether arrows are drawn */
    public boolean arrows() {
        return this == E_ARROWS || this == H_ARROWS;
    }

    /** @return whether field lines are drawn */
    public boolean lines() {
        return this == E_LINES || this == H_LINES;
    }

    @Override
    public String toString() {
        return caption;
    }
}
