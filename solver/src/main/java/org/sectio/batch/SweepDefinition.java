package org.sectio.batch;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;

/**
 * A parameter sweep as read from a sweep file (see docs/sweep-files.md): the geometry with its fixed
 * settings, the solve settings, the swept axes and what to record.
 *
 * <p>The points are the full grid (cartesian product) of the axes, numbered 0, 1, … with the last
 * axis varying fastest. They are solved in <em>chains</em> of {@code chainLength} consecutive
 * indices: a chain is the unit of work of a thread, of a shard and of re-use, and each chain starts
 * from scratch, so a point's record depends only on the sweep file, never on threads, shards or on
 * which points an earlier, interrupted run finished.
 *
 * @param sourceName the sweep file as named by the user
 * @param geometry the cross-section with named parameters
 * @param fixed parameter values set for every point, geometry units
 * @param solve modes, families, grid or accuracy, error estimate (its thread count is replaced when run)
 * @param axes the swept parameters, at least one, distinct names
 * @param record what to record
 * @param analysis metal, roughness and impedance definition for α_c and impedances
 * @param reuse what consecutive points of a chain share
 * @param chainLength consecutive points per chain, 1 … {@value #MAX_CHAIN}
 */
public record SweepDefinition(String sourceName, GuideTemplate geometry, Map<String, Double> fixed, SolveSettings solve,
                              List<SweepAxis> axes, RecordPlan record, AnalysisSettings analysis, Reuse reuse,
                              int chainLength) {

    /** Most points one sweep may have. */
    public static final int MAX_POINTS = 1_000_000;
    /** Longest chain. */
    public static final int MAX_CHAIN = 1000;
    /** Chain length when the file does not set one. */
    public static final int DEFAULT_CHAIN = 8;

    public SweepDefinition {
        fixed = Collections.unmodifiableMap(new LinkedHashMap<>(fixed));
        axes = List.copyOf(axes);
        if (axes.isEmpty()) {
            throw new IllegalArgumentException("a sweep needs at least one swept parameter");
        }
        long count = 1;
        for (SweepAxis a : axes) {
            count *= a.size();
            if (count > MAX_POINTS) {
                throw new IllegalArgumentException("the sweep has more than " + MAX_POINTS + " points");
            }
        }
        if (chainLength < 1 || chainLength > MAX_CHAIN) {
            throw new IllegalArgumentException("chain length must be 1 … " + MAX_CHAIN + ", got " + chainLength);
        }
    }

    /** @return the number of points, the product of the axis sizes */
    public int pointCount() {
        int count = 1;
        for (SweepAxis a : axes) {
            count *= a.size();
        }
        return count;
    }

    /** @return the names of the swept parameters, in axis order */
    public List<String> parameterNames() {
        return axes.stream().map(SweepAxis::parameter).toList();
    }

    /**
     * @param index 0 … {@link #pointCount()} − 1
     * @return that point: axis values by mixed-radix digits of the index, the last axis fastest
     * @throws IndexOutOfBoundsException if the index is out of range
     */
    public SweepPoint point(int index) {
        if (index < 0 || index >= pointCount()) {
            throw new IndexOutOfBoundsException("point " + index + " of " + pointCount());
        }
        Map<String, Double> values = new LinkedHashMap<>();
        int rest = index;
        int[] digits = new int[axes.size()];
        for (int a = axes.size() - 1; a >= 0; a--) {
            digits[a] = rest % axes.get(a).size();
            rest /= axes.get(a).size();
        }
        for (int a = 0; a < axes.size(); a++) {
            values.put(axes.get(a).parameter(), axes.get(a).value(digits[a]));
        }
        return new SweepPoint(index, values);
    }

    /** @return the number of chains */
    public int chainCount() {
        return (pointCount() + chainLength - 1) / chainLength;
    }

    /** @return the point indices of chain {@code c}, ascending */
    public List<Integer> chain(int c) {
        List<Integer> members = new ArrayList<>();
        for (int i = c * chainLength; i < Math.min(pointCount(), (c + 1) * chainLength); i++) {
            members.add(i);
        }
        return members;
    }

    /** @return every value the geometry is built with at this point: the fixed ones, then the swept ones */
    Map<String, Double> settingsAt(SweepPoint point) {
        Map<String, Double> all = new LinkedHashMap<>(fixed);
        all.putAll(point.values());
        return all;
    }
}
