package org.sectio.modes;

import org.sectio.geometry.Bounds;

/**
 * The textbook indices (m, n) of a mode of an a × b rectangular guide, found from its field: ψ is
 * projected onto the separable functions of the closed form (Pozar, Microwave Engineering, 4th ed.,
 * §3.3): Hz ∝ cos(mπξ) cos(nπη) for TE_mn (m, n ≥ 0, not both 0) and Ez ∝ sin(mπξ) sin(nπη) for
 * TM_mn (m, n ≥ 1), ξ = (x − x0)/a and η = (y − y0)/b, with the weighted sums
 * c_mn = Σ w ψ φ_mn over the samples inside the rectangle. The indices are those maximizing
 * c_mn² / Σ w φ_mn², the energy of ψ along φ_mn; its share of Σ w ψ² is the purity (≈ 1 for a
 * well-resolved mode). Indices up to a quarter of the samples across each side (at most
 * {@value #MAX_INDEX}) are tried, so every candidate has at least two samples per half period.
 */
final class RectangleIndices {

    /** Largest index tried along either side. */
    static final int MAX_INDEX = 30;

    private RectangleIndices() {
    }

    /**
     * @param samples the field
     * @param box the rectangle, m
     * @param transverseMagnetic true for TM (sine basis), false for TE (cosine basis)
     * @return {m, n, purity}
     */
    static double[] of(FieldSamples samples, Bounds box, boolean transverseMagnetic) {
        int nx = samples.columns();
        int ny = samples.rows();
        int maxM = Math.max(1, Math.min(MAX_INDEX, nx / 4));
        int maxN = Math.max(1, Math.min(MAX_INDEX, ny / 4));
        double[][] bx = basis(samples, true, box, maxM, transverseMagnetic);
        double[][] by = basis(samples, false, box, maxN, transverseMagnetic);
        double[][] rowProjection = new double[maxM + 1][ny];
        double energy = 0;
        double[] normX = new double[maxM + 1];
        double[] normY = new double[maxN + 1];
        boolean[] columnUsed = new boolean[nx];
        boolean[] rowUsed = new boolean[ny];
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                double value = samples.value(i, j);
                if (Double.isNaN(value) || Double.isNaN(bx[0][i]) || Double.isNaN(by[0][j])) {
                    continue;
                }
                double w = samples.weight(i, j);
                energy += w * value * value;
                columnUsed[i] = true;
                rowUsed[j] = true;
                for (int m = 0; m <= maxM; m++) {
                    rowProjection[m][j] += w * value * bx[m][i];
                }
            }
        }
        accumulateNorms(samples, true, bx, columnUsed, normX);
        accumulateNorms(samples, false, by, rowUsed, normY);
        double best = -1;
        int bestM = -1;
        int bestN = -1;
        int first = transverseMagnetic ? 1 : 0;
        for (int m = first; m <= maxM; m++) {
            for (int n = first; n <= maxN; n++) {
                if ((m == 0 && n == 0) || !(normX[m] * normY[n] > 0)) {
                    continue;
                }
                double c = 0;
                for (int j = 0; j < ny; j++) {
                    if (!Double.isNaN(by[n][j])) {
                        c += rowProjection[m][j] * by[n][j];
                    }
                }
                double score = c * c / (normX[m] * normY[n]);
                if (score > best) {
                    best = score;
                    bestM = m;
                    bestN = n;
                }
            }
        }
        return new double[] {bestM, bestN, energy > 0 ? Math.min(1, best / energy) : 0};
    }

    /** φ_k at each coordinate along one side; NaN outside the rectangle. */
    private static double[][] basis(FieldSamples s, boolean alongX, Bounds box, int max, boolean sine) {
        int count = alongX ? s.columns() : s.rows();
        double start = alongX ? box.minX() : box.minY();
        double length = alongX ? box.width() : box.height();
        double slack = 1e-9 * length;
        double[][] b = new double[max + 1][count];
        for (int q = 0; q < count; q++) {
            double u = ((alongX ? s.x(q) : s.y(q)) - start) / length;
            boolean inside = u * length >= -slack && (u - 1) * length <= slack;
            for (int k = 0; k <= max; k++) {
                b[k][q] = !inside ? Double.NaN : sine ? Math.sin(k * Math.PI * u) : Math.cos(k * Math.PI * u);
            }
        }
        return b;
    }

    /** Σ w φ_k² along one side, over the columns (or rows) that hold field samples. */
    private static void accumulateNorms(FieldSamples s, boolean alongX, double[][] b, boolean[] used, double[] norm) {
        for (int k = 0; k < norm.length; k++) {
            for (int q = 0; q < used.length; q++) {
                if (used[q]) {
                    norm[k] += (alongX ? s.columnWeight(q) : s.rowWeight(q)) * b[k][q] * b[k][q];
                }
            }
        }
    }
}
