package org.sectio.geometry.file;

import java.util.Map;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.family.StandardSize;
import org.sectio.geometry.family.StandardSizes;

/**
 * {@code "standard": "WR-90"}, optionally with {@code "rounded_corners": r}: the inner rectangle of a
 * standard size (the "rectangular" family, centred at the origin), or with corners of radius r in the
 * file's units (the "rounded_rectangular" family, whose rule bounds r by half the narrow side).
 */
final class StandardGuide {

    private StandardGuide() {
    }

    /**
     * @param designation the value of {@code "standard"}
     * @param corners the value of {@code "rounded_corners"}, or null
     * @return the guide, m
     * @throws SectionFileException for an unknown designation (listing known or nearest ones) or a bad radius
     */
    static GuideSection read(SectionNode designation, SectionNode corners) throws SectionFileException {
        String name = designation.text();
        StandardSize size;
        try {
            size = StandardSizes.byName(name);
        } catch (IllegalArgumentException e) {
            throw designation.problem(e.getMessage());
        }
        String title = size.designation() + " (" + size.widthInches() + " × " + size.heightInches() + " in)";
        if (corners == null) {
            return GuideFamilies.byName("rectangular").build(size.dimensions()).named(title);
        }
        double radius = corners.nonNegativeLength();
        try {
            return GuideFamilies.byName("rounded_rectangular").build(Map.of("width", size.width(),
                    "height", size.height(), "corner_radius", radius)).named(title + " with rounded corners");
        } catch (IllegalArgumentException e) {
            throw corners.problem(e.getMessage());
        }
    }
}
