package org.sectio.batch;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The outcome of one sweep point, as recorded: its index among all points, the swept values, and
 * either the figures of the {@link RecordPlan} or the one-line reason it failed.
 *
 * @param index 0-based point index
 * @param total the number of points of the whole sweep (so that a merge can tell a missing last point)
 * @param parameters the swept values in axis order, geometry units
 * @param failed whether the point failed
 * @param figures the recorded figures in {@link RecordPlan#columns()} order: a {@code String} (mode
 *     label), a {@code Double} (SI units as the column says) or null where not available; empty when failed
 * @param reason why it failed, one line; "" when it did not
 */
public record PointRecord(int index, int total, List<Double> parameters, boolean failed, List<Object> figures,
                          String reason) {

    public PointRecord {
        parameters = List.copyOf(parameters);
        figures = Collections.unmodifiableList(new ArrayList<>(figures));
        reason = reason == null ? "" : reason.replaceAll("\\s*[\\r\\n]+\\s*", " ").strip();
        if (index < 0 || index >= total) {
            throw new IllegalArgumentException("point index " + index + " outside 0 … " + (total - 1));
        }
        if (failed == reason.isEmpty()) {
            throw new IllegalArgumentException("a failed point needs a reason and a finished one none, got \"" + reason + "\"");
        }
    }
}
