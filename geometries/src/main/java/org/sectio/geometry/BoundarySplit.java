package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * Two boundaries cut at every point where they meet, so that afterwards two cut pieces either share
 * nothing but end vertices or coincide as a whole (a common stretch of wall). Each boundary is cut
 * where the other crosses or touches it and where an end of the other lies on it; for two pieces on
 * one line, circle or ellipse the latter are exactly the ends of their common stretch.
 *
 * <p>Cut points go through one {@link VertexPool}, with the pieces' own ends entered first, so a cut
 * within the tolerance of an existing vertex becomes that vertex. Cut pieces keep their kind
 * ({@link PieceGeometry#between}), so the cut boundary is as exact as the original.
 */
final class BoundarySplit {

    private BoundarySplit() {
    }

    /**
     * @param a the first boundary's pieces
     * @param b the second boundary's pieces
     * @param pool the vertices, shared by both results
     * @param tol distance below which points coincide, m
     * @return two lists: a's cut edges then b's, each in the order and direction of the input
     */
    static List<List<BoundaryEdge>> split(List<WallPiece> a, List<WallPiece> b, VertexPool pool, double tol) {
        List<List<Integer>> cutsA = ends(a, pool);
        List<List<Integer>> cutsB = ends(b, pool);
        for (int i = 0; i < a.size(); i++) {
            for (int j = 0; j < b.size(); j++) {
                for (double[] m : PieceIntersections.meet(a.get(i), b.get(j), tol)) {
                    int v = pool.snap(m[0], m[1]);
                    cutsA.get(i).add(v);
                    cutsB.get(j).add(v);
                }
            }
        }
        return List.of(cut(a, cutsA, pool), cut(b, cutsB, pool));
    }

    private static List<List<Integer>> ends(List<WallPiece> pieces, VertexPool pool) {
        List<List<Integer>> cuts = new ArrayList<>();
        for (WallPiece p : pieces) {
            List<Integer> list = new ArrayList<>();
            list.add(pool.snap(p.startX(), p.startY()));
            list.add(pool.snap(p.endX(), p.endY()));
            cuts.add(list);
        }
        return cuts;
    }

    private static List<BoundaryEdge> cut(List<WallPiece> pieces, List<List<Integer>> cuts, VertexPool pool) {
        List<BoundaryEdge> edges = new ArrayList<>();
        for (int i = 0; i < pieces.size(); i++) {
            WallPiece p = pieces.get(i);
            List<Integer> ids = cuts.get(i);
            int first = ids.get(0);
            int last = ids.get(1);
            double t0 = p.startParameter();
            double t1 = p.endParameter();
            List<double[]> inner = new ArrayList<>(); // {distance along the parameter, parameter, vertex}
            for (int k = 2; k < ids.size(); k++) {
                int v = ids.get(k);
                if (v == first || v == last || containsVertex(inner, v)) {
                    continue;
                }
                double t = PieceGeometry.nearestParameter(p, pool.x(v), pool.y(v));
                inner.add(new double[] {(t - t0) / (t1 - t0), t, v});
            }
            inner.sort((u, w) -> Double.compare(u[0], w[0]));
            double fromT = t0;
            int from = first;
            for (double[] c : inner) {
                int v = (int) c[2];
                edges.add(new BoundaryEdge(PieceGeometry.between(p, fromT, c[1], pool.x(from), pool.y(from),
                        pool.x(v), pool.y(v)), from, v));
                fromT = c[1];
                from = v;
            }
            if (from != last) {
                edges.add(new BoundaryEdge(PieceGeometry.between(p, fromT, t1, pool.x(from), pool.y(from),
                        pool.x(last), pool.y(last)), from, last));
            }
        }
        return edges;
    }

    private static boolean containsVertex(List<double[]> inner, int v) {
        for (double[] c : inner) {
            if ((int) c[2] == v) {
                return true;
            }
        }
        return false;
    }
}
