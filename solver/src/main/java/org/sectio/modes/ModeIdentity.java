package org.sectio.modes;

/**
 * What a computed mode is, found from its field and the cross-section (see {@link ModeIdentifier}).
 *
 * <p>Textbook indices: for a rectangular guide {@code firstIndex} = m (half periods along x, the
 * side of {@link SectionShape#bounds()} width) and {@code secondIndex} = n (along y), as in TE_mn /
 * TM_mn of Pozar, Microwave Engineering, 4th ed., §3.3; for a circular guide {@code firstIndex} = n
 * (azimuthal order) and {@code secondIndex} = m (radial index), as in §3.4; both −1 for other guides
 * and for TEM modes.
 *
 * @param family TE, TM or TEM
 * @param shape the recognized kind of guide
 * @param firstIndex m (rectangular), n (circular), or −1
 * @param secondIndex n (rectangular), m (circular), or −1
 * @param indexPurity the share of the field's energy carried by the closed-form pattern with these
 *     indices, 0 … 1 (≈ 1 for a well-resolved mode; a low value warns that the indices are a guess);
 *     NaN without indices
 * @param aboutVertical parity about the vertical mirror line x = xc
 * @param aboutHorizontal parity about the horizontal mirror line y = yc
 * @param label e.g. "TE10", "TM11", "TE11 (circular)", "TE #2, odd/even", "TEM"
 * @throws IllegalArgumentException if a component is missing, an index is below −1, only one index is
 *     known, or the label is blank
 */
public record ModeIdentity(ModeFamily family, GuideShape shape, int firstIndex, int secondIndex, double indexPurity,
                           MirrorParity aboutVertical, MirrorParity aboutHorizontal, String label) {

    public ModeIdentity {
        if (family == null || shape == null || aboutVertical == null || aboutHorizontal == null || label == null
                || label.isBlank()) {
            throw new IllegalArgumentException("mode identity: family, shape, parities and label are required");
        }
        if (firstIndex < -1 || secondIndex < -1 || (firstIndex == -1) != (secondIndex == -1)) {
            throw new IllegalArgumentException("mode identity " + label + ": indices must both be ≥ 0 or both −1, got "
                    + firstIndex + ", " + secondIndex);
        }
        if (firstIndex >= 0 && !(indexPurity >= 0 && indexPurity <= 1)) {
            throw new IllegalArgumentException("mode identity " + label + ": index purity must be 0 … 1, got "
                    + indexPurity);
        }
    }

    /** @return whether the textbook indices are known (rectangular and circular TE/TM modes) */
    public boolean hasTextbookIndices() {
        return firstIndex >= 0;
    }

    /**
     * @return whether {@code other} is the same textbook mode (same family and indices), as the two
     *     members of a degenerate pair are; false when either has no indices
     */
    public boolean sameTextbookMode(ModeIdentity other) {
        return hasTextbookIndices() && other.hasTextbookIndices() && family == other.family
                && shape == other.shape && firstIndex == other.firstIndex && secondIndex == other.secondIndex;
    }

    /** @return the two parities as "even/odd" (vertical line first), e.g. "none/none" for an asymmetric guide */
    public String parityText() {
        return aboutVertical.parity().word() + "/" + aboutHorizontal.parity().word();
    }
}
