package org.sectio.geometry.svg;

/**
 * Receives the drawing commands of SVG path data in absolute user-space coordinates (relative
 * commands already resolved, S and T already turned into C and Q with their reflected control point).
 * Every call carries the 1-based position in the path data of the command it comes from, so that a
 * receiver can report faults there.
 */
interface PathSink {

    /** Starts a new sub-path at (x, y). */
    void moveTo(double x, double y, int position) throws SvgPathException;

    /** A straight segment to (x, y). */
    void lineTo(double x, double y, int position) throws SvgPathException;

    /** A cubic Bézier curve with control points (x1, y1), (x2, y2) ending at (x, y). */
    void cubicTo(double x1, double y1, double x2, double y2, double x, double y, int position)
            throws SvgPathException;

    /** A quadratic Bézier curve with control point (x1, y1) ending at (x, y). */
    void quadraticTo(double x1, double y1, double x, double y, int position) throws SvgPathException;

    /**
     * An elliptical arc in the endpoint form of SVG 1.1 §8.3.8.
     *
     * @param rx x radius as written (sign not yet dropped)
     * @param ry y radius as written
     * @param rotationDegrees the x-axis-rotation, degrees
     * @param largeArc the large-arc-flag
     * @param sweep the sweep-flag (true: the positive-angle direction)
     */
    void arcTo(double rx, double ry, double rotationDegrees, boolean largeArc, boolean sweep, double x, double y,
               int position) throws SvgPathException;

    /** Closes the current sub-path (Z or z). */
    void closePath(int position) throws SvgPathException;
}
