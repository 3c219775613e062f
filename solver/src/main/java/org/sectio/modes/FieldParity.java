package org.sectio.modes;

/**
 * The parity of a sampled field about the vertical or horizontal mirror line of its cross-section:
 * the weighted correlation between ψ(p) and ψ(p′) over the samples p with a value, p′ the mirror
 * image of p (see {@link MirrorParity}). When the sample coordinates are themselves mirror-symmetric
 * about the line, p′ is a sample and its value is read directly; otherwise ψ(p′) is interpolated
 * bilinearly, and samples whose image has no value (outside the guide) are left out.
 */
final class FieldParity {

    private FieldParity() {
    }

    /**
     * @param samples the field
     * @param aboutVertical true for the line x = c, false for y = c
     * @param c the line's position, m
     * @return the correlation c ∈ [−1, 1], or NaN when no sample pair has values
     */
    static double agreement(FieldSamples samples, boolean aboutVertical, double c) {
        double[] axis = aboutVertical ? samples.xs() : samples.ys();
        double span = axis[axis.length - 1] - axis[0];
        boolean direct = FieldSamples.mirrorsAbout(axis, c, 1e-9 * span);
        double cross = 0;
        double self = 0;
        double image = 0;
        int n = samples.columns();
        int m = samples.rows();
        for (int j = 0; j < m; j++) {
            for (int i = 0; i < n; i++) {
                double value = samples.value(i, j);
                if (Double.isNaN(value)) {
                    continue;
                }
                double mirrored;
                if (direct) {
                    mirrored = aboutVertical ? samples.value(n - 1 - i, j) : samples.value(i, m - 1 - j);
                } else {
                    mirrored = aboutVertical ? samples.interpolate(2 * c - samples.x(i), samples.y(j))
                            : samples.interpolate(samples.x(i), 2 * c - samples.y(j));
                }
                if (Double.isNaN(mirrored)) {
                    continue;
                }
                double w = samples.weight(i, j);
                cross += w * value * mirrored;
                self += w * value * value;
                image += w * mirrored * mirrored;
            }
        }
        return self > 0 && image > 0 ? cross / Math.sqrt(self * image) : Double.NaN;
    }
}
