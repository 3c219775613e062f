package org.sectio.viewer.render;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.FieldMap;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.TransverseFields;
import org.sectio.physics.TransversePattern;
import org.sectio.viewer.model.FieldView;

/**
 * What the section view paints, computed without a window: the raster (field colours inside the guide,
 * metal around it), the colour bar, the arrows and the field lines of a mode. The transverse pattern
 * comes from the solver ({@link TransverseFields}) on a lattice over the section, once per mode; the
 * longitudinal field is the solve's own samples. Pixels are interpolated bilinearly, for display only.
 */
public final class FieldPicture {

    /** Metal around the guide, ARGB. */
    public static final int METAL = 0xFF8F969D;
    /** The view's background beyond the metal block, ARGB. */
    public static final int BACKGROUND = 0xFFEDEBE6;
    /** Inside the guide when no mode is drawn, ARGB. */
    public static final int OPEN = 0xFFFBFAF7;
    /** Points of the transverse lattice across the longer side of the section. */
    static final int LATTICE = 160;

    private final CrossSection section;
    private final Mode mode;
    private final PatternSampler longitudinal;
    private final double[] longitudinalValues;
    private TransversePattern pattern;
    private PatternSampler patternSampler;
    private double[] magnitudeE;
    private double[] magnitudeH;

    /**
     * @param section the cross-section, m
     * @param mode a mode solved on it, or null to draw the empty guide
     */
    public FieldPicture(CrossSection section, Mode mode) {
        this.section = section;
        this.mode = mode;
        if (mode != null) {
            FieldMap f = mode.field();
            longitudinal = new PatternSampler(f.xCoordinates(), f.yCoordinates());
            longitudinalValues = f.values();
        } else {
            longitudinal = null;
            longitudinalValues = null;
        }
    }

    /** @return the section drawn */
    public CrossSection section() {
        return section;
    }

    /** @return the transverse pattern on the lattice (computed on first use) */
    public TransversePattern pattern() {
        if (pattern == null) {
            Bounds b = section.bounds();
            double step = Math.max(b.width(), b.height()) / LATTICE;
            double[] xs = lattice(b.minX(), b.maxX(), step);
            double[] ys = lattice(b.minY(), b.maxY(), step);
            pattern = TransverseFields.of(section, mode).sample(xs, ys);
            patternSampler = new PatternSampler(xs, ys);
            int n = xs.length * ys.length;
            magnitudeE = new double[n];
            magnitudeH = new double[n];
            for (int j = 0; j < ys.length; j++) {
                for (int i = 0; i < xs.length; i++) {
                    magnitudeE[j * xs.length + i] = pattern.magnitudeAt(true, i, j);
                    magnitudeH[j * xs.length + i] = pattern.magnitudeAt(false, i, j);
                }
            }
        }
        return pattern;
    }

    private static double[] lattice(double low, double high, double step) {
        int n = Math.max(2, (int) Math.round((high - low) / step));
        double[] c = new double[n];
        double h = (high - low) / n;
        for (int k = 0; k < n; k++) {
            c[k] = low + (k + 0.5) * h;
        }
        return c;
    }

    /**
     * The normalized value painted at a point: the longitudinal field (−1 … 1) or |E_t| (0 … 1).
     *
     * @return the value, or NaN outside the guide or without a mode
     */
    public double valueAt(FieldView view, double x, double y) {
        if (mode == null || !section.contains(x, y)) {
            return Double.NaN;
        }
        if (view.paintsTransverseMagnitude()) {
            pattern();
            return patternSampler.sample(magnitudeE, x, y);
        }
        return longitudinal.sample(longitudinalValues, x, y);
    }

    /**
     * @param view what to paint
     * @param t the view's map
     * @param width px
     * @param height px
     * @return ARGB pixels row by row: field colours inside the guide, {@link #METAL} in a block around it,
     *     {@link #BACKGROUND} beyond
     */
    public int[] raster(FieldView view, ViewTransform t, int width, int height) {
        int[] pixels = new int[width * height];
        Bounds b = section.bounds();
        double rim = 0.06 * Math.max(b.width(), b.height());
        boolean magnitude = view.paintsTransverseMagnitude() && mode != null;
        if (magnitude) {
            pattern();
        }
        for (int row = 0; row < height; row++) {
            double y = t.worldY(row + 0.5);
            double[] crossings = section.wallCrossingsAtY(y);
            boolean inBlockY = y >= b.minY() - rim && y <= b.maxY() + rim;
            int next = 0;
            for (int column = 0; column < width; column++) {
                double x = t.worldX(column + 0.5);
                while (next < crossings.length && crossings[next] <= x) {
                    next++;
                }
                boolean inside = next % 2 == 1;
                int colour;
                if (inside) {
                    double v = mode == null ? Double.NaN : magnitude ? patternSampler.sample(magnitudeE, x, y)
                            : longitudinal.sample(longitudinalValues, x, y);
                    colour = Double.isNaN(v) ? OPEN : 0xFF000000 | ColourBar.rgb(v);
                } else {
                    boolean inBlock = inBlockY && x >= b.minX() - rim && x <= b.maxX() + rim;
                    colour = inBlock ? METAL : BACKGROUND;
                }
                pixels[row * width + column] = colour;
            }
        }
        return pixels;
    }

    /**
     * @param view what is painted
     * @param peakFieldPerRootWatt the largest |E_t| at 1 W, V/m, or NaN when not known (then relative)
     * @return the colour bar that reads the raster
     */
    public ColourBar colourBar(FieldView view, double peakFieldPerRootWatt) {
        if (view.paintsTransverseMagnitude()) {
            return Double.isFinite(peakFieldPerRootWatt)
                    ? new ColourBar("|E_t| (kV/m at 1 W)", peakFieldPerRootWatt * 1e-3, 0, false)
                    : new ColourBar("|E_t| / peak", 1, 0, false);
        }
        String name = mode == null ? "field" : mode.family() == ModeFamily.TE ? "Hz"
                : mode.family() == ModeFamily.TM ? "Ez" : "potential φ";
        return new ColourBar(name + " / peak (relative)", 1, -1, true);
    }

    /**
     * Arrows of E_t or H_t on a square lattice of the view, each as {x, y, dx, dy} in pixels from its
     * tail, its length the spacing times 0.85 times the magnitude; weak ones (below 4 %) are left out.
     */
    public List<double[]> arrows(boolean electric, ViewTransform t, int width, int height, double spacingPx) {
        TransversePattern p = pattern();
        List<double[]> out = new ArrayList<>();
        double[] ex = electric ? p.ex() : p.hx();
        double[] ey = electric ? p.ey() : p.hy();
        for (double py = spacingPx / 2; py < height; py += spacingPx) {
            for (double px = spacingPx / 2; px < width; px += spacingPx) {
                double x = t.worldX(px);
                double y = t.worldY(py);
                if (!section.contains(x, y)) {
                    continue;
                }
                double vx = patternSampler.sample(ex, x, y);
                double vy = patternSampler.sample(ey, x, y);
                double m = Math.hypot(vx, vy);
                if (!(m > 0.04)) {
                    continue;
                }
                double len = 0.85 * spacingPx * Math.min(1, m);
                // screen y runs down
                out.add(new double[] {px - 0.5 * len * vx / m, py + 0.5 * len * vy / m, len * vx / m, -len * vy / m});
            }
        }
        return out;
    }

    /**
     * Lines of force of E_t or H_t in the plane, m: polylines {x0, y0, x1, y1, …} (see {@link FieldLines}).
     */
    public List<double[]> fieldLines(boolean electric) {
        TransversePattern p = pattern();
        return FieldLines.trace(section, patternSampler, electric ? p.ex() : p.hx(), electric ? p.ey() : p.hy());
    }
}
