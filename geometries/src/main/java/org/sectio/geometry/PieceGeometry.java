package org.sectio.geometry;

/**
 * Operations on wall pieces of every kind that the boolean operations and the outline checks need:
 * cutting a piece to a sub-range (the result is of the same kind, so stays exact), reversing it,
 * locating a point on it, and its distance from a point.
 *
 * <p>Why the point location works for every kind: a piece is monotone in x and y, so the point of the
 * piece with a given x (or y) is unique and given exactly by {@link WallPiece#parameterAtX}. Of the
 * points with the query's x, with its y and the two ends, the nearest lies within √2 times the true
 * distance of a point near the piece, which is all a tolerance test needs.
 */
final class PieceGeometry {

    private PieceGeometry() {
    }

    /**
     * The part of {@code p} between parameters t0 and t1 (either order), of the same kind, with its
     * ends placed exactly at (x0, y0) and (x1, y1), m (points on the piece, possibly snapped by
     * rounding-level amounts).
     */
    static WallPiece between(WallPiece p, double t0, double t1, double x0, double y0, double x1, double y1) {
        if (p instanceof LineSegment) {
            return new LineSegment(x0, y0, x1, y1);
        }
        if (p instanceof ArcPiece a) {
            return new ArcPiece(a.centreX(), a.centreY(), a.radius(), t0, t1, x0, y0, x1, y1);
        }
        if (p instanceof EllipseArcPiece e) {
            return new EllipseArcPiece(e.centreX(), e.centreY(), e.semiAxisA(), e.semiAxisB(), e.rotation(),
                    t0, t1, x0, y0, x1, y1);
        }
        throw new IllegalStateException("unknown wall piece " + p.getClass().getName());
    }

    /** @return {@code p} traversed the other way, so the region it bounds is on the other side */
    static WallPiece reversed(WallPiece p) {
        return Outline.reversed(java.util.List.of(p)).get(0);
    }

    /** @return the parameter of the point of {@code p} nearest (x, y), m, to within a factor √2 in distance */
    static double nearestParameter(WallPiece p, double x, double y) {
        double t0 = p.startParameter();
        double t1 = p.endParameter();
        double best = t0;
        double bestDistance = Math.hypot(p.startX() - x, p.startY() - y);
        double dEnd = Math.hypot(p.endX() - x, p.endY() - y);
        if (dEnd < bestDistance) {
            best = t1;
            bestDistance = dEnd;
        }
        if ((p.startX() < x) == (x < p.endX()) && p.startX() != x && p.endX() != x) {
            double t = clamp(p.parameterAtX(x), t0, t1);
            double d = Math.hypot(p.x(t) - x, p.y(t) - y);
            if (d < bestDistance) {
                best = t;
                bestDistance = d;
            }
        }
        if ((p.startY() < y) == (y < p.endY()) && p.startY() != y && p.endY() != y) {
            double t = clamp(p.parameterAtY(y), t0, t1);
            double d = Math.hypot(p.x(t) - x, p.y(t) - y);
            if (d < bestDistance) {
                best = t;
            }
        }
        return best;
    }

    /** @return the distance from (x, y) to the piece, m, exact far away and within a factor √2 near it */
    static double distance(WallPiece p, double x, double y) {
        double t = nearestParameter(p, x, y);
        return Math.hypot(p.x(t) - x, p.y(t) - y);
    }

    /**
     * The signed distance (to first order near the curve) from (x, y) to the whole curve the piece lies
     * on: the infinite line, the full circle or the full ellipse, m.
     */
    static double curveDistance(WallPiece p, double x, double y) {
        if (p instanceof LineSegment s) {
            double dx = s.x1() - s.x0();
            double dy = s.y1() - s.y0();
            return (dx * (y - s.y0()) - dy * (x - s.x0())) / Math.hypot(dx, dy);
        }
        if (p instanceof ArcPiece a) {
            return Math.hypot(x - a.centreX(), y - a.centreY()) - a.radius();
        }
        if (p instanceof EllipseArcPiece e) {
            return e.curveDistance(x, y);
        }
        throw new IllegalStateException("unknown wall piece " + p.getClass().getName());
    }

    /** @return the parameter halfway along the piece's range */
    static double middle(WallPiece p) {
        return 0.5 * (p.startParameter() + p.endParameter());
    }

    /**
     * The unit direction in which the piece leaves its start ({@code atStart}) or arrives at its end,
     * from a chord over a small fraction of the piece (which also sees the curvature of a curved piece).
     */
    static double[] direction(WallPiece p, boolean atStart) {
        double t0 = p.startParameter();
        double t1 = p.endParameter();
        double step = 1e-6 * (t1 - t0);
        double dx = atStart ? p.x(t0 + step) - p.startX() : p.endX() - p.x(t1 - step);
        double dy = atStart ? p.y(t0 + step) - p.startY() : p.endY() - p.y(t1 - step);
        double norm = Math.hypot(dx, dy);
        return new double[] {dx / norm, dy / norm};
    }

    private static double clamp(double t, double t0, double t1) {
        return Math.max(Math.min(t0, t1), Math.min(Math.max(t0, t1), t));
    }
}
