package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * A closed wall made of straight segments and circular arcs, built step by step from a start point,
 * in metres. On {@link #close()} arcs are split at the quadrant angles so that every piece is monotone
 * in x and y, and the loop is oriented counter-clockwise (interior on the left).
 *
 * <pre>{@code
 * Outline.startAt(0, 0).lineTo(0.02, 0).arcTo(0.02, 0.01, Math.PI).lineTo(0, 0.01).close();
 * }</pre>
 */
public final class Outline {

    private final double startX;
    private final double startY;
    private double currentX;
    private double currentY;
    private final List<WallPiece> pieces = new ArrayList<>();

    private Outline(double x, double y) {
        requireFinite("start point", x, y);
        startX = x;
        startY = y;
        currentX = x;
        currentY = y;
    }

    /**
     * @param x start point x, m
     * @param y start point y, m
     * @return a new outline beginning there
     * @throws IllegalArgumentException if a coordinate is not finite
     */
    public static Outline startAt(double x, double y) {
        return new Outline(x, y);
    }

    /**
     * Adds a straight segment from the current point.
     *
     * @throws IllegalArgumentException if the end is not finite or equals the current point
     */
    public Outline lineTo(double x, double y) {
        requireFinite("segment end", x, y);
        pieces.add(new LineSegment(currentX, currentY, x, y));
        currentX = x;
        currentY = y;
        return this;
    }

    /**
     * Adds a circular arc from the current point to (x, y) turning through {@code sweepRadians}
     * (positive: counter-clockwise), 0 &lt; |sweep| &lt; 2π.
     *
     * @throws IllegalArgumentException if the sweep is out of range or the end equals the current point
     */
    public Outline arcTo(double x, double y, double sweepRadians) {
        requireFinite("arc end", x, y);
        if (!(Math.abs(sweepRadians) > 0 && Math.abs(sweepRadians) < 2 * Math.PI)) {
            throw new IllegalArgumentException("arc sweep must be in (0, 2π) in magnitude, got " + sweepRadians);
        }
        double chordX = x - currentX;
        double chordY = y - currentY;
        double chord = Math.hypot(chordX, chordY);
        if (chord == 0) {
            throw new IllegalArgumentException("arc of zero chord at (" + x + ", " + y + ")");
        }
        double radius = chord / (2 * Math.sin(Math.abs(sweepRadians) / 2));
        // centre on the left of the chord for a counter-clockwise sweep below π, mirrored otherwise
        double toCentre = Math.sqrt(Math.max(0, radius * radius - chord * chord / 4));
        double side = Math.signum(sweepRadians) * (Math.abs(sweepRadians) <= Math.PI ? 1 : -1);
        double centreX = currentX + chordX / 2 - side * toCentre * chordY / chord;
        double centreY = currentY + chordY / 2 + side * toCentre * chordX / chord;
        double startAngle = Math.atan2(currentY - centreY, currentX - centreX);
        addArc(centreX, centreY, radius, startAngle, startAngle + sweepRadians, currentX, currentY, x, y);
        currentX = x;
        currentY = y;
        return this;
    }

    /**
     * Adds an arc of an ellipse from the current point to (x, y), chosen among the (up to) four
     * candidates by two flags exactly as the elliptical arc command of SVG chooses them (W3C SVG 1.1,
     * Appendix F.6.5, endpoint-to-centre conversion): semi-axes too small to join the two points are
     * scaled up together until they just do (F.6.6). The arc is split at once where dx/dt or dy/dt
     * vanishes, so that every piece is monotone in x and y.
     *
     * <p>Coordinates here are y-up: {@code counterClockwise} is SVG's sweep flag read in a y-up frame
     * (an importer of y-down SVG data flips y and so inverts the flag).
     *
     * @param x end x, m
     * @param y end y, m
     * @param semiAxisX semi-axis along the ellipse's own x direction before rotation, m, &gt; 0
     * @param semiAxisY semi-axis along the ellipse's own y direction before rotation, m, &gt; 0
     * @param rotationRadians counter-clockwise turn of the ellipse's own x direction from the x axis
     * @param largeArc take the candidate sweeping more than half a turn
     * @param counterClockwise take the candidate traversed counter-clockwise
     * @throws IllegalArgumentException if a value is not finite, a semi-axis is not positive, or the end
     *     equals the current point
     */
    public Outline ellipticalArcTo(double x, double y, double semiAxisX, double semiAxisY, double rotationRadians,
                                   boolean largeArc, boolean counterClockwise) {
        requireFinite("elliptical arc end", x, y);
        EllipseArcCentre arc = EllipseArcCentre.fromEndpoints(currentX, currentY, x, y, semiAxisX, semiAxisY,
                rotationRadians, largeArc, counterClockwise);
        pieces.addAll(EllipseArcPiece.monotonePieces(arc.centreX(), arc.centreY(), arc.semiAxisA(), arc.semiAxisB(),
                rotationRadians, arc.startParameter(), arc.startParameter() + arc.sweep(), currentX, currentY, x, y));
        currentX = x;
        currentY = y;
        return this;
    }

    /**
     * A whole ellipse (x, y) = c + R(φ)(a cos t, b sin t) as a counter-clockwise loop of monotone pieces.
     */
    static List<WallPiece> ellipse(double centreX, double centreY, double a, double b, double rotation) {
        EllipseArcPiece start = EllipseArcPiece.of(centreX, centreY, a, b, rotation, 0, 0.5);
        return List.copyOf(EllipseArcPiece.monotonePieces(centreX, centreY, a, b, rotation, 0, 2 * Math.PI,
                start.startX(), start.startY(), start.startX(), start.startY()));
    }

    /**
     * Closes the outline with a straight segment back to the start if needed.
     *
     * @return the closed loop, counter-clockwise
     * @throws IllegalArgumentException if the loop encloses no area
     */
    public List<WallPiece> close() {
        if (currentX != startX || currentY != startY) {
            lineTo(startX, startY);
        }
        double area = 0;
        for (WallPiece piece : pieces) {
            area += piece.integralXdy(piece.startParameter(), piece.endParameter());
        }
        if (!(Math.abs(area) > 0)) {
            throw new IllegalArgumentException("outline encloses no area");
        }
        return area > 0 ? List.copyOf(pieces) : reversed(pieces);
    }

    /** A full circle of the given centre and radius, as a counter-clockwise loop of four quadrant arcs. */
    static List<WallPiece> circle(double centreX, double centreY, double radius) {
        // the four axis points once, exactly: neighbouring quarters must share their end points bit for bit
        double[] xs = {centreX + radius, centreX, centreX - radius, centreX, centreX + radius};
        double[] ys = {centreY, centreY + radius, centreY, centreY - radius, centreY};
        List<WallPiece> quarters = new ArrayList<>();
        for (int q = 0; q < 4; q++) {
            quarters.add(new ArcPiece(centreX, centreY, radius, q * 0.5 * Math.PI, (q + 1) * 0.5 * Math.PI,
                    xs[q], ys[q], xs[q + 1], ys[q + 1]));
        }
        return List.copyOf(quarters);
    }

    /** The same loop traversed the other way, so that its interior side flips. */
    static List<WallPiece> reversed(List<WallPiece> loop) {
        List<WallPiece> out = new ArrayList<>(loop.size());
        for (int i = loop.size() - 1; i >= 0; i--) {
            WallPiece p = loop.get(i);
            if (p instanceof LineSegment s) {
                out.add(new LineSegment(s.x1(), s.y1(), s.x0(), s.y0()));
            } else if (p instanceof ArcPiece a) {
                out.add(new ArcPiece(a.centreX(), a.centreY(), a.radius(), a.endAngle(), a.startAngle(),
                        a.endX(), a.endY(), a.startX(), a.startY()));
            } else if (p instanceof EllipseArcPiece e) {
                out.add(e.reversed());
            } else {
                throw new IllegalStateException("unknown wall piece " + p.getClass().getName());
            }
        }
        return List.copyOf(out);
    }

    private void addArc(double cx, double cy, double r, double a0, double a1,
                        double x0, double y0, double x1, double y1) {
        double quarter = 0.5 * Math.PI;
        double direction = Math.signum(a1 - a0);
        double from = a0;
        double fromX = x0;
        double fromY = y0;
        while (true) {
            // next quadrant boundary strictly beyond 'from' in the sweep direction
            double k = direction > 0 ? Math.floor(from / quarter + 1e-9) + 1 : Math.ceil(from / quarter - 1e-9) - 1;
            double boundary = k * quarter;
            boolean last = direction > 0 ? boundary >= a1 - 1e-12 : boundary <= a1 + 1e-12;
            double to = last ? a1 : boundary;
            double toX = last ? x1 : quadrantPointX(cx, r, k);
            double toY = last ? y1 : quadrantPointY(cy, r, k);
            pieces.add(new ArcPiece(cx, cy, r, from, to, fromX, fromY, toX, toY));
            if (last) {
                return;
            }
            from = to;
            fromX = toX;
            fromY = toY;
        }
    }

    /** x of the circle point at angle k·π/2, exact (cos of a multiple of π/2 is not, in floating point). */
    private static double quadrantPointX(double cx, double r, double k) {
        int q = Math.floorMod((int) Math.round(k), 4);
        return q == 0 ? cx + r : q == 2 ? cx - r : cx;
    }

    /** y of the circle point at angle k·π/2, exact. */
    private static double quadrantPointY(double cy, double r, double k) {
        int q = Math.floorMod((int) Math.round(k), 4);
        return q == 1 ? cy + r : q == 3 ? cy - r : cy;
    }

    private static void requireFinite(String what, double x, double y) {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException(what + " must be finite, got (" + x + ", " + y + ")");
        }
    }
}
