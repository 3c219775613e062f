package org.sectio.viewer.render;

import java.util.Arrays;

/**
 * Bilinear interpolation on a tensor grid of samples that may hold NaN (points outside the guide):
 * NaN corners are dropped and the other weights renormalized; NaN when every corner is NaN or the
 * point is off the grid. Used for drawing only.
 */
final class PatternSampler {

    private final double[] xs;
    private final double[] ys;

    PatternSampler(double[] xs, double[] ys) {
        this.xs = xs;
        this.ys = ys;
    }

    /**
     * @return the value at (x, y) of the samples {@code values[j * xs.length + i]}; a point beyond the
     *     outermost samples (between them and the wall) takes the value at the nearest edge of the grid
     */
    double sample(double[] values, double px, double py) {
        double x = Math.max(xs[0], Math.min(xs[xs.length - 1], px));
        double y = Math.max(ys[0], Math.min(ys[ys.length - 1], py));
        int i = cell(xs, x);
        int j = cell(ys, y);
        if (i < 0 || j < 0) {
            return Double.NaN;
        }
        double tx = xs.length < 2 ? 0 : (x - xs[i]) / (xs[i + 1] - xs[i]);
        double ty = ys.length < 2 ? 0 : (y - ys[j]) / (ys[j + 1] - ys[j]);
        double sum = 0;
        double weights = 0;
        for (int dj = 0; dj <= 1; dj++) {
            for (int di = 0; di <= 1; di++) {
                int ci = Math.min(i + di, xs.length - 1);
                int cj = Math.min(j + dj, ys.length - 1);
                double v = values[cj * xs.length + ci];
                double w = (di == 0 ? 1 - tx : tx) * (dj == 0 ? 1 - ty : ty);
                if (!Double.isNaN(v) && w > 0) {
                    sum += w * v;
                    weights += w;
                }
            }
        }
        return weights > 1e-9 ? sum / weights : Double.NaN;
    }

    private static int cell(double[] a, double c) {
        if (a.length == 0 || !(c >= a[0] && c <= a[a.length - 1])) {
            return -1;
        }
        if (a.length == 1) {
            return 0;
        }
        int k = Arrays.binarySearch(a, c);
        int index = k >= 0 ? k : -k - 2;
        return Math.max(0, Math.min(a.length - 2, index));
    }
}
