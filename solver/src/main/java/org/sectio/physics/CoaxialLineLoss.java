package org.sectio.physics;

/**
 * Closed-form conductor attenuation of the TEM mode of a coaxial line, inner radius a, outer
 * radius b, both conductors of surface resistance Rs, homogeneously filled:
 * α_c = Rs (1/a + 1/b) / (2 η ln(b/a)) Np/m (Pozar, Microwave Engineering, 4th ed., §2.7, the
 * coaxial-line example of the perturbation method), the same as R / (2 Z0) with the series
 * resistance R = Rs (1/a + 1/b) / (2π) and Z0 = η ln(b/a) / (2π) (Pozar §2.1–2.2).
 */
public final class CoaxialLineLoss {

    private CoaxialLineLoss() {
    }

    /**
     * α_c = Rs (1/a + 1/b) / (2 η ln(b/a)).
     *
     * @param innerRadius a, finite and &gt; 0, m
     * @param outerRadius b &gt; a, finite, m
     * @param filling the medium between the conductors (its η)
     * @param surfaceResistance Rs ≥ 0, Ω
     * @return α_c, Np/m
     * @throws IllegalArgumentException if a value is out of range
     */
    public static double tem(double innerRadius, double outerRadius, Filling filling, double surfaceResistance) {
        if (!(innerRadius > 0) || !(outerRadius > innerRadius) || Double.isInfinite(outerRadius)) {
            throw new IllegalArgumentException("coaxial radii must satisfy 0 < a < b < ∞, got a = " + innerRadius
                    + " m, b = " + outerRadius + " m");
        }
        if (!(surfaceResistance >= 0) || Double.isInfinite(surfaceResistance)) {
            throw new IllegalArgumentException("surface resistance must be finite and ≥ 0 Ω, got " + surfaceResistance);
        }
        return surfaceResistance * (1 / innerRadius + 1 / outerRadius)
                / (2 * filling.intrinsicImpedance() * Math.log(outerRadius / innerRadius));
    }
}
