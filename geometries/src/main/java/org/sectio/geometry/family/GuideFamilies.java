package org.sectio.geometry.family;

import java.util.List;
import java.util.Locale;
import java.util.StringJoiner;

/** The built-in cross-section families, found by name. */
public final class GuideFamilies {

    private static final List<GuideFamily> ALL = List.of(
            new RectangularFamily(),
            new RoundedRectangularFamily(),
            new CircularFamily(),
            new EllipticalFamily(),
            new CoaxialFamily(),
            new RidgedGuideFamily("single_ridge", 1),
            new RidgedGuideFamily("double_ridge", 2),
            new QuadRidgeFamily(),
            new SlabLoadedFamily(),
            new SlabOnBroadWallFamily(),
            new RodLoadedCircularFamily());

    private GuideFamilies() {
    }

    /** @return every built-in family, in a fixed order (plain shapes first, then ridged, then loaded) */
    public static List<GuideFamily> all() {
        return ALL;
    }

    /**
     * @param name a family name such as "double_ridge"; letter case and surrounding spaces are ignored
     * @return the family of that name
     * @throws IllegalArgumentException listing the known names, if there is none of that name
     */
    public static GuideFamily byName(String name) {
        String wanted = name == null ? "" : name.strip().toLowerCase(Locale.ROOT);
        for (GuideFamily family : ALL) {
            if (family.name().equals(wanted)) {
                return family;
            }
        }
        StringJoiner known = new StringJoiner(", ");
        ALL.forEach(f -> known.add(f.name()));
        throw new IllegalArgumentException("unknown guide family '" + name + "'; known: " + known);
    }
}
