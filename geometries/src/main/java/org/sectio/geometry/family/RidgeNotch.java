package org.sectio.geometry.family;

/**
 * A rectangular ridge standing on the middle of a wall, seen from the air side: a notch in the outer
 * wall. Its two tip corners (facing the gap) may be rounded, and the two re-entrant corners where it
 * meets the wall may carry concave fillets. Lengths in metres; the family checks that they fit.
 *
 * @param width across the ridge, along the wall, &gt; 0
 * @param depth how far the ridge stands out of the wall, &gt; 0
 * @param cornerRadius radius rounding each tip corner, ≥ 0, at most {@code width / 2} and
 *     {@code depth − filletRadius}
 * @param filletRadius radius of each fillet at the foot of the ridge, ≥ 0, at most {@code depth}
 */
record RidgeNotch(double width, double depth, double cornerRadius, double filletRadius) {

    RidgeNotch {
        if (!(width > 0) || !(depth > 0) || !(cornerRadius >= 0) || !(filletRadius >= 0)
                || cornerRadius > width / 2 || cornerRadius > depth - filletRadius || filletRadius > depth) {
            throw new IllegalArgumentException("ridge: width " + width + " m, depth " + depth + " m, corner radius "
                    + cornerRadius + " m and fillet radius " + filletRadius + " m do not fit");
        }
    }

    /**
     * The air area this ridge changes: minus the ridge's rectangle, plus what rounding its tip takes
     * from the metal, minus what the fillets add to it (each rounded corner of radius r moves
     * (1 − π/4) r²).
     *
     * @return the change of the guide's area, m², negative
     */
    double areaChange() {
        double quarterCornerShare = 1 - Math.PI / 4;
        return -width * depth + 2 * quarterCornerShare * (cornerRadius * cornerRadius - filletRadius * filletRadius);
    }
}
