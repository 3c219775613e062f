package org.sectio.operator;

import org.ejml.data.DMatrixSparseCSC;

/**
 * A discrete scalar eigenproblem {@code A x = λ M x} whose unknowns sit on a 2-D lattice (grid cells
 * or grid nodes): A sparse symmetric positive semi-definite with a 5-point pattern, or 9-point where
 * a TE pencil crosses oblique or curved dielectric interfaces (both triangles stored), M diagonal and
 * positive. λ = kc², rad²/m².
 *
 * @param stiffness A, m⁰ (dimensionless face-length ratios), n × n
 * @param mass the diagonal of M, m² (cell or dual-cell areas), length n
 * @param column lattice column of each unknown
 * @param row lattice row of each unknown
 */
public record LatticePencil(DMatrixSparseCSC stiffness, double[] mass, int[] column, int[] row) {

    public LatticePencil {
        int n = mass.length;
        if (stiffness.numRows != n || stiffness.numCols != n || column.length != n || row.length != n) {
            throw new IllegalArgumentException("pencil: A is " + stiffness.numRows + " × " + stiffness.numCols
                    + ", M has " + n + " entries, lattice " + column.length + "/" + row.length);
        }
    }

    /** @return the number of unknowns n */
    public int size() {
        return mass.length;
    }

    /** @return A − σM as a new matrix */
    public DMatrixSparseCSC shifted(double shift) {
        DMatrixSparseCSC k = stiffness.copy();
        for (int c = 0; c < k.numCols; c++) {
            for (int p = k.col_idx[c]; p < k.col_idx[c + 1]; p++) {
                if (k.nz_rows[p] == c) {
                    k.nz_values[p] -= shift * mass[c];
                }
            }
        }
        return k;
    }
}
