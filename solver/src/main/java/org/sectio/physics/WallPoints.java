package org.sectio.physics;

import java.util.Arrays;
import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Loop;
import org.sectio.geometry.WallPiece;

/**
 * Quadrature points on the exact walls of a cross-section: every {@link WallPiece} is walked in steps of
 * about one local grid step (measured along the wall), and each step carries the 4-point Gauss–Legendre
 * rule in the piece's parameter (Abramowitz &amp; Stegun, Handbook of Mathematical Functions, Table 25.4,
 * from memory). Each point has its position, the unit tangent in the direction of travel (interior on
 * the left, so the inward normal is (−t_y, t_x)), its length weight dℓ = |dp/dt| w dt, and the index of
 * the conductor ({@link CrossSection#conductors()}) it belongs to.
 *
 * @param x point abscissae, m
 * @param y point ordinates, m
 * @param tangentX unit tangent x
 * @param tangentY unit tangent y
 * @param length the length weight of each point, m (Σ over a loop is its perimeter)
 * @param conductor the conductor index of each point
 */
record WallPoints(double[] x, double[] y, double[] tangentX, double[] tangentY, double[] length, int[] conductor) {

    private static final double[] NODES = {-0.8611363115940526, -0.3399810435848563, 0.3399810435848563,
        0.8611363115940526};
    private static final double[] WEIGHTS = {0.3478548451374538, 0.6521451548625461, 0.6521451548625461,
        0.3478548451374538};

    WallPoints {
        x = x.clone();
        y = y.clone();
        tangentX = tangentX.clone();
        tangentY = tangentY.clone();
        length = length.clone();
        conductor = conductor.clone();
    }

    /** @return the number of points */
    int size() {
        return x.length;
    }

    /**
     * @param section the cross-section
     * @param samples gives the local grid step
     * @return the points on every wall piece
     */
    static WallPoints of(CrossSection section, PotentialSamples samples) {
        List<Loop> loops = section.conductors();
        Builder out = new Builder();
        for (WallPiece piece : section.wallPieces()) {
            int owner = 0;
            for (int k = 0; k < loops.size(); k++) {
                if (loops.get(k).pieces().contains(piece)) {
                    owner = k;
                }
            }
            walk(piece, owner, samples, out);
        }
        return out.build();
    }

    private static void walk(WallPiece piece, int owner, PotentialSamples samples, Builder out) {
        double t0 = piece.startParameter();
        double t1 = piece.endParameter();
        double span = t1 - t0;
        double delta = 1e-7 * Math.abs(span);
        double t = t0;
        int guard = 0;
        while ((t1 - t) * Math.signum(span) > 1e-12 * Math.abs(span) && guard++ < 1_000_000) {
            double speed = speed(piece, t + Math.signum(span) * delta, delta);
            double step = samples.localStep(piece.x(t), piece.y(t)) / Math.max(speed, 1e-300);
            double next = t + Math.signum(span) * Math.min(step, Math.abs(t1 - t));
            if (Math.abs(t1 - next) < 0.2 * step) {
                next = t1; // no sliver step at the end
            }
            double mid = 0.5 * (t + next);
            double half = 0.5 * (next - t);
            for (int g = 0; g < NODES.length; g++) {
                double tg = mid + half * NODES[g];
                double dx = (piece.x(tg + delta) - piece.x(tg - delta)) / (2 * delta);
                double dy = (piece.y(tg + delta) - piece.y(tg - delta)) / (2 * delta);
                double norm = Math.hypot(dx, dy);
                double sign = Math.signum(span);
                out.add(piece.x(tg), piece.y(tg), sign * dx / norm, sign * dy / norm, norm * WEIGHTS[g] * Math.abs(half),
                        owner);
            }
            t = next;
        }
    }

    /** |dp/dt| at t by a central difference. */
    private static double speed(WallPiece piece, double t, double delta) {
        return Math.hypot(piece.x(t + delta) - piece.x(t - delta), piece.y(t + delta) - piece.y(t - delta)) / (2 * delta);
    }

    /** Grows the point arrays. */
    private static final class Builder {
        private double[] x = new double[256];
        private double[] y = new double[256];
        private double[] tx = new double[256];
        private double[] ty = new double[256];
        private double[] dl = new double[256];
        private int[] owner = new int[256];
        private int n;

        void add(double px, double py, double ux, double uy, double w, int k) {
            if (n == x.length) {
                int m = 2 * n;
                x = Arrays.copyOf(x, m);
                y = Arrays.copyOf(y, m);
                tx = Arrays.copyOf(tx, m);
                ty = Arrays.copyOf(ty, m);
                dl = Arrays.copyOf(dl, m);
                owner = Arrays.copyOf(owner, m);
            }
            x[n] = px;
            y[n] = py;
            tx[n] = ux;
            ty[n] = uy;
            dl[n] = w;
            owner[n] = k;
            n++;
        }

        WallPoints build() {
            return new WallPoints(Arrays.copyOf(x, n), Arrays.copyOf(y, n), Arrays.copyOf(tx, n), Arrays.copyOf(ty, n),
                    Arrays.copyOf(dl, n), Arrays.copyOf(owner, n));
        }
    }
}
