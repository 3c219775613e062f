package org.sectio.geometry.file;

import org.sectio.geometry.Region;

/**
 * A shape read from a file: the part of the plane it covers, in metres, and a short description used
 * as the guide's name when the file gives none.
 *
 * @param description e.g. {@code "rectangle 22.86 × 10.16 mm"}
 * @param region the covered part of the plane, m
 */
record ShapeRegion(String description, Region region) {
}
