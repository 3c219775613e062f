package org.sectio.geometry.svg;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.EllipseArcCentre;
import org.sectio.geometry.Loop;
import org.sectio.geometry.Outline;

/**
 * Turns SVG path data (W3C SVG 1.1, §8.3) into closed wall loops in metres.
 *
 * <ul>
 *   <li>Each sub-path (from one moveto to the next, or to the end) becomes one loop. A sub-path
 *       without Z is closed by a straight step back to its start, as SVG fills an open sub-path
 *       (SVG 1.1 §11.3, "fill"). A sub-path that draws nothing (a lone moveto) is dropped.</li>
 *   <li>Points are mapped by {@code (x, y) → (s x, s y)}, or {@code (s x, −s y)} with {@code flipY} (SVG's
 *       y axis points down), s in metres per user unit.</li>
 *   <li>Straight commands (L H V Z) are exact segments. An arc A whose radii are equal after the F.6.6
 *       correction is an exact circular arc; any other arc is an exact elliptical arc. Cubic (C, S)
 *       and quadratic (Q, T) Bézier curves become chords within {@code tolerance} of the curve
 *       ({@link CurveFlattening}).</li>
 *   <li>A step to the current point (a zero-length L, or an arc whose end points coincide, which
 *       F.6.2 omits) draws nothing and is skipped; an arc with a zero radius is a straight step (F.6.2).</li>
 * </ul>
 */
public final class SvgPaths {

    private SvgPaths() {
    }

    /**
     * @param d the path data
     * @param metresPerUnit s, the length in metres of one user unit, &gt; 0
     * @param flipY whether to mirror y (SVG's y axis points down)
     * @param tolerance largest distance between a Bézier curve and its chords, m, &gt; 0
     * @return the closed sub-paths in order, at least one
     * @throws SvgPathException at the position in {@code d} of a syntax fault, or of the sub-path or
     *     command that cannot become a wall (no area, an arc that cannot be built)
     */
    public static List<SvgSubPath> read(String d, double metresPerUnit, boolean flipY, double tolerance)
            throws SvgPathException {
        Builder builder = new Builder(metresPerUnit, flipY ? -metresPerUnit : metresPerUnit, tolerance);
        PathDataReader.read(d, builder);
        builder.finish(d.length() + 1);
        if (builder.done.isEmpty()) {
            throw new SvgPathException(1, "the path data draws nothing, expected at least one sub-path with area");
        }
        return List.copyOf(builder.done);
    }

    /** Builds outlines in metres as the commands arrive. */
    private static final class Builder implements PathSink {
        private final double sx;
        private final double sy;
        private final double tolerance;
        private final List<SvgSubPath> done = new ArrayList<>();
        private Outline outline;
        private int steps;
        private int subPathPosition;
        /** The current point and the sub-path start, in user units. */
        private double ux;
        private double uy;
        private double startX;
        private double startY;
        private boolean closed;
        /** The outline's current point, m. */
        private double lastX;
        private double lastY;

        Builder(double sx, double sy, double tolerance) {
            this.sx = sx;
            this.sy = sy;
            this.tolerance = tolerance;
        }

        @Override
        public void moveTo(double x, double y, int position) throws SvgPathException {
            finish(position);
            begin(x, y, position);
        }

        private void begin(double x, double y, int position) {
            outline = Outline.startAt(sx * x, sy * y);
            lastX = sx * x;
            lastY = sy * y;
            steps = 0;
            subPathPosition = position;
            ux = x;
            uy = y;
            startX = x;
            startY = y;
            closed = false;
        }

        /** After Z, a drawing command starts a new sub-path at the old start (SVG 1.1 §8.3.3). */
        private void reopen(int position) throws SvgPathException {
            if (closed) {
                finish(position);
                begin(startX, startY, position);
            }
        }

        @Override
        public void lineTo(double x, double y, int position) throws SvgPathException {
            reopen(position);
            if (x == ux && y == uy) {
                return;
            }
            outline.lineTo(sx * x, sy * y);
            lastX = sx * x;
            lastY = sy * y;
            steps++;
            ux = x;
            uy = y;
        }

        @Override
        public void cubicTo(double x1, double y1, double x2, double y2, double x, double y, int position)
                throws SvgPathException {
            reopen(position);
            CurveFlattening.cubic(sx * ux, sy * uy, sx * x1, sy * y1, sx * x2, sy * y2, sx * x, sy * y,
                    tolerance, position, this::vertex);
            ux = x;
            uy = y;
        }

        @Override
        public void quadraticTo(double x1, double y1, double x, double y, int position) throws SvgPathException {
            reopen(position);
            CurveFlattening.quadratic(sx * ux, sy * uy, sx * x1, sy * y1, sx * x, sy * y,
                    tolerance, position, this::vertex);
            ux = x;
            uy = y;
        }

        /** A chord end in metres; a repeat of the outline's current point (a cusp) draws nothing. */
        private void vertex(double mx, double my) {
            if (mx != lastX || my != lastY) {
                outline.lineTo(mx, my);
                lastX = mx;
                lastY = my;
                steps++;
            }
        }

        @Override
        public void arcTo(double rx, double ry, double rotationDegrees, boolean largeArc, boolean sweep,
                          double x, double y, int position) throws SvgPathException {
            reopen(position);
            if (x == ux && y == uy) {
                return;
            }
            if (rx == 0 || ry == 0) {
                lineTo(x, y, position);
                return;
            }
            double rotation = Math.toRadians(rotationDegrees % 360);
            // F.6.6: the radii's signs are ignored
            EllipseArcCentre arc = EllipseArcCentre.fromEndpoints(ux, uy, x, y, Math.abs(rx), Math.abs(ry), rotation,
                    largeArc, sweep);
            boolean mirrored = (sx < 0) != (sy < 0);
            try {
                if (arc.circular()) {
                    outline.arcTo(sx * x, sy * y, mirrored ? -arc.sweep() : arc.sweep());
                } else {
                    double s = Math.abs(sx);
                    outline.ellipticalArcTo(sx * x, sy * y, s * arc.semiAxisA(), s * arc.semiAxisB(),
                            mirrored ? -rotation : rotation, largeArc, mirrored != sweep);
                }
            } catch (IllegalArgumentException e) {
                throw new SvgPathException(position, "the arc cannot be built: " + e.getMessage());
            }
            lastX = sx * x;
            lastY = sy * y;
            steps++;
            ux = x;
            uy = y;
        }

        @Override
        public void closePath(int position) {
            closed = true;
            ux = startX;
            uy = startY;
        }

        void finish(int position) throws SvgPathException {
            if (outline == null || steps == 0) {
                outline = null;
                return;
            }
            try {
                done.add(new SvgSubPath(new Loop(outline.close()), subPathPosition));
            } catch (IllegalArgumentException e) {
                throw new SvgPathException(subPathPosition, "the sub-path is not a valid wall: " + e.getMessage());
            }
            outline = null;
        }
    }
}
