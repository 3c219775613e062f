package org.sectio.geometry.file;

import org.sectio.geometry.Region;
import org.sectio.geometry.Shapes;

/** {@code "circle": {"radius": r, "centre": [x, y]}}; the centre is optional and defaults to the origin. */
final class CircleWall implements WallShape {

    @Override
    public ShapeRegion read(SectionNode body) throws SectionFileException {
        body.requireObject("an object with \"radius\" and optionally \"centre\"");
        body.allowOnly("radius", "centre");
        double radius = body.get("radius").positiveLength();
        double[] centre = body.has("centre") ? body.get("centre").point() : new double[] {0, 0};
        var shape = Shapes.circle(radius, centre[0], centre[1]);
        return new ShapeRegion(shape.name(), Region.of(shape.wallPieces()));
    }
}
