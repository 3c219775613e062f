package org.sectio.operator;

import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.Material;
import org.sectio.geometry.WallPiece;
import org.sectio.mesh.MaterialAreas;
import org.sectio.mesh.StaggeredGrids;
import org.sectio.mesh.TensorGrid;

/**
 * The relative permittivity εr of a cross-section averaged onto the control volumes of a grid, for the
 * two pencils at cutoff (β = 0, μr = 1):
 *
 * <pre>
 *   Ez:  −∇·∇Ez = k0² εr Ez,  Ez = 0 on metal        (mass:   M = ⟨εr⟩ × dual-cell area)
 *   Hz:  −∇·(εr⁻¹ ∇Hz) = k0² Hz,  ∂Hz/∂n = 0 on metal   (faces: w = ℓ_open / d × a_eff)
 * </pre>
 *
 * <p>Averages are over the part of the control volume inside the guide, with exact material areas
 * ({@link MaterialAreas}): ⟨εr⟩ = Σ_m εr,m S_m / S and ⟨εr⁻¹⟩ = Σ_m S_m / (εr,m S). The node mass uses
 * ⟨εr⟩ of the node's dual cell: Ez is continuous across an interface, so the mass is the arithmetic
 * mean. A face uses the box spanned by its link (centre to centre) and the face, and the subpixel
 * smoothing of Farjadpour et al., "Improving accuracy by subpixel smoothing in the finite-difference
 * time domain", Opt. Lett. 31 (2006) 2972, for the coefficient a = εr⁻¹ of the flux a ∇Hz: the flux
 * normal to an interface is continuous, so that component sees the harmonic mean 1/⟨εr⟩ of a; the
 * gradient along the interface is continuous, so that component sees the arithmetic mean ⟨εr⁻¹⟩.
 * Projected on the link direction e with the interface's unit normal n in the box,
 *
 * <pre>
 *   a_eff = (n·e)² / ⟨εr⟩ + (1 − (n·e)²) ⟨εr⁻¹⟩.
 * </pre>
 *
 * For an interface between two cell centres perpendicular to the link this is the harmonic mean of
 * εr⁻¹ along the link (exact flux for a layered medium); for an interface along the link it is the
 * arithmetic mean of εr⁻¹ over the face. The normal is the direction of ∫ n dℓ of the dielectric
 * boundaries in the box; a box whose boundaries cancel (a sliver thinner than the box) takes
 * (n·e)² = ½. A box holding one material gets exactly 1/εr.
 *
 * <p>The tensor a = ⟨εr⁻¹⟩ I + (1/⟨εr⟩ − ⟨εr⁻¹⟩) n nᵀ of that smoothing also has an off-diagonal
 * entry a_xy = n_x n_y (1/⟨εr⟩ − ⟨εr⁻¹⟩), which is what couples ∂Hz/∂x to the flux along y at an
 * oblique or curved interface; it is averaged over the node dual cells
 * ({@link #nodeCrossInverse}), where both gradient components of the four cells around a node meet.
 *
 * <p>A uniform medium ({@link #uniform}) stores nothing and returns the same numbers everywhere, so an
 * air-filled guide gives bit for bit the pencils of before.
 */
public final class PermittivityMap {

    private final double uniform;
    private final int cellsX;
    private final double[] nodeMean;
    private final double[] verticalFace;
    private final double[] horizontalFace;
    private final double[] nodeCross;
    private final double maximum;

    private PermittivityMap(double uniform, int cellsX, double[] nodeMean, double[] verticalFace,
                            double[] horizontalFace, double[] nodeCross, double maximum) {
        this.uniform = uniform;
        this.cellsX = cellsX;
        this.nodeMean = nodeMean;
        this.verticalFace = verticalFace;
        this.horizontalFace = horizontalFace;
        this.nodeCross = nodeCross;
        this.maximum = maximum;
    }

    /** @return a medium of one permittivity εr ≥ 1 everywhere */
    public static PermittivityMap uniform(double relativePermittivity) {
        if (!(relativePermittivity >= 1.0) || !Double.isFinite(relativePermittivity)) {
            throw new IllegalArgumentException("relative permittivity must be finite and ≥ 1, got "
                    + relativePermittivity);
        }
        return new PermittivityMap(relativePermittivity, 0, null, null, null, null, relativePermittivity);
    }

    /**
     * Averages the cross-section's materials onto the grid.
     *
     * @throws IllegalArgumentException if a material has μr ≠ 1 (the pencils above assume μr = 1)
     */
    public static PermittivityMap of(CrossSection section, TensorGrid grid) {
        requireNonMagnetic(section.filling(), "the filling");
        List<Dielectric> regions = section.dielectrics();
        double max = section.filling().relativePermittivity();
        boolean same = true;
        for (Dielectric d : regions) {
            requireNonMagnetic(d.material(), "dielectric region '" + d.name() + "'");
            max = Math.max(max, d.material().relativePermittivity());
            same &= d.material().relativePermittivity() == section.filling().relativePermittivity();
        }
        if (same) {
            return uniform(section.filling().relativePermittivity());
        }
        Averages node = Averages.on(section, StaggeredGrids.nodeDual(grid));
        Averages vertical = Averages.on(section, StaggeredGrids.acrossVerticalFaces(grid));
        Averages horizontal = Averages.on(section, StaggeredGrids.acrossHorizontalFaces(grid));
        return new PermittivityMap(Double.NaN, grid.cellsX(), node.arithmetic(),
                vertical.effectiveInverse(true), horizontal.effectiveInverse(false), node.offDiagonalInverse(), max);
    }

    /**
     * Whether some interface between materials of different εr is neither horizontal nor vertical (an
     * arc, or an oblique segment). There the Hz scheme keeps a small first-order part of its error
     * (measured on a rod-loaded circle: fitted order about 1.6 over 48 to 320 cells), so an error
     * estimate must not assume order 2.
     *
     * @param section the cross-section
     * @return true if a dielectric region of εr different from the filling's has a boundary piece
     *     whose ends differ in both x and y
     */
    public static boolean hasOffAxisInterfaces(CrossSection section) {
        double fill = section.filling().relativePermittivity();
        for (Dielectric d : section.dielectrics()) {
            if (d.material().relativePermittivity() == fill) {
                continue;
            }
            for (WallPiece piece : d.region().pieces()) {
                if (piece.startX() != piece.endX() && piece.startY() != piece.endY()) {
                    return true;
                }
            }
        }
        return false;
    }

    private static void requireNonMagnetic(Material m, String what) {
        if (m.relativePermeability() != 1.0) {
            throw new IllegalArgumentException(what + " has relative permeability " + m.relativePermeability()
                    + "; only non-magnetic materials (μr = 1) are supported");
        }
    }

    /** @return whether εr is the same everywhere */
    public boolean isUniform() {
        return nodeMean == null;
    }

    /** @return the largest εr of any material of the cross-section */
    public double maximum() {
        return maximum;
    }

    /** @return ⟨εr⟩ over the guide part of the dual cell of node (i, j) */
    public double nodeMean(int i, int j) {
        return nodeMean == null ? uniform : nodeMean[j * (cellsX + 1) + i];
    }

    /** @return a_eff (see the class comment) of the link across vertical face (i, j), 1 ≤ i ≤ cellsX − 1 */
    public double verticalFaceInverse(int i, int j) {
        return verticalFace == null ? 1.0 / uniform : verticalFace[j * (cellsX + 1) + i];
    }

    /** @return a_eff of the link across horizontal face (i, j), 1 ≤ j ≤ cellsY − 1 */
    public double horizontalFaceInverse(int i, int j) {
        return horizontalFace == null ? 1.0 / uniform : horizontalFace[j * cellsX + i];
    }

    /**
     * The off-diagonal entry of the smoothed tensor over the dual cell of node (i, j) (the box between
     * the four cell centres around the node): a_xy = n_x n_y (1/⟨εr⟩ − ⟨εr⁻¹⟩), where n is the interface
     * normal in the box. It is exactly 0 in a uniform medium, in a box of one material and wherever
     * the interfaces are parallel to the axes.
     *
     * @return a_xy, dimensionless, in [−½(⟨εr⁻¹⟩ − 1/⟨εr⟩), ½(⟨εr⁻¹⟩ − 1/⟨εr⟩)]
     */
    public double nodeCrossInverse(int i, int j) {
        return nodeCross == null ? 0.0 : nodeCross[j * (cellsX + 1) + i];
    }
}
