package org.sectio.physics;

/**
 * Which characteristic impedance of a waveguide mode is reported as "the" impedance. A hollow guide has
 * no unique voltage and current, so the three common definitions differ (for WR-90 TE10 by a factor
 * π²/8 ≈ 1.23 between power–voltage and power–current); they agree for TEM (N. Marcuvitz, Waveguide
 * Handbook, §2.2, and Pozar, Microwave Engineering, 4th ed., §3.3 and §4.1, from memory).
 */
public enum ImpedanceDefinition {
    /** Z_PV = |V|² / (2P): power and the voltage across the path; the usual choice for matching rectangular and ridged guides to TEM lines (common practice). */
    POWER_VOLTAGE,
    /** Z_PI = 2P / |I|²: power and the longitudinal wall current. */
    POWER_CURRENT,
    /** Z_VI = V / I. */
    VOLTAGE_CURRENT
}
