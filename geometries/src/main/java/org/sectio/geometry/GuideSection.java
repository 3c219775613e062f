package org.sectio.geometry;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A metal-walled guide: the space inside the walls (a region whose loops are the conductors: the
 * outer wall first, inner conductors as holes), a filling, optional dielectric regions, and the
 * metal of those walls where it is given.
 *
 * @param name a short description
 * @param interior the space the fields live in; each of its loops is one conductor
 * @param dielectrics regions of another material, inside the interior, not overlapping
 * @param filling the material everywhere else
 * @param wallMetals the metal of each conductor that has one given, by its index in {@link #conductors()}
 *     (0 the outer wall); conductors absent from the map have none given; copied
 */
public record GuideSection(String name, Region interior, List<Dielectric> dielectrics, Material filling,
                           Map<Integer, WallMetal> wallMetals) implements CrossSection {

    /**
     * Validates the components.
     *
     * @throws IllegalArgumentException if the name is blank or a wall metal's index is not a conductor of
     *     the interior
     */
    public GuideSection {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a cross-section needs a name");
        }
        dielectrics = List.copyOf(dielectrics);
        wallMetals = Map.copyOf(wallMetals);
        if (!wallMetals.isEmpty()) {
            int loops = interior.loops().size();
            for (int index : wallMetals.keySet()) {
                if (index < 0 || index >= loops) {
                    throw new IllegalArgumentException(name + ": wall metal for conductor " + index
                            + ", expected an index 0 … " + (loops - 1));
                }
            }
        }
    }

    /** A guide with no wall metal given (the form used by every family). */
    public GuideSection(String name, Region interior, List<Dielectric> dielectrics, Material filling) {
        this(name, interior, dielectrics, filling, Map.of());
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

    @Override
    public Optional<WallMetal> wallMetal(int conductorIndex) {
        CrossSection.super.wallMetal(conductorIndex);
        return Optional.ofNullable(wallMetals.get(conductorIndex));
    }

    /** @return this guide with another name */
    public GuideSection named(String newName) {
        return new GuideSection(newName, interior, dielectrics, filling, wallMetals);
    }

    /**
     * @param metals the metal of each conductor given, by index in {@link #conductors()}
     * @return this guide with those wall metals (replacing any it had)
     * @throws IllegalArgumentException if an index is not a conductor of this guide
     */
    public GuideSection withWallMetals(Map<Integer, WallMetal> metals) {
        return new GuideSection(name, interior, dielectrics, filling, metals);
    }
}
