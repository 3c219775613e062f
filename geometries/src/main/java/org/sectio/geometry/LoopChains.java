package org.sectio.geometry;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Chains directed edges that meet at numbered vertices into closed loops. Where several unused edges
 * leave a vertex, the walk takes the one turning furthest to the left (the region lies on the left,
 * so that edge bounds the same face); and as soon as the walk comes back to a vertex it has already
 * left, the cycle since then is closed off as a loop of its own. Loops therefore never pass a vertex
 * twice: two squares touching at a corner give two loops, a hole touching the outer wall at one point
 * stays a separate hole.
 */
final class LoopChains {

    private LoopChains() {
    }

    /**
     * @param edges directed edges in which every vertex has as many edges arriving as leaving
     * @param pool the vertices the edges refer to
     * @return the closed loops, each in walking order
     * @throws IllegalArgumentException naming the vertex (mm) if an edge cannot be continued
     */
    static List<List<WallPiece>> chain(List<BoundaryEdge> edges, VertexPool pool) {
        Map<Integer, List<Integer>> leaving = new HashMap<>();
        for (int k = 0; k < edges.size(); k++) {
            leaving.computeIfAbsent(edges.get(k).from(), v -> new ArrayList<>()).add(k);
        }
        boolean[] used = new boolean[edges.size()];
        List<List<WallPiece>> loops = new ArrayList<>();
        for (int s = 0; s < edges.size(); s++) {
            if (used[s]) {
                continue;
            }
            List<Integer> path = new ArrayList<>();
            Map<Integer, Integer> leftAt = new HashMap<>(); // vertex → index in path of the edge leaving it
            used[s] = true;
            leftAt.put(edges.get(s).from(), 0);
            path.add(s);
            while (!path.isEmpty()) {
                int current = path.get(path.size() - 1);
                int v = edges.get(current).to();
                Integer back = leftAt.get(v);
                if (back != null) {
                    List<WallPiece> loop = new ArrayList<>();
                    for (int k = back; k < path.size(); k++) {
                        loop.add(edges.get(path.get(k)).piece());
                        leftAt.remove(edges.get(path.get(k)).from());
                    }
                    loops.add(loop);
                    path.subList(back, path.size()).clear();
                    continue;
                }
                int next = leftmost(edges, current, leaving.getOrDefault(v, List.of()), used);
                if (next < 0) {
                    throw new IllegalArgumentException("the combined boundary does not close at "
                            + Millimetres.point(pool.x(v), pool.y(v)) + "; check both outlines for self-crossings");
                }
                used[next] = true;
                leftAt.put(v, path.size());
                path.add(next);
            }
        }
        return loops;
    }

    private static int leftmost(List<BoundaryEdge> edges, int current, List<Integer> candidates, boolean[] used) {
        double[] in = PieceGeometry.direction(edges.get(current).piece(), false);
        int best = -1;
        double bestTurn = Double.NEGATIVE_INFINITY;
        for (int k : candidates) {
            if (used[k]) {
                continue;
            }
            double[] out = PieceGeometry.direction(edges.get(k).piece(), true);
            double turn = Math.atan2(in[0] * out[1] - in[1] * out[0], in[0] * out[0] + in[1] * out[1]);
            if (turn > bestTurn) {
                bestTurn = turn;
                best = k;
            }
        }
        return best;
    }
}
