package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * Points in the plane, merged when closer than a tolerance: every point handed in is replaced by the
 * first stored point within the tolerance, so that pieces cut at "the same" point end exactly at one
 * shared vertex and can be chained by vertex number.
 */
final class VertexPool {

    private final double tolerance;
    private final List<double[]> points = new ArrayList<>();

    /** @param tolerance merging distance, m, &gt; 0 */
    VertexPool(double tolerance) {
        this.tolerance = tolerance;
    }

    /** @return the number of the vertex at (x, y), m, adding it if no stored vertex is near */
    int snap(double x, double y) {
        for (int k = 0; k < points.size(); k++) {
            double[] p = points.get(k);
            if (Math.hypot(p[0] - x, p[1] - y) <= tolerance) {
                return k;
            }
        }
        points.add(new double[] {x, y});
        return points.size() - 1;
    }

    /** @return x of vertex {@code k}, m */
    double x(int k) {
        return points.get(k)[0];
    }

    /** @return y of vertex {@code k}, m */
    double y(int k) {
        return points.get(k)[1];
    }
}
