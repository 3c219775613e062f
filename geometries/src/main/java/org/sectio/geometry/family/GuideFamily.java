package org.sectio.geometry.family;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;

/**
 * A parametric kind of cross-section (rectangular, double ridge, coaxial ...): a name, a list of
 * named parameters with defaults and rules, and a builder that turns values into a
 * {@link GuideSection} with exact walls. Every family centres its guide at the origin with the broad
 * side along x. Find families with {@link GuideFamilies}.
 */
public interface GuideFamily {

    /** @return the family's name as written in geometry files, lowercase_with_underscores, e.g. "double_ridge" */
    String name();

    /** @return one sentence saying what the family is and where it sits in the plane */
    String description();

    /** @return the parameters in the order they are best listed, each with its default and rule */
    List<FamilyParameter> parameters();

    /**
     * Builds the cross-section.
     *
     * @param values parameter values by name, SI units (metres for lengths); a parameter not given takes
     *     its default
     * @return the guide: its outer wall counter-clockwise, inner conductors as holes, dielectric regions
     *     inside it
     * @throws IllegalArgumentException naming the family, the parameter, its value and the rule, if a
     *     name is unknown, a value is missing or not finite, or a value breaks its rule
     */
    GuideSection build(Map<String, Double> values);

    /** @return the guide built from every parameter's default */
    default GuideSection buildDefault() {
        return build(Map.of());
    }

    /** @return every parameter's default by name, SI units, in the order of {@link #parameters()} */
    default Map<String, Double> defaults() {
        Map<String, Double> defaults = new LinkedHashMap<>();
        for (FamilyParameter p : parameters()) {
            defaults.put(p.name(), p.defaultValue());
        }
        return Collections.unmodifiableMap(defaults);
    }
}
