/**
 * The desktop viewer: cross-section, grid, modes, fields and charts on the solver's API.
 *
 * <p>{@code model} holds the view state without JavaFX (tested with no window), {@code render} turns a
 * mode into pixels, arrows and lines without JavaFX, {@code ui} arranges the JavaFX controls. The viewer
 * computes no physics: solving is {@code ModeSolver.solve}, figures are {@code ModeAnalysis}, the
 * transverse field is {@code TransverseFields}.
 */
package org.sectio.viewer;
