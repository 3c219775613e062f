package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Union, difference and intersection of two regions, with boundaries made of the same exact pieces
 * (segments, circular and elliptical arcs) cut where the two boundaries meet: a ridged guide is a
 * rectangle minus a ridge, a coaxial guide a circle minus a smaller one.
 *
 * <p>Method: clipping by edge classification, as in Weiler &amp; Atherton, "Hidden surface removal
 * using polygon area sorting", SIGGRAPH 1977 (and Greiner &amp; Hormann, "Efficient clipping of
 * arbitrary polygons", ACM TOG 17(2), 1998), extended from polygons to curved pieces, with the
 * explicit treatment of shared edges of Martínez, Rueda &amp; Feito, "A new algorithm for computing
 * Boolean operations on polygons", Computers &amp; Geosciences 35, 2009:
 * <ol>
 * <li>cut both boundaries at every point where they meet ({@link BoundarySplit});</li>
 * <li>label each cut piece of one boundary by a point test at its middle against the other region:
 *     inside or outside; or, if the other boundary has the same piece, shared in the same or the
 *     opposite direction (the regions on the same or on opposite sides);</li>
 * <li>keep: union — outside pieces of both, shared-same once; intersection — inside pieces of both,
 *     shared-same once; a minus b — a's outside pieces, b's inside pieces reversed, shared-opposite
 *     once;</li>
 * <li>chain the kept pieces into closed loops at their common vertices ({@link LoopChains}).</li>
 * </ol>
 * Points closer than 1e-9 of the larger side of the two regions' common box are one point.
 *
 * <p>The regions' own loops must not cross themselves or each other (see {@link OutlineChecks}).
 */
public final class Booleans {

    /** Points closer than this fraction of the common box size coincide. */
    static final double RELATIVE_TOLERANCE = 1e-9;

    private enum Side { INSIDE, OUTSIDE, SHARED_SAME, SHARED_OPPOSITE }

    private enum Operation { UNION, INTERSECTION, DIFFERENCE }

    private Booleans() {
    }

    /**
     * @return the points in a or b; regions touching only at points stay separate loops of one region
     * @throws IllegalArgumentException if the boundaries cannot be combined into closed loops (crossing
     *     input outlines), naming the point in mm
     */
    public static Region union(Region a, Region b) {
        return combine(a, b, Operation.UNION).orElseThrow(() -> new IllegalArgumentException(
                "the union of two regions came out empty; check both outlines for self-crossings"));
    }

    /**
     * @return the points in a and not in b (b's part inside a becomes holes or notches), or empty if b
     *     covers a
     * @throws IllegalArgumentException if the boundaries cannot be combined into closed loops, naming
     *     the point in mm
     */
    public static Optional<Region> difference(Region a, Region b) {
        return combine(a, b, Operation.DIFFERENCE);
    }

    /**
     * @return the points in both a and b, or empty if they do not overlap (touching is not overlapping)
     * @throws IllegalArgumentException if the boundaries cannot be combined into closed loops, naming
     *     the point in mm
     */
    public static Optional<Region> intersection(Region a, Region b) {
        return combine(a, b, Operation.INTERSECTION);
    }

    /** @return the distance below which two points of regions a and b coincide, m */
    static double tolerance(Region a, Region b) {
        Bounds box = a.bounds().union(b.bounds());
        return RELATIVE_TOLERANCE * Math.max(box.width(), box.height());
    }

    private static Optional<Region> combine(Region a, Region b, Operation op) {
        double tol = tolerance(a, b);
        VertexPool pool = new VertexPool(tol);
        List<List<BoundaryEdge>> cut = BoundarySplit.split(a.pieces(), b.pieces(), pool, tol);
        List<BoundaryEdge> edgesA = cut.get(0);
        List<BoundaryEdge> edgesB = cut.get(1);
        List<BoundaryEdge> kept = new ArrayList<>();
        for (BoundaryEdge e : edgesA) {
            Side side = side(e, edgesB, b, tol);
            boolean keep = switch (op) {
                case UNION -> side == Side.OUTSIDE || side == Side.SHARED_SAME;
                case INTERSECTION -> side == Side.INSIDE || side == Side.SHARED_SAME;
                case DIFFERENCE -> side == Side.OUTSIDE || side == Side.SHARED_OPPOSITE;
            };
            if (keep) {
                kept.add(e);
            }
        }
        for (BoundaryEdge e : edgesB) {
            Side side = side(e, edgesA, a, tol);
            if (op == Operation.UNION && side == Side.OUTSIDE || op == Operation.INTERSECTION && side == Side.INSIDE) {
                kept.add(e);
            } else if (op == Operation.DIFFERENCE && side == Side.INSIDE) {
                kept.add(e.reversed());
            }
        }
        List<Loop> loops = new ArrayList<>();
        for (List<WallPiece> pieces : LoopChains.chain(kept, pool)) {
            Loop loop = new Loop(pieces);
            if (Math.abs(loop.signedArea()) > 16 * tol * tol) {
                loops.add(loop);
            }
        }
        return loops.isEmpty() ? Optional.empty() : Optional.of(new Region(loops));
    }

    private static Side side(BoundaryEdge e, List<BoundaryEdge> others, Region other, double tol) {
        WallPiece p = e.piece();
        double t = PieceGeometry.middle(p);
        double mx = p.x(t);
        double my = p.y(t);
        for (BoundaryEdge o : others) {
            boolean same = o.from() == e.from() && o.to() == e.to();
            boolean opposite = o.from() == e.to() && o.to() == e.from();
            if ((same || opposite) && PieceGeometry.distance(o.piece(), mx, my) <= 4 * tol) {
                return same ? Side.SHARED_SAME : Side.SHARED_OPPOSITE;
            }
        }
        return other.contains(mx, my) ? Side.INSIDE : Side.OUTSIDE;
    }
}
