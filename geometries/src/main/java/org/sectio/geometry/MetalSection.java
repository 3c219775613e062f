package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;

/**
 * An air-filled guide bounded by one outer metal wall (and, later, inner conductors).
 *
 * @param name a short description
 * @param outerWall the outer wall, a closed counter-clockwise loop of monotone pieces
 */
public record MetalSection(String name, List<WallPiece> outerWall) implements CrossSection {

    public MetalSection {
        if (outerWall.isEmpty()) {
            throw new IllegalArgumentException("cross-section '" + name + "' has no wall");
        }
        outerWall = List.copyOf(outerWall);
    }

    @Override
    public Bounds bounds() {
        double minX = Double.POSITIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        for (WallPiece p : outerWall) {
            minX = Math.min(minX, Math.min(p.startX(), p.endX()));
            maxX = Math.max(maxX, Math.max(p.startX(), p.endX()));
            minY = Math.min(minY, Math.min(p.startY(), p.endY()));
            maxY = Math.max(maxY, Math.max(p.startY(), p.endY()));
        }
        return new Bounds(minX, minY, maxX, maxY);
    }

    @Override
    public List<WallPiece> wallPieces() {
        return outerWall;
    }

    @Override
    public Material materialAt(double x, double y) {
        return Material.AIR;
    }

    /** @return a copy of the wall pieces, for building derived shapes */
    public List<WallPiece> wallCopy() {
        return new ArrayList<>(outerWall);
    }
}
