package org.sectio.viewer.render;

import org.sectio.geometry.Bounds;

/**
 * The map between the cross-section's plane (metres, y up) and the view's pixels (y down), with
 * zoom about a point and pan. A plain mutable value of the view's state, used without a window.
 */
public final class ViewTransform {

    /** Smallest and largest zoom relative to the fitted view. */
    private static final double MIN_ZOOM = 0.2;
    private static final double MAX_ZOOM = 400;

    private double scale = 1;
    private double originX;
    private double originY;
    private double fittedScale = 1;

    /** @return pixels per metre */
    public double scale() {
        return scale;
    }

    /**
     * Shows the whole box centred with a margin.
     *
     * @param box what to show, m
     * @param width view width, px, &gt; 0
     * @param height view height, px, &gt; 0
     * @param marginPx free border, px, ≥ 0
     */
    public void fit(Bounds box, double width, double height, double marginPx) {
        double w = Math.max(1, width - 2 * marginPx);
        double h = Math.max(1, height - 2 * marginPx);
        scale = Math.min(w / box.width(), h / box.height());
        fittedScale = scale;
        double cx = 0.5 * (box.minX() + box.maxX());
        double cy = 0.5 * (box.minY() + box.maxY());
        originX = 0.5 * width - cx * scale;
        originY = 0.5 * height + cy * scale;
    }

    /** @return the pixel column of abscissa x, m */
    public double screenX(double x) {
        return originX + x * scale;
    }

    /** @return the pixel row of ordinate y, m */
    public double screenY(double y) {
        return originY - y * scale;
    }

    /** @return the abscissa under pixel column px, m */
    public double worldX(double px) {
        return (px - originX) / scale;
    }

    /** @return the ordinate under pixel row py, m */
    public double worldY(double py) {
        return (originY - py) / scale;
    }

    /**
     * Zooms keeping the point under (px, py) fixed; the zoom stays within 0.2 … 400 times the fitted view.
     *
     * @param px pixel column
     * @param py pixel row
     * @param factor &gt; 1 zooms in
     */
    public void zoomAbout(double px, double py, double factor) {
        double wx = worldX(px);
        double wy = worldY(py);
        scale = Math.max(MIN_ZOOM * fittedScale, Math.min(MAX_ZOOM * fittedScale, scale * factor));
        originX = px - wx * scale;
        originY = py + wy * scale;
    }

    /**
     * @param dx pixels to the right
     * @param dy pixels down
     */
    public void panBy(double dx, double dy) {
        originX += dx;
        originY += dy;
    }
}
