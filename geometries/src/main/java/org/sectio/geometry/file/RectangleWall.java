package org.sectio.geometry.file;

import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;

/**
 * {@code "rectangle": {"width": a, "height": b, "centre": [x, y], "rotate_degrees": t, "corner_radius": r}}.
 * Without a centre the lower-left corner is at the origin; a turn is counter-clockwise about the
 * centre (for a rectangle without one, about its middle (a/2, b/2)). With a corner radius the four
 * corners are quarter circles of that radius, which must not exceed half the shorter side.
 */
final class RectangleWall implements WallShape {

    @Override
    public ShapeRegion read(SectionNode body) throws SectionFileException {
        body.requireObject("an object with \"width\" and \"height\"");
        body.allowOnly("width", "height", "centre", "rotate_degrees", "corner_radius");
        double width = body.get("width").positiveLength();
        double height = body.get("height").positiveLength();
        double[] centre = body.has("centre") ? body.get("centre").point() : new double[] {width / 2, height / 2};
        double turn = body.has("rotate_degrees") ? Math.toRadians(body.get("rotate_degrees").number()) : 0;
        double radius = 0;
        if (body.has("corner_radius")) {
            SectionNode radiusNode = body.get("corner_radius");
            radius = radiusNode.nonNegativeLength();
            double limit = Math.min(width, height) / 2;
            if (radius > limit * (1 + 1e-12)) {
                throw radiusNode.problem("the corner radius " + body.unit().shown(radius) + " is larger than half the"
                        + " shorter side (" + body.unit().shown(limit) + "), expected at most that");
            }
            radius = Math.min(radius, limit);
        }
        String description = String.format("rectangle %.4g × %.4g mm", width * 1e3, height * 1e3)
                + (radius > 0 ? String.format(" with corners of radius %.4g mm", radius * 1e3) : "")
                + (turn != 0 ? String.format(" turned %.3g°", Math.toDegrees(turn)) : "");
        return new ShapeRegion(description, Region.of(outline(width, height, radius, centre, turn)));
    }

    private static java.util.List<org.sectio.geometry.WallPiece> outline(double w, double h, double r,
                                                                         double[] centre, double turn) {
        double c = Math.cos(turn);
        double s = Math.sin(turn);
        // corners of the straight parts, counter-clockwise from the bottom edge, in the rectangle's frame
        double[][] local = {
            {-w / 2 + r, -h / 2}, {w / 2 - r, -h / 2}, {w / 2, -h / 2 + r}, {w / 2, h / 2 - r},
            {w / 2 - r, h / 2}, {-w / 2 + r, h / 2}, {-w / 2, h / 2 - r}, {-w / 2, -h / 2 + r}};
        double[][] p = new double[8][];
        for (int k = 0; k < 8; k++) {
            p[k] = new double[] {centre[0] + c * local[k][0] - s * local[k][1],
                centre[1] + s * local[k][0] + c * local[k][1]};
        }
        if (r == 0) {
            return Outline.startAt(p[0][0], p[0][1]).lineTo(p[2][0], p[2][1]).lineTo(p[4][0], p[4][1])
                    .lineTo(p[6][0], p[6][1]).close();
        }
        Outline outline = Outline.startAt(p[0][0], p[0][1]);
        for (int k = 0; k < 8; k++) {
            double[] to = p[(k + 1) % 8];
            double[] from = p[k];
            if (k % 2 == 0) {
                if (!(to[0] == from[0] && to[1] == from[1]) && Math.hypot(to[0] - from[0], to[1] - from[1]) > 1e-12 * (w + h)) {
                    outline.lineTo(to[0], to[1]);
                }
            } else {
                outline.arcTo(to[0], to[1], Math.PI / 2);
            }
        }
        return outline.close();
    }
}
