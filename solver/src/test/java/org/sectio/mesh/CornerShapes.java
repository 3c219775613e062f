package org.sectio.mesh;

import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Shapes;

/**
 * Shapes with re-entrant (270°) corners for the grid-planning tests, built by hand with
 * {@link Outline}, lengths in metres.
 */
public final class CornerShapes {

    /** Double-ridge outer width and height, m. */
    public static final double RIDGE_WIDTH_A = 20e-3;
    /** See {@link #RIDGE_WIDTH_A}. */
    public static final double RIDGE_HEIGHT_B = 10e-3;
    /** Width of each ridge, m. */
    public static final double RIDGE_S = 6e-3;
    /** Gap between the two ridges of the double-ridge guide, m. */
    public static final double RIDGE_GAP = 3e-3;

    private CornerShapes() {
    }

    /**
     * The L-shaped region of three unit squares, [0,2]² without (1,2]², turned 90° counter-clockwise
     * and moved by (0.3, −0.2) m, so that the re-entrant corner sits at (−0.7, 0.8) and no wall lies
     * on the coordinate axes.
     */
    public static CrossSection lShape() {
        double dx = 0.3;
        double dy = -0.2;
        // (x, y) → (−y, x) of the vertices (0,0), (2,0), (2,1), (1,1), (1,2), (0,2), then shifted
        return Shapes.polygon("L-shape", Outline.startAt(dx, dy).lineTo(dx, dy + 2).lineTo(dx - 1, dy + 2)
                .lineTo(dx - 1, dy + 1).lineTo(dx - 2, dy + 1).lineTo(dx - 2, dy));
    }

    /** x of the re-entrant corner of {@link #lShape()}, m. */
    public static final double L_CORNER_X = -0.7;
    /** y of the re-entrant corner of {@link #lShape()}, m. */
    public static final double L_CORNER_Y = 0.8;

    /**
     * A double-ridge guide: outer A × B, with ridges of width S on the middle of the top and bottom
     * walls, leaving a gap of height {@code gap} between them, centred.
     */
    public static CrossSection doubleRidge(double a, double b, double s, double gap) {
        double x0 = (a - s) / 2;
        double x1 = (a + s) / 2;
        double y0 = (b - gap) / 2;
        double y1 = (b + gap) / 2;
        return Shapes.polygon("double ridge", Outline.startAt(0, 0).lineTo(x0, 0).lineTo(x0, y0).lineTo(x1, y0)
                .lineTo(x1, 0).lineTo(a, 0).lineTo(a, b).lineTo(x1, b).lineTo(x1, y1).lineTo(x0, y1).lineTo(x0, b)
                .lineTo(0, b));
    }

    /** The 20 × 10 mm double-ridge guide with 6 mm ridges and a 3 mm gap. */
    public static CrossSection doubleRidge() {
        return doubleRidge(RIDGE_WIDTH_A, RIDGE_HEIGHT_B, RIDGE_S, RIDGE_GAP);
    }

    /**
     * A single-ridge guide: outer A × B, one ridge of width S rising from the middle of the bottom wall,
     * leaving a gap {@code gap} below the top wall.
     */
    public static CrossSection singleRidge(double a, double b, double s, double gap) {
        double x0 = (a - s) / 2;
        double x1 = (a + s) / 2;
        double top = b - gap;
        return Shapes.polygon("single ridge", Outline.startAt(0, 0).lineTo(x0, 0).lineTo(x0, top).lineTo(x1, top)
                .lineTo(x1, 0).lineTo(a, 0).lineTo(a, b).lineTo(0, b));
    }
}
