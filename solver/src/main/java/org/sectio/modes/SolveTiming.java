package org.sectio.modes;

/**
 * Wall-clock time of the stages of a solve, in seconds, summed over families and grids.
 *
 * @param assemblySeconds grid, cut cells and matrix assembly
 * @param factorSeconds ordering and sparse factorization
 * @param eigenSeconds Krylov iterations
 * @param totalSeconds the whole solve, error estimate included
 */
public record SolveTiming(double assemblySeconds, double factorSeconds, double eigenSeconds, double totalSeconds) {
}
