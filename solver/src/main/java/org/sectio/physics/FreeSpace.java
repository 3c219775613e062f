package org.sectio.physics;

/**
 * The constants of free space, SI.
 *
 * <p>c is exact by the definition of the metre; μ0 is the CODATA 2018 recommended value (no longer
 * exactly 4π × 10⁻⁷ since the 2019 redefinition of the SI); ε0 = 1 / (μ0 c²) and η0 = μ0 c follow
 * from them (Pozar, Microwave Engineering, 4th ed., §1.2 and §1.4).
 */
public final class FreeSpace {

    /** Speed of light in vacuum, m/s, exact. */
    public static final double SPEED_OF_LIGHT = 299_792_458.0;
    /** Vacuum permeability μ0, H/m (CODATA 2018). */
    public static final double PERMEABILITY = 1.25663706212e-6;
    /** Vacuum permittivity ε0 = 1 / (μ0 c²), F/m (≈ 8.8541878128e-12). */
    public static final double PERMITTIVITY = 1.0 / (PERMEABILITY * SPEED_OF_LIGHT * SPEED_OF_LIGHT);
    /** Wave impedance of free space η0 = μ0 c = √(μ0/ε0), Ω (≈ 376.730313668). */
    public static final double IMPEDANCE = PERMEABILITY * SPEED_OF_LIGHT;

    private FreeSpace() {
    }
}
