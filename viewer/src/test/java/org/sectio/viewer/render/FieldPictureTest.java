package org.sectio.viewer.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.family.StandardSizes;
import org.sectio.io.ColourScale;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;
import org.sectio.viewer.model.FieldView;
import org.sectio.viewer.model.SectionEditor;

/**
 * The pictures of a WR-90 TE10 mode against its closed form (Pozar, Microwave Engineering, 4th ed.,
 * §3.3, from memory): Hz ∝ cos(πx/a) with the guide centred on x = 0, so Hz is 0 on the centre line and
 * extreme at the side walls, and E_t = Ey ∝ sin(π(x + a/2)/a), largest on the centre line and 0 at the
 * side walls; E lines run straight from broad wall to broad wall, H lines along x.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class FieldPictureTest {

    private static final int WIDTH = 480;
    private static final int HEIGHT = 240;

    private final CrossSection guide = SectionEditor.of(StandardSizes.byName("WR-90")).section();
    private final Mode te10 = ModeSolver.solve(guide, new SolveSettings(1, EnumSet.of(ModeFamily.TE), 48, Double.NaN,
            false, 1), SolveProgress.SILENT).modes().get(0);
    private final FieldPicture picture = new FieldPicture(guide, te10);
    private final ViewTransform view = fitted();

    private ViewTransform fitted() {
        ViewTransform t = new ViewTransform();
        t.fit(guide.bounds(), WIDTH, HEIGHT, 40); // wider than the metal block (6 % of 22.86 mm ≈ 26 px)
        return t;
    }

    private static int channelGap(int a, int b) {
        int gap = 0;
        for (int shift = 0; shift <= 16; shift += 8) {
            gap = Math.max(gap, Math.abs(((a >> shift) & 0xFF) - ((b >> shift) & 0xFF)));
        }
        return gap;
    }

    /** The inside pixel columns of the middle row, from the left wall to the right wall. */
    private int[] insideColumns() {
        int row = (int) view.screenY(0);
        int first = -1;
        int last = -1;
        for (int c = 0; c < WIDTH; c++) {
            if (guide.contains(view.worldX(c + 0.5), view.worldY(row + 0.5))) {
                first = first < 0 ? c : first;
                last = c;
            }
        }
        return new int[] {row, first, last};
    }

    @Test
    @DisplayName("|E_t| picture: its maximum on the centre line, zero at the side walls, metal outside")
    void transverseMagnitude() {
        int[] pixels = picture.raster(FieldView.E_MAGNITUDE, view, WIDTH, HEIGHT);
        int[] span = insideColumns();
        int row = span[0];
        double lowest = 2;
        double a = guide.bounds().width();
        for (int c = span[1]; c <= span[2]; c++) {
            int colour = pixels[row * WIDTH + c] & 0xFFFFFF;
            lowest = Math.min(lowest, ColourScale.toOklab(colour)[0]);
            double exact = Math.sin(Math.PI * (view.worldX(c + 0.5) + a / 2) / a);
            // the pattern is good to 1e-4 here (TransverseFieldsTest); 3 units is the lattice interpolation
            assertTrue(channelGap(colour, ColourScale.rgb(exact)) <= 3,
                    String.format("column %d: %06x, closed form %06x", c, colour, ColourScale.rgb(exact)));
        }
        int centre = (int) view.screenX(0);
        assertEquals(lowest, ColourScale.toOklab(pixels[row * WIDTH + centre] & 0xFFFFFF)[0], 1e-3,
                "the centre line is as dark as the darkest pixel: the maximum");
        // peak 1 → the end of the scale; within one lattice step (a/160) of the wall sin(π/320) ≈ 0.01
        assertTrue(channelGap(pixels[row * WIDTH + centre] & 0xFFFFFF, ColourScale.rgb(1)) <= 3);
        assertTrue(channelGap(pixels[row * WIDTH + span[1]] & 0xFFFFFF, ColourScale.rgb(0)) <= 4);
        assertTrue(channelGap(pixels[row * WIDTH + span[2]] & 0xFFFFFF, ColourScale.rgb(0)) <= 4);
        assertEquals(FieldPicture.METAL, pixels[row * WIDTH + span[1] - 2]);
        assertEquals(FieldPicture.METAL, pixels[row * WIDTH + span[2] + 2]);
        assertEquals(FieldPicture.BACKGROUND, pixels[2]);
    }

    @Test
    @DisplayName("Hz picture: 0 (the scale's white) on the centre line, ±1 at the two side walls")
    void longitudinal() {
        int[] pixels = picture.raster(FieldView.LONGITUDINAL, view, WIDTH, HEIGHT);
        int[] span = insideColumns();
        int row = span[0];
        int centre = (int) view.screenX(0);
        // half a pixel off the line: |cos| ≤ π/2 · 0.5 px / 440 px ≈ 0.002
        assertTrue(channelGap(pixels[row * WIDTH + centre] & 0xFFFFFF, ColourScale.rgb(0)) <= 3);
        int left = pixels[row * WIDTH + span[1]] & 0xFFFFFF;
        int right = pixels[row * WIDTH + span[2]] & 0xFFFFFF;
        boolean plusLeft = channelGap(left, ColourScale.rgb(1)) <= 4 && channelGap(right, ColourScale.rgb(-1)) <= 4;
        boolean plusRight = channelGap(left, ColourScale.rgb(-1)) <= 4 && channelGap(right, ColourScale.rgb(1)) <= 4;
        assertTrue(plusLeft || plusRight, String.format("wall colours %06x and %06x", left, right));
    }

    @Test
    @DisplayName("colour bar: top row is the scale's +1, bottom row −1 (signed) or 0 (magnitude); values read back")
    void colourBarExtremes() {
        ColourBar signed = picture.colourBar(FieldView.LONGITUDINAL, Double.NaN);
        assertTrue(signed.diverging());
        assertEquals(ColourScale.rgb(1), signed.rgbAtRow(0, 101));
        assertEquals(ColourScale.rgb(0), signed.rgbAtRow(50, 101));
        assertEquals(ColourScale.rgb(-1), signed.rgbAtRow(100, 101));
        assertEquals(1, signed.valueAtRow(0, 101), 0);
        assertEquals(-1, signed.valueAtRow(100, 101), 0);
        assertTrue(signed.caption().startsWith("Hz"));
        ColourBar magnitude = picture.colourBar(FieldView.E_MAGNITUDE, 2931.2);
        assertEquals(ColourScale.rgb(1), magnitude.rgbAtRow(0, 64));
        assertEquals(ColourScale.rgb(0), magnitude.rgbAtRow(63, 64));
        assertEquals(2.9312, magnitude.valueAtRow(0, 64), 1e-12, "kV/m at 1 W");
        assertEquals(0, magnitude.valueAtRow(63, 64), 0);
        assertTrue(magnitude.caption().contains("kV/m"));
    }

    @Test
    @DisplayName("TE10 field lines: E straight across the narrow side, H along the broad side")
    void fieldLines() {
        Bounds b = guide.bounds();
        List<double[]> e = picture.fieldLines(true);
        List<double[]> h = picture.fieldLines(false);
        assertFalse(e.isEmpty());
        assertFalse(h.isEmpty());
        for (double[] line : e) {
            double spread = 0;
            for (int k = 0; k < line.length; k += 2) {
                spread = Math.max(spread, Math.abs(line[k] - line[0]));
            }
            assertTrue(spread < 0.01 * b.width(), "an E line wanders " + spread + " m in x");
        }
        for (double[] line : h) {
            double spread = 0;
            for (int k = 1; k < line.length; k += 2) {
                spread = Math.max(spread, Math.abs(line[k] - line[1]));
            }
            assertTrue(spread < 0.01 * b.height(), "an H line wanders " + spread + " m in y");
        }
    }

    @Test
    @DisplayName("TE10 E arrows point along y, longest at the centre line")
    void arrows() {
        List<double[]> arrows = picture.arrows(true, view, WIDTH, HEIGHT, 24);
        assertTrue(arrows.size() > 20);
        double longest = 0;
        double longestX = Double.NaN;
        for (double[] a : arrows) {
            assertTrue(Math.abs(a[2]) < 0.02 * Math.hypot(a[2], a[3]), "arrow not vertical");
            double len = Math.hypot(a[2], a[3]);
            if (len > longest) {
                longest = len;
                longestX = view.worldX(a[0] + a[2] / 2);
            }
        }
        assertEquals(0, longestX, 24 / view.scale(), "the longest arrow is within one spacing of the centre line");
    }

    @Test
    @DisplayName("zoom keeps the point under the cursor where it is; pan moves by the pixels dragged")
    void zoomAndPan() {
        ViewTransform t = fitted();
        double x = t.worldX(123);
        double y = t.worldY(77);
        t.zoomAbout(123, 77, 3.7);
        assertEquals(x, t.worldX(123), 1e-12);
        assertEquals(y, t.worldY(77), 1e-12);
        double before = t.screenX(0.001);
        t.panBy(15, -4);
        assertEquals(before + 15, t.screenX(0.001), 1e-9);
    }
}
