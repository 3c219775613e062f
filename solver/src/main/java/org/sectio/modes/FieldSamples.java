package org.sectio.modes;

import java.util.Arrays;

/**
 * Read access to a {@link FieldMap} for mode identification: the samples, a weight per sample (its
 * dual-cell area, from the coordinates alone: half the distance to each neighbour in x times the same
 * in y) and bilinear interpolation between samples that skips NaN (outside) corners.
 */
final class FieldSamples {

    private final double[] x;
    private final double[] y;
    private final double[] v;
    private final double[] wx;
    private final double[] wy;

    FieldSamples(FieldMap field) {
        this.x = field.xCoordinates();
        this.y = field.yCoordinates();
        this.v = field.values();
        this.wx = dualWidths(x);
        this.wy = dualWidths(y);
    }

    int columns() {
        return x.length;
    }

    int rows() {
        return y.length;
    }

    double x(int i) {
        return x[i];
    }

    double y(int j) {
        return y[j];
    }

    /** @return the sample at column i, row j (NaN outside) */
    double value(int i, int j) {
        return v[j * x.length + i];
    }

    /** @return the dual-cell area of sample (i, j), m² */
    double weight(int i, int j) {
        return wx[i] * wy[j];
    }

    /** @return the dual width of column i, m */
    double columnWeight(int i) {
        return wx[i];
    }

    /** @return the dual height of row j, m */
    double rowWeight(int j) {
        return wy[j];
    }

    /**
     * Bilinear interpolation at (px, py) from the four surrounding samples; corners that are NaN are
     * dropped and the other weights renormalized.
     *
     * @return the interpolated value, or NaN outside the sample box or when every corner is NaN
     */
    double interpolate(double px, double py) {
        int i = cellBelow(x, px);
        int j = cellBelow(y, py);
        if (i < 0 || j < 0) {
            return Double.NaN;
        }
        double s = x.length == 1 ? 0 : (px - x[i]) / (x[i + 1] - x[i]);
        double t = y.length == 1 ? 0 : (py - y[j]) / (y[j + 1] - y[j]);
        double sum = 0;
        double weights = 0;
        for (int dj = 0; dj <= 1; dj++) {
            for (int di = 0; di <= 1; di++) {
                double value = value(i + di, j + dj);
                double w = (di == 0 ? 1 - s : s) * (dj == 0 ? 1 - t : t);
                if (!Double.isNaN(value) && w > 0) {
                    sum += w * value;
                    weights += w;
                }
            }
        }
        return weights > 1e-9 ? sum / weights : Double.NaN;
    }

    /** Whether the coordinates are their own mirror about c: a[k] + a[n − 1 − k] = 2c for all k. */
    static boolean mirrorsAbout(double[] a, double c, double tol) {
        for (int k = 0; k < a.length; k++) {
            if (Math.abs(a[k] + a[a.length - 1 - k] - 2 * c) > tol) {
                return false;
            }
        }
        return true;
    }

    double[] xs() {
        return x.clone();
    }

    double[] ys() {
        return y.clone();
    }

    /** Index k with a[k] ≤ p ≤ a[k + 1], or −1 outside. */
    private static int cellBelow(double[] a, double p) {
        if (!(p >= a[0] && p <= a[a.length - 1]) || a.length < 2) {
            return -1;
        }
        int k = Arrays.binarySearch(a, p);
        if (k < 0) {
            k = -k - 2;
        }
        return Math.min(k, a.length - 2);
    }

    private static double[] dualWidths(double[] a) {
        double[] w = new double[a.length];
        for (int k = 0; k < a.length; k++) {
            double left = k > 0 ? a[k] - a[k - 1] : 0;
            double right = k < a.length - 1 ? a[k + 1] - a[k] : 0;
            w[k] = a.length == 1 ? 1 : 0.5 * (left + right);
        }
        return w;
    }
}
