package org.sectio.eigen;

/**
 * Ritz pairs of a real non-symmetric operator: eigenvalues θ = re + j·im and eigenvectors
 * x = xr + j·xi (xi all zero for a real θ), each of unit 2-norm.
 *
 * @param valueReal Re θ, largest |θ| first
 * @param valueImaginary Im θ
 * @param vectorReal Re x of every pair
 * @param vectorImaginary Im x of every pair
 * @param residualEstimates ‖OP x − θ x‖₂ / |θ| from the Arnoldi relation
 * @param applications how many times the operator was applied
 * @param restarts how many thick restarts were made
 */
public record ArnoldiPairs(double[] valueReal, double[] valueImaginary, double[][] vectorReal,
                           double[][] vectorImaginary, double[] residualEstimates, int applications, int restarts) {

    /** @return the number of pairs */
    public int count() {
        return valueReal.length;
    }
}
