package org.sectio.modes;

/**
 * The grid a solve used.
 *
 * @param cellsX cells along x
 * @param cellsY cells along y
 * @param cellWidth cell width, m
 * @param cellHeight cell height, m
 * @param unknownsTE unknowns of the TE pencil (0 if not solved)
 * @param unknownsTM unknowns of the TM pencil (0 if not solved)
 */
public record GridSummary(int cellsX, int cellsY, double cellWidth, double cellHeight, int unknownsTE, int unknownsTM) {
}
