package org.sectio.geometry;

import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * The metal of a guide's wall (one conductor loop): what the conductor loss is computed with.
 *
 * <p>The built-in metals are those of Pozar, Microwave Engineering, 4th ed., Appendix F,
 * "Conductivity of some materials" (values quoted from memory): copper 5.813e7, silver 6.173e7,
 * gold 4.098e7, aluminium 3.816e7, brass 2.564e7 S/m, all non-magnetic (μr = 1). This is the one
 * table of them in Sectio; the solver's conductor relations take their values from here. Real walls
 * (plating, alloy, temperature) are usually worse.
 *
 * @param name a label, not blank
 * @param conductivity σ, finite and &gt; 0, S/m
 * @param relativePermeability μr, finite and &gt; 0 (1 for the metals here)
 */
public record WallMetal(String name, double conductivity, double relativePermeability) {

    /** Copper, 5.813e7 S/m (Pozar Appendix F, from memory). */
    public static final WallMetal COPPER = new WallMetal("copper", 5.813e7, 1.0);
    /** Silver, 6.173e7 S/m (Pozar Appendix F, from memory). */
    public static final WallMetal SILVER = new WallMetal("silver", 6.173e7, 1.0);
    /** Gold, 4.098e7 S/m (Pozar Appendix F, from memory). */
    public static final WallMetal GOLD = new WallMetal("gold", 4.098e7, 1.0);
    /** Aluminium, 3.816e7 S/m (Pozar Appendix F, from memory). */
    public static final WallMetal ALUMINIUM = new WallMetal("aluminium", 3.816e7, 1.0);
    /** Brass, 2.564e7 S/m (Pozar Appendix F, from memory). */
    public static final WallMetal BRASS = new WallMetal("brass", 2.564e7, 1.0);

    private static final List<WallMetal> BUILT_IN = List.of(COPPER, SILVER, GOLD, ALUMINIUM, BRASS);

    /**
     * Validates the components.
     *
     * @param name as in the record description
     * @param conductivity as in the record description
     * @param relativePermeability as in the record description
     * @throws IllegalArgumentException if a value is out of range; the one-line message names it
     */
    public WallMetal {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a conductor needs a name, got \"" + name + "\"");
        }
        if (!(conductivity > 0) || Double.isInfinite(conductivity)) {
            throw new IllegalArgumentException("conductivity of " + name + " must be finite and > 0 S/m, got "
                    + conductivity);
        }
        if (!(relativePermeability > 0) || Double.isInfinite(relativePermeability)) {
            throw new IllegalArgumentException("relative permeability of " + name + " must be finite and > 0, got "
                    + relativePermeability);
        }
    }

    /**
     * A non-magnetic metal of the user's own conductivity.
     *
     * @param conductivity σ, finite and &gt; 0, S/m
     * @return a metal named "user (σ S/m)", μr = 1
     * @throws IllegalArgumentException if σ is out of range
     */
    public static WallMetal user(double conductivity) {
        return new WallMetal("user (" + conductivity + " S/m)", conductivity, 1.0);
    }

    /** @return the built-in metals, in a fixed order: copper, silver, gold, aluminium, brass */
    public static List<WallMetal> builtIn() {
        return BUILT_IN;
    }

    /**
     * A built-in metal by name, ignoring case and surrounding blanks ("aluminum" is accepted for
     * aluminium).
     *
     * @param name e.g. "Copper"
     * @return the metal (one of the constants)
     * @throws IllegalArgumentException if the name is unknown; the one-line message lists the known names
     */
    public static WallMetal named(String name) {
        String key = name == null ? "" : name.strip().toLowerCase(Locale.ROOT);
        if (key.equals("aluminum")) {
            key = "aluminium";
        }
        for (WallMetal m : BUILT_IN) {
            if (m.name.equals(key)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown conductor \"" + name + "\"; known: "
                + BUILT_IN.stream().map(WallMetal::name).collect(Collectors.joining(", ")));
    }
}
