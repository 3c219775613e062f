/**
 * Engineering relations that turn a computed mode (its family and cutoff frequency), a frequency, a
 * homogeneous filling and a wall conductor into the quantities a microwave designer works with:
 * propagation constants, guide wavelength, velocities and wave impedance ({@link
 * org.sectio.physics.Propagation}), skin depth and surface resistance ({@link
 * org.sectio.physics.Conductor}, {@link org.sectio.physics.RoughnessFactor}), closed-form reference
 * attenuations of the classic guides, impedance-step mismatch, breakdown-limited power, the usable
 * band rule and the frequency text of the command line.
 *
 * <p>Everything is in SI units (Hz, m, S/m, Ω, Np/m, W, V/m) and converted only when printed. No
 * class here assembles a matrix. {@link org.sectio.physics.ModeAnalysis} (scalar modes of homogeneously
 * filled guides) and {@link org.sectio.physics.HybridFigures} (hybrid modes of partly filled guides)
 * are the places that look at a computed field: they rebuild the wall fields of a mode from its
 * samples and integrate power, conductor loss, peak field and impedances (the scalar path also the
 * dielectric loss), tested against the closed forms here and exact layered-guide fields. Sources are
 * named in each class; the main one is
 * D. M. Pozar, Microwave Engineering, 4th ed. (Wiley, 2012).
 */
package org.sectio.physics;
