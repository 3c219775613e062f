package org.sectio.physics;

import org.sectio.geometry.CrossSection;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.PotentialSamples.Constraint;

/**
 * The frequency-independent integrals of a computed mode's potential ψ (Hz, Ez or the TEM potential φ,
 * peak-normalized), from which {@link ModeAnalysis} scales power, wall loss and peak field to any
 * frequency.
 *
 * <p>Power uses Green's first identity: for −∇²ψ = kc² ψ with ∂ψ/∂n = 0 (TE) or ψ = 0 (TM) on the
 * wall, ∫ |∇ψ|² dA = kc² ∫ ψ² dA − ∮ ψ ∂ψ/∂n dℓ = kc² ∫ ψ² dA, the wall term vanishing in both cases
 * (e.g. Pozar, Microwave Engineering, 4th ed., §3.1 and the power-flow derivations of §3.3, from memory);
 * the discrete pencil keeps it exactly (ψᵀAψ = kc² ψᵀMψ), so ∫ ψ² dA is taken as Σ w ψ² with the solve's
 * mass. For TEM, ψ is constant on each conductor and harmonic, so ∫ |∇φ|² dA = ∮ φ ∂φ/∂n_out dℓ, taken on
 * the walls.
 *
 * @param family the mode's family
 * @param massNorm S = Σ w ψ² = ∫ ψ² dA, m²
 * @param wallValueSquared ∮ ψ² dℓ over every wall, m (TE; 0 otherwise)
 * @param wallTangentialSquared ∮ (∂ψ/∂t)² dℓ, 1/m (TE; 0 otherwise)
 * @param wallNormalSquared ∮ (∂ψ/∂n)² dℓ, 1/m (TM and TEM; 0 for TE)
 * @param gradientEnergy ∫ |∇ψ|² dA (TEM by the wall identity; TE and TM kc² S is used instead, NaN here)
 * @param peakGradient the largest |∇ψ| found, 1/m
 * @param peakX where, m
 * @param peakY where, m
 * @param walls the wall quadrature points with ∂ψ/∂t, ∂ψ/∂n there ({@code wallTangential}, {@code wallNormal})
 * @param wallTangential ∂ψ/∂t at each wall point, 1/m
 * @param wallNormal ∂ψ/∂n_in at each wall point (inward normal), 1/m
 */
record ModeFieldIntegrals(ModeFamily family, double massNorm, double wallValueSquared, double wallTangentialSquared,
                          double wallNormalSquared, double gradientEnergy, double peakGradient, double peakX,
                          double peakY, WallPoints walls, double[] wallTangential, double[] wallNormal) {

    ModeFieldIntegrals {
        wallTangential = wallTangential.clone();
        wallNormal = wallNormal.clone();
    }

    /**
     * Rebuilds ψ on every wall point, integrates, and searches the peak of |∇ψ| over the samples and the
     * walls, refined by a pattern search within one grid step of the best point.
     *
     * @param section the cross-section the mode was solved on
     * @param mode a mode from the solver (its field map carries weights)
     * @param samples the mode's samples
     * @return the integrals
     * @throws IllegalStateException if the field cannot be rebuilt somewhere (grid too coarse)
     */
    static ModeFieldIntegrals of(CrossSection section, Mode mode, PotentialSamples samples) {
        ModeFamily family = mode.family();
        WallPoints walls = WallPoints.of(section, samples);
        samples.useWalls(walls);
        Constraint onWall = switch (family) {
            case TE -> Constraint.ZERO_NORMAL_DERIVATIVE;
            case TM -> Constraint.ZERO_VALUE;
            case TEM -> Constraint.CONSTANT_ON_WALL;
        };
        int n = walls.size();
        double[] tangential = new double[n];
        double[] normal = new double[n];
        double value2 = 0;
        double tangential2 = 0;
        double normal2 = 0;
        double energy = 0;
        double peak = 0;
        double px = Double.NaN;
        double py = Double.NaN;
        double[] wx = walls.x();
        double[] wy = walls.y();
        double[] tx = walls.tangentX();
        double[] ty = walls.tangentY();
        double[] dl = walls.length();
        for (int p = 0; p < n; p++) {
            samples.fit(wx[p], wy[p], tx[p], ty[p], onWall, walls.conductor()[p]);
            double gt = samples.gradientX * tx[p] + samples.gradientY * ty[p];
            double gn = -samples.gradientX * ty[p] + samples.gradientY * tx[p];
            tangential[p] = gt;
            normal[p] = gn;
            value2 += samples.value * samples.value * dl[p];
            tangential2 += gt * gt * dl[p];
            normal2 += gn * gn * dl[p];
            energy -= samples.value * gn * dl[p]; // ∂φ/∂n_out = −∂φ/∂n_in
            double g = Math.hypot(gt, gn);
            if (g > peak) {
                peak = g;
                px = wx[p];
                py = wy[p];
            }
        }
        for (int k = 0; k < samples.sampleCount(); k++) {
            if (samples.isUsable(k)) {
                double x = samples.sampleX(k);
                double y = samples.sampleY(k);
                samples.fit(x, y, 1, 0, Constraint.NONE);
                double g = Math.hypot(samples.gradientX, samples.gradientY);
                if (g > peak) {
                    peak = g;
                    px = x;
                    py = y;
                }
            }
        }
        double[] best = refinePeak(section, samples, px, py, peak);
        boolean te = family == ModeFamily.TE;
        boolean tem = family == ModeFamily.TEM;
        return new ModeFieldIntegrals(family, samples.massNorm(), te ? value2 : 0, te ? tangential2 : 0,
                te ? 0 : normal2, tem ? energy : Double.NaN, best[0], best[1], best[2], walls, tangential, normal);
    }

    /** Pattern search for a larger |∇ψ| within one local grid step of (x, y), inside the guide. */
    private static double[] refinePeak(CrossSection section, PotentialSamples samples, double x, double y,
                                       double peak) {
        if (!Double.isFinite(x)) {
            return new double[] {peak, x, y};
        }
        double bestX = x;
        double bestY = y;
        double best = peak;
        double step = 0.5 * samples.localStep(x, y);
        for (int round = 0; round < 4; round++, step *= 0.5) {
            double cx = bestX;
            double cy = bestY;
            for (int a = -1; a <= 1; a++) {
                for (int b = -1; b <= 1; b++) {
                    double qx = cx + a * step;
                    double qy = cy + b * step;
                    if ((a == 0 && b == 0) || !section.contains(qx, qy)) {
                        continue;
                    }
                    samples.fit(qx, qy, 1, 0, Constraint.NONE);
                    double g = Math.hypot(samples.gradientX, samples.gradientY);
                    if (g > best) {
                        best = g;
                        bestX = qx;
                        bestY = qy;
                    }
                }
            }
        }
        return new double[] {best, bestX, bestY};
    }
}
