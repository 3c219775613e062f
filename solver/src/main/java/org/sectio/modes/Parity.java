package org.sectio.modes;

/**
 * How a mode's longitudinal potential ψ behaves under a mirror of the cross-section.
 */
public enum Parity {
    /** ψ(mirror of p) = ψ(p): the mirror line is a magnetic wall for TE (∂Hz/∂n = 0) and TM alike. */
    EVEN,
    /** ψ(mirror of p) = −ψ(p): ψ vanishes on the mirror line. */
    ODD,
    /**
     * The guide has the mirror but the field is neither even nor odd: typically one member of a
     * degenerate pair solved in an arbitrary orientation (the two members mix freely).
     */
    MIXED,
    /** The guide (walls or dielectrics) has no such mirror, so parity does not apply. */
    NONE;

    /** @return the lower-case word used in labels: "even", "odd", "mixed", "none" */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
