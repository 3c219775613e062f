package org.sectio.modes;

/**
 * One mode of a partially filled guide at one frequency, from the full-vector solve
 * ({@link HybridModeSolver}). With fields ∝ exp(j(ωt − βz)) and complex
 * β = β′ − jα: β′ is the phase constant and α ≥ 0 the attenuation (by a lossy material, or of an
 * evanescent mode).
 *
 * @param index 1-based position at this frequency, largest Re β² first
 * @param betaSquaredReal Re β², rad²/m²
 * @param betaSquaredImaginary Im β², rad²/m² (0 for lossless materials, negative with loss)
 * @param phaseConstant β′ = Re β, rad/m (0 for a lossless evanescent mode)
 * @param attenuation α = −Im β, Np/m (the evanescent decay, or the material loss of a propagating mode)
 * @param propagating whether Re β² &gt; 0
 * @param relativeResidual ‖A h − β² h‖₂ / (‖A‖₁ ‖h‖₂) of the discrete eigenpair
 * @param longitudinalMagneticShare ∫|Hz|² / (∫|Hz|² + ∫|Ez|²/η0²): 1 for TE, 0 for TM, between for hybrid
 * @param field the six components, see {@link HybridField}
 * @param edgeVectorReal Re of the eigenvector h on the edges (for mode tracking), not copied
 * @param edgeVectorImaginary Im of h, not copied
 */
public record HybridMode(int index, double betaSquaredReal, double betaSquaredImaginary, double phaseConstant,
                         double attenuation, boolean propagating, double relativeResidual,
                         double longitudinalMagneticShare, HybridField field, double[] edgeVectorReal,
                         double[] edgeVectorImaginary) {

    public HybridMode {
        if (index < 1 || !Double.isFinite(betaSquaredReal) || !Double.isFinite(betaSquaredImaginary)) {
            throw new IllegalArgumentException("hybrid mode: expected index ≥ 1 and a finite β², got #" + index
                    + ", β² = " + betaSquaredReal + " + j" + betaSquaredImaginary + " rad²/m²");
        }
    }

    /** @return e.g. "H-like 2" (Hz dominates the longitudinal field) or "E-like 1" */
    public String label() {
        return (longitudinalMagneticShare >= 0.5 ? "H-like " : "E-like ") + index;
    }

    /** @return this mode with another index */
    public HybridMode withIndex(int newIndex) {
        return new HybridMode(newIndex, betaSquaredReal, betaSquaredImaginary, phaseConstant, attenuation, propagating,
                relativeResidual, longitudinalMagneticShare, field, edgeVectorReal, edgeVectorImaginary);
    }
}
