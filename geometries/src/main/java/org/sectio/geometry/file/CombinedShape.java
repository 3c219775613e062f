package org.sectio.geometry.file;

import java.util.List;
import java.util.Optional;
import org.sectio.geometry.Booleans;
import org.sectio.geometry.Region;

/**
 * {@code "union": [shape, ...]}, {@code "difference": [shape, ...]} (the first minus all the others) and
 * {@code "intersection": [shape, ...]}: at least two shapes, combined left to right with
 * {@link Booleans}, exact pieces kept. An empty result is an error at the array.
 */
final class CombinedShape implements WallShape {

    /** Which combination. */
    enum Kind { UNION, DIFFERENCE, INTERSECTION }

    private final Kind kind;
    private final ShapeKinds shapes;

    CombinedShape(Kind kind, ShapeKinds shapes) {
        this.kind = kind;
        this.shapes = shapes;
    }

    @Override
    public ShapeRegion read(SectionNode body) throws SectionFileException {
        String word = kind.name().toLowerCase(java.util.Locale.ROOT);
        List<SectionNode> items = body.elements("an array of at least two shapes");
        if (items.size() < 2) {
            throw body.problem("expected at least two shapes to combine, got " + items.size());
        }
        Region result = shapes.read(items.get(0)).region();
        for (SectionNode item : items.subList(1, items.size())) {
            Region next = shapes.read(item).region();
            try {
                Optional<Region> combined = switch (kind) {
                    case UNION -> Optional.of(Booleans.union(result, next));
                    case DIFFERENCE -> Booleans.difference(result, next);
                    case INTERSECTION -> Booleans.intersection(result, next);
                };
                if (combined.isEmpty()) {
                    throw item.problem("the " + word + " becomes empty with this shape, expected shapes that"
                            + (kind == Kind.DIFFERENCE ? " leave part of the first" : " overlap"));
                }
                result = combined.get();
            } catch (IllegalArgumentException e) {
                throw item.problem("the " + word + " cannot be formed with this shape: " + e.getMessage());
            }
        }
        return new ShapeRegion(word + " of " + items.size() + " shapes", result);
    }
}
