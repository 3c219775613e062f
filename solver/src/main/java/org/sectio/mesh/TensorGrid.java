package org.sectio.mesh;

import java.util.Arrays;
import org.sectio.geometry.Bounds;

/**
 * A Cartesian tensor grid: vertical lines {@code x = xLines[i]} and horizontal lines {@code y = yLines[j]},
 * both strictly ascending, in metres. Cell (i, j) is the box [x_i, x_{i+1}] × [y_j, y_{j+1}]; node (i, j)
 * is the point (x_i, y_j).
 *
 * @param xLines vertical grid lines, m, ascending, at least 2
 * @param yLines horizontal grid lines, m, ascending, at least 2
 */
public record TensorGrid(double[] xLines, double[] yLines) {

    public TensorGrid {
        requireAscending("x", xLines);
        requireAscending("y", yLines);
        xLines = xLines.clone();
        yLines = yLines.clone();
    }

    /**
     * A uniform-as-possible grid whose outermost lines lie on the bounding box, so that axis-aligned walls
     * fall on grid lines: the longer side gets {@code cellsAcross} cells, the other side the number of
     * cells that keeps the cells closest to square.
     *
     * @param bounds the box to cover, m
     * @param cellsAcross cells along the longer side, ≥ 2
     */
    public static TensorGrid fitted(Bounds bounds, int cellsAcross) {
        if (cellsAcross < 2) {
            throw new IllegalArgumentException("cells across must be at least 2, got " + cellsAcross);
        }
        double step = Math.max(bounds.width(), bounds.height()) / cellsAcross;
        int nx = Math.max(2, (int) Math.round(bounds.width() / step));
        int ny = Math.max(2, (int) Math.round(bounds.height() / step));
        return new TensorGrid(evenLines(bounds.minX(), bounds.maxX(), nx), evenLines(bounds.minY(), bounds.maxY(), ny));
    }

    /**
     * A uniform square-celled grid covering the box with a margin, shifted by the given fractions of a cell,
     * so that no wall, centre or symmetry line of the shape need fall on a grid line.
     *
     * @param bounds the box to cover, m
     * @param cellsAcross cells spanning the longer side of the box, ≥ 2 (one more cell is added as margin)
     * @param shiftX shift of the lines in x, in cells, 0 … 1
     * @param shiftY shift of the lines in y, in cells, 0 … 1
     */
    public static TensorGrid shifted(Bounds bounds, int cellsAcross, double shiftX, double shiftY) {
        double step = Math.max(bounds.width(), bounds.height()) / cellsAcross;
        int nx = (int) Math.ceil(bounds.width() / step - 1e-9) + 1;
        int ny = (int) Math.ceil(bounds.height() / step - 1e-9) + 1;
        double x0 = bounds.minX() - step * shiftX;
        double y0 = bounds.minY() - step * shiftY;
        return new TensorGrid(evenLines(x0, x0 + nx * step, nx), evenLines(y0, y0 + ny * step, ny));
    }

    private static double[] evenLines(double from, double to, int cells) {
        double[] lines = new double[cells + 1];
        for (int k = 0; k <= cells; k++) {
            lines[k] = k == cells ? to : from + (to - from) * k / cells;
        }
        return lines;
    }

    /** @return cells along x */
    public int cellsX() {
        return xLines.length - 1;
    }

    /** @return cells along y */
    public int cellsY() {
        return yLines.length - 1;
    }

    @Override
    public double[] xLines() {
        return xLines.clone();
    }

    @Override
    public double[] yLines() {
        return yLines.clone();
    }

    /** @return x of line i, m */
    public double x(int i) {
        return xLines[i];
    }

    /** @return y of line j, m */
    public double y(int j) {
        return yLines[j];
    }

    /**
     * The length of the grid link from x-line i towards i + direction (±1); at the grid's edge, the
     * length of the link on the other side.
     */
    public double xStep(int i, int direction) {
        return step(xLines, i, direction);
    }

    /** The length of the grid link from y-line j towards j + direction (±1); see {@link #xStep}. */
    public double yStep(int j, int direction) {
        return step(yLines, j, direction);
    }

    private static double step(double[] lines, int k, int direction) {
        int to = k + direction;
        if (to < 0 || to >= lines.length) {
            return Math.abs(lines[k] - lines[k - direction]);
        }
        return Math.abs(lines[to] - lines[k]);
    }

    /** @return the largest cell side, m */
    public double largestStep() {
        double h = 0;
        for (int i = 0; i + 1 < xLines.length; i++) {
            h = Math.max(h, xLines[i + 1] - xLines[i]);
        }
        for (int j = 0; j + 1 < yLines.length; j++) {
            h = Math.max(h, yLines[j + 1] - yLines[j]);
        }
        return h;
    }

    /**
     * The cell column holding coordinate x under the grid's convention that a point on line i belongs
     * to the cell on its left: the k with x_k &lt; x ≤ x_{k+1}, clamped to the grid.
     */
    public int cellColumnOf(double x) {
        return cellOf(xLines, x);
    }

    /** The cell row holding coordinate y: the k with y_k &lt; y ≤ y_{k+1}, clamped to the grid. */
    public int cellRowOf(double y) {
        return cellOf(yLines, y);
    }

    private static int cellOf(double[] lines, double v) {
        int at = Arrays.binarySearch(lines, v);
        int firstNotBelow = at >= 0 ? at : -at - 1;
        return Math.max(0, Math.min(lines.length - 2, firstNotBelow - 1));
    }

    private static void requireAscending(String axis, double[] lines) {
        if (lines.length < 2) {
            throw new IllegalArgumentException(axis + " grid needs at least 2 lines, got " + lines.length);
        }
        for (int k = 0; k + 1 < lines.length; k++) {
            if (!(lines[k + 1] > lines[k]) || !Double.isFinite(lines[k])) {
                throw new IllegalArgumentException(axis + " grid lines must be finite and ascending; line " + k
                        + " = " + lines[k] + ", line " + (k + 1) + " = " + lines[k + 1]);
            }
        }
    }
}
