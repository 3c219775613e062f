package org.sectio.physics;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiPredicate;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Material;
import org.sectio.modes.HybridField;
import org.sectio.physics.PotentialSamples.Constraint;

/**
 * The wall and path quantities of a hybrid mode, rebuilt from the samples of its field
 * ({@link HybridField}) by the local least-squares fits of {@link PotentialSamples}, one real part at a
 * time (the fits are linear in the data, so real and imaginary parts are fitted alike).
 *
 * <p>Wall: on the exact walls ({@link WallPoints}), H_tan has the longitudinal part Hz and the tangential
 * part t̂·H_t. At a perfectly conducting wall H_n = 0 and t̂·E = 0, and the t̂ component of
 * jωε E = ∇ × H is ∂Hz/∂n + jβ H_n, so ∂Hz/∂n = 0 for every mode, hybrid or not, whatever the material
 * at the wall: Hz is fitted from its cell-centre samples with that condition (at the point and at the
 * neighbouring wall points, as for a TE potential). Hx and Hy have no condition of their own; each is
 * fitted one-sided from its face samples and projected on t̂. H is continuous across a dielectric
 * interface (μr = 1), so these fits may span one. The surface current is J = n̂ × H with n̂ out of the
 * metal: |J|² = |Hz|² + |t̂·H_t|², and its longitudinal part is J_z = −t̂·H_t.
 *
 * <p>Path: V = −∫ E_t · dℓ along a {@link VoltagePath}. The normal part of E jumps at a dielectric
 * interface (by the ratio of the permittivities), so E_x and E_y are fitted from the samples of the
 * material at the point only, and the path is split where it crosses an interface so that no
 * quadrature step straddles the jump. Where one material holds too few samples for a fit (a layer
 * thinner than a few cells) the samples of every material are used there.
 *
 * <p>Not thread-safe (the samples hold work arrays).
 */
final class HybridFieldFits {

    /** Bisection steps locating an interface on the path (2⁻⁶⁰ of a grid step). */
    private static final int BISECTIONS = 60;

    /**
     * The wall data of the field.
     *
     * @param points the wall quadrature points
     * @param tangentialSquared ∮ |H_tan|² dℓ over every wall, A²/m
     * @param currentReal Re J_z at every point, A/m
     * @param currentImaginary Im J_z at every point, A/m
     */
    record Wall(WallPoints points, double tangentialSquared, double[] currentReal, double[] currentImaginary) {
    }

    private final CrossSection section;
    private final HybridField field;
    private final PotentialSamples hzRe;
    private final PotentialSamples hzIm;
    private final WallPoints walls;
    private final Map<Material, PotentialSamples[]> electric = new HashMap<>();
    private PotentialSamples[] electricAnyMaterial;

    private HybridFieldFits(CrossSection section, HybridField field) {
        this.section = section;
        this.field = field;
        hzRe = component(field.hz(), false, "Re Hz", null);
        hzIm = component(field.hz(), true, "Im Hz", null);
        walls = WallPoints.of(section, hzRe);
        hzRe.useWalls(walls);
        hzIm.useWalls(walls);
    }

    /**
     * @param section the cross-section the mode was solved on
     * @param field the mode's rebuilt field
     * @return the fits, ready for {@link #wall()} and {@link #voltage}
     */
    static HybridFieldFits of(CrossSection section, HybridField field) {
        return new HybridFieldFits(section, field);
    }

    private PotentialSamples component(HybridField.Samples s, boolean imaginary, String what, Material only) {
        BiPredicate<Double, Double> keep = only == null ? (x, y) -> true
                : (x, y) -> section.materialAt(x, y).equals(only);
        return new PotentialSamples(section, what, s.xCoordinates(), s.yCoordinates(),
                imaginary ? s.imaginary() : s.real(), keep);
    }

    /**
     * Fits H at every wall point.
     *
     * @return ∮ |H_tan|² dℓ and J_z at the points
     * @throws IllegalStateException if the grid is too coarse to rebuild H near some wall point
     */
    Wall wall() {
        PotentialSamples hxRe = component(field.hx(), false, "Re Hx", null);
        PotentialSamples hxIm = component(field.hx(), true, "Im Hx", null);
        PotentialSamples hyRe = component(field.hy(), false, "Re Hy", null);
        PotentialSamples hyIm = component(field.hy(), true, "Im Hy", null);
        int n = walls.size();
        double[] jr = new double[n];
        double[] ji = new double[n];
        double sum = 0;
        for (int p = 0; p < n; p++) {
            double x = walls.x()[p];
            double y = walls.y()[p];
            double tx = walls.tangentX()[p];
            double ty = walls.tangentY()[p];
            int owner = walls.conductor()[p];
            double zr = fitted(hzRe, x, y, tx, ty, Constraint.ZERO_NORMAL_DERIVATIVE, owner);
            double zi = fitted(hzIm, x, y, tx, ty, Constraint.ZERO_NORMAL_DERIVATIVE, owner);
            double tr = tx * fitted(hxRe, x, y, tx, ty, Constraint.ONE_SIDED, -1)
                    + ty * fitted(hyRe, x, y, tx, ty, Constraint.ONE_SIDED, -1);
            double ti = tx * fitted(hxIm, x, y, tx, ty, Constraint.ONE_SIDED, -1)
                    + ty * fitted(hyIm, x, y, tx, ty, Constraint.ONE_SIDED, -1);
            jr[p] = -tr;
            ji[p] = -ti;
            sum += (zr * zr + zi * zi + tr * tr + ti * ti) * walls.length()[p];
        }
        return new Wall(walls, sum, jr, ji);
    }

    private static double fitted(PotentialSamples s, double x, double y, double tx, double ty, Constraint c,
                                 int conductor) {
        s.fit(x, y, tx, ty, c, conductor);
        return s.value;
    }

    /**
     * V = −∫ E_t · dℓ from the path's start to its end.
     *
     * @param path the voltage path
     * @return {Re V, Im V}, V
     * @throws IllegalArgumentException if the path leaves the guide
     * @throws IllegalStateException if the grid is too coarse to rebuild E somewhere on the path
     */
    double[] voltage(VoltagePath path) {
        path.requireInside(section);
        double length = path.length();
        double ux = (path.x2() - path.x1()) / length;
        double uy = (path.y2() - path.y1()) / length;
        double[] sum = new double[2];
        List<Double> breaks = interfaces(path, ux, uy);
        for (int piece = 0; piece + 1 < breaks.size(); piece++) {
            PathVoltageAndCurrent.quadrature(path, breaks.get(piece), breaks.get(piece + 1), hzRe::localStep,
                    (x, y, weight) -> {
                        double[] e = electricField(x, y);
                        sum[0] -= (e[0] * ux + e[2] * uy) * weight;
                        sum[1] -= (e[1] * ux + e[3] * uy) * weight;
                    });
        }
        double re = sum[0];
        double im = sum[1];
        return new double[] {re, im};
    }

    /** The arc lengths 0, the interface crossings, and the path's length, ascending. */
    private List<Double> interfaces(VoltagePath path, double ux, double uy) {
        List<Double> out = new ArrayList<>();
        out.add(0.0);
        double length = path.length();
        double s = 0;
        Material before = section.materialAt(path.x1(), path.y1());
        while (s < length) {
            double step = 0.25 * hzRe.localStep(path.x1() + s * ux, path.y1() + s * uy);
            double next = Math.min(length, s + step);
            Material after = section.materialAt(path.x1() + next * ux, path.y1() + next * uy);
            if (!after.equals(before)) {
                double lo = s;
                double hi = next;
                for (int k = 0; k < BISECTIONS; k++) {
                    double m = 0.5 * (lo + hi);
                    if (section.materialAt(path.x1() + m * ux, path.y1() + m * uy).equals(before)) {
                        lo = m;
                    } else {
                        hi = m;
                    }
                }
                double cut = 0.5 * (lo + hi);
                if (cut > out.get(out.size() - 1) && cut < length) {
                    out.add(cut);
                }
                before = after;
            }
            s = next;
        }
        out.add(length);
        return out;
    }

    /** {Re Ex, Im Ex, Re Ey, Im Ey} at a point inside the guide, from the samples of its material. */
    private double[] electricField(double x, double y) {
        Material here = section.materialAt(x, y);
        PotentialSamples[] own = electric.computeIfAbsent(here, m -> electricSamples(m));
        try {
            return electricField(own, x, y);
        } catch (IllegalStateException tooFew) {
            if (electricAnyMaterial == null) {
                electricAnyMaterial = electricSamples(null);
            }
            return electricField(electricAnyMaterial, x, y);
        }
    }

    private PotentialSamples[] electricSamples(Material only) {
        return new PotentialSamples[] {component(field.ex(), false, "Re Ex", only),
            component(field.ex(), true, "Im Ex", only), component(field.ey(), false, "Re Ey", only),
            component(field.ey(), true, "Im Ey", only)};
    }

    private static double[] electricField(PotentialSamples[] parts, double x, double y) {
        double[] out = new double[4];
        for (int k = 0; k < 4; k++) {
            out[k] = fitted(parts[k], x, y, 1, 0, Constraint.NONE, -1);
        }
        return out;
    }
}
