package org.sectio.modes;

/** The field families of a metal guide at cutoff. */
public enum ModeFamily {
    /** Transverse electric: Hz is the potential, −∇·(εr⁻¹∇Hz) = k0² Hz, ∂Hz/∂n = 0 on metal. */
    TE,
    /** Transverse magnetic: Ez is the potential, −∇²Ez = k0² εr Ez, Ez = 0 on metal. */
    TM,
    /**
     * Transverse electromagnetic, cutoff 0: N − 1 modes in a guide with N conductors, from the
     * electrostatic potential −∇·(εr∇φ) = 0 with φ fixed on each conductor.
     */
    TEM
}
