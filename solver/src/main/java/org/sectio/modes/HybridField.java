package org.sectio.modes;

/**
 * The six field components of one hybrid mode, each sampled where the Yee scheme holds it, complex,
 * for fields ∝ exp(j(ωt − βz)):
 * Hx and Ey at vertical-face midpoints (x_i, y_{j+½}), Hy and Ex at horizontal-face midpoints
 * (x_{i+½}, y_j), Hz at cell centres, Ez at nodes. Scaled so that the transverse power
 * P = ½ Re ∫ (E × H*)·ẑ dA is 1 W (propagating modes) or, where P vanishes (evanescent modes), so that
 * the largest |Ht| is 1 A/m. For a lossless propagating mode Ht and Et are real and Hz, Ez imaginary.
 *
 * @param hx Hx, A/m
 * @param hy Hy, A/m
 * @param hz Hz, A/m
 * @param ex Ex, V/m
 * @param ey Ey, V/m
 * @param ez Ez, V/m
 * @param powerWatts P of the scaled field, W (1 for a propagating mode)
 * @param storedEnergyJoulesPerMetre W = ¼ ∫ (ε0 εr′ |E|² + μ0 |H|²) dA of the scaled field, J/m; for a
 *     lossless propagating mode the group (energy) velocity is P / W
 * @param peakElectricField the largest |E| of the scaled field, V/m (at cell centres, each component
 *     averaged from its two or four nearest samples)
 * @param peakX where it is, m
 * @param peakY where it is, m
 */
public record HybridField(Samples hx, Samples hy, Samples hz, Samples ex, Samples ey, Samples ez, double powerWatts,
                          double storedEnergyJoulesPerMetre, double peakElectricField, double peakX, double peakY) {

    /**
     * One complex component on a tensor set of sample points; NaN where there is no unknown.
     *
     * @param xCoordinates sample abscissae, m, ascending
     * @param yCoordinates sample ordinates, m, ascending
     * @param real Re of the value at (x[i], y[j]) in {@code real[j * x.length + i]}
     * @param imaginary Im, same layout
     */
    public record Samples(double[] xCoordinates, double[] yCoordinates, double[] real, double[] imaginary) {

        public Samples {
            if (real.length != xCoordinates.length * yCoordinates.length || imaginary.length != real.length) {
                throw new IllegalArgumentException("field samples: " + real.length + "/" + imaginary.length
                        + " values for a " + xCoordinates.length + " × " + yCoordinates.length + " set of points");
            }
        }

        /** @return the largest |value| over the samples */
        public double peakMagnitude() {
            double peak = 0;
            for (int k = 0; k < real.length; k++) {
                if (!Double.isNaN(real[k])) {
                    peak = Math.max(peak, Math.hypot(real[k], imaginary[k]));
                }
            }
            return peak;
        }

        /** @return |value| as a field map for plots (no weights), NaN outside */
        public FieldMap magnitude() {
            double[] v = new double[real.length];
            for (int k = 0; k < v.length; k++) {
                v[k] = Double.isNaN(real[k]) ? Double.NaN : Math.hypot(real[k], imaginary[k]);
            }
            return new FieldMap(xCoordinates, yCoordinates, v, new double[0]);
        }
    }
}
