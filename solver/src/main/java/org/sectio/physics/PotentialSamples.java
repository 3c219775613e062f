package org.sectio.physics;

import java.util.Arrays;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.FieldMap;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;

/**
 * The longitudinal potential ψ of a computed mode (Hz, Ez or the TEM potential) and its gradient at any
 * point of the cross-section, rebuilt from the grid samples by a small weighted least-squares quadratic
 * fit.
 *
 * <p>At a point p with a frame (t, n) — the wall tangent and the inward normal at a wall point, the axes
 * elsewhere — ψ is fitted as c0 + c1 s + c2 r + c3 s² + c4 s r + c5 r² in the local coordinates
 * s = (x − p)·t / h, r = (x − p)·n / h (h the local grid step) to the usable samples within a radius R,
 * each weighted by (1 − d²/R²)². R is 3 h, widened to 4.5 h, 6 h, 9 h and 12 h until at least 10 samples
 * of positive weight lie there and the normal equations are well conditioned ({@link NormalEquations}:
 * the equilibrated condition number at most 2e4): a sample count alone is not enough, since beside a
 * Dirichlet wall on a grid line (TM, whose wall nodes carry no sample) a 3 h half-disc can hold only two
 * usable grid columns, on which s² is not determined. If no radius gives a well-conditioned quadratic, a
 * linear fit (1, s, r) over 3 h, 6 h or 12 h is used, with ∇ψ then only first order there.
 * At a wall the boundary condition is built in: at p itself through the basis (TE,
 * ∂Hz/∂n = 0: c2 dropped; TM, Ez = 0: c0 dropped; TEM: φ free), and at the neighbouring wall
 * quadrature points of the same conductor within R as exact rows of the least-squares system
 * (TE: ∂ψ/∂n_q = 0; TM and TEM: ψ(q) = ψ(p)), so the fit follows a curved wall; only samples on the
 * inward side (r ≥ −h/4) are used, so that metal thinner than the fit radius does not couple fields
 * across it ({@link Constraint#ONE_SIDED} keeps that inward filter with no condition and no wall rows, for a
 * field component with no boundary condition of its own). A quadratic fit of a smooth ψ leaves O(h³) in ψ and O(h²) in ∇ψ. Measured (tests in
 * {@code org.sectio.physics.ModeAnalysis*Test}): TE wall values and tangential derivatives converge at
 * order 2 (α_c of WR-90 TE10, circular TE11 and TE01), the TEM normal derivative at order 2 (coaxial
 * α_c); the TM normal derivative only at order 1 on curved walls (circular TM01: 5.5e-3, 3.2e-3, 1.6e-3
 * at 50, 100, 200 cells), because the nodal Ez of the cut-link stencil next to a curved wall carries an
 * error that varies from node to node with the cut fraction. Usable samples are the finite samples with
 * positive weight whose point lies inside the guide (for TE a cut cell's centre may lie in the metal;
 * that sample is not used).
 *
 * <p>Not thread-safe: one instance holds its work arrays, so fitting allocates nothing.
 */
final class PotentialSamples {

    /** Basis index of the normal-derivative term (dropped for a Neumann wall). */
    private static final int NORMAL_TERM = 2;
    /** Basis index of the constant term (dropped for a Dirichlet wall). */
    private static final int CONSTANT_TERM = 0;
    private static final int MIN_SAMPLES = 10;
    /** Fit radii of the quadratic, in local grid steps, tried in turn until the fit is well conditioned. */
    private static final double[] RADII = {3.0, 4.5, 6.0, 9.0, 12.0};
    /** Fit radii of the linear fallback. */
    private static final double[] LINEAR_RADII = {3.0, 6.0, 12.0};
    /** Basis terms of the linear fallback: 1, s, r. */
    private static final int LINEAR_TERMS = 3;

    /** How the fit treats the point. */
    enum Constraint {
        /** No condition: a point inside the guide, or a TEM conductor of unknown potential. */
        NONE,
        /** ∂ψ/∂n = 0 at the point (TE wall). */
        ZERO_NORMAL_DERIVATIVE,
        /** ψ = 0 at the point (TM wall). */
        ZERO_VALUE,
        /** ψ takes one unknown value along the conductor (TEM wall). */
        CONSTANT_ON_WALL,
        /**
         * No condition, but only samples on the inward side are used: a wall point for a component with no
         * boundary condition of its own (the transverse H of a hybrid mode).
         */
        ONE_SIDED
    }

    private final double[] xs;
    private final double[] ys;
    private final double[] values;
    private final double[] weights;
    private final boolean[] usable;
    private final ModeFamily family;
    private final String what;

    private WallPoints walls;
    private final NormalEquations system = new NormalEquations();
    private final double[] basis = new double[6];
    private final double[] row = new double[6];
    private final int[] active = new int[6];

    /** ψ at the last fitted point. */
    double value;
    /** ∂ψ/∂x at the last fitted point, 1/m times the units of ψ. */
    double gradientX;
    /** ∂ψ/∂y at the last fitted point. */
    double gradientY;

    /**
     * @param section the cross-section the mode was solved on
     * @param mode a mode whose field map carries sample weights
     * @throws IllegalArgumentException if the field map has no weights
     */
    PotentialSamples(CrossSection section, Mode mode) {
        FieldMap map = mode.field();
        if (!map.hasWeights()) {
            throw new IllegalArgumentException("mode " + mode.label() + ": its field map carries no sample weights;"
                    + " field-based quantities need a mode from ModeSolver");
        }
        family = mode.family();
        what = family.name();
        xs = map.xCoordinates();
        ys = map.yCoordinates();
        values = map.values();
        weights = map.weights();
        usable = new boolean[values.length];
        for (int j = 0; j < ys.length; j++) {
            for (int i = 0; i < xs.length; i++) {
                int k = j * xs.length + i;
                usable[k] = Double.isFinite(values[k]) && weights[k] > 0 && section.contains(xs[i], ys[j]);
            }
        }
    }

    /**
     * One real field component on a tensor set of points (a part of a hybrid mode's field), with no mass
     * weights: {@link #massNorm()} is then 0 and {@link #family()} null. Usable are the finite samples
     * inside the guide that {@code keep} accepts.
     *
     * @param section the cross-section the field was solved on
     * @param what the component's name for messages, e.g. "Re Hx"
     * @param xCoordinates sample abscissae, m, ascending
     * @param yCoordinates sample ordinates, m, ascending
     * @param samples the values, row-major ({@code samples[j * x.length + i]}), NaN where there is none;
     *     shared, not copied
     * @param keep which sample points (x, y) may be used, e.g. those in one material
     */
    PotentialSamples(CrossSection section, String what, double[] xCoordinates, double[] yCoordinates,
                     double[] samples, java.util.function.BiPredicate<Double, Double> keep) {
        family = null;
        this.what = what;
        xs = xCoordinates;
        ys = yCoordinates;
        values = samples;
        weights = new double[values.length];
        usable = new boolean[values.length];
        for (int j = 0; j < ys.length; j++) {
            for (int i = 0; i < xs.length; i++) {
                int k = j * xs.length + i;
                usable[k] = Double.isFinite(values[k]) && section.contains(xs[i], ys[j]) && keep.test(xs[i], ys[j]);
            }
        }
    }

    /**
     * Lets wall fits use the boundary condition at the neighbouring wall points as well.
     *
     * @param points the wall quadrature points of the cross-section
     */
    void useWalls(WallPoints points) {
        walls = points;
    }

    /** @return the family of the mode (null for a component of a hybrid field) */
    ModeFamily family() {
        return family;
    }

    /** @return Σ w ψ² over the samples: the discrete ∫ ψ² dA, m² */
    double massNorm() {
        double sum = 0;
        for (int k = 0; k < values.length; k++) {
            if (weights[k] > 0 && Double.isFinite(values[k])) {
                sum += weights[k] * values[k] * values[k];
            }
        }
        return sum;
    }

    /** @return the number of sample points */
    int sampleCount() {
        return values.length;
    }

    /** @return whether sample k (row-major) is used by the fits */
    boolean isUsable(int k) {
        return usable[k];
    }

    /** @return x of sample k, m */
    double sampleX(int k) {
        return xs[k % xs.length];
    }

    /** @return y of sample k, m */
    double sampleY(int k) {
        return ys[k / xs.length];
    }

    /** @return the local grid step at (x, y): the larger sample spacing of the column and row there, m */
    double localStep(double x, double y) {
        return Math.max(spacing(xs, x), spacing(ys, y));
    }

    private static double spacing(double[] lines, double v) {
        int at = Arrays.binarySearch(lines, v);
        int k = at >= 0 ? at : -at - 2;
        k = Math.max(0, Math.min(lines.length - 2, k));
        return lines[k + 1] - lines[k];
    }

    /**
     * Fits ψ at (x, y) in the frame (tx, ty) / inward normal (−ty, tx) and sets {@link #value},
     * {@link #gradientX}, {@link #gradientY}.
     *
     * @param x the point, m
     * @param y the point, m
     * @param tx unit tangent x (1 away from walls)
     * @param ty unit tangent y (0 away from walls)
     * @param constraint the boundary condition at the point
     * @throws IllegalStateException if even the linear fit over 12 h is singular or ill conditioned (fewer
     *     than 4 usable samples, or all on one line, near the point)
     */
    void fit(double x, double y, double tx, double ty, Constraint constraint) {
        fit(x, y, tx, ty, constraint, -1);
    }

    /**
     * As {@link #fit(double, double, double, double, Constraint)}, at a wall point of the given conductor:
     * the boundary condition at the other wall points of that conductor within the fit radius enters
     * the fit as exact data (∂ψ/∂n = 0 for TE, ψ = ψ(p) for TM and TEM).
     */
    void fit(double x, double y, double tx, double ty, Constraint constraint, int conductor) {
        double h = localStep(x, y);
        for (double radiusInSteps : RADII) {
            if (tryFit(x, y, tx, ty, constraint, conductor, h, radiusInSteps * h, basis.length, MIN_SAMPLES)) {
                return;
            }
        }
        for (double radiusInSteps : LINEAR_RADII) {
            if (tryFit(x, y, tx, ty, constraint, conductor, h, radiusInSteps * h, LINEAR_TERMS, LINEAR_TERMS + 1)) {
                return;
            }
        }
        throw new IllegalStateException(String.format(java.util.Locale.ROOT,
                "the field samples near (%.6g, %.6g) m are too few or aligned to rebuild the %s field there even"
                        + " with a linear fit over %.3g grid steps; use a finer grid", x, y, what,
                LINEAR_RADII[LINEAR_RADII.length - 1]));
    }

    /**
     * One fit with the basis terms below {@code terms} over the samples within {@code radius}; sets the
     * results and returns true if at least {@code minSamples} samples lie there and the normal equations
     * are well conditioned.
     */
    private boolean tryFit(double x, double y, double tx, double ty, Constraint constraint, int conductor, double h,
                           double radius, int terms, int minSamples) {
        double nx = -ty;
        double ny = tx;
        int count = 0;
        for (int b = 0; b < terms; b++) {
            boolean dropped = (constraint == Constraint.ZERO_NORMAL_DERIVATIVE && b == NORMAL_TERM)
                    || (constraint == Constraint.ZERO_VALUE && b == CONSTANT_TERM);
            if (!dropped) {
                active[count++] = b;
            }
        }
        system.clear(count);
        boolean wall = constraint != Constraint.NONE;
        if (accumulate(x, y, tx, ty, nx, ny, h, radius, wall, count) < minSamples) {
            return false;
        }
        if (conductor >= 0 && walls != null && constraint != Constraint.ONE_SIDED) {
            accumulateWall(x, y, tx, ty, nx, ny, h, radius, constraint, count, conductor);
        }
        if (!system.solve()) {
            return false;
        }
        int first = constraint == Constraint.ZERO_VALUE ? 0 : 1;
        double c0 = constraint == Constraint.ZERO_VALUE ? 0 : system.coefficient(0);
        double cs = system.coefficient(first) / h;
        double cr = constraint == Constraint.ZERO_NORMAL_DERIVATIVE ? 0 : system.coefficient(first + 1) / h;
        value = c0;
        gradientX = cs * tx + cr * nx;
        gradientY = cs * ty + cr * ny;
        return true;
    }

    /** Builds the normal equations over the samples within {@code radius}; returns how many were used. */
    private int accumulate(double x, double y, double tx, double ty, double nx, double ny, double h, double radius,
                           boolean wall, int count) {
        int i0 = Math.max(0, lowerIndex(xs, x - radius));
        int i1 = Math.min(xs.length - 1, upperIndex(xs, x + radius));
        int j0 = Math.max(0, lowerIndex(ys, y - radius));
        int j1 = Math.min(ys.length - 1, upperIndex(ys, y + radius));
        double r2max = radius * radius;
        int used = 0;
        for (int j = j0; j <= j1; j++) {
            double dy = ys[j] - y;
            for (int i = i0; i <= i1; i++) {
                int k = j * xs.length + i;
                double dx = xs[i] - x;
                double d2 = dx * dx + dy * dy;
                if (!usable[k] || d2 > r2max) {
                    continue;
                }
                double s = (dx * tx + dy * ty) / h;
                double r = (dx * nx + dy * ny) / h;
                if (wall && r < -0.25) {
                    continue;
                }
                double q = 1 - d2 / r2max;
                double w = q * q;
                basis[0] = 1;
                basis[1] = s;
                basis[2] = r;
                basis[3] = s * s;
                basis[4] = s * r;
                basis[5] = r * r;
                for (int a = 0; a < count; a++) {
                    row[a] = basis[active[a]];
                }
                system.addRow(row, w, values[k]);
                if (w > 0) {
                    used++;
                }
            }
        }
        return used;
    }

    /** Adds the boundary condition at the wall points of one conductor within {@code radius}. */
    private void accumulateWall(double x, double y, double tx, double ty, double nx, double ny, double h,
                                double radius, Constraint constraint, int count, int conductor) {
        double[] wx = walls.x();
        double[] wy = walls.y();
        double[] wtx = walls.tangentX();
        double[] wty = walls.tangentY();
        int[] owner = walls.conductor();
        double r2max = radius * radius;
        for (int q = 0; q < wx.length; q++) {
            double dx = wx[q] - x;
            double dy = wy[q] - y;
            double d2 = dx * dx + dy * dy;
            if (owner[q] != conductor || d2 > r2max || d2 < 1e-12 * h * h) {
                continue;
            }
            double s = (dx * tx + dy * ty) / h;
            double r = (dx * nx + dy * ny) / h;
            if (constraint == Constraint.ZERO_NORMAL_DERIVATIVE) {
                // the normal of q in the frame of p: ∂/∂n_q = (n_q·t) ∂/∂s + (n_q·n) ∂/∂r
                double qnx = -wty[q];
                double qny = wtx[q];
                double ns = qnx * tx + qny * ty;
                double nr = qnx * nx + qny * ny;
                basis[0] = 0;
                basis[1] = ns;
                basis[2] = nr;
                basis[3] = 2 * s * ns;
                basis[4] = r * ns + s * nr;
                basis[5] = 2 * r * nr;
            } else {
                basis[0] = 0;
                basis[1] = s;
                basis[2] = r;
                basis[3] = s * s;
                basis[4] = s * r;
                basis[5] = r * r;
            }
            double qw = 1 - d2 / r2max;
            double w = qw * qw;
            for (int a = 0; a < count; a++) {
                row[a] = basis[active[a]];
            }
            system.addRow(row, w, 0);
        }
    }

    private static int lowerIndex(double[] lines, double v) {
        int at = Arrays.binarySearch(lines, v);
        return at >= 0 ? at : -at - 1;
    }

    private static int upperIndex(double[] lines, double v) {
        int at = Arrays.binarySearch(lines, v);
        return at >= 0 ? at : -at - 2;
    }
}
