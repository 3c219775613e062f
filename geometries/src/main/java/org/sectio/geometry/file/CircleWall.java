package org.sectio.geometry.file;

import org.sectio.geometry.CrossSection;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Shapes;

/** {@code "circle": {"radius": r, "centre": [x, y]}}; the centre is optional and defaults to the origin. */
final class CircleWall implements WallShape {

    @Override
    public CrossSection read(SectionNode body, LengthUnit unit, String name) throws SectionFileException {
        body.requireObject("an object with \"radius\" and optionally \"centre\"");
        body.allowOnly("radius", "centre");
        double radius = body.get("radius").positiveLength(unit);
        double[] centre = body.has("centre") ? body.get("centre").point(unit) : new double[] {0, 0};
        CrossSection shape = Shapes.circle(radius, centre[0], centre[1]);
        return name == null ? shape : GuideSection.airFilled(name, shape.wallPieces());
    }
}
