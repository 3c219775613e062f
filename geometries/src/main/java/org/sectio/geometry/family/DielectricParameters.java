package org.sectio.geometry.family;

import org.sectio.geometry.Material;

/** The material parameters shared by the dielectric-loaded families, and the material they make. */
final class DielectricParameters {

    /** Default εr: a low-loss fluoropolymer-like filler. */
    static final double DEFAULT_PERMITTIVITY = 2.1;
    /** Default tan δ of the same filler. */
    static final double DEFAULT_LOSS_TANGENT = 2e-4;

    static final FamilyParameter PERMITTIVITY = new FamilyParameter("permittivity",
            "relative permittivity εr of the dielectric", DEFAULT_PERMITTIVITY, ParameterKind.PERMITTIVITY, "≥ 1");
    static final FamilyParameter LOSS_TANGENT = new FamilyParameter("loss_tangent",
            "loss tangent tan δ of the dielectric", DEFAULT_LOSS_TANGENT, ParameterKind.LOSS_TANGENT, "≥ 0");

    private DielectricParameters() {
    }

    /** Checks both material parameters and returns the non-magnetic material they describe. */
    static Material material(ParameterValues v) {
        v.requirePermittivity("permittivity");
        v.requireLossTangent("loss_tangent");
        return new Material(v.get("permittivity"), 1.0, v.get("loss_tangent"));
    }
}
