package org.sectio.modes;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.special.BesselJ;

/**
 * The lowest Dirichlet eigenvalue (the TM1 cutoff) of a stadium, by the method of particular solutions
 * with the subspace-angle criterion of Betcke &amp; Trefethen, "Reviving the method of particular
 * solutions", SIAM Review 47(3), 2005, §4: u = Σ c_j J_{2j}(k r) cos(2jθ) about the stadium's centre
 * (the fully symmetric class, which holds the lowest mode), collocated on the boundary of one quarter
 * (the flat side y = R for 0 ≤ x ≤ L, then the quarter circle of radius R about (L, 0)) and on random
 * interior points; k minimizes σ_min of the boundary block of the orthonormalized basis. Independent
 * of the finite-volume solver: no grid, no cut cells.
 */
final class StadiumParticularSolutions {

    private final int terms;
    private final double[][] boundary;
    private final double[][] interior;

    /**
     * @param halfStraight L, half the length of the straight sides, m
     * @param radius R, radius of the end caps (half the stadium's height), m
     * @param terms number of Fourier–Bessel terms; three times as many boundary and interior points
     */
    StadiumParticularSolutions(double halfStraight, double radius, int terms) {
        this.terms = terms;
        int points = 3 * terms;
        boundary = new double[points][];
        int flat = points / 2;
        int round = points - flat;
        for (int i = 0; i < flat; i++) {
            boundary[i] = new double[] {clustered(i, flat) * halfStraight, radius};
        }
        for (int i = 0; i < round; i++) {
            double phi = Math.PI / 2 * (1 - clustered(i, round));
            boundary[flat + i] = new double[] {halfStraight + radius * Math.cos(phi), radius * Math.sin(phi)};
        }
        interior = new double[points][];
        Random random = new Random(7);
        for (int c = 0; c < points; ) {
            double x = random.nextDouble() * (halfStraight + radius);
            double y = random.nextDouble() * radius;
            if (x <= halfStraight || Math.hypot(x - halfStraight, y) < radius) {
                interior[c++] = new double[] {x, y};
            }
        }
    }

    /** Chebyshev-like points on [0, 1], denser at both ends (at the arc–flat junction's weak singularity). */
    private static double clustered(int i, int count) {
        return 0.5 * (1 - Math.cos(Math.PI * (i + 0.5) / count));
    }

    /** σ_min of the boundary rows of an orthonormal basis of the particular-solution space at k, rad/m. */
    double subspaceAngle(double k) {
        int rows = boundary.length + interior.length;
        double[][] a = new double[rows][terms];
        for (int j = 0; j < terms; j++) {
            double scale = 0;
            for (int i = 0; i < rows; i++) {
                double[] p = i < boundary.length ? boundary[i] : interior[i - boundary.length];
                a[i][j] = BesselJ.value(2 * j, k * Math.hypot(p[0], p[1])) * Math.cos(2 * j * Math.atan2(p[1], p[0]));
                scale = Math.max(scale, Math.abs(a[i][j]));
            }
            for (int i = 0; i < rows; i++) {
                a[i][j] /= scale;
            }
        }
        RealMatrix q = new QRDecomposition(new Array2DRowRealMatrix(a, false)).getQ().getSubMatrix(0, rows - 1, 0, terms - 1);
        double[] sigma = new SingularValueDecomposition(q.getSubMatrix(0, boundary.length - 1, 0, terms - 1))
                .getSingularValues();
        return sigma[sigma.length - 1];
    }

    /**
     * Scans [from, to] in 40 steps for the smallest subspace angle, then refines it by Brent's method.
     * The fully symmetric class has one eigenvalue in the bracket given by domain monotonicity (the
     * stadium between its inscribed and its enclosing rectangle), so the smallest angle is that one.
     *
     * @param from lower end, rad/m
     * @param to upper end, rad/m
     * @return k of the lowest Dirichlet eigenvalue, rad/m
     */
    double lowestDirichletWavenumber(double from, double to) {
        double step = (to - from) / 40;
        double best = from;
        double bestAngle = Double.POSITIVE_INFINITY;
        for (double k = from; k <= to; k += step) {
            double angle = subspaceAngle(k);
            if (angle < bestAngle) {
                bestAngle = angle;
                best = k;
            }
        }
        return new BrentOptimizer(1e-14, 1e-12).optimize(new MaxEval(500),
                new UnivariateObjectiveFunction(this::subspaceAngle), GoalType.MINIMIZE,
                new SearchInterval(Math.max(from, best - step), Math.min(to, best + step), best)).getPoint();
    }

}
