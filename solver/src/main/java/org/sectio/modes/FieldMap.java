package org.sectio.modes;

/**
 * A mode's longitudinal field (Hz for TE, Ez for TM) sampled on the points of a tensor grid, normalized
 * so that its largest magnitude is 1 and its largest-magnitude sample is positive.
 *
 * <p>The weights, when present, are the discrete mass M of the solve mapped to the samples (TE: the open
 * cell area; TM and TEM: the dual-cell area; 0 outside), so that Σ w ψ² is the discrete ∫ ψ² dA whose
 * ratio to ∫ |∇ψ|² dA is the eigenvalue.
 *
 * @param xCoordinates the sample abscissae, m, ascending
 * @param yCoordinates the sample ordinates, m, ascending
 * @param values {@code values[j * xCoordinates.length + i]} is the field at (x[i], y[j]); NaN where the
 *     point is not inside the guide
 * @param weights the quadrature weight of each sample, m², same layout as {@code values}, each finite
 *     and ≥ 0; or an empty array when not known
 * @throws IllegalArgumentException if the array lengths do not match the grid or a weight is negative
 */
public record FieldMap(double[] xCoordinates, double[] yCoordinates, double[] values, double[] weights) {

    public FieldMap {
        if (values.length != xCoordinates.length * yCoordinates.length) {
            throw new IllegalArgumentException("field map: " + values.length + " values for a "
                    + xCoordinates.length + " × " + yCoordinates.length + " grid");
        }
        if (weights.length != 0 && weights.length != values.length) {
            throw new IllegalArgumentException("field map: " + weights.length + " weights for " + values.length
                    + " values");
        }
        for (double w : weights) {
            if (!(w >= 0) || Double.isInfinite(w)) {
                throw new IllegalArgumentException("field map: sample weights must be finite and ≥ 0 m², got " + w);
            }
        }
        xCoordinates = xCoordinates.clone();
        yCoordinates = yCoordinates.clone();
        values = values.clone();
        weights = weights.clone();
    }

    /** A field map without sample weights ({@link #hasWeights()} false). */
    public FieldMap(double[] xCoordinates, double[] yCoordinates, double[] values) {
        this(xCoordinates, yCoordinates, values, new double[0]);
    }

    @Override
    public double[] xCoordinates() {
        return xCoordinates.clone();
    }

    @Override
    public double[] yCoordinates() {
        return yCoordinates.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    @Override
    public double[] weights() {
        return weights.clone();
    }

    /** @return the number of sample columns */
    public int columns() {
        return xCoordinates.length;
    }

    /** @return the number of sample rows */
    public int rows() {
        return yCoordinates.length;
    }

    /** @return the sample at column i, row j (NaN outside the guide) */
    public double valueAt(int i, int j) {
        return values[j * xCoordinates.length + i];
    }

    /** @return whether the map carries the solve's sample weights */
    public boolean hasWeights() {
        return weights.length != 0;
    }

    /**
     * @return the weight of the sample at column i, row j, m² (0 outside the guide)
     * @throws IllegalStateException if the map carries no weights
     */
    public double weightAt(int i, int j) {
        if (!hasWeights()) {
            throw new IllegalStateException("this field map carries no sample weights");
        }
        return weights[j * xCoordinates.length + i];
    }
}
