package org.sectio.io;

import java.util.List;

/**
 * A junction from guide A into guide B over one or more frequencies, as {@link JunctionWriter} prints it.
 *
 * @param sectionA name of the cross-section A, not null
 * @param modeA the dominant mode of A, e.g. "TE10", not blank
 * @param cutoffA its cutoff frequency, Hz (0 for TEM)
 * @param sectionB name of B, not null
 * @param modeB the dominant mode of B, not blank
 * @param cutoffB its cutoff frequency, Hz (0 for TEM)
 * @param impedanceDefinition how Z was defined, e.g. "pv" (power–voltage), not blank
 * @param steps one per frequency, ascending, at least one; copied
 */
public record JunctionReport(String sectionA, String modeA, double cutoffA, String sectionB, String modeB,
                             double cutoffB, String impedanceDefinition, List<JunctionStep> steps) {

    /**
     * Validates and copies the components.
     *
     * @param sectionA as in the record description
     * @param modeA as in the record description
     * @param cutoffA as in the record description
     * @param sectionB as in the record description
     * @param modeB as in the record description
     * @param cutoffB as in the record description
     * @param impedanceDefinition as in the record description
     * @param steps as in the record description
     * @throws IllegalArgumentException if a component is missing or there is no step
     */
    public JunctionReport {
        if (sectionA == null || sectionB == null || modeA == null || modeA.isBlank() || modeB == null
                || modeB.isBlank() || impedanceDefinition == null || impedanceDefinition.isBlank()) {
            throw new IllegalArgumentException("a junction report needs both section names, both mode names and the"
                    + " impedance definition");
        }
        if (!(cutoffA >= 0) || !(cutoffB >= 0) || steps == null || steps.isEmpty()) {
            throw new IllegalArgumentException("a junction report needs cutoffs ≥ 0 and at least one frequency, got "
                    + cutoffA + " Hz, " + cutoffB + " Hz, " + (steps == null ? 0 : steps.size()) + " steps");
        }
        steps = List.copyOf(steps);
    }
}
