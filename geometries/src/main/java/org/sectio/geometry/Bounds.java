package org.sectio.geometry;

/**
 * An axis-aligned box in the cross-section plane, in metres.
 *
 * @param minX left edge, m
 * @param minY bottom edge, m
 * @param maxX right edge, m; greater than {@code minX}
 * @param maxY top edge, m; greater than {@code minY}
 */
public record Bounds(double minX, double minY, double maxX, double maxY) {

    public Bounds {
        if (!(maxX > minX) || !(maxY > minY) || !Double.isFinite(minX + minY + maxX + maxY)) {
            throw new IllegalArgumentException("bounds: expected finite minX < maxX and minY < maxY, got ["
                    + minX + ", " + maxX + "] x [" + minY + ", " + maxY + "]");
        }
    }

    /** @return {@code maxX − minX}, m */
    public double width() {
        return maxX - minX;
    }

    /** @return {@code maxY − minY}, m */
    public double height() {
        return maxY - minY;
    }

    /** @return the smallest box holding this one and {@code other} */
    public Bounds union(Bounds other) {
        return new Bounds(Math.min(minX, other.minX), Math.min(minY, other.minY),
                Math.max(maxX, other.maxX), Math.max(maxY, other.maxY));
    }
}
