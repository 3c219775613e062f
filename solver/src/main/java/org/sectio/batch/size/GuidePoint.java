package org.sectio.batch.size;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.physics.GuideSummary;

/**
 * One solved guide of a template: the parameter values it was built from, the cross-section, its
 * modes and their summary.
 *
 * @param values every parameter's value, by name, in the template's units; copied
 * @param section the cross-section built from them (metres)
 * @param modes the solve
 * @param summary dominant mode, first higher mode and bands
 */
public record GuidePoint(Map<String, Double> values, CrossSection section, ModeSet modes, GuideSummary summary) {

    public GuidePoint {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /**
     * @param family TE or TM, or null for any family
     * @param index 1-based: the index-th mode of that family (of all modes when family is null), lowest first
     * @return the mode
     * @throws IllegalArgumentException if the solve holds fewer such modes
     */
    public Mode mode(ModeFamily family, int index) {
        int seen = 0;
        for (Mode m : modes.modes()) {
            if (family == null || m.family() == family) {
                if (++seen == index) {
                    return m;
                }
            }
        }
        throw new IllegalArgumentException("the solve of " + section.name() + " holds only " + seen + " "
                + (family == null ? "" : family + " ") + "modes, mode " + index + " was asked for");
    }
}
