package org.sectio.geometry.file;

import org.sectio.geometry.CrossSection;

/**
 * Reads the body of one kind of {@code "wall"} entry (the value under its shape key) into a
 * cross-section. One implementation per shape keeps each check small and lets new shapes be added
 * without touching the others.
 */
interface WallShape {

    /**
     * @param body the value under the shape key, e.g. the object under {@code "rectangle"}
     * @param unit the unit of every length in the file
     * @param name the file's {@code "name"}, or null to use a description of the shape
     * @return the cross-section, lengths in metres
     * @throws SectionFileException if the body is not a valid description of this shape
     */
    CrossSection read(SectionNode body, LengthUnit unit, String name) throws SectionFileException;
}
