package org.sectio.geometry;

import java.util.List;

/**
 * One closed boundary: monotone pieces, each starting exactly (bit for bit) where the previous one
 * ends, the last ending where the first starts. Exactness matters: the crossing rule of
 * {@link WallCrossings} counts a grid line through a vertex once only if both pieces report the same
 * vertex. Its orientation says which side is inside: counter-clockwise (positive
 * {@link #signedArea()}) encloses its interior, clockwise marks a hole.
 *
 * @param pieces the pieces in order, at least one
 */
public record Loop(List<WallPiece> pieces) {

    public Loop {
        if (pieces.isEmpty()) {
            throw new IllegalArgumentException("a loop needs at least one piece");
        }
        pieces = List.copyOf(pieces);
        for (int k = 0; k < pieces.size(); k++) {
            WallPiece a = pieces.get(k);
            WallPiece b = pieces.get((k + 1) % pieces.size());
            if (a.endX() != b.startX() || a.endY() != b.startY()) {
                throw new IllegalArgumentException("loop is open: piece " + k + " ends at (" + a.endX() + ", " + a.endY()
                        + ") m but the next starts at (" + b.startX() + ", " + b.startY() + ") m");
            }
        }
    }

    /** @return ∮ x dy, m²: positive when counter-clockwise */
    public double signedArea() {
        return WallCrossings.signedArea(pieces);
    }

    /** @return the same loop traversed the other way */
    public Loop reversed() {
        return new Loop(Outline.reversed(pieces));
    }

    /** @return this loop oriented counter-clockwise ({@code true}) or clockwise */
    public Loop oriented(boolean counterClockwise) {
        return (signedArea() > 0) == counterClockwise ? this : reversed();
    }

    /** @return the box holding the loop, m */
    public Bounds bounds() {
        return WallCrossings.bounds(pieces);
    }

    /** @return whether (x, y), m, is enclosed by the loop (either orientation) */
    public boolean encloses(double x, double y) {
        return WallCrossings.contains(pieces, x, y);
    }
}
