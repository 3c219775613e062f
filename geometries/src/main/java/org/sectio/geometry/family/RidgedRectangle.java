package org.sectio.geometry.family;

import java.util.List;
import org.sectio.geometry.WallPiece;

/**
 * The outline of a rectangle centred at the origin, width along x, whose walls may each carry one
 * {@link RidgeNotch} at their middle. The walls are traced counter-clockwise from the lower-left
 * corner: bottom, right, top, left. Every coordinate is a sum of the given dimensions with signs, so
 * symmetric ridges are exactly symmetric.
 */
final class RidgedRectangle {

    private final double halfWidth;
    private final double halfHeight;
    private final OutlineTrace trace;

    private RidgedRectangle(double width, double height) {
        this.halfWidth = width / 2;
        this.halfHeight = height / 2;
        this.trace = OutlineTrace.startAt(-halfWidth, -halfHeight, Math.max(width, height));
    }

    /**
     * @param width along x, m
     * @param height along y, m
     * @param bottom the ridge on the wall y = −height/2, or null
     * @param right the ridge on the wall x = +width/2, or null
     * @param top the ridge on the wall y = +height/2, or null
     * @param left the ridge on the wall x = −width/2, or null
     * @return the closed outline, counter-clockwise
     */
    static List<WallPiece> outline(double width, double height, RidgeNotch bottom, RidgeNotch right, RidgeNotch top,
                                   RidgeNotch left) {
        RidgedRectangle r = new RidgedRectangle(width, height);
        // each wall: from its first corner, along direction (ux, uy), interior towards (nx, ny) = left of u
        r.wall(0, -r.halfHeight, 1, 0, bottom, r.halfWidth, -r.halfHeight);
        r.wall(r.halfWidth, 0, 0, 1, right, r.halfWidth, r.halfHeight);
        r.wall(0, r.halfHeight, -1, 0, top, -r.halfWidth, r.halfHeight);
        r.wall(-r.halfWidth, 0, 0, -1, left, -r.halfWidth, -r.halfHeight);
        return r.trace.close();
    }

    /** Traces one wall whose middle is (mx, my), direction (ux, uy), ending at corner (endX, endY). */
    private void wall(double mx, double my, int ux, int uy, RidgeNotch ridge, double endX, double endY) {
        if (ridge != null) {
            int nx = -uy;
            int ny = ux;
            double w = ridge.width() / 2;
            double h = ridge.depth();
            double rc = ridge.cornerRadius();
            double rf = ridge.filletRadius();
            Frame f = new Frame(mx, my, ux, uy, nx, ny);
            // the foot, the near flank, the tip, the far flank, the foot: fillets turn left, tip corners right
            trace.lineTo(f.x(-w - rf, 0), f.y(-w - rf, 0));
            if (rf > 0) {
                trace.arcTo(f.x(-w, rf), f.y(-w, rf), Math.PI / 2);
            }
            trace.lineTo(f.x(-w, h - rc), f.y(-w, h - rc));
            if (rc > 0) {
                trace.arcTo(f.x(-w + rc, h), f.y(-w + rc, h), -Math.PI / 2);
            }
            trace.lineTo(f.x(w - rc, h), f.y(w - rc, h));
            if (rc > 0) {
                trace.arcTo(f.x(w, h - rc), f.y(w, h - rc), -Math.PI / 2);
            }
            trace.lineTo(f.x(w, rf), f.y(w, rf));
            if (rf > 0) {
                trace.arcTo(f.x(w + rf, 0), f.y(w + rf, 0), Math.PI / 2);
            }
        }
        trace.lineTo(endX, endY);
    }

    /** Coordinates along a wall (u) and into the guide (n) from the wall's middle, axis directions only. */
    private record Frame(double mx, double my, int ux, int uy, int nx, int ny) {

        double x(double along, double inward) {
            return mx + ux * along + nx * inward;
        }

        double y(double along, double inward) {
            return my + uy * along + ny * inward;
        }
    }
}
