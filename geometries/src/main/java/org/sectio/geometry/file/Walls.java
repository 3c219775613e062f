package org.sectio.geometry.file;

import org.sectio.geometry.Booleans;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.Loop;
import org.sectio.geometry.OutlineChecks;
import org.sectio.geometry.Region;

/**
 * The geometric checks a file's shapes must pass, each turning the check's message into a located
 * error: outlines that cross themselves or each other, inner conductors that touch or leave the wall,
 * dielectric regions outside the guide or overlapping each other.
 */
final class Walls {

    /** Areas below this fraction of a region's own area count as nothing (rounding of the cuts). */
    private static final double AREA_FRACTION = 1e-9;

    private Walls() {
    }

    /** @throws SectionFileException at {@code where} if a loop crosses or touches itself or another loop */
    static void requireSimple(Region region, SectionNode where) throws SectionFileException {
        try {
            OutlineChecks.requireValid(region, "the outline");
        } catch (IllegalArgumentException e) {
            throw where.problem(e.getMessage() + ", expected an outline that does not cross or touch itself");
        }
    }

    /** @throws SectionFileException at {@code where} unless the loop lies inside the interior, touching nothing */
    static void requireStrictlyInside(Loop conductor, Region interior, SectionNode where) throws SectionFileException {
        try {
            OutlineChecks.requireInside(Region.of(conductor), interior, "the inner conductor");
        } catch (IllegalArgumentException e) {
            throw where.problem(e.getMessage() + ", expected it strictly inside the guide, apart from every"
                    + " other wall");
        }
    }

    /** @throws SectionFileException at {@code where} unless the region lies within the guide's interior */
    static void requireWithin(Region region, Region interior, SectionNode where) throws SectionFileException {
        try {
            var outside = Booleans.difference(region, interior);
            if (outside.isPresent() && outside.get().area() > AREA_FRACTION * region.area()) {
                throw where.problem(String.format("the dielectric region has %.4g mm² outside the guide (or inside"
                        + " a conductor), expected it within the guide", outside.get().area() * 1e6));
            }
        } catch (IllegalArgumentException e) {
            throw where.problem("the dielectric region cannot be compared with the guide: " + e.getMessage());
        }
    }

    /** @throws SectionFileException at {@code where} if the region overlaps the other dielectric */
    static void requireApart(Region region, Dielectric other, SectionNode where) throws SectionFileException {
        try {
            var common = Booleans.intersection(region, other.region());
            if (common.isPresent() && common.get().area() > AREA_FRACTION * Math.min(region.area(), other.region().area())) {
                throw where.problem(String.format("the dielectric region overlaps \"%s\" over %.4g mm², expected"
                        + " dielectric regions that do not overlap", other.name(), common.get().area() * 1e6));
            }
        } catch (IllegalArgumentException e) {
            throw where.problem("the dielectric region cannot be compared with \"" + other.name() + "\": "
                    + e.getMessage());
        }
    }
}
