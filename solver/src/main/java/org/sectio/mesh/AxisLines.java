package org.sectio.mesh;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Grid lines along one axis: fixed lines first (the two ends, corner coordinates, straight walls),
 * then between each pair of neighbouring fixed lines as many cells as the wanted size calls for.
 *
 * <p>Placement: with the wanted size s(v), the number of cells between fixed lines a and b is
 * n = max(1, round(I)), I = ∫ₐᵇ dv / s(v), and the lines go where ∫ₐᵛ dv / s = k·I/n (an
 * equidistribution of the density 1/s). So a uniform s gives uniform cells, and a graded s gives cells
 * that follow it smoothly. Fixed lines closer together than a share of the local size are merged,
 * keeping the more important one (ends, then corners, then walls; the lower coordinate on a tie).
 */
final class AxisLines {

    /** Sub-steps per wanted cell in the numerical integral of 1/s (|s′| ≤ 0.5, so this is ample). */
    private static final int SUBSTEPS = 16;

    private AxisLines() {
    }

    /** A candidate fixed line; rank 0 = an end, 1 = a corner, 2 = a wall. */
    private record Fixed(double at, int rank) {
    }

    /**
     * @param lo first line, m
     * @param hi last line, m, &gt; lo
     * @param corners corner coordinates, m (outside (lo, hi) they are ignored)
     * @param walls wall coordinates, m (likewise)
     * @param spacing the wanted size
     * @param mergeShare fixed lines closer than this share of the local size are merged
     * @return the lines, strictly ascending, starting at lo and ending at hi
     */
    static double[] place(double lo, double hi, double[] corners, double[] walls, CornerSpacing spacing,
                          double mergeShare) {
        List<Fixed> candidates = new ArrayList<>();
        for (double c : corners) {
            candidates.add(new Fixed(c, 1));
        }
        for (double w : walls) {
            candidates.add(new Fixed(w, 2));
        }
        candidates.sort((p, q) -> p.at() != q.at() ? Double.compare(p.at(), q.at()) : Integer.compare(p.rank(), q.rank()));
        List<Fixed> kept = new ArrayList<>();
        kept.add(new Fixed(lo, 0));
        for (Fixed f : candidates) {
            if (!(f.at() > lo && f.at() < hi)) {
                continue;
            }
            Fixed last = kept.get(kept.size() - 1);
            if (f.at() - last.at() < mergeShare * spacing.at(f.at()) || f.at() == last.at()) {
                if (f.rank() < last.rank()) {
                    kept.set(kept.size() - 1, f);
                }
                continue;
            }
            kept.add(f);
        }
        Fixed last = kept.get(kept.size() - 1);
        if (kept.size() > 1 && hi - last.at() < mergeShare * spacing.at(hi)) {
            kept.remove(kept.size() - 1);
        }
        kept.add(new Fixed(hi, 0));
        List<Double> lines = new ArrayList<>();
        lines.add(lo);
        for (int k = 0; k + 1 < kept.size(); k++) {
            fill(kept.get(k).at(), kept.get(k + 1).at(), spacing, lines);
        }
        double[] out = new double[lines.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = lines.get(k);
        }
        return out;
    }

    /** Appends the lines after a, up to and including b, equidistributing 1/s. */
    private static void fill(double a, double b, CornerSpacing spacing, List<Double> lines) {
        double[] v = new double[64];
        double[] cumulative = new double[64];
        int count = 1;
        v[0] = a;
        double at = a;
        double integral = 0;
        while (at < b) {
            double step = Math.min(spacing.at(at) / SUBSTEPS, b - at);
            double next = b - at - step < 1e-12 * (b - a) ? b : at + step;
            integral += (next - at) / spacing.at(0.5 * (at + next));
            at = next;
            if (count == v.length) {
                v = Arrays.copyOf(v, 2 * count);
                cumulative = Arrays.copyOf(cumulative, 2 * count);
            }
            v[count] = at;
            cumulative[count] = integral;
            count++;
        }
        int cells = Math.max(1, (int) Math.round(integral));
        if (spacing.uniformBetween(a, b)) {
            for (int k = 1; k < cells; k++) {
                lines.add(a + (b - a) * k / cells); // exactly the evenly spaced lines where s is constant
            }
        } else {
            int p = 1;
            for (int k = 1; k < cells; k++) {
                double target = integral * k / cells;
                while (cumulative[p] < target) {
                    p++;
                }
                double w = (target - cumulative[p - 1]) / (cumulative[p] - cumulative[p - 1]);
                lines.add(v[p - 1] + w * (v[p] - v[p - 1]));
            }
        }
        lines.add(b);
    }

    /**
     * Every interval cut in two at its midpoint: the fine lines whose every second line is {@code lines}.
     */
    static double[] bisect(double[] lines) {
        double[] out = new double[2 * lines.length - 1];
        for (int k = 0; k + 1 < lines.length; k++) {
            out[2 * k] = lines[k];
            out[2 * k + 1] = 0.5 * (lines[k] + lines[k + 1]);
        }
        out[out.length - 1] = lines[lines.length - 1];
        return out;
    }
}
