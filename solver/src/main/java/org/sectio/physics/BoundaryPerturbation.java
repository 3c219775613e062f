package org.sectio.physics;

import org.sectio.geometry.CrossSection;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.PotentialSamples.Constraint;

/**
 * How a computed mode's cutoff moves when the metal walls move: the boundary-perturbation (Hadamard)
 * formula, evaluated from the mode's field on the exact walls. It gives the derivative of a cutoff with
 * respect to any parameter that only moves walls, from one solve, and so cross-checks finite
 * differences, which need two more.
 *
 * <p>For −∇²ψ = λψ in the cross-section (λ = kc² = εr k0² for a homogeneous filling) and a wall moved by
 * δn along its outward normal (Harrington, Time-Harmonic Electromagnetic Fields, §7 on the perturbation
 * of boundaries; Pozar, Microwave Engineering, 4th ed., §6.7 for the cavity form; both from memory):
 * <ul>
 * <li>TM (Ez, Dirichlet): δλ = −∮ (∂Ez/∂n)² δn dℓ / ∫ Ez² dA;</li>
 * <li>TE (Hz, Neumann): δλ = ∮ (|∇_t Hz|² − λ Hz²) δn dℓ / ∫ Hz² dA (on the wall ∂Hz/∂n = 0, so
 *     |∇_t Hz|² = (∂Hz/∂t)²).</li>
 * </ul>
 * Signs, checked on the circle of radius R (kc = p/R, Pozar §3.4): enlarging the guide (δn = δR &gt; 0)
 * gives δλ = −2λ δR / R for both, i.e. dkc/dR = −kc/R. Wall values and derivatives come from the
 * least-squares fits of {@link PotentialSamples} on the wall quadrature points of {@link WallPoints}:
 * second order for TE, first order for the TM normal derivative on curved walls (see there).
 *
 * <p>Limits: only guides without dielectric regions (with them the interfaces would need their own
 * terms); the formula is first order in δn; for a degenerate pair it holds only for perturbations that
 * keep the pair's symmetry (otherwise degenerate perturbation theory is needed); at a sharp re-entrant
 * corner the field is singular and the quadrature converges slowly.
 */
public final class BoundaryPerturbation {

    private final double[] x;
    private final double[] y;
    private final double[] outwardX;
    private final double[] outwardY;
    private final double[] weightedIntegrand;
    private final double cutoffWavenumber;
    private final double relativePermittivity;

    private BoundaryPerturbation(double[] x, double[] y, double[] outwardX, double[] outwardY,
                                 double[] weightedIntegrand, double cutoffWavenumber, double relativePermittivity) {
        this.x = x;
        this.y = y;
        this.outwardX = outwardX;
        this.outwardY = outwardY;
        this.weightedIntegrand = weightedIntegrand;
        this.cutoffWavenumber = cutoffWavenumber;
        this.relativePermittivity = relativePermittivity;
    }

    /**
     * Rebuilds the mode's wall field on the wall quadrature points.
     *
     * @param section the cross-section the mode was solved on
     * @param mode a TE or TM mode from {@code ModeSolver} on that cross-section
     * @return the prepared formula
     * @throws IllegalArgumentException if the mode is TEM, has no sample weights, or the section has
     *     dielectric regions
     * @throws IllegalStateException if the grid is too coarse to rebuild the field near some wall point
     */
    public static BoundaryPerturbation of(CrossSection section, Mode mode) {
        if (mode.family() == ModeFamily.TEM) {
            throw new IllegalArgumentException("boundary perturbation: TEM modes have no cutoff to perturb");
        }
        if (!section.dielectrics().isEmpty()) {
            throw new IllegalArgumentException("boundary perturbation: " + section.name()
                    + " has dielectric regions, whose interfaces the wall formula does not cover");
        }
        PotentialSamples samples = new PotentialSamples(section, mode);
        WallPoints walls = WallPoints.of(section, samples);
        samples.useWalls(walls);
        double epsilon = section.filling().relativePermittivity();
        double lambda = epsilon * mode.cutoffWavenumber() * mode.cutoffWavenumber();
        double mass = samples.massNorm();
        boolean te = mode.family() == ModeFamily.TE;
        Constraint onWall = te ? Constraint.ZERO_NORMAL_DERIVATIVE : Constraint.ZERO_VALUE;
        int n = walls.size();
        double[] integrand = new double[n];
        double[] nx = new double[n];
        double[] ny = new double[n];
        for (int p = 0; p < n; p++) {
            double tx = walls.tangentX()[p];
            double ty = walls.tangentY()[p];
            nx[p] = ty;
            ny[p] = -tx;
            samples.fit(walls.x()[p], walls.y()[p], tx, ty, onWall, walls.conductor()[p]);
            double gt = samples.gradientX * tx + samples.gradientY * ty;
            double gn = -samples.gradientX * ty + samples.gradientY * tx;
            double local = te ? gt * gt - lambda * samples.value * samples.value : -gn * gn;
            integrand[p] = local * walls.length()[p] / mass;
        }
        return new BoundaryPerturbation(walls.x(), walls.y(), nx, ny, integrand, mode.cutoffWavenumber(), epsilon);
    }

    /** @return the number of wall quadrature points */
    public int pointCount() {
        return x.length;
    }

    /** @return x of each wall point, m (a copy) */
    public double[] wallX() {
        return x.clone();
    }

    /** @return y of each wall point, m (a copy) */
    public double[] wallY() {
        return y.clone();
    }

    /** @return x component of the unit outward normal (into the metal) at each wall point (a copy) */
    public double[] outwardNormalX() {
        return outwardX.clone();
    }

    /** @return y component of the unit outward normal at each wall point (a copy) */
    public double[] outwardNormalY() {
        return outwardY.clone();
    }

    /**
     * @param outwardDisplacement δn at each wall point per unit change of the parameter, outward
     *     positive (m per parameter unit), {@link #pointCount()} values
     * @return dλ/dp of λ = εr k0², rad²/m² per parameter unit
     * @throws IllegalArgumentException if the length does not match or a value is not finite
     */
    public double eigenvalueDerivative(double[] outwardDisplacement) {
        if (outwardDisplacement.length != x.length) {
            throw new IllegalArgumentException("boundary perturbation: " + outwardDisplacement.length
                    + " displacements for " + x.length + " wall points");
        }
        double sum = 0;
        for (int p = 0; p < x.length; p++) {
            if (!Double.isFinite(outwardDisplacement[p])) {
                throw new IllegalArgumentException("boundary perturbation: displacement at wall point " + p
                        + " is not finite: " + outwardDisplacement[p]);
            }
            sum += weightedIntegrand[p] * outwardDisplacement[p];
        }
        return sum;
    }

    /**
     * @param outwardDisplacement as for {@link #eigenvalueDerivative}
     * @return dk0/dp = (dλ/dp) / (2 εr k0), rad/m per parameter unit (multiply by c/2π for Hz)
     */
    public double cutoffWavenumberDerivative(double[] outwardDisplacement) {
        return eigenvalueDerivative(outwardDisplacement) / (2 * relativePermittivity * cutoffWavenumber);
    }
}
