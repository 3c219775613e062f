package org.sectio.mesh;

/**
 * The grid nodes inside the guide and, for each, how far along each of its four grid links the wall
 * lies: the data of the symmetric cut-link (Dirichlet) stencil.
 *
 * <p>For node (i, j) and direction d ∈ {left, right, down, up}, the link fraction θ ∈ (0, 1] is the
 * distance to the nearest wall crossing on that link divided by the link length; θ = 1 with a
 * neighbour that is not an unknown means the neighbour is a wall node (value zero). A node closer to
 * the wall than {@link #WALL_NODE_FRACTION} of a link is itself a wall node: keeping it would put
 * an unbounded 1/θ in the matrix, and its value is zero to that accuracy anyway.
 */
public final class NodeLinks {

    /** Link fraction below which a node counts as lying on the wall. */
    public static final double WALL_NODE_FRACTION = 1e-4;

    /** Direction indices into the link fraction arrays. */
    public static final int LEFT = 0;
    /** See {@link #LEFT}. */
    public static final int RIGHT = 1;
    /** See {@link #LEFT}. */
    public static final int DOWN = 2;
    /** See {@link #LEFT}. */
    public static final int UP = 3;

    private final TensorGrid grid;
    private final int[] unknownOfNode;
    private final int[] nodeOfUnknown;
    private final double[] linkFraction;

    private NodeLinks(TensorGrid grid, int[] unknownOfNode, int[] nodeOfUnknown, double[] linkFraction) {
        this.grid = grid;
        this.unknownOfNode = unknownOfNode;
        this.nodeOfUnknown = nodeOfUnknown;
        this.linkFraction = linkFraction;
    }

    /** Classifies every node of the cut grid. */
    public static NodeLinks of(CutCells cells) {
        TensorGrid grid = cells.grid();
        int nx = grid.cellsX() + 1;
        int ny = grid.cellsY() + 1;
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        double[] fraction = new double[4 * nx * ny];
        boolean[] inside = new boolean[nx * ny];
        for (int j = 0; j < ny; j++) {
            double[] c = cells.crossingsOnHorizontalLine(j);
            int p = 0;
            for (int i = 0; i < nx; i++) {
                while (p < c.length && c[p] <= xs[i]) {
                    p++;
                }
                int node = j * nx + i;
                inside[node] = p % 2 == 1;
                fraction[4 * node + LEFT] = p > 0 ? linkFraction(xs[i] - c[p - 1], grid.xStep(i, -1)) : 1.0;
                fraction[4 * node + RIGHT] = p < c.length ? linkFraction(c[p] - xs[i], grid.xStep(i, +1)) : 1.0;
            }
        }
        for (int i = 0; i < nx; i++) {
            double[] c = cells.crossingsOnVerticalLine(i);
            int p = 0;
            for (int j = 0; j < ny; j++) {
                while (p < c.length && c[p] <= ys[j]) {
                    p++;
                }
                int node = j * nx + i;
                fraction[4 * node + DOWN] = p > 0 ? linkFraction(ys[j] - c[p - 1], grid.yStep(j, -1)) : 1.0;
                fraction[4 * node + UP] = p < c.length ? linkFraction(c[p] - ys[j], grid.yStep(j, +1)) : 1.0;
            }
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int node = j * nx + i;
                boolean onEdge = (i == 0 && fraction[4 * node + LEFT] == 1.0) || (i + 1 == nx && fraction[4 * node + RIGHT] == 1.0)
                        || (j == 0 && fraction[4 * node + DOWN] == 1.0) || (j + 1 == ny && fraction[4 * node + UP] == 1.0);
                if (inside[node] && onEdge && minimum(fraction, node) >= WALL_NODE_FRACTION) {
                    throw new IllegalArgumentException("node (" + xs[i] + ", " + ys[j] + ") m on the grid's edge is"
                            + " inside the guide: the grid does not cover the cross-section");
                }
            }
        }
        int[] unknownOfNode = new int[nx * ny];
        int count = 0;
        for (int node = 0; node < nx * ny; node++) {
            boolean wall = minimum(fraction, node) < WALL_NODE_FRACTION;
            unknownOfNode[node] = inside[node] && !wall ? count++ : -1;
        }
        int[] nodeOfUnknown = new int[count];
        for (int node = 0; node < nx * ny; node++) {
            if (unknownOfNode[node] >= 0) {
                nodeOfUnknown[unknownOfNode[node]] = node;
            }
        }
        return new NodeLinks(grid, unknownOfNode, nodeOfUnknown, fraction);
    }

    private static double minimum(double[] fraction, int node) {
        return Math.min(Math.min(fraction[4 * node], fraction[4 * node + 1]),
                Math.min(fraction[4 * node + 2], fraction[4 * node + 3]));
    }


    /** Distance to the wall over link length, or 1 if the wall is beyond the link. */
    private static double linkFraction(double distance, double linkLength) {
        return distance >= linkLength ? 1.0 : distance / linkLength;
    }

    /** @return the grid */
    public TensorGrid grid() {
        return grid;
    }

    /** @return the number of unknown (interior, non-wall) nodes */
    public int unknowns() {
        return nodeOfUnknown.length;
    }

    /** @return the flat node index j·(cellsX+1)+i of unknown k */
    public int nodeOf(int unknown) {
        return nodeOfUnknown[unknown];
    }

    /** @return the unknown at node (i, j), or −1 if that node is outside or on the wall */
    public int unknownAt(int i, int j) {
        if (i < 0 || j < 0 || i > grid.cellsX() || j > grid.cellsY()) {
            return -1;
        }
        return unknownOfNode[j * (grid.cellsX() + 1) + i];
    }

    /** @return θ of node (i, j) in direction {@link #LEFT}, {@link #RIGHT}, {@link #DOWN} or {@link #UP} */
    public double linkFraction(int i, int j, int direction) {
        return linkFraction[4 * (j * (grid.cellsX() + 1) + i) + direction];
    }
}
