package org.sectio.eigen;

/** A linear map y = OP x on real vectors of one length (e.g. a shift-invert solve). */
@FunctionalInterface
public interface LinearMap {

    /**
     * @param x the input, not modified
     * @param y the output, overwritten
     */
    void apply(double[] x, double[] y);
}
