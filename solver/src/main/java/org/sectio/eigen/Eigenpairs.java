package org.sectio.eigen;

import java.util.Arrays;

/**
 * The eigenpairs {@code A xᵢ = λᵢ M xᵢ} of a symmetric pencil found by an eigensolver, in ascending
 * order of {@code λ}, with {@code M}-orthonormal vectors ({@code xᵢᵀ M xⱼ = δᵢⱼ}).
 *
 * @param values the eigenvalues {@code λᵢ}, ascending
 * @param vectors {@code vectors[i]} is the eigenvector of {@code values[i]}
 * @param relativeResiduals {@code ‖A xᵢ − λᵢ M xᵢ‖₂ / (‖A xᵢ‖₂ + |λᵢ| ‖M xᵢ‖₂)} for each pair
 * @param operatorApplications how many shift-invert solves the iteration used
 */
public record Eigenpairs(double[] values, double[][] vectors, double[] relativeResiduals, int operatorApplications) {

    public Eigenpairs {
        if (values.length != vectors.length || values.length != relativeResiduals.length) {
            throw new IllegalArgumentException("eigenpairs: " + values.length + " values, " + vectors.length
                    + " vectors and " + relativeResiduals.length + " residuals; the three counts must agree");
        }
        values = values.clone();
        relativeResiduals = relativeResiduals.clone();
        vectors = Arrays.stream(vectors).map(double[]::clone).toArray(double[][]::new);
    }

    /** @return how many pairs were found */
    public int count() {
        return values.length;
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public double[] relativeResiduals() {
        return relativeResiduals.clone();
    }

    /** @return a copy of eigenvector {@code i} */
    public double[] vector(int i) {
        return vectors[i].clone();
    }

    @Override
    public double[][] vectors() {
        return Arrays.stream(vectors).map(double[]::clone).toArray(double[][]::new);
    }
}
