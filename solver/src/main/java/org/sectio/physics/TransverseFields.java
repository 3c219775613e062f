package org.sectio.physics;

import org.sectio.geometry.CrossSection;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.PotentialSamples.Constraint;

/**
 * The transverse field pattern of a computed mode, for drawing: E_t and H_t rebuilt from the gradient of
 * its longitudinal potential ψ (Hz, Ez or the TEM potential φ) by the local quadratic fits of
 * {@code PotentialSamples} (∇ψ second order inside the guide, see there).
 *
 * <p>Relations (Pozar, Microwave Engineering, 4th ed., §3.1, eqs. (3.19)–(3.23), numbers from memory;
 * the same ones {@link ModeAnalysis} uses): TE: H_t = −(jβ/kc²) ∇_t Hz, E_t = Z_TE H_t × ẑ; TM:
 * E_t = −(jβ/kc²) ∇_t Ez, H_t = ẑ × E_t / Z_TM; TEM: E_t = −∇_t φ, H_t = ẑ × E_t / η. The factor
 * common to E_t and H_t (−jβ/kc², and the wave impedance) is dropped: the shape of the pattern is the
 * same at every frequency above cutoff, and each of E_t and H_t is scaled to a largest magnitude of 1
 * over the points asked for. Absolute values at a given power are {@link ModeAnalysis}'s. For a guide
 * with dielectric regions of another material the modes are hybrid away from cutoff and the pattern
 * is that at cutoff.
 *
 * <p>Thread-safe: {@link #sample} is synchronized (the fits share work arrays).
 */
public final class TransverseFields {

    private final CrossSection section;
    private final ModeFamily family;
    private final PotentialSamples samples;

    private TransverseFields(CrossSection section, Mode mode) {
        this.section = section;
        this.family = mode.family();
        this.samples = new PotentialSamples(section, mode);
    }

    /**
     * @param section the cross-section the mode was solved on, m
     * @param mode a mode from {@code ModeSolver} on it (its field map carries sample weights)
     * @return the mode's transverse fields, ready to sample
     * @throws IllegalArgumentException if an argument is missing or the field map carries no weights
     */
    public static TransverseFields of(CrossSection section, Mode mode) {
        if (section == null || mode == null) {
            throw new IllegalArgumentException("transverse fields need a cross-section and a mode");
        }
        return new TransverseFields(section, mode);
    }

    /**
     * Samples E_t and H_t on the points of a tensor grid.
     *
     * @param xs abscissae, m, finite (any order)
     * @param ys ordinates, m, finite
     * @return the pattern, NaN at points outside the guide and where the field cannot be rebuilt (too
     *     few samples near a point on a very coarse grid); each field scaled to a peak magnitude of 1
     * @throws IllegalArgumentException if a coordinate is not finite or a list is empty
     */
    public synchronized TransversePattern sample(double[] xs, double[] ys) {
        if (xs == null || ys == null || xs.length == 0 || ys.length == 0) {
            throw new IllegalArgumentException("transverse fields: sample points needed in x and y");
        }
        int n = xs.length * ys.length;
        double[] ex = new double[n];
        double[] ey = new double[n];
        double[] hx = new double[n];
        double[] hy = new double[n];
        double peakE = 0;
        double peakH = 0;
        for (int j = 0; j < ys.length; j++) {
            for (int i = 0; i < xs.length; i++) {
                if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[j])) {
                    throw new IllegalArgumentException("transverse fields: sample point (" + xs[i] + ", " + ys[j]
                            + ") m is not finite");
                }
                int k = j * xs.length + i;
                double[] f = at(xs[i], ys[j]);
                ex[k] = f[0];
                ey[k] = f[1];
                hx[k] = f[2];
                hy[k] = f[3];
                if (Double.isFinite(f[0])) {
                    peakE = Math.max(peakE, Math.hypot(f[0], f[1]));
                    peakH = Math.max(peakH, Math.hypot(f[2], f[3]));
                }
            }
        }
        scale(ex, ey, peakE);
        scale(hx, hy, peakH);
        return new TransversePattern(xs, ys, ex, ey, hx, hy);
    }

    /** {Ex, Ey, Hx, Hy} at a point, unscaled, or NaNs. */
    private double[] at(double x, double y) {
        double nan = Double.NaN;
        if (!section.contains(x, y)) {
            return new double[] {nan, nan, nan, nan};
        }
        try {
            samples.fit(x, y, 1, 0, Constraint.NONE);
        } catch (IllegalStateException tooFewSamples) {
            return new double[] {nan, nan, nan, nan};
        }
        double gx = -samples.gradientX;
        double gy = -samples.gradientY;
        if (family == ModeFamily.TE) {
            // H_t ∝ −∇Hz, E_t ∝ H_t × ẑ = (Hy, −Hx)
            return new double[] {gy, -gx, gx, gy};
        }
        // E_t ∝ −∇ψ, H_t ∝ ẑ × E_t = (−Ey, Ex)
        return new double[] {gx, gy, -gy, gx};
    }

    private static void scale(double[] a, double[] b, double peak) {
        if (!(peak > 0)) {
            return;
        }
        for (int k = 0; k < a.length; k++) {
            a[k] /= peak;
            b[k] /= peak;
        }
    }
}
