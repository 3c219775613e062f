package org.sectio.operator;

import org.sectio.mesh.LinkConductors;
import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;

/**
 * The boundary data of the electrostatic problem −∇²φ = 0 with φ = V_c on conductor c, on the
 * cut-link node stencil of {@link DirichletNodeAssembler} (Gibou et al. 2002): that stiffness A
 * already holds, on the diagonal, the weight w = dual length / (θ · link length) of every link that
 * ends on a wall. Those links carry the conductors' potentials to the right-hand side:
 *
 * <pre>
 *   A φ = Σ_c V_c s_c,     s_c[k] = Σ_{links from unknown k ending on conductor c} w,
 * </pre>
 *
 * and the discrete energy Σ_links w (Δφ)² of two such potentials u, v (all links, those to the walls
 * with their wall values) is E(u, v) = Σ_c V_c^u V_c^v S_c − uᵀ b_v, with S_c = Σ_k s_c[k] and
 * b_v = Σ_c V_c^v s_c (using A u = b_u). Dimensionless (w is a length ratio); times ε0 εr it is the
 * capacitance per unit length in F/m.
 *
 * @param sources s_c for every conductor, indexed [conductor][unknown]
 * @param wallWeights S_c for every conductor
 */
public record ConductorSources(double[][] sources, double[] wallWeights) {

    /**
     * @param links the node classification (its wall crossings are the guide's, all conductors)
     * @param owners which conductor each link ends on
     * @param conductors the number of conductors
     * @throws IllegalStateException if a wall link cannot be given a conductor (a grid inconsistency)
     */
    public static ConductorSources of(NodeLinks links, LinkConductors owners, int conductors) {
        TensorGrid grid = links.grid();
        int n = links.unknowns();
        int columns = grid.cellsX() + 1;
        double[][] s = new double[conductors][n];
        double[] total = new double[conductors];
        int[] di = {-1, 1, 0, 0};
        int[] dj = {0, 0, -1, 1};
        for (int k = 0; k < n; k++) {
            int node = links.nodeOf(k);
            int i = node % columns;
            int j = node / columns;
            double dualWidth = 0.5 * (grid.xStep(i, -1) + grid.xStep(i, +1));
            double dualHeight = 0.5 * (grid.yStep(j, -1) + grid.yStep(j, +1));
            for (int d = 0; d < 4; d++) {
                double theta = links.linkFraction(i, j, d);
                int ni = i + di[d];
                int nj = j + dj[d];
                boolean neighbourUnknown = links.unknownAt(ni, nj) >= 0;
                if (theta >= 1.0 && neighbourUnknown) {
                    continue;
                }
                boolean inGrid = ni >= 0 && nj >= 0 && ni < columns && nj <= grid.cellsY();
                int c = theta < 1.0 || !inGrid ? owners.conductorOf(i, j, d) : owners.conductorOfWallNode(links, ni, nj);
                if (c < 0) {
                    c = owners.conductorOf(i, j, d);
                }
                if (c < 0) {
                    throw new IllegalStateException("link " + d + " of node (" + i + ", " + j + ") ends on a wall"
                            + " that belongs to no conductor");
                }
                boolean horizontal = d == NodeLinks.LEFT || d == NodeLinks.RIGHT;
                double length = horizontal ? grid.xStep(i, di[d]) : grid.yStep(j, dj[d]);
                double w = (horizontal ? dualHeight : dualWidth) / (theta * length);
                s[c][k] += w;
                total[c] += w;
            }
        }
        return new ConductorSources(s, total);
    }
}
