package org.sectio.modes;

/** The two field families of a hollow metal guide with homogeneous filling. */
public enum ModeFamily {
    /** Transverse electric: Hz is the potential, −∇²Hz = kc² Hz, ∂Hz/∂n = 0 on metal. */
    TE,
    /** Transverse magnetic: Ez is the potential, −∇²Ez = kc² Ez, Ez = 0 on metal. */
    TM
}
