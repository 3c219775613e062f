package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * A part of the plane bounded by closed loops, filled by the even-odd rule: a point is inside when a
 * ray from it crosses the loops an odd number of times. Loops are stored oriented so that the region
 * lies on their left: outer boundaries counter-clockwise, holes clockwise. Loops must not cross
 * each other or themselves (see the validation in the geometry builders).
 *
 * @param loops the boundary loops
 */
public record Region(List<Loop> loops) {

    public Region {
        if (loops.isEmpty()) {
            throw new IllegalArgumentException("a region needs at least one loop");
        }
        List<Loop> oriented = new ArrayList<>(loops.size());
        for (int k = 0; k < loops.size(); k++) {
            Loop loop = loops.get(k);
            // depth: how many other loops enclose a point of this one; even depth bounds from outside
            double px = loop.pieces().get(0).x(0.5 * (loop.pieces().get(0).startParameter() + loop.pieces().get(0).endParameter()));
            double py = loop.pieces().get(0).y(0.5 * (loop.pieces().get(0).startParameter() + loop.pieces().get(0).endParameter()));
            int depth = 0;
            for (int j = 0; j < loops.size(); j++) {
                if (j != k && loops.get(j).encloses(px, py)) {
                    depth++;
                }
            }
            oriented.add(loop.oriented(depth % 2 == 0));
        }
        loops = List.copyOf(oriented);
    }

    /** @return a region bounded by one loop */
    public static Region of(Loop outer) {
        return new Region(List.of(outer));
    }

    /** @return a region bounded by one loop given as pieces */
    public static Region of(List<WallPiece> outer) {
        return of(new Loop(outer));
    }

    /** @return every boundary piece, region on the left */
    public List<WallPiece> pieces() {
        List<WallPiece> all = new ArrayList<>();
        for (Loop loop : loops) {
            all.addAll(loop.pieces());
        }
        return List.copyOf(all);
    }

    /** @return the area, m² */
    public double area() {
        double sum = 0;
        for (Loop loop : loops) {
            sum += loop.signedArea();
        }
        return sum;
    }

    /** @return the box holding the region, m */
    public Bounds bounds() {
        Bounds b = loops.get(0).bounds();
        for (Loop loop : loops) {
            b = b.union(loop.bounds());
        }
        return b;
    }

    /** @return whether (x, y), m, is inside */
    public boolean contains(double x, double y) {
        return WallCrossings.contains(pieces(), x, y);
    }
}
