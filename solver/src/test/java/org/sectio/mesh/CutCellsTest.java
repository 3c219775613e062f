package org.sectio.mesh;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Shapes;
import org.sectio.geometry.WallPiece;

/**
 * The cut-cell data (open cell areas and open face lengths) against closed-form geometry. The
 * conformal scheme's second-order accuracy rests on these being exact, so they are compared with
 * areas and chords worked out here from the circle's equation (the area of a disc cut by a box as
 * ∫ chord dx with the primitive ∫√(R² − x²) dx = ½[x√(R² − x²) + R² asin(x/R)], elementary calculus),
 * with πR², a·b, 2s² for a square standing on a corner, and 20·10 + π·5² mm² for a stadium. Grids
 * include the awkward ones: walls lying on grid lines, vertices on grid nodes, lines tangent to a
 * circle.
 */
class CutCellsTest {

    private static final double R = 0.01;
    private static final double CX = 0.3e-3;
    private static final double CY = -0.2e-3;

    /**
     * Round-off bound for sums of cell areas, relative. Measured: circle on a shifted grid 2.1e-14,
     * fitted 2.2e-14, with lines through its centre 6.5e-14; rectangle on grid lines 1.9e-14; rotated
     * rectangle shifted 3.8e-14 and with a corner on a node 1.8e-14; diamond 1.3e-15; stadium 5.8e-14.
     * (Each cell's Green sum subtracts x_i·Δy from ∫x dy, so its round-off is about ε·L/h.)
     */
    private static final double TOTAL_AREA_TOLERANCE = 2e-13;

    /**
     * Per-cell bound, in units of the full cell area. Measured worst: 7.2e-12 (circle, shifted grid),
     * 1.6e-12 (fitted), 8.5e-13 (lines through the centre). Arc integrals are of size R², so their
     * round-off is about ε·(R/h)² of a cell, in the wall cells here and in the closed form alike.
     */
    private static final double CELL_AREA_TOLERANCE = 2e-11;

    /** Per-face bound, in units of the cell side. Measured worst: 4.3e-14 (circle, shifted grid). */
    private static final double FACE_TOLERANCE = 2e-13;

    private static double antiderivativeOfHalfChord(double u) {
        double s = Math.sqrt(Math.max(0, R * R - u * u));
        return 0.5 * (u * s + R * R * Math.asin(Math.max(-1, Math.min(1, u / R))));
    }

    /** Area of the disc (centre CX, CY, radius R) inside the box [x0, x1] × [y0, y1], in closed form. */
    private static double discInBox(double x0, double x1, double y0, double y1) {
        double from = Math.max(x0, CX - R);
        double to = Math.min(x1, CX + R);
        if (!(to > from)) {
            return 0;
        }
        double[] breaks = new double[6];
        int count = 0;
        breaks[count++] = from;
        breaks[count++] = to;
        for (double y : new double[] {y0, y1}) {
            double d = y - CY;
            if (Math.abs(d) < R) {
                double half = Math.sqrt(R * R - d * d);
                for (double x : new double[] {CX - half, CX + half}) {
                    if (x > from && x < to) {
                        breaks[count++] = x;
                    }
                }
            }
        }
        double[] sorted = Arrays.copyOf(breaks, count);
        Arrays.sort(sorted);
        double area = 0;
        for (int k = 0; k + 1 < sorted.length; k++) {
            double p = sorted[k];
            double q = sorted[k + 1];
            double mid = 0.5 * (p + q);
            double half = Math.sqrt(R * R - (mid - CX) * (mid - CX));
            boolean topIsWall = CY + half < y1;
            boolean bottomIsWall = CY - half > y0;
            double top = topIsWall ? CY + half : y1;
            double bottom = bottomIsWall ? CY - half : y0;
            if (top <= bottom) {
                continue;
            }
            double chordIntegral = antiderivativeOfHalfChord(q - CX) - antiderivativeOfHalfChord(p - CX);
            double topIntegral = topIsWall ? CY * (q - p) + chordIntegral : y1 * (q - p);
            double bottomIntegral = bottomIsWall ? CY * (q - p) - chordIntegral : y0 * (q - p);
            area += topIntegral - bottomIntegral;
        }
        return area;
    }

    /** Length of [centre − half, centre + half] ∩ [from, to], with half the half-chord at offset d. */
    private static double chordOverlap(double offset, double centre, double from, double to) {
        if (Math.abs(offset) >= R) {
            return 0;
        }
        double half = Math.sqrt(R * R - offset * offset);
        return Math.max(0, Math.min(to, centre + half) - Math.max(from, centre - half));
    }

    private static double fullArea(TensorGrid grid, int i, int j) {
        return (grid.x(i + 1) - grid.x(i)) * (grid.y(j + 1) - grid.y(j));
    }

    private static void assertEveryCellWithinItsBox(CutCells cells) {
        TensorGrid grid = cells.grid();
        for (int j = 0; j < grid.cellsY(); j++) {
            for (int i = 0; i < grid.cellsX(); i++) {
                double a = cells.cellArea(i, j);
                assertTrue(a >= 0 && a <= fullArea(grid, i, j), "cell (" + i + ", " + j + ") has area " + a
                        + " outside [0, " + fullArea(grid, i, j) + "]");
            }
        }
    }

    private static double greenArea(CrossSection section) {
        double area = 0;
        for (WallPiece p : section.wallPieces()) {
            area += p.integralXdy(p.startParameter(), p.endParameter());
        }
        return area;
    }

    /** Lines {@code origin + k h} for k = −below … above. */
    private static double[] linesThrough(double origin, double h, int below, int above) {
        double[] lines = new double[below + above + 1];
        for (int k = -below; k <= above; k++) {
            lines[k + below] = origin + k * h;
        }
        return lines;
    }

    private static void assertCellsMatchTheDisc(TensorGrid grid) {
        CutCells cells = CutCells.of(Shapes.circle(R, CX, CY), grid);
        for (int j = 0; j < grid.cellsY(); j++) {
            for (int i = 0; i < grid.cellsX(); i++) {
                double expected = discInBox(grid.x(i), grid.x(i + 1), grid.y(j), grid.y(j + 1));
                assertEquals(expected, cells.cellArea(i, j), CELL_AREA_TOLERANCE * fullArea(grid, i, j),
                        "cell (" + i + ", " + j + ")");
            }
        }
        assertEquals(Math.PI * R * R, cells.totalArea(), TOTAL_AREA_TOLERANCE * Math.PI * R * R);
        assertEveryCellWithinItsBox(cells);
    }

    @Test
    @DisplayName("On a shifted grid every cut cell of a circle has the closed-form area of the disc inside it, and they sum to πR²")
    void circleCellAreasOnAShiftedGridAreTheClosedFormOnes() {
        assertCellsMatchTheDisc(TensorGrid.shifted(Shapes.circle(R, CX, CY).bounds(), 100, 0.37, 0.61));
    }

    @Test
    @DisplayName("On a fitted grid, whose outer lines touch the circle, the cell areas are still the closed-form ones")
    void circleCellAreasOnAFittedGridAreTheClosedFormOnes() {
        assertCellsMatchTheDisc(TensorGrid.fitted(Shapes.circle(R, CX, CY).bounds(), 100));
    }

    @Test
    @DisplayName("On a grid with a line through the centre and nodes on the circle the cell areas are the closed-form ones")
    void circleCellAreasWithLinesThroughTheCentreAreTheClosedFormOnes() {
        // h = R/40: lines x = CX and y = CY pass through the centre; (CX ± R, CY) and (CX, CY ± R) are nodes
        double h = R / 40;
        assertCellsMatchTheDisc(new TensorGrid(linesThrough(CX, h, 41, 41), linesThrough(CY, h, 41, 41)));
    }

    @Test
    @DisplayName("Every open face length of a circle's cut grid is the chord of the circle inside that face")
    void circleFaceOpenLengthsAreTheChords() {
        TensorGrid grid = TensorGrid.shifted(Shapes.circle(R, CX, CY).bounds(), 100, 0.37, 0.61);
        CutCells cells = CutCells.of(Shapes.circle(R, CX, CY), grid);
        double h = grid.largestStep();
        int cut = 0;
        for (int j = 0; j < grid.cellsY(); j++) {
            for (int i = 0; i <= grid.cellsX(); i++) {
                double expected = chordOverlap(grid.x(i) - CX, CY, grid.y(j), grid.y(j + 1));
                assertEquals(expected, cells.verticalFaceOpenLength(i, j), FACE_TOLERANCE * h,
                        "vertical face (" + i + ", " + j + ")");
                cut += expected > 0 && expected < grid.y(j + 1) - grid.y(j) ? 1 : 0;
            }
        }
        for (int j = 0; j <= grid.cellsY(); j++) {
            for (int i = 0; i < grid.cellsX(); i++) {
                double expected = chordOverlap(grid.y(j) - CY, CX, grid.x(i), grid.x(i + 1));
                assertEquals(expected, cells.horizontalFaceOpenLength(i, j), FACE_TOLERANCE * h,
                        "horizontal face (" + i + ", " + j + ")");
            }
        }
        assertTrue(cut > 100, "the check should include many partly open faces, got " + cut);
    }

    @Test
    @DisplayName("A rectangle whose walls lie on grid lines has full cells inside and total area a·b")
    void rectangleOnGridLinesHasFullCellsAndAreaAB() {
        double a = 0.020;
        double b = 0.009;
        TensorGrid grid = TensorGrid.fitted(Shapes.rectangle(a, b).bounds(), 80);
        CutCells cells = CutCells.of(Shapes.rectangle(a, b), grid);
        assertEquals(a * b, cells.totalArea(), TOTAL_AREA_TOLERANCE * a * b);
        for (int j = 0; j < grid.cellsY(); j++) {
            for (int i = 0; i < grid.cellsX(); i++) {
                // measured worst 2.6e-13 of a cell
                assertEquals(fullArea(grid, i, j), cells.cellArea(i, j), 1e-12 * fullArea(grid, i, j),
                        "cell (" + i + ", " + j + ")");
            }
        }
        // interior faces are fully open
        assertEquals(grid.y(1) - grid.y(0), cells.verticalFaceOpenLength(1, 0), 1e-15);
        assertEquals(grid.x(1) - grid.x(0), cells.horizontalFaceOpenLength(3, 5), 1e-15);
    }

    @Test
    @DisplayName("A rectangle turned 30° has total cut area a·b on a shifted grid and with a corner on a grid node")
    void rotatedRectangleHasAreaABWhereverTheGridLies() {
        double a = 0.020;
        double b = 0.009;
        CrossSection box = Shapes.rotatedRectangle(a, b, 0.4e-3, -0.3e-3, Math.toRadians(30));
        CutCells shifted = CutCells.of(box, TensorGrid.shifted(box.bounds(), 90, 0.37, 0.61));
        assertEquals(a * b, shifted.totalArea(), TOTAL_AREA_TOLERANCE * a * b);
        assertEveryCellWithinItsBox(shifted);

        WallPiece first = box.wallPieces().get(0);
        double vx = first.startX();
        double vy = first.startY();
        double h = 0.25e-3;
        TensorGrid throughCorner = new TensorGrid(linesThrough(vx, h, 100, 100), linesThrough(vy, h, 100, 100));
        assertEquals(vx, throughCorner.x(100), 0.0);
        assertEquals(vy, throughCorner.y(100), 0.0);
        CutCells onNode = CutCells.of(box, throughCorner);
        assertEquals(a * b, onNode.totalArea(), TOTAL_AREA_TOLERANCE * a * b);
        assertEveryCellWithinItsBox(onNode);
    }

    @Test
    @DisplayName("A square standing on a corner, vertices on nodes and walls through nodes, has half cells on its walls and area 2s²")
    void diamondThroughGridNodesHasHalfCellsOnItsWalls() {
        double s = 0.004; // half-diagonal
        double h = 0.5e-3;
        CrossSection diamond = Shapes.polygon("square on a corner", Outline.startAt(0, -s).lineTo(s, 0)
                .lineTo(0, s).lineTo(-s, 0));
        TensorGrid grid = new TensorGrid(linesThrough(0, h, 10, 10), linesThrough(0, h, 10, 10));
        CutCells cells = CutCells.of(diamond, grid);
        assertEquals(2 * s * s, cells.totalArea(), TOTAL_AREA_TOLERANCE * 2 * s * s);
        int halves = 0;
        for (int j = 0; j < grid.cellsY(); j++) {
            for (int i = 0; i < grid.cellsX(); i++) {
                // the cell is crossed by a wall along its diagonal when |x| + |y| = s passes through two corners
                double cx = 0.5 * (grid.x(i) + grid.x(i + 1));
                double cy = 0.5 * (grid.y(j) + grid.y(j + 1));
                double level = Math.abs(cx) + Math.abs(cy); // measured worst deviation 1.2e-15 of a cell
                double expected = level < s - h / 2 ? h * h : Math.abs(level - s) < 1e-12 ? h * h / 2 : 0;
                assertEquals(expected, cells.cellArea(i, j), 1e-14 * h * h, "cell (" + i + ", " + j + ")");
                halves += expected == h * h / 2 ? 1 : 0;
            }
        }
        assertEquals(4 * 8, halves, "each of the four walls crosses s/h = 8 cells along their diagonals");
    }

    @Test
    @DisplayName("A 30 × 10 mm stadium of two segments and two half-circle arcs has cut area 20·10 + π·5² mm²")
    void stadiumCutAreaIsRectanglePlusDisc() {
        CrossSection stadium = Shapes.polygon("stadium 30 × 10 mm", Outline.startAt(0, 0).lineTo(0.020, 0)
                .arcTo(0.020, 0.010, Math.PI).lineTo(0, 0.010).arcTo(0, 0, Math.PI));
        double expected = (20 * 10 + Math.PI * 5 * 5) * 1e-6;
        assertEquals(expected, greenArea(stadium), 1e-15 * expected);
        for (TensorGrid grid : new TensorGrid[] {TensorGrid.shifted(stadium.bounds(), 120, 0.37, 0.61),
            TensorGrid.fitted(stadium.bounds(), 120)}) {
            CutCells cells = CutCells.of(stadium, grid);
            assertEquals(expected, cells.totalArea(), TOTAL_AREA_TOLERANCE * expected);
            assertEveryCellWithinItsBox(cells);
        }
    }
}
