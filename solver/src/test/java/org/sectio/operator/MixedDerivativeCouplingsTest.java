package org.sectio.operator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;
import org.ejml.ops.DConvertMatrixStruct;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;
import org.sectio.geometry.Shapes;
import org.sectio.mesh.CutCells;
import org.sectio.mesh.TensorGrid;

/**
 * The off-diagonal part of the smoothed εr⁻¹ tensor and the 9-point Hz pencil it makes. Closed form:
 * a = ⟨εr⁻¹⟩ I + (1/⟨εr⟩ − ⟨εr⁻¹⟩) n nᵀ (Farjadpour et al., Opt. Lett. 31 (2006) 2972; Kottke,
 * Farjadpour &amp; Johnson, Phys. Rev. E 77 (2008) 036611, from memory), so a box cut in half by the
 * line x + y = const (n = (1, 1)/√2) has a_xy = ½ (2/(1 + εr) − (1 + 1/εr)/2). The pencil of the weak
 * form ∫ ∇u · a ∇u is symmetric, annihilates constants (∂Hz/∂n = 0: the constant is the λ = 0 mode)
 * and is positive semi-definite.
 */
class MixedDerivativeCouplingsTest {

    private static final double EPS = 4.0;

    private static CrossSection square(Region dielectric) {
        Region inside = Region.of(Outline.startAt(0, 0).lineTo(0.01, 0).lineTo(0.01, 0.01).lineTo(0, 0.01).close());
        return new GuideSection("square", inside, List.of(new Dielectric("d", dielectric, new Material(EPS, 1, 0))),
                Material.AIR);
    }

    private static int diagonalCouplings(LatticePencil pencil) {
        DMatrixSparseCSC a = pencil.stiffness();
        int count = 0;
        for (int k = 0; k < a.numCols; k++) {
            for (int p = a.col_idx[k]; p < a.col_idx[k + 1]; p++) {
                int l = a.nz_rows[p];
                if (pencil.column()[l] != pencil.column()[k] && pencil.row()[l] != pencil.row()[k]) {
                    count++;
                }
            }
        }
        return count;
    }

    @Test
    void aNodeBoxHalvedByADiagonalInterfaceHasTheClosedFormOffDiagonal() {
        // the triangle below x + y = 10 mm: its hypotenuse passes through node (5, 5) of 1 mm cells
        CrossSection guide = square(Region.of(Outline.startAt(0, 0).lineTo(0.01, 0).lineTo(0, 0.01).close()));
        PermittivityMap medium = PermittivityMap.of(guide, TensorGrid.fitted(guide.bounds(), 10));
        double expected = 0.5 * (2 / (1 + EPS) - (1 + 1 / EPS) / 2);
        // a closed form of the exact areas and normal: the tolerance is round-off
        assertEquals(expected, medium.nodeCrossInverse(5, 5), 1e-12);
        // boxes of one material and uniform media carry no cross term
        assertEquals(0.0, medium.nodeCrossInverse(2, 2));
        assertEquals(0.0, medium.nodeCrossInverse(8, 8));
        assertEquals(0.0, PermittivityMap.uniform(EPS).nodeCrossInverse(5, 5));
        assertTrue(PermittivityMap.hasOffAxisInterfaces(guide));
    }

    @Test
    void interfacesAlongTheAxesAndAirKeepTheFivePointPencil() {
        CrossSection slab = square(Region.of(Outline.startAt(0.0031, 0).lineTo(0.0063, 0).lineTo(0.0063, 0.01)
                .lineTo(0.0031, 0.01).close()));
        TensorGrid grid = TensorGrid.fitted(slab.bounds(), 23);
        CutCells cells = CutCells.of(slab, grid);
        assertEquals(0, diagonalCouplings(NeumannCellAssembler.assemble(cells, PermittivityMap.of(slab, grid))));
        assertEquals(0, diagonalCouplings(NeumannCellAssembler.assemble(cells)));
        assertTrue(!PermittivityMap.hasOffAxisInterfaces(slab));
    }

    @Test
    void theRodLoadedPencilIsSymmetricAnnihilatesConstantsAndIsPositiveSemiDefinite() {
        Region rod = Region.of(Shapes.circle(0.004, 0.3e-3, -0.2e-3).wallPieces());
        CrossSection guide = new GuideSection("rod", Region.of(Shapes.circle(0.010, 0.3e-3, -0.2e-3).wallPieces()),
                List.of(new Dielectric("rod", rod, new Material(EPS, 1, 0))), Material.AIR);
        TensorGrid grid = TensorGrid.shifted(guide.bounds(), 26, 0.37, 0.61);
        LatticePencil pencil = NeumannCellAssembler.assemble(CutCells.of(guide, grid), PermittivityMap.of(guide, grid));
        assertTrue(diagonalCouplings(pencil) > 0, "the curved interface couples diagonal neighbours");
        DMatrixRMaj a = DConvertMatrixStruct.convert(pencil.stiffness(), (DMatrixRMaj) null);
        int n = a.numRows;
        double largest = 0;
        for (int k = 0; k < n; k++) {
            double rowSum = 0;
            for (int l = 0; l < n; l++) {
                assertEquals(a.get(k, l), a.get(l, k), 0.0, "symmetry at " + k + ", " + l);
                rowSum += a.get(k, l);
            }
            largest = Math.max(largest, a.get(k, k));
            // measured: |row sum| ≤ 2.1e-16 of the diagonal
            assertEquals(0, rowSum, 1e-13 * a.get(k, k), "row " + k);
        }
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(n, false, true);
        assertTrue(eig.decompose(a.copy()));
        double lowest = Double.POSITIVE_INFINITY;
        for (int k = 0; k < n; k++) {
            lowest = Math.min(lowest, eig.getEigenvalue(k).getReal());
        }
        // measured: lowest eigenvalue −2.6e-15 of the largest diagonal entry (the constant mode)
        assertTrue(lowest > -1e-12 * largest, "lowest eigenvalue " + lowest);
    }
}
