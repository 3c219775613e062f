package org.sectio.geometry;

/** A straight wall piece from (x0, y0) to (x1, y1), metres, parameter t ∈ [0, 1]. */
record LineSegment(double x0, double y0, double x1, double y1) implements WallPiece {

    LineSegment {
        if (x0 == x1 && y0 == y1) {
            throw new IllegalArgumentException("segment of zero length at (" + x0 + ", " + y0 + ")");
        }
    }

    @Override
    public double startParameter() {
        return 0.0;
    }

    @Override
    public double endParameter() {
        return 1.0;
    }

    @Override
    public double x(double t) {
        return t == 1.0 ? x1 : x0 + t * (x1 - x0);
    }

    @Override
    public double y(double t) {
        return t == 1.0 ? y1 : y0 + t * (y1 - y0);
    }

    @Override
    public double parameterAtX(double x) {
        return (x - x0) / (x1 - x0);
    }

    @Override
    public double parameterAtY(double y) {
        return (y - y0) / (y1 - y0);
    }

    @Override
    public double integralXdy(double t0, double t1) {
        double dy = y1 - y0;
        double dx = x1 - x0;
        return dy * (x0 * (t1 - t0) + 0.5 * dx * (t1 * t1 - t0 * t0));
    }
}
