package org.sectio.operator;

import org.sectio.mesh.CutCells;
import org.sectio.mesh.NodeLinks;
import org.sectio.mesh.TensorGrid;

/**
 * The unknowns of the transverse-field Yee scheme on a cut grid, and the lengths that weight them.
 *
 * <p>On the Yee lattice of the scalar solvers Hz lives at cell centres (the TE unknowns of
 * {@link NeumannCellAssembler}), Ez at nodes (the TM unknowns of {@link DirichletNodeAssembler}),
 * and the transverse fields on the faces between: Hx and Ey at the midpoints of vertical faces
 * (x_i, y_{j+½}), Hy and Ex at the midpoints of horizontal faces (x_{i+½}, y_j). A face is also the
 * grid link between two nodes, so every edge f carries two lengths: its open length ℓ_f (the part
 * of the face inside the guide, as in the TE scheme; for a link cut once by the wall it is the
 * distance from the inside node to the wall, θ h, as in the TM scheme) and its dual length d_f (the
 * distance between the two cell centres it separates).
 *
 * <p>An edge is an unknown when its open length is positive, both cells it separates are TE unknowns
 * and at least one of its two end nodes is a TM unknown. An edge with both ends on or beyond the
 * wall (a chord of the wall crossing one link) carries no circulation; keeping it would add a field
 * with zero divergence and zero curl, a spurious mode at β² = k0² εr.
 *
 * <p>Edges are numbered Hx before Hy, each row by row. Lattice points for the nested-dissection
 * ordering are the Yee positions rotated by 45°: Hx(i, j) ↦ (i + j, j − i + 1 + cellsX),
 * Hy(i, j) ↦ (i + j, j − i + cellsX). Every coupling of the scheme (the four edges of a cell, the
 * four edges at a node) then joins lattice neighbours, which the dissection needs.
 */
public final class YeeEdges {

    /** Edge kind: Hx on a vertical face. */
    public static final int HX = 0;
    /** Edge kind: Hy on a horizontal face. */
    public static final int HY = 1;

    private final TensorGrid grid;
    private final int[] kind;
    private final int[] faceColumn;
    private final int[] faceRow;
    private final double[] openLength;
    private final double[] dualLength;
    private final int[] cellUnknown;
    private final int cellCount;
    private final NodeLinks nodes;

    private YeeEdges(TensorGrid grid, int[] kind, int[] faceColumn, int[] faceRow, double[] openLength,
                     double[] dualLength, int[] cellUnknown, int cellCount, NodeLinks nodes) {
        this.grid = grid;
        this.kind = kind;
        this.faceColumn = faceColumn;
        this.faceRow = faceRow;
        this.openLength = openLength;
        this.dualLength = dualLength;
        this.cellUnknown = cellUnknown;
        this.cellCount = cellCount;
        this.nodes = nodes;
    }

    /**
     * Classifies the faces, cells and nodes of a cut grid.
     *
     * @param cells the cut grid
     * @return the edge unknowns with their lengths, the TE cell and TM node numbering
     */
    public static YeeEdges of(CutCells cells) {
        TensorGrid grid = cells.grid();
        int nx = grid.cellsX();
        int ny = grid.cellsY();
        double[] xs = grid.xLines();
        double[] ys = grid.yLines();
        NodeLinks links = NodeLinks.of(cells);
        int[] cellUnknown = new int[nx * ny];
        int cellCount = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                cellUnknown[j * nx + i] = NeumannCellAssembler.isUnknown(cells, i, j) ? cellCount++ : -1;
            }
        }
        int capacity = (nx + 1) * ny + nx * (ny + 1);
        int[] kind = new int[capacity];
        int[] col = new int[capacity];
        int[] row = new int[capacity];
        double[] open = new double[capacity];
        double[] dual = new double[capacity];
        int n = 0;
        for (int j = 0; j < ny; j++) {
            for (int i = 1; i < nx; i++) {
                double l = cells.verticalFaceOpenLength(i, j);
                boolean cellsOpen = cellUnknown[j * nx + i - 1] >= 0 && cellUnknown[j * nx + i] >= 0;
                boolean linked = links.unknownAt(i, j) >= 0 || links.unknownAt(i, j + 1) >= 0;
                if (l > 0 && cellsOpen && linked) {
                    kind[n] = HX;
                    col[n] = i;
                    row[n] = j;
                    open[n] = l;
                    dual[n] = 0.5 * (xs[i + 1] - xs[i - 1]);
                    n++;
                }
            }
        }
        for (int j = 1; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                double l = cells.horizontalFaceOpenLength(i, j);
                boolean cellsOpen = cellUnknown[(j - 1) * nx + i] >= 0 && cellUnknown[j * nx + i] >= 0;
                boolean linked = links.unknownAt(i, j) >= 0 || links.unknownAt(i + 1, j) >= 0;
                if (l > 0 && cellsOpen && linked) {
                    kind[n] = HY;
                    col[n] = i;
                    row[n] = j;
                    open[n] = l;
                    dual[n] = 0.5 * (ys[j + 1] - ys[j - 1]);
                    n++;
                }
            }
        }
        return new YeeEdges(grid, java.util.Arrays.copyOf(kind, n), java.util.Arrays.copyOf(col, n),
                java.util.Arrays.copyOf(row, n), java.util.Arrays.copyOf(open, n), java.util.Arrays.copyOf(dual, n),
                cellUnknown, cellCount, links);
    }

    /** @return the grid */
    public TensorGrid grid() {
        return grid;
    }

    /** @return the number of edge unknowns */
    public int size() {
        return kind.length;
    }

    /** @return {@link #HX} or {@link #HY} */
    public int kind(int edge) {
        return kind[edge];
    }

    /** @return the face column i (Hx: the vertical line x_i; Hy: the cell column) */
    public int faceColumn(int edge) {
        return faceColumn[edge];
    }

    /** @return the face row j (Hx: the cell row; Hy: the horizontal line y_j) */
    public int faceRow(int edge) {
        return faceRow[edge];
    }

    /** @return ℓ_f, the open length of the face, m */
    public double openLength(int edge) {
        return openLength[edge];
    }

    /** @return d_f, the distance between the centres of the two cells the face separates, m */
    public double dualLength(int edge) {
        return dualLength[edge];
    }

    /** @return the TE unknown of cell (i, j), or −1 */
    public int cellUnknown(int i, int j) {
        return cellUnknown[j * grid.cellsX() + i];
    }

    /** @return the number of TE cell unknowns */
    public int cellCount() {
        return cellCount;
    }

    /** @return the TM node classification of the same grid */
    public NodeLinks nodes() {
        return nodes;
    }

    /** @return the lattice column of every edge for the nested-dissection ordering (see the class comment) */
    public int[] latticeColumns() {
        int[] out = new int[kind.length];
        for (int e = 0; e < out.length; e++) {
            out[e] = faceColumn[e] + faceRow[e];
        }
        return out;
    }

    /** @return the lattice row of every edge for the nested-dissection ordering (see the class comment) */
    public int[] latticeRows() {
        int[] out = new int[kind.length];
        for (int e = 0; e < out.length; e++) {
            out[e] = faceRow[e] - faceColumn[e] + (kind[e] == HX ? 1 : 0) + grid.cellsX();
        }
        return out;
    }
}
