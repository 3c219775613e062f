package org.sectio.mesh;

import java.util.Arrays;
import java.util.List;
import org.sectio.geometry.Loop;
import org.sectio.geometry.WallCrossings;

/**
 * Which conductor a grid link ends on: for node (i, j) and each direction of {@link NodeLinks}, the
 * index (into {@code CrossSection.conductors()}) of the conductor owning the nearest wall crossing
 * in that direction along the grid line, or −1 if the line meets no wall on that side. The crossings
 * are computed per conductor loop, under the same convention as the guide's own crossings
 * ({@link WallCrossings}), and merged; so the position of the nearest crossing is the one
 * {@link NodeLinks} uses, and this adds only its owner. This is what a Dirichlet problem with a
 * different value on each conductor (the electrostatic potential of TEM modes) needs.
 */
public final class LinkConductors {

    private final int columns;
    private final int[] conductor;

    private LinkConductors(int columns, int[] conductor) {
        this.columns = columns;
        this.conductor = conductor;
    }

    /**
     * @param conductors the conductors' loops, in the order their indices are to refer to
     * @param grid the grid
     */
    public static LinkConductors of(List<Loop> conductors, TensorGrid grid) {
        int nx = grid.cellsX() + 1;
        int ny = grid.cellsY() + 1;
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        int[] owner = new int[4 * nx * ny];
        Arrays.fill(owner, -1);
        for (int j = 0; j < ny; j++) {
            Labelled line = Labelled.atY(conductors, ys[j]);
            int p = 0;
            for (int i = 0; i < nx; i++) {
                while (p < line.at.length && line.at[p] <= xs[i]) {
                    p++;
                }
                int node = j * nx + i;
                owner[4 * node + NodeLinks.LEFT] = p > 0 ? line.owner[p - 1] : -1;
                owner[4 * node + NodeLinks.RIGHT] = p < line.at.length ? line.owner[p] : -1;
            }
        }
        for (int i = 0; i < nx; i++) {
            Labelled line = Labelled.atX(conductors, xs[i]);
            int p = 0;
            for (int j = 0; j < ny; j++) {
                while (p < line.at.length && line.at[p] <= ys[j]) {
                    p++;
                }
                int node = j * nx + i;
                owner[4 * node + NodeLinks.DOWN] = p > 0 ? line.owner[p - 1] : -1;
                owner[4 * node + NodeLinks.UP] = p < line.at.length ? line.owner[p] : -1;
            }
        }
        return new LinkConductors(nx, owner);
    }

    /** @return the conductor of the nearest wall from node (i, j) in a direction of {@link NodeLinks}, or −1 */
    public int conductorOf(int i, int j, int direction) {
        return conductor[4 * (j * columns + i) + direction];
    }

    /**
     * The conductor a wall node (one that {@link NodeLinks} drops because it lies within
     * {@link NodeLinks#WALL_NODE_FRACTION} of a link from the wall) belongs to: the owner of the
     * nearest crossing over its four links.
     */
    public int conductorOfWallNode(NodeLinks links, int i, int j) {
        int best = -1;
        double nearest = Double.POSITIVE_INFINITY;
        for (int d = 0; d < 4; d++) {
            double theta = links.linkFraction(i, j, d);
            if (theta < nearest && conductorOf(i, j, d) >= 0) {
                nearest = theta;
                best = conductorOf(i, j, d);
            }
        }
        return best;
    }

    /** Crossings of one grid line with every conductor, ascending, each with its conductor's index. */
    private record Labelled(double[] at, int[] owner) {

        static Labelled atY(List<Loop> conductors, double y) {
            double[][] per = new double[conductors.size()][];
            for (int c = 0; c < per.length; c++) {
                per[c] = WallCrossings.atY(conductors.get(c).pieces(), y);
            }
            return merge(per);
        }

        static Labelled atX(List<Loop> conductors, double x) {
            double[][] per = new double[conductors.size()][];
            for (int c = 0; c < per.length; c++) {
                per[c] = WallCrossings.atX(conductors.get(c).pieces(), x);
            }
            return merge(per);
        }

        private static Labelled merge(double[][] per) {
            int total = 0;
            for (double[] p : per) {
                total += p.length;
            }
            double[] at = new double[total];
            int[] from = new int[total];
            int k = 0;
            for (int c = 0; c < per.length; c++) {
                for (double v : per[c]) {
                    at[k] = v;
                    from[k++] = c;
                }
            }
            Integer[] index = new Integer[total];
            for (int q = 0; q < total; q++) {
                index[q] = q;
            }
            Arrays.sort(index, (a, b) -> Double.compare(at[a], at[b]));
            double[] sorted = new double[total];
            int[] owner = new int[total];
            for (int q = 0; q < total; q++) {
                sorted[q] = at[index[q]];
                owner[q] = from[index[q]];
            }
            return new Labelled(sorted, owner);
        }
    }
}
