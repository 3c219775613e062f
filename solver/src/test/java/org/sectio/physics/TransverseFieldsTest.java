package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.function.BiFunction;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;

/**
 * The transverse patterns of a WR-90-sized rectangle (a = 22.86 mm, b = 10.16 mm) against the closed
 * forms of Pozar, Microwave Engineering, 4th ed., §3.3 (from memory): TE10 Ey ∝ sin(πx/a), Ex = 0,
 * Hx ∝ sin(πx/a); TM11 E_t ∝ ∇[sin(πx/a) sin(πy/b)] and H_t ∝ ẑ × E_t. Both sides are scaled to a peak
 * of 1 over the same points, so the comparison is of shape only, as the API promises.
 */
class TransverseFieldsTest {

    private static final double A = 22.86e-3;
    private static final double B = 10.16e-3;
    private final CrossSection guide = Shapes.rectangle(A, B);

    private Mode mode(int cells, ModeFamily family) {
        ModeSet set = ModeSolver.solve(guide, new SolveSettings(1, EnumSet.of(family), cells, Double.NaN, false, 1),
                SolveProgress.SILENT);
        return set.modes().get(0);
    }

    /** Largest |computed − exact| of one component over interior points, exact scaled like the computed. */
    private static double worst(TransversePattern p, boolean electric, int component,
                                BiFunction<Double, Double, double[]> exact) {
        double peakExact = 0;
        for (int j = 0; j < p.rows(); j++) {
            for (int i = 0; i < p.columns(); i++) {
                double[] e = exact.apply(p.x(i), p.y(j));
                peakExact = Math.max(peakExact, Math.hypot(e[0], e[1]));
            }
        }
        // the sign of a computed mode is arbitrary: compare with the sign that fits
        double plus = 0;
        double minus = 0;
        for (int j = 0; j < p.rows(); j++) {
            for (int i = 0; i < p.columns(); i++) {
                double c = p.vectorAt(electric, i, j)[component];
                double e = exact.apply(p.x(i), p.y(j))[component] / peakExact;
                plus = Math.max(plus, Math.abs(c - e));
                minus = Math.max(minus, Math.abs(c + e));
            }
        }
        return Math.min(plus, minus);
    }

    private static double[] interior(double length, int points) {
        double[] c = new double[points];
        for (int k = 0; k < points; k++) {
            c[k] = length * (k + 0.5) / points;
        }
        return c;
    }

    private TransversePattern te10(int cells) {
        return TransverseFields.of(guide, mode(cells, ModeFamily.TE)).sample(interior(A, 23), interior(B, 11));
    }

    @Test
    @DisplayName("TE10: Ey ∝ sin(πx/a), Ex = 0, Hx ∝ sin(πx/a), Hy = 0 (Pozar §3.3); error falls at order ~2")
    void te10MatchesTheClosedForm() {
        BiFunction<Double, Double, double[]> e = (x, y) -> new double[] {0, Math.sin(Math.PI * x / A)};
        BiFunction<Double, Double, double[]> h = (x, y) -> new double[] {Math.sin(Math.PI * x / A), 0};
        TransversePattern coarse = te10(40);
        TransversePattern fine = te10(80);
        double ey40 = worst(coarse, true, 1, e);
        double ey80 = worst(fine, true, 1, e);
        // measured: 3.3e-4 at 40 cells, 2.1e-5 at 80 (faster than h² on this rectangle); Ex 2.3e-6
        assertTrue(ey80 < 1e-4, "Ey error at 80 cells " + ey80);
        assertTrue(ey40 / ey80 > 3, "Ey error should fall about 4× on halving h: " + ey40 + " → " + ey80);
        assertEquals(0, worst(fine, true, 0, e), 2e-5, "Ex");
        assertEquals(0, worst(fine, false, 0, h), 1e-4, "Hx");
        assertEquals(0, worst(fine, false, 1, h), 2e-5, "Hy");
    }

    @Test
    @DisplayName("TM11: E_t ∝ ∇(sin(πx/a) sin(πy/b)), H_t ∝ ẑ × E_t (Pozar §3.3)")
    void tm11MatchesTheClosedForm() {
        BiFunction<Double, Double, double[]> e = (x, y) -> new double[] {
            Math.PI / A * Math.cos(Math.PI * x / A) * Math.sin(Math.PI * y / B),
            Math.PI / B * Math.sin(Math.PI * x / A) * Math.cos(Math.PI * y / B)};
        BiFunction<Double, Double, double[]> h = (x, y) -> {
            double[] v = e.apply(x, y);
            return new double[] {-v[1], v[0]};
        };
        TransversePattern p = TransverseFields.of(guide, mode(80, ModeFamily.TM))
                .sample(interior(A, 23), interior(B, 11));
        for (int c = 0; c < 2; c++) {
            // measured at 80 cells: 1.6e-3 (x components), 2.7e-3 (y components)
            assertEquals(0, worst(p, true, c, e), 5e-3, "E component " + c);
            assertEquals(0, worst(p, false, c, h), 5e-3, "H component " + c);
        }
    }

    @Test
    @DisplayName("points outside the guide are NaN; bad arguments are refused")
    void outsideAndBadInput() {
        TransverseFields fields = TransverseFields.of(guide, mode(40, ModeFamily.TE));
        TransversePattern p = fields.sample(new double[] {-1e-3, A / 2}, new double[] {B / 2});
        assertTrue(Double.isNaN(p.magnitudeAt(true, 0, 0)));
        assertEquals(1.0, p.magnitudeAt(true, 1, 0), 1e-12, "the only inside point carries the peak");
        assertThrows(IllegalArgumentException.class, () -> fields.sample(new double[0], new double[] {0}));
        assertThrows(IllegalArgumentException.class, () -> TransverseFields.of(guide, null));
    }
}
