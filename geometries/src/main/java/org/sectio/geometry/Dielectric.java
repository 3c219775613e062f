package org.sectio.geometry;

/**
 * A region of the guide filled with a material other than the guide's own filling.
 *
 * @param name what it is, e.g. "PTFE slab"
 * @param region where it is; must lie inside the guide
 * @param material its permittivity, permeability and loss tangent
 */
public record Dielectric(String name, Region region, Material material) {
}
