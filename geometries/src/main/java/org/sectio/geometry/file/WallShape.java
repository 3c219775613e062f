package org.sectio.geometry.file;

/**
 * Reads the body of one kind of shape (the value under its shape key, e.g. the object under
 * {@code "rectangle"}) into a region. One implementation per shape keeps each check small and lets new
 * shapes be added without touching the others. Shapes are used for the wall, inner conductors,
 * dielectric regions and the operands of unions, differences and intersections.
 */
interface WallShape {

    /**
     * @param body the value under the shape key; lengths in {@code body.unit()}
     * @return the shape, lengths in metres
     * @throws SectionFileException if the body is not a valid description of this shape
     */
    ShapeRegion read(SectionNode body) throws SectionFileException;
}
