package org.sectio.geometry.file;

import java.util.List;
import org.sectio.geometry.Region;
import org.sectio.geometry.Shapes;

/**
 * {@code "ellipse": {"semi_axes": [a, b], "centre": [x, y], "rotate_degrees": t}}: semi-axis a along the
 * ellipse's own x direction, b along its y direction, both positive; the centre defaults to the
 * origin and the turn (counter-clockwise, degrees) to 0.
 */
final class EllipseWall implements WallShape {

    @Override
    public ShapeRegion read(SectionNode body) throws SectionFileException {
        body.requireObject("an object with \"semi_axes\" and optionally \"centre\" and \"rotate_degrees\"");
        body.allowOnly("semi_axes", "centre", "rotate_degrees");
        SectionNode axesNode = body.get("semi_axes");
        List<SectionNode> axes = axesNode.elements("a pair [a, b] of semi-axes");
        if (axes.size() != 2) {
            throw axesNode.problem("expected a pair [a, b] of two semi-axes, got " + axes.size() + " numbers");
        }
        double a = axes.get(0).positiveLength();
        double b = axes.get(1).positiveLength();
        double[] centre = body.has("centre") ? body.get("centre").point() : new double[] {0, 0};
        double turn = body.has("rotate_degrees") ? Math.toRadians(body.get("rotate_degrees").number()) : 0;
        var shape = Shapes.ellipse(a, b, centre[0], centre[1], turn);
        return new ShapeRegion(shape.name(), Region.of(shape.wallPieces()));
    }
}
