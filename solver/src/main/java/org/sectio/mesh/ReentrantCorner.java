package org.sectio.mesh;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.WallPiece;

/**
 * A re-entrant corner of the wall: a vertex where the interior angle ω exceeds π. Near it the modal
 * field behaves like r^λ with λ = π/ω (the Meixner edge condition; for ω = 3π/2, λ = 2/3), so its
 * gradient is unbounded and a uniform grid loses accuracy there.
 *
 * <p>Why from tangents: the wall is handed over as {@link WallPiece}s only, so the turn at a vertex is
 * measured from the two pieces' end tangents, approximated by a tiny parameter step; this works the
 * same for straight segments and arcs.
 *
 * @param x corner x, m
 * @param y corner y, m
 * @param interiorAngle the interior angle ω, rad, π &lt; ω ≤ 2π
 */
public record ReentrantCorner(double x, double y, double interiorAngle) {

    /** Clockwise turn (rad) beyond which a vertex counts as re-entrant: 1°. */
    public static final double MIN_TURN = Math.PI / 180;

    /** Parameter step, as a share of a piece's parameter range, used to approximate end tangents. */
    private static final double TANGENT_STEP = 1e-6;

    /** Two piece ends closer than this share of the section's size are the same vertex. */
    private static final double JOIN_TOLERANCE = 1e-9;

    /**
     * @throws IllegalArgumentException if a coordinate is not finite or ω is outside (π, 2π]
     */
    public ReentrantCorner {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("corner must be finite, got (" + x + ", " + y + ")");
        }
        if (!(interiorAngle > Math.PI && interiorAngle <= 2 * Math.PI)) {
            throw new IllegalArgumentException("a re-entrant corner has an interior angle in (π, 2π], got "
                    + interiorAngle);
        }
    }

    /** @return λ = π/ω, the exponent of the leading singular term r^λ of the field at this corner */
    public double singularExponent() {
        return Math.PI / interiorAngle;
    }

    /**
     * Finds every re-entrant corner: at each vertex (the end of one piece and the start of the piece
     * that continues from it) the turn from the incoming to the outgoing tangent is measured; with the
     * interior on the left, a clockwise turn by more than {@link #MIN_TURN} means ω = π + |turn| &gt; π.
     *
     * @param section the cross-section, m
     * @return the corners in wall order (deterministic)
     */
    public static List<ReentrantCorner> of(CrossSection section) {
        List<WallPiece> pieces = section.wallPieces();
        double size = Math.max(section.bounds().width(), section.bounds().height());
        List<ReentrantCorner> corners = new ArrayList<>();
        for (int k = 0; k < pieces.size(); k++) {
            WallPiece in = pieces.get(k);
            WallPiece out = successor(pieces, k, JOIN_TOLERANCE * size);
            if (out == null) {
                continue;
            }
            double[] a = tangent(in, in.endParameter(), -1);
            double[] b = tangent(out, out.startParameter(), +1);
            double turn = Math.atan2(a[0] * b[1] - a[1] * b[0], a[0] * b[0] + a[1] * b[1]);
            if (turn < -MIN_TURN) {
                corners.add(new ReentrantCorner(in.endX(), in.endY(), Math.PI - turn));
            }
        }
        return List.copyOf(corners);
    }

    /** The piece starting where piece k ends: the next one in the list if it joins, else a search. */
    private static WallPiece successor(List<WallPiece> pieces, int k, double tolerance) {
        WallPiece in = pieces.get(k);
        WallPiece next = pieces.get((k + 1) % pieces.size());
        if (joins(in, next, tolerance)) {
            return next;
        }
        for (WallPiece p : pieces) {
            if (p != in && joins(in, p, tolerance)) {
                return p;
            }
        }
        return null;
    }

    private static boolean joins(WallPiece in, WallPiece out, double tolerance) {
        return Math.abs(in.endX() - out.startX()) <= tolerance && Math.abs(in.endY() - out.startY()) <= tolerance;
    }

    /**
     * The unit direction of travel at parameter t, from a chord of a tiny parameter step taken into
     * the piece ({@code into} = +1 from the start, −1 from the end).
     */
    private static double[] tangent(WallPiece p, double t, int into) {
        double range = p.endParameter() - p.startParameter();
        double other = t + into * TANGENT_STEP * range;
        double dx = (p.x(other) - p.x(t)) * into;
        double dy = (p.y(other) - p.y(t)) * into;
        double length = Math.hypot(dx, dy);
        return new double[] {dx / length, dy / length};
    }
}
