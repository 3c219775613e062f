package org.sectio.operator;

import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;

/**
 * The TM pencil: −∇²Ez = kc² Ez with Ez = 0 on metal, as the symmetric cut-link node stencil of
 * Gibou, Fedkiw, Cheng &amp; Kang, "A second-order-accurate symmetric discretization of the Poisson
 * equation on irregular domains", J. Comput. Phys. 176 (2002) 205–227. Ez lives at grid nodes inside
 * the guide. A link to a neighbouring node inside carries the weight (dual length / link length); a
 * link cut by the wall at fraction θ ends at the wall, where Ez = 0, so it adds
 * (dual length / (θ · link length)) to the diagonal only. The mass is the full dual-cell area, which
 * keeps the pencil symmetric; the local error at the wall is then O(1) but the eigenvalues converge at
 * second order (the cited paper's analysis, and our refinement tests).
 */
public final class DirichletNodeAssembler {

    private DirichletNodeAssembler() {
    }

    /** @return the TM pencil of an air-filled guide; unknowns are the interior non-wall nodes, row by row */
    public static LatticePencil assemble(NodeLinks links) {
        return assemble(links, PermittivityMap.uniform(1.0));
    }

    /**
     * The Ez pencil at cutoff of a guide with dielectrics (μr = 1): −∇²Ez = k0² εr Ez; the stiffness is
     * the cut-link stencil above and the mass of a node is its dual-cell area times ⟨εr⟩ over the
     * guide part of that cell ({@link PermittivityMap#nodeMean}). λ = k0², the free-space wavenumber
     * at cutoff squared; for air λ = kc².
     *
     * @param links the cut-link data of the grid
     * @param medium εr averaged on the same grid
     * @return the pencil; unknowns are the interior non-wall nodes, numbered row by row
     */
    public static LatticePencil assemble(NodeLinks links, PermittivityMap medium) {
        TensorGrid grid = links.grid();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        int n = links.unknowns();
        int columns = grid.cellsX() + 1;
        double[] mass = new double[n];
        int[] column = new int[n];
        int[] row = new int[n];
        LatticeMatrixBuilder a = new LatticeMatrixBuilder(n);
        for (int k = 0; k < n; k++) {
            int node = links.nodeOf(k);
            int i = node % columns;
            int j = node / columns;
            column[k] = i;
            row[k] = j;
            double hLeft = grid.xStep(i, -1);
            double hRight = grid.xStep(i, +1);
            double hDown = grid.yStep(j, -1);
            double hUp = grid.yStep(j, +1);
            double dualWidth = 0.5 * (hLeft + hRight);
            double dualHeight = 0.5 * (hDown + hUp);
            mass[k] = dualWidth * dualHeight * medium.nodeMean(i, j);
            int kDown = links.unknownAt(i, j - 1);
            int kLeft = links.unknownAt(i - 1, j);
            int kRight = links.unknownAt(i + 1, j);
            int kUp = links.unknownAt(i, j + 1);
            double diagonal = 0;
            diagonal += link(a, kDown, dualWidth, hDown, links.linkFraction(i, j, NodeLinks.DOWN), true);
            diagonal += link(a, kLeft, dualHeight, hLeft, links.linkFraction(i, j, NodeLinks.LEFT), true);
            a.add(k, diagonal
                    + weightOf(kRight, dualHeight, hRight, links.linkFraction(i, j, NodeLinks.RIGHT))
                    + weightOf(kUp, dualWidth, hUp, links.linkFraction(i, j, NodeLinks.UP)));
            link(a, kRight, dualHeight, hRight, links.linkFraction(i, j, NodeLinks.RIGHT), false);
            link(a, kUp, dualWidth, hUp, links.linkFraction(i, j, NodeLinks.UP), false);
            a.endColumn();
        }
        return new LatticePencil(a.build(), mass, column, row);
    }

    /** Diagonal contribution of one link. */
    private static double weightOf(int neighbour, double dualLength, double linkLength, double theta) {
        boolean cut = theta < 1.0 || neighbour < 0;
        return cut ? dualLength / (theta * linkLength) : dualLength / linkLength;
    }

    /**
     * Adds the off-diagonal entry of an uncut link to an unknown neighbour, and returns the link's
     * diagonal contribution when {@code returnDiagonal}.
     */
    private static double link(LatticeMatrixBuilder a, int neighbour, double dualLength, double linkLength,
                               double theta, boolean returnDiagonal) {
        boolean coupled = neighbour >= 0 && theta >= 1.0;
        if (coupled) {
            a.add(neighbour, -dualLength / linkLength);
        }
        return returnDiagonal ? weightOf(neighbour, dualLength, linkLength, theta) : 0.0;
    }

}
