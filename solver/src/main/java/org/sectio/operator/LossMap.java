package org.sectio.operator;

import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.mesh.MaterialAreas;
import org.sectio.mesh.StaggeredGrids;
import org.sectio.mesh.TensorGrid;

/**
 * The imaginary part of the permittivity, ⟨ε′ tan δ⟩ (εr = ε′(1 − j tan δ)), averaged over the same
 * control volumes as {@link PermittivityMap}: node dual cells and the boxes across vertical and
 * horizontal faces. The arithmetic mean is exact inside one material; at an interface it is the
 * first-order share of the loss, which is what a small tan δ needs.
 */
public final class LossMap {

    private final int cellsX;
    private final double[] node;
    private final double[] vertical;
    private final double[] horizontal;

    private LossMap(int cellsX, double[] node, double[] vertical, double[] horizontal) {
        this.cellsX = cellsX;
        this.node = node;
        this.vertical = vertical;
        this.horizontal = horizontal;
    }

    /**
     * @param section the cross-section
     * @param grid the primary grid
     * @return the map, or null if no material of the section has tan δ &gt; 0
     */
    public static LossMap of(CrossSection section, TensorGrid grid) {
        boolean lossy = section.filling().lossTangent() > 0;
        for (Dielectric d : section.dielectrics()) {
            lossy |= d.material().lossTangent() > 0;
        }
        if (!lossy) {
            return null;
        }
        return new LossMap(grid.cellsX(), mean(section, StaggeredGrids.nodeDual(grid)),
                mean(section, StaggeredGrids.acrossVerticalFaces(grid)),
                mean(section, StaggeredGrids.acrossHorizontalFaces(grid)));
    }

    private static double[] mean(CrossSection section, TensorGrid boxes) {
        int nx = boxes.cellsX();
        int ny = boxes.cellsY();
        MaterialAreas guide = MaterialAreas.of(section.wallPieces(), boxes);
        double fill = section.filling().relativePermittivity() * section.filling().lossTangent();
        double[] sum = new double[nx * ny];
        double[] covered = new double[nx * ny];
        for (Dielectric d : section.dielectrics()) {
            MaterialAreas in = MaterialAreas.of(d.region().pieces(), boxes);
            double value = d.material().relativePermittivity() * d.material().lossTangent();
            for (int j = 0; j < ny; j++) {
                for (int i = 0; i < nx; i++) {
                    sum[j * nx + i] += value * in.area(i, j);
                    covered[j * nx + i] += in.area(i, j);
                }
            }
        }
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                int c = j * nx + i;
                double total = guide.area(i, j);
                sum[c] = total > 0 ? (sum[c] + fill * Math.max(0, total - covered[c])) / Math.max(total, covered[c])
                        : fill;
            }
        }
        return sum;
    }

    /** @return ⟨ε′ tan δ⟩ of the dual cell of node (i, j) */
    public double node(int i, int j) {
        return node[j * (cellsX + 1) + i];
    }

    /** @return ⟨ε′ tan δ⟩ of the box across vertical face (i, j) */
    public double verticalFace(int i, int j) {
        return vertical[j * (cellsX + 1) + i];
    }

    /** @return ⟨ε′ tan δ⟩ of the box across horizontal face (i, j) */
    public double horizontalFace(int i, int j) {
        return horizontal[j * cellsX + i];
    }
}
