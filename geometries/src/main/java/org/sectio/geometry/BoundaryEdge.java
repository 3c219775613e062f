package org.sectio.geometry;

/**
 * A wall piece whose ends are numbered vertices of a {@link VertexPool}, for chaining.
 *
 * @param piece the piece, running from vertex {@code from} to vertex {@code to}
 * @param from the start vertex
 * @param to the end vertex, different from the start
 */
record BoundaryEdge(WallPiece piece, int from, int to) {

    /** @return the edge traversed the other way */
    BoundaryEdge reversed() {
        return new BoundaryEdge(PieceGeometry.reversed(piece), to, from);
    }
}
