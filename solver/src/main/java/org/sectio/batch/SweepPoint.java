package org.sectio.batch;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One point of a sweep: its stable index (0-based, in the order of the sweep file's grid, the last
 * axis varying fastest) and the value of every swept parameter, in the geometry's units.
 *
 * @param index 0-based position in the sweep, ≥ 0
 * @param values the swept parameters' values by name, in axis order
 */
public record SweepPoint(int index, Map<String, Double> values) {

    public SweepPoint {
        if (index < 0) {
            throw new IllegalArgumentException("point index must be ≥ 0, got " + index);
        }
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }
}
