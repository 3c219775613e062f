package org.sectio.geometry.file;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The shape keys a file may use wherever a shape belongs (the wall, an inner conductor, a dielectric
 * region, an operand of a combination), each read by its {@link WallShape}.
 */
final class ShapeKinds {

    private final Map<String, WallShape> kinds = new LinkedHashMap<>();

    ShapeKinds() {
        kinds.put("rectangle", new RectangleWall());
        kinds.put("circle", new CircleWall());
        kinds.put("ellipse", new EllipseWall());
        kinds.put("outline", new OutlineWall());
        kinds.put("svg_path", new SvgPathWall());
        kinds.put("union", new CombinedShape(CombinedShape.Kind.UNION, this));
        kinds.put("difference", new CombinedShape(CombinedShape.Kind.DIFFERENCE, this));
        kinds.put("intersection", new CombinedShape(CombinedShape.Kind.INTERSECTION, this));
    }

    /** @return the shape keys, in documentation order */
    String[] keys() {
        return kinds.keySet().toArray(String[]::new);
    }

    /**
     * @param shape an object with exactly one shape key
     * @return the shape it describes, m
     * @throws SectionFileException if it is not an object with one known shape key, or the shape is bad
     */
    ShapeRegion read(SectionNode shape) throws SectionFileException {
        shape.requireObject("an object with one shape key (" + SectionNode.quoted(keys()) + ")");
        List<String> keys = shape.keys();
        if (keys.size() != 1) {
            throw shape.problem("expected exactly one shape key (" + SectionNode.quoted(keys()) + "), got "
                    + keys.size());
        }
        shape.allowOnly(keys());
        return kinds.get(keys.get(0)).read(shape.get(keys.get(0)));
    }
}
