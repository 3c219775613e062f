package org.sectio.physics;

/**
 * A mode's transverse field pattern on the points of a tensor grid (see {@link TransverseFields}):
 * E_t and H_t, each scaled to a largest magnitude of 1, dimensionless; NaN where not known.
 *
 * @param xs the abscissae, m
 * @param ys the ordinates, m
 * @param ex Ex at (xs[i], ys[j]) stored at {@code j * xs.length + i}
 * @param ey Ey, same layout
 * @param hx Hx, same layout
 * @param hy Hy, same layout
 * @throws IllegalArgumentException if an array length does not match the grid
 */
public record TransversePattern(double[] xs, double[] ys, double[] ex, double[] ey, double[] hx, double[] hy) {

    public TransversePattern {
        int n = xs.length * ys.length;
        if (ex.length != n || ey.length != n || hx.length != n || hy.length != n) {
            throw new IllegalArgumentException("transverse pattern: field arrays must hold " + n + " values");
        }
        xs = xs.clone();
        ys = ys.clone();
        ex = ex.clone();
        ey = ey.clone();
        hx = hx.clone();
        hy = hy.clone();
    }

    /** @return the abscissae, m */
    @Override
    public double[] xs() {
        return xs.clone();
    }

    /** @return the ordinates, m */
    @Override
    public double[] ys() {
        return ys.clone();
    }

    /** @return a copy of Ex */
    @Override
    public double[] ex() {
        return ex.clone();
    }

    /** @return a copy of Ey */
    @Override
    public double[] ey() {
        return ey.clone();
    }

    /** @return a copy of Hx */
    @Override
    public double[] hx() {
        return hx.clone();
    }

    /** @return a copy of Hy */
    @Override
    public double[] hy() {
        return hy.clone();
    }

    /** @return the number of columns (points along x) */
    public int columns() {
        return xs.length;
    }

    /** @return the number of rows (points along y) */
    public int rows() {
        return ys.length;
    }

    /** @return x of column i, m */
    public double x(int i) {
        return xs[i];
    }

    /** @return y of row j, m */
    public double y(int j) {
        return ys[j];
    }

    /**
     * @param electric E_t if true, H_t if false
     * @return {x component, y component} at column i, row j (NaN where not known)
     */
    public double[] vectorAt(boolean electric, int i, int j) {
        int k = j * xs.length + i;
        return electric ? new double[] {ex[k], ey[k]} : new double[] {hx[k], hy[k]};
    }

    /** @return |E_t| or |H_t| at column i, row j, 0 … 1 (NaN where not known) */
    public double magnitudeAt(boolean electric, int i, int j) {
        double[] v = vectorAt(electric, i, j);
        return Math.hypot(v[0], v[1]);
    }
}
