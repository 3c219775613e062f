package org.sectio.physics;

/**
 * A homogeneous, isotropic medium filling the whole guide.
 *
 * <p>ε = ε0 εr, μ = μ0 μr, wave speed v = 1/√(με) = c/√(εr μr), intrinsic impedance
 * η = √(μ/ε) = η0 √(μr/εr), wavenumber k = ω √(με) = 2π f √(εr μr) / c (Pozar, Microwave
 * Engineering, 4th ed., §1.4). The loss tangent tan δ = ε″/ε′ enters only the dielectric attenuation
 * ({@link DielectricLoss}); the other relations use the real εr (low-loss approximation).
 *
 * @param relativePermittivity εr (real part), finite and ≥ 1
 * @param relativePermeability μr, finite and &gt; 0
 * @param lossTangent tan δ, finite, 0 ≤ tan δ &lt; 1
 */
public record Filling(double relativePermittivity, double relativePermeability, double lossTangent) {

    /** Vacuum (dry air differs by about 6e-4 in εr and is usually taken as vacuum). */
    public static final Filling VACUUM = new Filling(1.0, 1.0, 0.0);

    /**
     * Validates the components.
     *
     * @param relativePermittivity as in the record description
     * @param relativePermeability as in the record description
     * @param lossTangent as in the record description
     * @throws IllegalArgumentException if a value is out of range; the message names it
     */
    public Filling {
        if (!(relativePermittivity >= 1.0) || Double.isInfinite(relativePermittivity)) {
            throw new IllegalArgumentException("relative permittivity must be finite and ≥ 1, got "
                    + relativePermittivity);
        }
        if (!(relativePermeability > 0) || Double.isInfinite(relativePermeability)) {
            throw new IllegalArgumentException("relative permeability must be finite and > 0, got "
                    + relativePermeability);
        }
        if (!(lossTangent >= 0 && lossTangent < 1)) {
            throw new IllegalArgumentException("loss tangent must be 0 ≤ tan δ < 1, got " + lossTangent);
        }
    }

    /**
     * A lossless dielectric with μr = 1.
     *
     * @param relativePermittivity εr ≥ 1
     * @return the filling
     * @throws IllegalArgumentException if εr is out of range
     */
    public static Filling dielectric(double relativePermittivity) {
        return new Filling(relativePermittivity, 1.0, 0.0);
    }

    /** @return ε = ε0 εr, F/m */
    public double permittivity() {
        return FreeSpace.PERMITTIVITY * relativePermittivity;
    }

    /** @return μ = μ0 μr, H/m */
    public double permeability() {
        return FreeSpace.PERMEABILITY * relativePermeability;
    }

    /** @return v = c / √(εr μr), m/s */
    public double waveSpeed() {
        return FreeSpace.SPEED_OF_LIGHT / Math.sqrt(relativePermittivity * relativePermeability);
    }

    /** @return η = η0 √(μr / εr), Ω */
    public double intrinsicImpedance() {
        return FreeSpace.IMPEDANCE * Math.sqrt(relativePermeability / relativePermittivity);
    }

    /**
     * k = 2π f √(εr μr) / c, rad/m.
     *
     * @param frequencyHz f ≥ 0, Hz
     * @return the wavenumber of the medium at f
     * @throws IllegalArgumentException if f is negative or not finite
     */
    public double wavenumber(double frequencyHz) {
        if (!(frequencyHz >= 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("frequency must be finite and ≥ 0 Hz, got " + frequencyHz);
        }
        return 2 * Math.PI * frequencyHz / waveSpeed();
    }
}
