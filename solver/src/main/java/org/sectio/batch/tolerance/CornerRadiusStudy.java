package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.sectio.batch.size.GuidePoint;
import org.sectio.batch.size.GuidePointSolver;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentifier;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.SolveException;
import org.sectio.modes.SolveSettings;

/**
 * The corner-radius question answered directly: the cutoffs of the first modes and the usable band of a
 * rectangular guide a × b against the radius of its four inner corners, from 0 (the sharp rectangle) to
 * b/2 (the stadium), with the family "rounded_rectangular". Milling leaves a radius in every inner
 * corner; this shows how much of the band it costs.
 *
 * <p>Each radius is a full solve on the same grid density; the points run in parallel. A curve follows
 * the k-th mode of one family ("TE 2"), named by its rectangle label at radius 0 (TE20); where two modes
 * of one family cross as the radius grows they exchange names, so a curve stays the k-th lowest.
 */
public final class CornerRadiusStudy {

    private CornerRadiusStudy() {
    }

    /**
     * One radius.
     *
     * @param radiusMetres the corner radius, m
     * @param cutoffsHz the followed modes' cutoffs, Hz (NaN when missing from the solve)
     * @param singleModeLowHz fc1, Hz
     * @param singleModeHighHz fc2, Hz (NaN when unknown)
     * @param usableLowHz 1.25 fc1, Hz
     * @param usableHighHz 0.95 fc2, Hz
     * @param largestRelativeError the largest error estimate of the followed cutoffs
     */
    public record Row(double radiusMetres, double[] cutoffsHz, double singleModeLowHz, double singleModeHighHz,
                      double usableLowHz, double usableHighHz, double largestRelativeError) {
        public Row {
            cutoffsHz = cutoffsHz.clone();
        }

        @Override
        public double[] cutoffsHz() {
            return cutoffsHz.clone();
        }
    }

    /**
     * @param widthMetres a, m
     * @param heightMetres b, m
     * @param modeLabels the followed modes by family and index ("TE 1")
     * @param modeNames their names at radius 0 ("TE10")
     * @param cellsAcross the grid of every solve
     * @param rows one per radius, ascending
     * @param seconds wall-clock time
     */
    public record Result(double widthMetres, double heightMetres, List<String> modeLabels, List<String> modeNames,
                         int cellsAcross, List<Row> rows, double seconds) {
        public Result {
            modeLabels = List.copyOf(modeLabels);
            modeNames = List.copyOf(modeNames);
            rows = List.copyOf(rows);
        }
    }

    /**
     * @param widthMetres a, finite and &gt; 0, m
     * @param heightMetres b, finite and &gt; 0, m
     * @param maxRadiusMetres the largest radius, 0 &lt; r ≤ min(a, b)/2, m
     * @param points radii from 0 to the largest, evenly spaced, 2 … 1000
     * @param modes modes to follow, 1 … 50
     * @param cellsAcross grid cells across, 8 … 4000
     * @param threads parallel solves, ≥ 1
     * @return the table
     * @throws IllegalArgumentException if a value is out of range (one line, with the value)
     * @throws SolveException if a solve fails
     */
    public static Result run(double widthMetres, double heightMetres, double maxRadiusMetres, int points, int modes,
                             int cellsAcross, int threads) {
        if (!(widthMetres > 0) || !(heightMetres > 0) || Double.isInfinite(widthMetres) || Double.isInfinite(heightMetres)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the guide's width and height must be > 0,"
                    + " got %.6g × %.6g mm", widthMetres * 1e3, heightMetres * 1e3));
        }
        double half = Math.min(widthMetres, heightMetres) / 2;
        if (!(maxRadiusMetres > 0) || maxRadiusMetres > half * (1 + 1e-12)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the largest corner radius must be > 0 and"
                    + " ≤ half the shorter side (%.6g mm), got %.6g mm", half * 1e3, maxRadiusMetres * 1e3));
        }
        if (points < 2 || points > 1000) {
            throw new IllegalArgumentException("radii must be 2 … 1000 points, got " + points);
        }
        if (modes < 1 || modes > 50) {
            throw new IllegalArgumentException("modes to follow must be 1 … 50, got " + modes);
        }
        long start = System.nanoTime();
        GuideTemplate template = GuideTemplate.of(GuideFamilies.byName("rounded_rectangular"));
        GuidePointSolver solver = new GuidePointSolver(template, Map.of("width", widthMetres * 1e3, "height",
                heightMetres * 1e3), new SolveSettings(modes + ToleranceStudy.SPARE_MODES,
                EnumSet.of(ModeFamily.TE, ModeFamily.TM), cellsAcross, Double.NaN, true, 1));
        List<Map<String, Double>> sets = new ArrayList<>();
        for (int j = 0; j < points; j++) {
            double r = j == points - 1 ? Math.min(maxRadiusMetres, half) : maxRadiusMetres * j / (points - 1);
            sets.add(Map.of("corner_radius", r * 1e3));
        }
        List<PointBatch.Outcome> solved = PointBatch.solveAll(solver, sets, threads);
        for (int j = 0; j < solved.size(); j++) {
            if (solved.get(j).point() == null) {
                throw new SolveException("corner radius " + sets.get(j).get("corner_radius") + " mm: "
                        + solved.get(j).failure());
            }
        }
        GuidePoint sharp = solved.get(0).point();
        List<String> labels = new ArrayList<>();
        List<String> names = new ArrayList<>();
        List<ModeIdentity> ids = ModeIdentifier.identify(sharp.section(), sharp.modes());
        for (int k = 0; k < sharp.modes().modes().size() && labels.size() < modes; k++) {
            labels.add(sharp.modes().modes().get(k).label());
            names.add(ids.get(k).label());
        }
        List<Row> rows = new ArrayList<>();
        for (int j = 0; j < solved.size(); j++) {
            GuidePoint p = solved.get(j).point();
            double[] fc = new double[labels.size()];
            double worst = 0;
            for (int k = 0; k < fc.length; k++) {
                Mode m = QuantityPlan.find(p, labels.get(k));
                fc[k] = m == null ? Double.NaN : m.cutoffFrequencyHz();
                if (m != null && Double.isFinite(m.relativeErrorEstimate())) {
                    worst = Math.max(worst, m.relativeErrorEstimate());
                }
            }
            rows.add(new Row(sets.get(j).get("corner_radius") * 1e-3, fc, p.summary().singleModeLowHz(),
                    p.summary().singleModeHighHz(), p.summary().usableLowHz(), p.summary().usableHighHz(), worst));
        }
        return new Result(widthMetres, heightMetres, labels, names, cellsAcross, rows, (System.nanoTime() - start) * 1e-9);
    }
}
