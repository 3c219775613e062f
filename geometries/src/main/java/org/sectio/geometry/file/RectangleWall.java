package org.sectio.geometry.file;

import org.sectio.geometry.CrossSection;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Shapes;

/** {@code "rectangle": {"width": a, "height": b}}: lower-left corner at the origin, sides on the axes. */
final class RectangleWall implements WallShape {

    @Override
    public CrossSection read(SectionNode body, LengthUnit unit, String name) throws SectionFileException {
        body.requireObject("an object with \"width\" and \"height\"");
        body.allowOnly("width", "height");
        double width = body.get("width").positiveLength(unit);
        double height = body.get("height").positiveLength(unit);
        CrossSection shape = Shapes.rectangle(width, height);
        return name == null ? shape : GuideSection.airFilled(name, shape.wallPieces());
    }
}
