package org.sectio.eigen;

import java.util.Arrays;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.EigenDecomposition_F64;

/**
 * The projection {@code T = Vᵀ M OP V} of a thick-restart Lanczos basis: after a restart that kept k
 * Ritz pairs, the leading k × k block is {@code diag(θ₁ … θ_k)}, row and column k carry the couplings
 * {@code sᵢ = β yₘᵢ} of the kept Ritz vectors to the restart vector (an arrowhead), and from there on it is
 * tridiagonal with the Lanczos {@code α_j} on the diagonal and {@code β_j} beside it (K. Wu and H. Simon,
 * SIAM J. Matrix Anal. Appl. 22 (2000) 602–616, §2). It is small (the basis size), so its eigenpairs come
 * from EJML's dense symmetric decomposition.
 */
final class ArrowheadTridiagonal {

    /** Eigenpairs of a leading block, ordered by decreasing |θ| (the largest-magnitude end first). */
    record Ritz(double[] values, double[][] vectors) {
    }

    private final double[][] t;

    /** @param capacity the largest order of T */
    ArrowheadTridiagonal(int capacity) {
        this.t = new double[capacity][capacity];
    }

    /** Sets T to zero. */
    void clear() {
        for (double[] row : t) {
            Arrays.fill(row, 0.0);
        }
    }

    /** Sets {@code T[i][j] = T[j][i] = value}. */
    void set(int i, int j, double value) {
        t[i][j] = value;
        t[j][i] = value;
    }

    /**
     * The eigenpairs of the leading {@code size × size} block.
     *
     * @return values by decreasing magnitude and {@code vectors[row][column]}, column i belonging to value i
     * @throws EigenSolverException if EJML's decomposition fails (a non-finite entry)
     */
    Ritz decompose(int size) {
        DMatrixRMaj block = new DMatrixRMaj(size, size);
        for (int i = 0; i < size; i++) {
            for (int j = 0; j < size; j++) {
                block.set(i, j, t[i][j]);
            }
        }
        EigenDecomposition_F64<DMatrixRMaj> eig = DecompositionFactory_DDRM.eig(size, true, true);
        if (!eig.decompose(block)) {
            throw new EigenSolverException("the dense eigen-decomposition of the " + size + " x " + size
                    + " Lanczos projection failed; an operator application returned a non-finite vector", 0, 0,
                    0, 0);
        }
        Integer[] order = new Integer[size];
        double[] raw = new double[size];
        for (int i = 0; i < size; i++) {
            order[i] = i;
            raw[i] = eig.getEigenvalue(i).getReal();
        }
        Arrays.sort(order, (a, b) -> {
            int byMagnitude = Double.compare(Math.abs(raw[b]), Math.abs(raw[a]));
            return byMagnitude != 0 ? byMagnitude : Double.compare(raw[b], raw[a]);
        });
        double[] values = new double[size];
        double[][] vectors = new double[size][size];
        for (int c = 0; c < size; c++) {
            values[c] = raw[order[c]];
            DMatrixRMaj y = eig.getEigenVector(order[c]);
            for (int r = 0; r < size; r++) {
                vectors[r][c] = y.get(r, 0);
            }
        }
        return new Ritz(values, vectors);
    }
}
