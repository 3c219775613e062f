package org.sectio.mesh;

/**
 * How a planned grid treats walls and re-entrant corners.
 *
 * <p>Cell size at distance d (along one axis) from a corner of singular exponent λ (field ~ r^λ), for
 * a base size H:
 * <pre>
 *   s(d) = min( H,  H·(d/R)^(1−μ),  s₀ + ln(1/σ)·d ),   μ = share·λ,   s₀ = R·(μH/R)^(1/μ)
 * </pre>
 * The middle term is the radical grading of Babuška, Kellogg &amp; Pitkäranta (Numer. Math. 33 (1979)
 * 447–471, "Direct and inverse error estimates for finite elements with mesh refinements"): with
 * local size h·r^(1−μ) and μ &lt; λ the energy error is O(h) again, so eigenvalues converge as h²
 * instead of h^(2λ) (h^(4/3) at a 270° corner). The last term caps the growth of neighbouring cells
 * near the corner at the ratio 1/σ (cells then shrink geometrically toward the corner, as in the
 * geometric meshes of Guo &amp; Babuška, Comput. Mech. 1 (1986) 21–41), down to the
 * smallest size s₀, which is the radical grading's own first cell.
 *
 * @param snapWalls whether every axis-aligned straight wall gets a grid line
 * @param gradeCorners whether cells shrink toward re-entrant corners
 * @param ratio σ, the smallest ratio of neighbouring cell sizes near a corner, 0 &lt; σ &lt; 1
 * @param exponentShare μ/λ, 0 &lt; share &lt; 1 (the theory needs μ &lt; λ)
 * @param reachShare R over the longer side of the bounding box: how far the grading reaches, &gt; 0
 * @param mergeShare two fixed lines closer than this share of the local size are merged, 0 ≤ share &lt; 0.5
 */
public record GradingRule(boolean snapWalls, boolean gradeCorners, double ratio, double exponentShare,
                          double reachShare, double mergeShare) {

    /**
     * Snapping and grading: σ = 0.7, μ = 0.75 λ (μ = 1/2 at a 270° corner), R = a quarter of the longer
     * side, merging below 0.1 of the local size. Chosen by the measurements in GradingBenchmark.
     */
    public static final GradingRule DEFAULT = new GradingRule(true, true, 0.7, 0.75, 0.25, 0.1);

    /** Lines on the axis-aligned walls, no grading. */
    public static final GradingRule SNAP_ONLY = new GradingRule(true, false, 0.7, 0.75, 0.25, 0.1);

    /**
     * @throws IllegalArgumentException naming the value out of range
     */
    public GradingRule {
        if (!(ratio > 0 && ratio < 1)) {
            throw new IllegalArgumentException("grading ratio must be in (0, 1), got " + ratio);
        }
        if (!(exponentShare > 0 && exponentShare < 1)) {
            throw new IllegalArgumentException("grading exponent share must be in (0, 1), got " + exponentShare);
        }
        if (!(reachShare > 0) || !Double.isFinite(reachShare)) {
            throw new IllegalArgumentException("grading reach share must be positive, got " + reachShare);
        }
        if (!(mergeShare >= 0 && mergeShare < 0.5)) {
            throw new IllegalArgumentException("merge share must be in [0, 0.5), got " + mergeShare);
        }
    }

    /** @return this rule with the given reach share */
    public GradingRule withReachShare(double share) {
        return new GradingRule(snapWalls, gradeCorners, ratio, exponentShare, share, mergeShare);
    }

    /** @return this rule with the given exponent share */
    public GradingRule withExponentShare(double share) {
        return new GradingRule(snapWalls, gradeCorners, ratio, share, reachShare, mergeShare);
    }
}
