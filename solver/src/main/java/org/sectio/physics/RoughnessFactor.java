package org.sectio.physics;

/**
 * The increase of conductor loss by surface roughness.
 *
 * <p>Hammerstad–Bekkadal: K = 1 + (2/π) arctan(1.4 (Δ/δs)²), with Δ the rms roughness and δs the
 * skin depth; K rises from 1 (smooth, Δ ≪ δs) towards 2 (Δ ≫ δs), and the rough wall's surface
 * resistance is Rs · K (E. Hammerstad and Ø. Bekkadal, Microstrip Handbook, ELAB report STF44
 * A74169, Trondheim, 1975 — cited from memory). It is an empirical fit for grooves transverse to the
 * current; it saturates at 2 and underestimates loss on very rough surfaces.
 */
public final class RoughnessFactor {

    private RoughnessFactor() {
    }

    /**
     * K = 1 + (2/π) arctan(1.4 (Δ/δs)²).
     *
     * @param rmsRoughness Δ, finite and ≥ 0, m
     * @param skinDepth δs, finite and &gt; 0, m
     * @return K, 1 ≤ K &lt; 2
     * @throws IllegalArgumentException if a value is out of range
     */
    public static double hammerstad(double rmsRoughness, double skinDepth) {
        if (!(rmsRoughness >= 0) || Double.isInfinite(rmsRoughness)) {
            throw new IllegalArgumentException("rms roughness must be finite and ≥ 0 m, got " + rmsRoughness);
        }
        if (!(skinDepth > 0) || Double.isInfinite(skinDepth)) {
            throw new IllegalArgumentException("skin depth must be finite and > 0 m, got " + skinDepth);
        }
        double ratio = rmsRoughness / skinDepth;
        return 1.0 + 2.0 / Math.PI * Math.atan(1.4 * ratio * ratio);
    }
}
