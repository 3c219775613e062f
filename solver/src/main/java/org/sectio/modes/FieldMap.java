package org.sectio.modes;

/**
 * A mode's longitudinal field (Hz for TE, Ez for TM) sampled on the points of a tensor grid, normalized
 * so that its largest magnitude is 1 and its largest-magnitude sample is positive.
 *
 * @param xCoordinates the sample abscissae, m, ascending
 * @param yCoordinates the sample ordinates, m, ascending
 * @param values {@code values[j * xCoordinates.length + i]} is the field at (x[i], y[j]); NaN where the
 *     point is not inside the guide
 */
public record FieldMap(double[] xCoordinates, double[] yCoordinates, double[] values) {

    public FieldMap {
        if (values.length != xCoordinates.length * yCoordinates.length) {
            throw new IllegalArgumentException("field map: " + values.length + " values for a "
                    + xCoordinates.length + " × " + yCoordinates.length + " grid");
        }
        xCoordinates = xCoordinates.clone();
        yCoordinates = yCoordinates.clone();
        values = values.clone();
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
}
