package org.sectio.physics;

import java.util.List;
import org.sectio.geometry.WallMetal;

/**
 * A wall metal: its DC conductivity and relative permeability, and the skin-effect relations.
 *
 * <p>Skin depth δs = √(2 / (ω μ0 μr σ)) and surface resistance Rs = 1/(σ δs) = √(ω μ0 μr / (2σ))
 * (Pozar, Microwave Engineering, 4th ed., §1.4 for δs in a good conductor and §1.7 for Rs, section
 * numbers from memory; valid for a good conductor, σ ≫ ωε, and walls much
 * thicker than δs). The built-in metals and their conductivities (Pozar, Appendix F, from memory) are
 * kept in one place, {@link WallMetal}, and taken from there. Real walls (plating, alloy,
 * temperature, roughness) are usually worse; see {@link RoughnessFactor}.
 *
 * @param name a label, not blank
 * @param conductivity σ, finite and &gt; 0, S/m
 * @param relativePermeability μr, finite and ≥ 1 for the metals here (&gt; 0 accepted)
 */
public record Conductor(String name, double conductivity, double relativePermeability) {

    /** Copper: {@link WallMetal#COPPER}. */
    public static final Conductor COPPER = of(WallMetal.COPPER);
    /** Silver: {@link WallMetal#SILVER}. */
    public static final Conductor SILVER = of(WallMetal.SILVER);
    /** Gold: {@link WallMetal#GOLD}. */
    public static final Conductor GOLD = of(WallMetal.GOLD);
    /** Aluminium: {@link WallMetal#ALUMINIUM}. */
    public static final Conductor ALUMINIUM = of(WallMetal.ALUMINIUM);
    /** Brass: {@link WallMetal#BRASS}. */
    public static final Conductor BRASS = of(WallMetal.BRASS);

    private static final List<Conductor> BUILT_IN = List.of(COPPER, SILVER, GOLD, ALUMINIUM, BRASS);

    /**
     * Validates the components.
     *
     * @param name as in the record description
     * @param conductivity as in the record description
     * @param relativePermeability as in the record description
     * @throws IllegalArgumentException if a value is out of range; the message names it
     */
    public Conductor {
        new WallMetal(name, conductivity, relativePermeability); // the one place the values are checked
    }

    /**
     * The conductor of a wall metal given by the geometry (same name, σ and μr).
     *
     * @param metal the metal, not null
     * @return its conductor; one of the constants when the metal is a built-in one
     * @throws IllegalArgumentException if the metal is null
     */
    public static Conductor of(WallMetal metal) {
        if (metal == null) {
            throw new IllegalArgumentException("a conductor needs a wall metal, got null");
        }
        Conductor c = new Conductor(metal.name(), metal.conductivity(), metal.relativePermeability());
        if (BUILT_IN != null) {
            for (Conductor known : BUILT_IN) {
                if (known.equals(c)) {
                    return known;
                }
            }
        }
        return c;
    }

    /**
     * A non-magnetic conductor of the user's own conductivity ({@link WallMetal#user}).
     *
     * @param conductivity σ &gt; 0, S/m
     * @return a conductor named "user (σ S/m)"
     * @throws IllegalArgumentException if σ is out of range
     */
    public static Conductor user(double conductivity) {
        return of(WallMetal.user(conductivity));
    }

    /** @return the built-in conductors, in a fixed order (those of {@link WallMetal#builtIn()}) */
    public static List<Conductor> builtIn() {
        return BUILT_IN;
    }

    /**
     * A built-in conductor by name ({@link WallMetal#named}), ignoring case and surrounding blanks
     * ("aluminum" is accepted for aluminium).
     *
     * @param name e.g. "Copper"
     * @return the conductor (one of the constants)
     * @throws IllegalArgumentException if the name is unknown; the one-line message lists the known names
     */
    public static Conductor named(String name) {
        return of(WallMetal.named(name));
    }

    /**
     * δs = √(2 / (ω μ0 μr σ)) (Pozar §1.4).
     *
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @return the skin depth, m
     * @throws IllegalArgumentException if f is out of range
     */
    public double skinDepth(double frequencyHz) {
        double omega = omega(frequencyHz);
        return Math.sqrt(2.0 / (omega * FreeSpace.PERMEABILITY * relativePermeability * conductivity));
    }

    /**
     * Rs = √(ω μ0 μr / (2σ)) of a smooth wall (Pozar §1.7).
     *
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @return the surface resistance, Ω (per square)
     * @throws IllegalArgumentException if f is out of range
     */
    public double surfaceResistance(double frequencyHz) {
        double omega = omega(frequencyHz);
        return Math.sqrt(omega * FreeSpace.PERMEABILITY * relativePermeability / (2.0 * conductivity));
    }

    /**
     * Rs · K of a rough wall, with K the Hammerstad–Bekkadal factor of {@link RoughnessFactor}.
     *
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @param rmsRoughness Δ, the rms surface roughness, finite and ≥ 0, m
     * @return the surface resistance of the rough wall, Ω
     * @throws IllegalArgumentException if a value is out of range
     */
    public double surfaceResistance(double frequencyHz, double rmsRoughness) {
        return surfaceResistance(frequencyHz) * RoughnessFactor.hammerstad(rmsRoughness, skinDepth(frequencyHz));
    }

    private static double omega(double frequencyHz) {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("frequency must be finite and > 0 Hz, got " + frequencyHz);
        }
        return 2 * Math.PI * frequencyHz;
    }
}
