package org.sectio.batch;

import java.util.Arrays;

/**
 * One parameter of a sweep and the values it takes, in the geometry's units (a geometry file's length
 * unit, mm for a built-in family; angles in degrees), in sweep order.
 *
 * @param parameter the parameter's name in the geometry
 * @param values the values, at least one, finite
 * @throws IllegalArgumentException if the name is blank or a value is missing or not finite
 */
public record SweepAxis(String parameter, double[] values) {

    public SweepAxis {
        if (parameter == null || parameter.isBlank() || values == null || values.length == 0) {
            throw new IllegalArgumentException("a sweep axis needs a parameter name and at least one value");
        }
        values = values.clone();
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("sweep values of " + parameter + " must be finite, got " + v);
            }
        }
    }

    /** @return a copy of the values */
    @Override
    public double[] values() {
        return values.clone();
    }

    /** @return how many values */
    public int size() {
        return values.length;
    }

    /** @return the value at position {@code k}, 0-based */
    public double value(int k) {
        return values[k];
    }

    /**
     * Evenly spaced values from {@code from} to {@code to}, both included; each is computed as
     * {@code from + k (to − from) / (count − 1)}, so no error accumulates along the range.
     *
     * @param count how many values, ≥ 2
     * @throws IllegalArgumentException if {@code count < 2} or a bound is not finite
     */
    public static double[] linear(double from, double to, int count) {
        requireRange(from, to, count);
        double[] v = new double[count];
        for (int k = 0; k < count; k++) {
            v[k] = k == count - 1 ? to : from + k * (to - from) / (count - 1);
        }
        return v;
    }

    /**
     * Values {@code from, from + step, …} up to {@code to}; {@code to} itself is included when it lies
     * within 1e-9 of a step of the last value (it replaces that value, so rounding cannot drop it).
     *
     * @param step &gt; 0
     * @throws IllegalArgumentException if {@code step ≤ 0}, {@code from ≥ to}, or more than
     *     {@link SweepDefinition#MAX_POINTS} values would result
     */
    public static double[] stepped(double from, double to, double step) {
        if (!(step > 0) || !Double.isFinite(step)) {
            throw new IllegalArgumentException("step must be a positive number, got " + step);
        }
        double span = (to - from) / step;
        if (span + 1 > SweepDefinition.MAX_POINTS) {
            throw new IllegalArgumentException("from " + from + " to " + to + " in steps of " + step + " gives "
                    + (long) Math.floor(span + 1) + " values, more than " + SweepDefinition.MAX_POINTS);
        }
        int last = (int) Math.floor(span + 1e-9);
        double[] v = new double[last + 1];
        for (int k = 0; k <= last; k++) {
            v[k] = from + k * step;
        }
        if (Math.abs(span - Math.rint(span)) <= 1e-9) {
            v[last] = to;
        }
        return v;
    }

    /**
     * Geometrically spaced values from {@code from} to {@code to}, both included:
     * {@code from · (to / from)^(k / (count − 1))}.
     *
     * @param count how many values, ≥ 2
     * @throws IllegalArgumentException if {@code from ≤ 0} or {@code to ≤ 0}, or {@code count < 2}
     */
    public static double[] logarithmic(double from, double to, int count) {
        if (!(from > 0 && to > 0)) {
            throw new IllegalArgumentException("a logarithmic range needs from > 0 and to > 0, got " + from + " … " + to);
        }
        requireRange(from, to, count);
        double[] v = new double[count];
        double ratio = StrictMath.log(to / from); // StrictMath: the same values on every machine of a cluster
        for (int k = 0; k < count; k++) {
            v[k] = k == 0 ? from : k == count - 1 ? to : from * StrictMath.exp(ratio * k / (count - 1));
        }
        return v;
    }

    private static void requireRange(double from, double to, int count) {
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw new IllegalArgumentException("range bounds must be finite, got " + from + " … " + to);
        }
        if (count < 2) {
            throw new IllegalArgumentException("a range needs a count of at least 2 values, got " + count);
        }
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof SweepAxis a && a.parameter.equals(parameter) && Arrays.equals(a.values, values);
    }

    @Override
    public int hashCode() {
        return 31 * parameter.hashCode() + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return parameter + " " + Arrays.toString(values);
    }
}
