package org.sectio.physics;

import java.util.Locale;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;

/**
 * The straight path (x1, y1) → (x2, y2) along which a mode's voltage V = −∫ E_t · dℓ is taken, from the
 * start conductor to the end conductor (so that for TEM V is the end conductor's potential over the
 * start's). Coordinates in metres.
 *
 * <p>The automatic path ({@link #automatic}) is vertical, on the line x = centre of the bounding box, and
 * spans the shortest of the interior intervals that line cuts between two walls (the lowest of equal
 * ones): the full height at the centre of a rectangular guide — the conventional path of the TE10
 * voltage across the broad walls — the gap between the ridges of a centred single or double ridge, and
 * the lower outer-to-inner span of a coaxial line.
 *
 * @param x1 start x, m, finite
 * @param y1 start y, m, finite
 * @param x2 end x, m, finite
 * @param y2 end y, m, finite
 * @throws IllegalArgumentException if a coordinate is not finite or the two ends coincide
 */
public record VoltagePath(double x1, double y1, double x2, double y2) {

    public VoltagePath {
        if (!Double.isFinite(x1) || !Double.isFinite(y1) || !Double.isFinite(x2) || !Double.isFinite(y2)) {
            throw new IllegalArgumentException("voltage path ends must be finite, got (" + x1 + ", " + y1 + ") – ("
                    + x2 + ", " + y2 + ") m");
        }
        if (x1 == x2 && y1 == y2) {
            throw new IllegalArgumentException("voltage path ends coincide at (" + x1 + ", " + y1 + ") m");
        }
    }

    /** @return the path length, m */
    public double length() {
        return Math.hypot(x2 - x1, y2 - y1);
    }

    /**
     * The default path of a cross-section (see the type description).
     *
     * @param section the cross-section
     * @return the vertical wall-to-wall span at the centre line
     * @throws IllegalArgumentException if the centre line does not pass through the guide
     */
    public static VoltagePath automatic(CrossSection section) {
        Bounds b = section.bounds();
        double x = 0.5 * (b.minX() + b.maxX());
        double[] c = section.wallCrossingsAtX(x);
        int best = -1;
        for (int k = 0; k + 1 < c.length; k += 2) {
            double span = c[k + 1] - c[k];
            if (span > 0 && (best < 0 || span < (c[best + 1] - c[best]) * (1 - 1e-9))) {
                best = k;
            }
        }
        if (best < 0) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "the centre line x = %.6g m of %s does not pass through the guide; give a voltage path", x,
                    section.name()));
        }
        return new VoltagePath(x, c[best], x, c[best + 1]);
    }

    /**
     * Checks that the path runs inside the guide (its interior points, sampled at 64 places).
     *
     * @param section the cross-section
     * @throws IllegalArgumentException naming the first point outside
     */
    void requireInside(CrossSection section) {
        for (int k = 1; k < 64; k++) {
            double t = k / 64.0;
            double x = x1 + t * (x2 - x1);
            double y = y1 + t * (y2 - y1);
            if (!section.contains(x, y)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "voltage path (%.6g, %.6g) – (%.6g, %.6g) m leaves the guide at (%.6g, %.6g) m", x1, y1, x2,
                        y2, x, y));
            }
        }
    }
}
