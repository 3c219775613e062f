package org.sectio.physics;

import java.util.function.DoubleBinaryOperator;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.PotentialSamples.Constraint;

/**
 * The geometric parts of a mode's voltage and current, before the frequency-dependent factors that
 * {@link ModeAnalysis} applies.
 *
 * <p>Voltage: the path is walked in steps of one local grid step with the 4-point Gauss–Legendre rule,
 * ∇ψ rebuilt at each point ({@link PotentialSamples}); {@code voltage} is ∫ (∇ψ × ẑ) · dℓ for TE (whose
 * E_t is along ∇Hz × ẑ) and ∫ ∇ψ · dℓ for TM and TEM.
 *
 * <p>Current: the longitudinal surface current J_z = ẑ · (n̂ × H), n̂ the normal out of the metal, is
 * −H_t · t̂ along a wall walked with the interior on the left. The conductor is the one whose wall lies
 * nearest to the path's end, and the current is the part of it that flows the same way as at the path's
 * end: I = s ∮ max(0, s J_z) dℓ, s = sign J_z at the end. On a conductor carrying a net current of one
 * sign (the inner conductor of a coaxial line in TEM) that is the whole current; on the single wall of
 * a hollow guide, whose net current is zero, it is the current of the half that the path ends on — for
 * TE10 of a rectangle the current of the broad wall (side-wall J_z is zero). {@code current} is that
 * integral of the geometric J_z: −∂ψ/∂t (TE, H_t along ∇Hz), +∂ψ/∂n_in (TM, H_t along ẑ × ∇Ez) and
 * −∂φ/∂n_in (TEM, H_t along −ẑ × ∇φ).
 *
 * @param voltage the geometric voltage integral, units of ψ
 * @param current the geometric current integral, units of ψ
 */
record PathVoltageAndCurrent(double voltage, double current) {

    private static final double[] NODES = {-0.8611363115940526, -0.3399810435848563, 0.3399810435848563,
        0.8611363115940526};
    private static final double[] WEIGHTS = {0.3478548451374538, 0.6521451548625461, 0.6521451548625461,
        0.3478548451374538};

    /**
     * @param section the cross-section
     * @param samples the mode's samples
     * @param integrals the mode's wall data
     * @param path the voltage path, inside the guide
     * @return the geometric voltage and current
     */
    static PathVoltageAndCurrent of(CrossSection section, PotentialSamples samples, ModeFieldIntegrals integrals,
                                    VoltagePath path) {
        path.requireInside(section);
        ModeFamily family = samples.family();
        double dx = (path.x2() - path.x1()) / path.length();
        double dy = (path.y2() - path.y1()) / path.length();
        double[] sum = new double[1];
        quadrature(path, 0, path.length(), samples::localStep, (x, y, weight) -> {
            samples.fit(x, y, 1, 0, Constraint.NONE);
            double integrand = family == ModeFamily.TE
                    ? samples.gradientY * dx - samples.gradientX * dy
                    : samples.gradientX * dx + samples.gradientY * dy;
            sum[0] += integrand * weight;
        });
        double voltage = sum[0];
        return new PathVoltageAndCurrent(voltage, current(family, integrals, path));
    }

    /** A quadrature point on a path: its position (m) and weight (m). */
    @FunctionalInterface
    interface PathPoint {
        void add(double x, double y, double weight);
    }

    /**
     * Four-point Gauss–Legendre quadrature over the arc length [from, to] of the path, in steps of the
     * local grid spacing (a last step shorter than a fifth of it is merged into the one before).
     *
     * @param localStep the grid spacing at a point, m
     * @param point receives every quadrature point
     */
    static void quadrature(VoltagePath path, double from, double to, DoubleBinaryOperator localStep, PathPoint point) {
        double ux = (path.x2() - path.x1()) / path.length();
        double uy = (path.y2() - path.y1()) / path.length();
        double s = from;
        while (s < to) {
            double h = localStep.applyAsDouble(path.x1() + s * ux, path.y1() + s * uy);
            double next = Math.min(to, s + h);
            if (to - next < 0.2 * h) {
                next = to;
            }
            double mid = 0.5 * (s + next);
            double half = 0.5 * (next - s);
            for (int g = 0; g < NODES.length; g++) {
                double at = mid + half * NODES[g];
                point.add(path.x1() + at * ux, path.y1() + at * uy, WEIGHTS[g] * half);
            }
            s = next;
        }
    }

    private static double current(ModeFamily family, ModeFieldIntegrals integrals, VoltagePath path) {
        double[] tangential = integrals.wallTangential();
        double[] normal = integrals.wallNormal();
        double[] density = new double[tangential.length];
        for (int p = 0; p < density.length; p++) {
            density[p] = density(family, tangential[p], normal[p]);
        }
        return wallCurrent(integrals.walls(), density, path);
    }

    /**
     * The current of the conductor nearest the path's end that flows the same way as at the end (see the
     * type description): I = s ∮ max(0, s J_z) dℓ, s = sign J_z at the wall point nearest the end.
     *
     * @param walls the wall quadrature points
     * @param density J_z at every wall point (real), A/m or the geometric units of the caller
     * @param path the voltage path
     * @return I in the units of density times metres
     */
    static double wallCurrent(WallPoints walls, double[] density, VoltagePath path) {
        double[] x = walls.x();
        double[] y = walls.y();
        double[] dl = walls.length();
        int[] owner = walls.conductor();
        int nearest = 0;
        double closest = Double.POSITIVE_INFINITY;
        for (int p = 0; p < walls.size(); p++) {
            double d = Math.hypot(x[p] - path.x2(), y[p] - path.y2());
            if (d < closest) {
                closest = d;
                nearest = p;
            }
        }
        double sign = density[nearest] < 0 ? -1 : 1;
        double sum = 0;
        for (int p = 0; p < walls.size(); p++) {
            if (owner[p] == owner[nearest]) {
                sum += Math.max(0, sign * density[p]) * dl[p];
            }
        }
        return sign * sum;
    }

    /** The geometric J_z at a wall point. */
    private static double density(ModeFamily family, double tangential, double normal) {
        return switch (family) {
            case TE -> -tangential;
            case TM -> normal;
            case TEM -> -normal;
        };
    }
}
