package org.sectio.geometry;

/**
 * The filling of a region of the cross-section.
 *
 * @param relativePermittivity εr, ≥ 1
 * @param relativePermeability μr, &gt; 0
 * @param lossTangent tan δ, ≥ 0
 */
public record Material(double relativePermittivity, double relativePermeability, double lossTangent) {

    /** Vacuum, and dry air to the accuracy that matters for mode cutoffs. */
    public static final Material AIR = new Material(1.0, 1.0, 0.0);

    public Material {
        if (!(relativePermittivity >= 1.0) || !(relativePermeability > 0.0) || !(lossTangent >= 0.0)
                || !Double.isFinite(relativePermittivity + relativePermeability + lossTangent)) {
            throw new IllegalArgumentException("material: expected εr ≥ 1, μr > 0, tanδ ≥ 0, got εr = "
                    + relativePermittivity + ", μr = " + relativePermeability + ", tanδ = " + lossTangent);
        }
    }
}
