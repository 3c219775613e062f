package org.sectio.modes;

import java.util.List;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.WallCrossings;
import org.sectio.geometry.WallPiece;

/**
 * What a cross-section is, as far as naming its modes goes: whether it is a plain rectangle or circle,
 * and whether it is mirror-symmetric about the vertical line x = xc and the horizontal line y = yc
 * through the centre (xc, yc) of its bounding box.
 *
 * <p>A mirror is detected by reflecting {@value #SAMPLES_PER_PIECE} points inside each wall piece and
 * checking that each image lies on a wall: the line y = y′ (or x = x′) through the image must cross a
 * wall within {@value #RELATIVE_TOLERANCE} × the larger box side of it. The same is required of the
 * boundary of every dielectric region, whose image must lie on the boundary of a region of the same
 * material. The test is exact for the shapes built from segments and arcs (up to rounding); a guide
 * asymmetric by less than the tolerance counts as symmetric.
 *
 * <p>Rectangular: one conductor, no dielectric regions, every wall sample on the bounding box's edges
 * (a closed wall on the box's boundary is the whole box). Circular: one conductor, no dielectric
 * regions, a square box, every wall sample at distance R = width / 2 from the centre.
 *
 * @param kind rectangular, circular or other
 * @param mirroredAboutVertical whether the guide is its own mirror image about x = xc
 * @param mirroredAboutHorizontal whether the guide is its own mirror image about y = yc
 * @param bounds the bounding box, m
 */
public record SectionShape(GuideShape kind, boolean mirroredAboutVertical, boolean mirroredAboutHorizontal,
                           Bounds bounds) {

    /** Wall distance, relative to the larger box side, within which a point counts as on the wall. */
    public static final double RELATIVE_TOLERANCE = 1e-6;
    /** Points tested inside each wall piece. */
    public static final int SAMPLES_PER_PIECE = 7;

    /** @throws IllegalArgumentException if a component is null */
    public SectionShape {
        if (kind == null || bounds == null) {
            throw new IllegalArgumentException("section shape: kind and bounds are required");
        }
    }

    /**
     * Recognizes the shape and mirrors of a cross-section.
     *
     * @param section the cross-section
     * @return its shape
     */
    public static SectionShape of(CrossSection section) {
        Bounds b = section.bounds();
        double tol = RELATIVE_TOLERANCE * Math.max(b.width(), b.height());
        double xc = 0.5 * (b.minX() + b.maxX());
        double yc = 0.5 * (b.minY() + b.maxY());
        boolean vertical = mirrored(section, true, xc, tol);
        boolean horizontal = mirrored(section, false, yc, tol);
        GuideShape kind = GuideShape.OTHER;
        boolean plain = section.conductors().size() == 1 && section.dielectrics().isEmpty();
        if (plain && allSamples(section.wallPieces(), (x, y) -> onBoxEdge(b, x, y, tol))) {
            kind = GuideShape.RECTANGULAR;
        } else if (plain && Math.abs(b.width() - b.height()) <= tol && allSamples(section.wallPieces(),
                (x, y) -> Math.abs(Math.hypot(x - xc, y - yc) - 0.5 * b.width()) <= tol)) {
            kind = GuideShape.CIRCULAR;
        }
        return new SectionShape(kind, vertical, horizontal, b);
    }

    /** @return xc, m */
    public double centreX() {
        return 0.5 * (bounds.minX() + bounds.maxX());
    }

    /** @return yc, m */
    public double centreY() {
        return 0.5 * (bounds.minY() + bounds.maxY());
    }

    private interface PointTest {
        boolean holds(double x, double y);
    }

    private static boolean allSamples(List<WallPiece> pieces, PointTest test) {
        for (WallPiece p : pieces) {
            for (int s = 0; s <= SAMPLES_PER_PIECE + 1; s++) {
                double t = p.startParameter() + (p.endParameter() - p.startParameter()) * s / (SAMPLES_PER_PIECE + 1);
                if (!test.holds(p.x(t), p.y(t))) {
                    return false;
                }
            }
        }
        return true;
    }

    private static boolean onBoxEdge(Bounds b, double x, double y, double tol) {
        return Math.abs(x - b.minX()) <= tol || Math.abs(x - b.maxX()) <= tol
                || Math.abs(y - b.minY()) <= tol || Math.abs(y - b.maxY()) <= tol;
    }

    /** Whether walls and dielectric boundaries map onto themselves under the mirror x ↦ 2c − x (or y). */
    private static boolean mirrored(CrossSection section, boolean aboutVertical, double c, double tol) {
        List<WallPiece> walls = section.wallPieces();
        if (!interiorSamples(walls, aboutVertical, c, (x, y) -> onCurve(walls, x, y, tol))) {
            return false;
        }
        List<Dielectric> dielectrics = section.dielectrics();
        for (Dielectric d : dielectrics) {
            PointTest onSameMaterial = (x, y) -> {
                for (Dielectric other : dielectrics) {
                    if (other.material().equals(d.material()) && onCurve(other.region().pieces(), x, y, tol)) {
                        return true;
                    }
                }
                return false;
            };
            if (!interiorSamples(d.region().pieces(), aboutVertical, c, onSameMaterial)) {
                return false;
            }
        }
        return true;
    }

    /** Applies the test to the mirror images of points strictly inside each piece (ends are avoided). */
    private static boolean interiorSamples(List<WallPiece> pieces, boolean aboutVertical, double c, PointTest test) {
        for (WallPiece p : pieces) {
            for (int s = 0; s < SAMPLES_PER_PIECE; s++) {
                double t = p.startParameter() + (p.endParameter() - p.startParameter()) * (s + 0.5) / SAMPLES_PER_PIECE;
                double x = p.x(t);
                double y = p.y(t);
                if (!(aboutVertical ? test.holds(2 * c - x, y) : test.holds(x, 2 * c - y))) {
                    return false;
                }
            }
        }
        return true;
    }

    private static boolean onCurve(List<WallPiece> pieces, double x, double y, double tol) {
        for (double cx : WallCrossings.atY(pieces, y)) {
            if (Math.abs(cx - x) <= tol) {
                return true;
            }
        }
        for (double cy : WallCrossings.atX(pieces, x)) {
            if (Math.abs(cy - y) <= tol) {
                return true;
            }
        }
        return false;
    }
}
