package org.sectio.geometry.file;

import org.sectio.geometry.Material;

/**
 * Reads the material keys of a dielectric region or of the filling: {@code "permittivity"} (εr ≥ 1),
 * {@code "loss_tangent"} (tan δ ≥ 0, default 0) and {@code "permeability"} (μr &gt; 0, default 1), all
 * dimensionless; each may be an expression.
 */
final class MaterialReader {

    private MaterialReader() {
    }

    /**
     * @param object the object holding the keys (other keys are the caller's to check)
     * @param permittivityRequired whether {@code "permittivity"} must be present (else default 1)
     * @return the material
     * @throws SectionFileException at a value out of its range
     */
    static Material read(SectionNode object, boolean permittivityRequired) throws SectionFileException {
        double eps = permittivityRequired || object.has("permittivity")
                ? object.get("permittivity").numberIn(1, Double.MAX_VALUE, "a relative permittivity ≥ 1") : 1;
        double tan = object.has("loss_tangent")
                ? object.get("loss_tangent").numberIn(0, Double.MAX_VALUE, "a loss tangent ≥ 0") : 0;
        double mu = 1;
        if (object.has("permeability")) {
            mu = object.get("permeability").numberIn(Double.MIN_VALUE, Double.MAX_VALUE, "a relative permeability > 0");
        }
        return new Material(eps, mu, tan);
    }
}
