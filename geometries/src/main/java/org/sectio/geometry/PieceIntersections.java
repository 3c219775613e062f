package org.sectio.geometry;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

/**
 * Where two wall pieces meet: crossings, touching points, an end of one lying on the other, and for
 * two pieces on the same line, circle or ellipse the ends of their common part. This one routine
 * serves the boolean operations and the outline checks, so both agree on what touches.
 *
 * <p>Method: the points where the two underlying curves meet are found in closed form for line–line,
 * line–circle, circle–circle and line–ellipse (the last reduces to ρ cos(t − β) = m in the eccentric
 * angle). Circle–ellipse and ellipse–ellipse use the signed distance of the ellipse piece's points to
 * the other curve as a function of its eccentric angle: a monotone piece spans less than π, so 64
 * samples isolate each root, refined by Brent's method (Brent 1973, "Algorithms for minimization
 * without derivatives", ch. 4, as implemented in Commons Math); a sampled local minimum of |distance|
 * below the tolerance is refined by golden-section search and counted as a tangency. Candidates are
 * kept when they lie within the tolerance of both pieces. Points closer than the tolerance count as
 * one; a curve pair that touches within the tolerance yields one point, not two.
 */
final class PieceIntersections {

    private static final int SAMPLES = 64;

    private PieceIntersections() {
    }

    /**
     * @param tol distance below which points coincide, m, &gt; 0
     * @return the meeting points {x, y}, m, ends of either piece first, no two within {@code tol}
     */
    static List<double[]> meet(WallPiece p, WallPiece q, double tol) {
        List<double[]> found = new ArrayList<>();
        if (!boxesOverlap(p, q, tol)) {
            return found;
        }
        addIfOn(found, q, p.startX(), p.startY(), tol);
        addIfOn(found, q, p.endX(), p.endY(), tol);
        addIfOn(found, p, q.startX(), q.startY(), tol);
        addIfOn(found, p, q.endX(), q.endY(), tol);
        if (sameCurve(p, q, tol)) {
            return found;
        }
        for (double[] c : curvePoints(p, q, tol)) {
            if (PieceGeometry.distance(p, c[0], c[1]) <= tol && PieceGeometry.distance(q, c[0], c[1]) <= tol) {
                addDistinct(found, c[0], c[1], tol);
            }
        }
        return found;
    }

    /** @return whether q lies, within {@code tol}, on the whole curve (line, circle, ellipse) of p */
    static boolean sameCurve(WallPiece p, WallPiece q, double tol) {
        for (int k = 0; k <= 4; k++) {
            double t = q.startParameter() + 0.25 * k * (q.endParameter() - q.startParameter());
            if (!(Math.abs(PieceGeometry.curveDistance(p, q.x(t), q.y(t))) <= tol)) {
                return false;
            }
        }
        return true;
    }

    private static boolean boxesOverlap(WallPiece p, WallPiece q, double tol) {
        return Math.max(p.startX(), p.endX()) + tol >= Math.min(q.startX(), q.endX())
                && Math.max(q.startX(), q.endX()) + tol >= Math.min(p.startX(), p.endX())
                && Math.max(p.startY(), p.endY()) + tol >= Math.min(q.startY(), q.endY())
                && Math.max(q.startY(), q.endY()) + tol >= Math.min(p.startY(), p.endY());
    }

    private static void addIfOn(List<double[]> found, WallPiece piece, double x, double y, double tol) {
        if (PieceGeometry.distance(piece, x, y) <= tol) {
            addDistinct(found, x, y, tol);
        }
    }

    private static void addDistinct(List<double[]> found, double x, double y, double tol) {
        for (double[] f : found) {
            if (Math.hypot(f[0] - x, f[1] - y) <= tol) {
                return;
            }
        }
        found.add(new double[] {x, y});
    }

    private static List<double[]> curvePoints(WallPiece p, WallPiece q, double tol) {
        if (q instanceof LineSegment && !(p instanceof LineSegment)) {
            return curvePoints(q, p, tol);
        }
        if (p instanceof LineSegment s) {
            if (q instanceof LineSegment r) {
                return lineLine(s, r);
            }
            if (q instanceof ArcPiece a) {
                return lineCircle(s, a.centreX(), a.centreY(), a.radius(), tol);
            }
            return lineEllipse(s, (EllipseArcPiece) q, tol);
        }
        if (p instanceof ArcPiece a && q instanceof ArcPiece b) {
            return circleCircle(a.centreX(), a.centreY(), a.radius(), b.centreX(), b.centreY(), b.radius(), tol);
        }
        return p instanceof EllipseArcPiece e ? sampled(e, q, tol) : sampled((EllipseArcPiece) q, p, tol);
    }

    private static List<double[]> lineLine(LineSegment s, LineSegment r) {
        double dx1 = s.x1() - s.x0();
        double dy1 = s.y1() - s.y0();
        double dx2 = r.x1() - r.x0();
        double dy2 = r.y1() - r.y0();
        double cross = dx1 * dy2 - dy1 * dx2;
        if (Math.abs(cross) <= 1e-15 * Math.hypot(dx1, dy1) * Math.hypot(dx2, dy2)) {
            return List.of();
        }
        double t = ((r.x0() - s.x0()) * dy2 - (r.y0() - s.y0()) * dx2) / cross;
        return List.of(new double[] {s.x0() + t * dx1, s.y0() + t * dy1});
    }

    /** The line through s against the circle |X − C| = r: the foot F of C and F ± √(r² − h²) u. */
    private static List<double[]> lineCircle(LineSegment s, double cx, double cy, double r, double tol) {
        double length = Math.hypot(s.x1() - s.x0(), s.y1() - s.y0());
        double ux = (s.x1() - s.x0()) / length;
        double uy = (s.y1() - s.y0()) / length;
        double along = (cx - s.x0()) * ux + (cy - s.y0()) * uy;
        double fx = s.x0() + along * ux;
        double fy = s.y0() + along * uy;
        double h = Math.hypot(cx - fx, cy - fy);
        if (h > r + tol) {
            return List.of();
        }
        if (h >= r - tol) {
            return List.<double[]>of(new double[] {fx, fy});
        }
        double k = Math.sqrt((r - h) * (r + h));
        return List.of(new double[] {fx - k * ux, fy - k * uy}, new double[] {fx + k * ux, fy + k * uy});
    }

    /** Two circles: the radical line at distance (d² + r1² − r2²)/(2d) from the first centre. */
    private static List<double[]> circleCircle(double x1, double y1, double r1, double x2, double y2, double r2,
                                               double tol) {
        double d = Math.hypot(x2 - x1, y2 - y1);
        if (d <= tol || d > r1 + r2 + tol || d < Math.abs(r1 - r2) - tol) {
            return List.of();
        }
        double ex = (x2 - x1) / d;
        double ey = (y2 - y1) / d;
        if (Math.abs(d - (r1 + r2)) <= tol || Math.abs(d - Math.abs(r1 - r2)) <= tol) {
            double side = r1 < r2 && Math.abs(d - (r1 + r2)) > tol ? -1 : 1;
            return List.<double[]>of(new double[] {x1 + side * r1 * ex, y1 + side * r1 * ey});
        }
        double a = (d * d + r1 * r1 - r2 * r2) / (2 * d);
        double h = Math.sqrt(Math.max(0, (r1 - a) * (r1 + a)));
        return List.of(new double[] {x1 + a * ex - h * ey, y1 + a * ey + h * ex},
                new double[] {x1 + a * ex + h * ey, y1 + a * ey - h * ex});
    }

    /** n·(e(t) − P0) = m + K cos t + L sin t = m + ρ cos(t − β) = 0 for the unit normal n of the line. */
    private static List<double[]> lineEllipse(LineSegment s, EllipseArcPiece e, double tol) {
        double length = Math.hypot(s.x1() - s.x0(), s.y1() - s.y0());
        double nx = -(s.y1() - s.y0()) / length;
        double ny = (s.x1() - s.x0()) / length;
        double c = Math.cos(e.rotation());
        double sn = Math.sin(e.rotation());
        double m = nx * (e.centreX() - s.x0()) + ny * (e.centreY() - s.y0());
        double k = e.semiAxisA() * (nx * c + ny * sn);
        double l = e.semiAxisB() * (-nx * sn + ny * c);
        double rho = Math.hypot(k, l);
        double beta = Math.atan2(l, k);
        if (Math.abs(m) > rho + tol) {
            return List.of();
        }
        List<double[]> out = new ArrayList<>();
        if (Math.abs(m) >= rho - tol) {
            out.add(ellipsePoint(e, m > 0 ? beta + Math.PI : beta));
        } else {
            double w = Math.acos(-m / rho);
            out.add(ellipsePoint(e, beta + w));
            out.add(ellipsePoint(e, beta - w));
        }
        return out;
    }

    private static double[] ellipsePoint(EllipseArcPiece e, double t) {
        double c = Math.cos(e.rotation());
        double s = Math.sin(e.rotation());
        double u = e.semiAxisA() * Math.cos(t);
        double v = e.semiAxisB() * Math.sin(t);
        return new double[] {e.centreX() + c * u - s * v, e.centreY() + s * u + c * v};
    }

    /** Roots and tangencies of the distance from e(t) to the other curve, over e's parameter range. */
    private static List<double[]> sampled(EllipseArcPiece e, WallPiece other, double tol) {
        double t0 = e.startParameter();
        double t1 = e.endParameter();
        double[] t = new double[SAMPLES + 1];
        double[] g = new double[SAMPLES + 1];
        for (int i = 0; i <= SAMPLES; i++) {
            t[i] = i == SAMPLES ? t1 : t0 + (t1 - t0) * i / SAMPLES;
            g[i] = gap(e, other, t[i]);
        }
        List<double[]> out = new ArrayList<>();
        BrentSolver brent = new BrentSolver(1e-16, 1e-15);
        for (int i = 0; i <= SAMPLES; i++) {
            if (g[i] == 0) {
                out.add(new double[] {e.x(t[i]), e.y(t[i])});
            } else if (i < SAMPLES && g[i] * g[i + 1] < 0) {
                double lo = Math.min(t[i], t[i + 1]);
                double hi = Math.max(t[i], t[i + 1]);
                double root = brent.solve(200, s -> gap(e, other, s), lo, hi);
                out.add(new double[] {e.x(root), e.y(root)});
            } else if (i > 0 && i < SAMPLES && Math.abs(g[i]) <= Math.abs(g[i - 1])
                    && Math.abs(g[i]) <= Math.abs(g[i + 1]) && g[i - 1] * g[i] > 0 && g[i] * g[i + 1] > 0) {
                double best = goldenMinimum(e, other, t[i - 1], t[i + 1]);
                if (Math.abs(gap(e, other, best)) <= tol) {
                    out.add(new double[] {e.x(best), e.y(best)});
                }
            }
        }
        return out;
    }

    private static double gap(EllipseArcPiece e, WallPiece other, double t) {
        return PieceGeometry.curveDistance(other, e.x(t), e.y(t));
    }

    /** Golden-section search for the minimum of |gap| on [a, b] (Kiefer 1953). */
    private static double goldenMinimum(EllipseArcPiece e, WallPiece other, double a, double b) {
        double ratio = 0.5 * (Math.sqrt(5) - 1);
        double c = b - ratio * (b - a);
        double d = a + ratio * (b - a);
        for (int k = 0; k < 80; k++) {
            if (Math.abs(gap(e, other, c)) < Math.abs(gap(e, other, d))) {
                b = d;
            } else {
                a = c;
            }
            c = b - ratio * (b - a);
            d = a + ratio * (b - a);
        }
        return 0.5 * (a + b);
    }
}
