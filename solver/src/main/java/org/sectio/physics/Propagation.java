package org.sectio.physics;

import org.apache.commons.math3.complex.Complex;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;

/**
 * How one mode of a homogeneously filled guide travels at one frequency.
 *
 * <p>With k = ω √(με) the wavenumber of the filling and kc = 2π fc √(με) the cutoff wavenumber
 * (fc the cutoff frequency of the filled guide, as {@link Mode#cutoffFrequencyHz()} reports it), the
 * fields vary along the guide as e^(−jβz) with β = √(k² − kc²) above cutoff, and as e^(−αz) with
 * α = √(kc² − k²) below it (Pozar, Microwave Engineering, 4th ed., §3.1). Above cutoff the guide
 * wavelength is λg = 2π/β, the phase velocity vp = ω/β and the group velocity vg = dω/dβ = v²β/ω,
 * so that vp vg = v² (Pozar §3.1, and §3.10 on wave velocities and dispersion, section number from memory). The wave impedance is
 * Z_TE = ωμ/β, Z_TM = β/(ωε) and Z_TEM = η = √(μ/ε) (Pozar §3.1).
 *
 * <p>At and below cutoff ({@link #propagating()} false) β is reported as 0 and λg, vp, vg take their
 * β → 0 limits (+∞, +∞, 0). The wave impedance is then purely reactive: with β = −jα,
 * Z_TE = jωμ/α (inductive, +j) and Z_TM = −jα/(ωε) (capacitive, −j) — an evanescent TE mode stores
 * mostly magnetic energy, a TM mode electric (Pozar §3.1, and §4.6 on discontinuities and modal analysis, section number from memory).
 * Exactly at cutoff Z_TE is j∞ and Z_TM is 0. TEM modes (fc = 0) always propagate.
 *
 * @param family TE, TM or TEM
 * @param cutoffHz fc of the mode in this filling, Hz: 0 for TEM, finite and &gt; 0 for TE and TM
 * @param frequencyHz f, finite and &gt; 0, Hz
 * @param filling the homogeneous medium in the guide
 */
public record Propagation(ModeFamily family, double cutoffHz, double frequencyHz, Filling filling) {

    /**
     * Validates the components.
     *
     * @param family as in the record description
     * @param cutoffHz as in the record description
     * @param frequencyHz as in the record description
     * @param filling as in the record description
     * @throws IllegalArgumentException if a value is out of range; the message names it
     */
    public Propagation {
        if (family == null || filling == null) {
            throw new IllegalArgumentException("propagation needs a mode family and a filling, got family "
                    + family + ", filling " + filling);
        }
        boolean tem = family == ModeFamily.TEM;
        if (tem ? cutoffHz != 0 : !(cutoffHz > 0) || Double.isInfinite(cutoffHz)) {
            throw new IllegalArgumentException(family + " cutoff must be " + (tem ? "0" : "finite and > 0")
                    + " Hz, got " + cutoffHz);
        }
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
            throw new IllegalArgumentException("frequency must be finite and > 0 Hz, got " + frequencyHz);
        }
    }

    /**
     * The propagation of a computed mode.
     *
     * @param mode a mode of a guide homogeneously filled with {@code filling}
     * @param frequencyHz f &gt; 0, Hz
     * @param filling the medium the mode was computed with
     * @return its propagation at f
     * @throws IllegalArgumentException if f is out of range
     */
    public static Propagation of(Mode mode, double frequencyHz, Filling filling) {
        return new Propagation(mode.family(), mode.cutoffFrequencyHz(), frequencyHz, filling);
    }

    /** @return true when f &gt; fc (always for TEM): the mode carries power along the guide */
    public boolean propagating() {
        return frequencyHz > cutoffHz;
    }

    /** @return ω = 2π f, rad/s */
    public double angularFrequency() {
        return 2 * Math.PI * frequencyHz;
    }

    /** @return k = ω √(με), rad/m */
    public double wavenumber() {
        return filling.wavenumber(frequencyHz);
    }

    /** @return kc = 2π fc √(με), rad/m (0 for TEM) */
    public double cutoffWavenumber() {
        return filling.wavenumber(cutoffHz);
    }

    /** @return β = √(k² − kc²) above cutoff, 0 at and below it, rad/m */
    public double phaseConstant() {
        return phaseConstant(wavenumber(), cutoffWavenumber());
    }

    /** @return α = √(kc² − k²) below cutoff, 0 at and above it, Np/m */
    public double attenuationConstant() {
        return attenuationConstant(wavenumber(), cutoffWavenumber());
    }

    /** @return λg = 2π / β, m; +∞ at and below cutoff */
    public double guideWavelength() {
        return 2 * Math.PI / phaseConstant();
    }

    /** @return vp = ω / β, m/s; +∞ at and below cutoff */
    public double phaseVelocity() {
        return angularFrequency() / phaseConstant();
    }

    /** @return vg = dω/dβ = v² β / ω, m/s; 0 at and below cutoff */
    public double groupVelocity() {
        double v = filling.waveSpeed();
        return v * v * phaseConstant() / angularFrequency();
    }

    /**
     * The wave impedance E_t / H_t of the mode.
     *
     * @return Z_TE = ωμ/β, Z_TM = β/(ωε), Z_TEM = η (Ω, real) above cutoff; jωμ/α (TE) or −jα/(ωε)
     *     (TM) at and below it
     */
    public Complex waveImpedance() {
        double omega = angularFrequency();
        double mu = filling.permeability();
        double eps = filling.permittivity();
        return switch (family) {
            case TEM -> new Complex(filling.intrinsicImpedance(), 0);
            case TE -> propagating() ? new Complex(omega * mu / phaseConstant(), 0)
                    : new Complex(0, omega * mu / attenuationConstant());
            case TM -> propagating() ? new Complex(phaseConstant() / (omega * eps), 0)
                    : new Complex(0, -attenuationConstant() / (omega * eps));
        };
    }

    /**
     * β = √(k² − kc²) for k &gt; kc, else 0 (Pozar §3.1).
     *
     * @param wavenumber k ≥ 0, rad/m
     * @param cutoffWavenumber kc ≥ 0, rad/m
     * @return β, rad/m
     * @throws IllegalArgumentException if k or kc is negative or not finite
     */
    public static double phaseConstant(double wavenumber, double cutoffWavenumber) {
        check(wavenumber, cutoffWavenumber);
        return wavenumber > cutoffWavenumber
                ? Math.sqrt((wavenumber - cutoffWavenumber) * (wavenumber + cutoffWavenumber)) : 0.0;
    }

    /**
     * α = √(kc² − k²) for k &lt; kc, else 0: the decay of an evanescent mode (Pozar §3.1).
     *
     * @param wavenumber k ≥ 0, rad/m
     * @param cutoffWavenumber kc ≥ 0, rad/m
     * @return α, Np/m
     * @throws IllegalArgumentException if k or kc is negative or not finite
     */
    public static double attenuationConstant(double wavenumber, double cutoffWavenumber) {
        check(wavenumber, cutoffWavenumber);
        return cutoffWavenumber > wavenumber
                ? Math.sqrt((cutoffWavenumber - wavenumber) * (cutoffWavenumber + wavenumber)) : 0.0;
    }

    private static void check(double k, double kc) {
        if (!(k >= 0) || !(kc >= 0) || Double.isInfinite(k) || Double.isInfinite(kc)) {
            throw new IllegalArgumentException("wavenumbers must be finite and ≥ 0 rad/m, got k = " + k
                    + ", kc = " + kc);
        }
    }
}
