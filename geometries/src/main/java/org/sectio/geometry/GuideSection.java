package org.sectio.geometry;

import java.util.List;

/**
 * A metal-walled guide: the space inside the walls (a region whose loops are the conductors: the
 * outer wall first, inner conductors as holes), a filling, and optional dielectric regions.
 *
 * @param name a short description
 * @param interior the space the fields live in; each of its loops is one conductor
 * @param dielectrics regions of another material, inside the interior, not overlapping
 * @param filling the material everywhere else
 */
public record GuideSection(String name, Region interior, List<Dielectric> dielectrics, Material filling)
        implements CrossSection {

    public GuideSection {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a cross-section needs a name");
        }
        dielectrics = List.copyOf(dielectrics);
    }

    /** An air-filled guide bounded by one wall. */
    public static GuideSection airFilled(String name, List<WallPiece> outerWall) {
        return new GuideSection(name, Region.of(outerWall), List.of(), Material.AIR);
    }

    @Override
    public Bounds bounds() {
        return interior.bounds();
    }

    @Override
    public List<WallPiece> wallPieces() {
        return interior.pieces();
    }

    @Override
    public List<Loop> conductors() {
        return interior.loops();
    }

    /** @return this guide with another name */
    public GuideSection named(String newName) {
        return new GuideSection(newName, interior, dielectrics, filling);
    }
}
