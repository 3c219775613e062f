package org.sectio.physics;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One frequency or a linear sweep, as written on the command line.
 *
 * <p>A frequency is a decimal number with an optional exponent and an optional unit, with or
 * without a space: {@code 10GHz}, {@code 10 GHz}, {@code 1e10}, {@code 9.5e9Hz}, {@code 500MHz}.
 * Units are Hz, kHz, MHz, GHz and THz, in any letter case ({@code mhz} is megahertz: there is no
 * millihertz here); no unit means Hz. A sweep is {@code START:STOP:POINTS}, e.g.
 * {@code 8GHz:12GHz:101}: POINTS (2 … {@value #MAX_POINTS}) frequencies evenly spaced from START to
 * STOP, both included, f_i = START + i (STOP − START) / (POINTS − 1). Every frequency must be
 * finite and &gt; 0, and STOP &gt; START.
 *
 * @param startHz first frequency, Hz
 * @param stopHz last frequency, Hz (equal to start for one frequency)
 * @param points how many, 1 for a single frequency
 */
public record FrequencySpec(double startHz, double stopHz, int points) {

    /** Most points in a sweep. */
    public static final int MAX_POINTS = 1_000_000;

    private static final Pattern FREQUENCY = Pattern.compile(
            "([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*([A-Za-z]*)");
    private static final String EXPECTED = "expected a number with an optional unit Hz, kHz, MHz, GHz or THz,"
            + " e.g. 10GHz, 500 MHz or 9.5e9";

    /**
     * Validates the components.
     *
     * @param startHz as in the record description
     * @param stopHz as in the record description
     * @param points as in the record description
     * @throws IllegalArgumentException if the values do not form a single frequency or a sweep as above
     */
    public FrequencySpec {
        if (!(startHz > 0) || Double.isInfinite(startHz)) {
            throw new IllegalArgumentException("frequency must be finite and > 0 Hz, got " + startHz);
        }
        if (points == 1 ? stopHz != startHz
                : points < 2 || points > MAX_POINTS || !(stopHz > startHz) || Double.isInfinite(stopHz)) {
            throw new IllegalArgumentException("a sweep needs 2 … " + MAX_POINTS + " points and stop > start,"
                    + " or 1 point with stop = start; got " + startHz + " … " + stopHz + " Hz, " + points + " points");
        }
    }

    /**
     * A single frequency or a sweep.
     *
     * @param text e.g. "10GHz" or "8GHz:12GHz:101"
     * @return the specification
     * @throws IllegalArgumentException with a one-line message naming the bad text and what was expected
     */
    public static FrequencySpec parse(String text) {
        if (text == null) {
            throw new IllegalArgumentException("missing frequency: " + EXPECTED);
        }
        String[] parts = text.split(":", -1);
        if (parts.length == 1) {
            double f = parseFrequency(parts[0]);
            return new FrequencySpec(f, f, 1);
        }
        if (parts.length != 3) {
            throw new IllegalArgumentException("bad frequency sweep \"" + text
                    + "\": expected START:STOP:POINTS, e.g. 8GHz:12GHz:101");
        }
        double start = parseFrequency(parts[0]);
        double stop = parseFrequency(parts[1]);
        String count = parts[2].strip();
        int points;
        try {
            points = Integer.parseInt(count);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("bad number of points \"" + count + "\" in \"" + text
                    + "\": expected a whole number 2 … " + MAX_POINTS);
        }
        if (points < 2 || points > MAX_POINTS) {
            throw new IllegalArgumentException("bad number of points " + points + " in \"" + text
                    + "\": expected 2 … " + MAX_POINTS);
        }
        if (!(stop > start)) {
            throw new IllegalArgumentException("bad frequency sweep \"" + text + "\": expected STOP above START, got "
                    + start + " Hz … " + stop + " Hz");
        }
        return new FrequencySpec(start, stop, points);
    }

    /**
     * One frequency.
     *
     * @param text e.g. "10 GHz", "1e10", "9.5e9Hz"
     * @return the frequency, Hz
     * @throws IllegalArgumentException with a one-line message naming the bad text and what was expected
     */
    public static double parseFrequency(String text) {
        String t = text == null ? "" : text.strip();
        Matcher m = FREQUENCY.matcher(t);
        if (!m.matches()) {
            throw new IllegalArgumentException("bad frequency \"" + t + "\": " + EXPECTED);
        }
        double scale = switch (m.group(2).toLowerCase(Locale.ROOT)) {
            case "", "hz" -> 1.0;
            case "khz" -> 1e3;
            case "mhz" -> 1e6;
            case "ghz" -> 1e9;
            case "thz" -> 1e12;
            default -> throw new IllegalArgumentException("bad frequency unit \"" + m.group(2) + "\" in \"" + t
                    + "\": " + EXPECTED);
        };
        double value = Double.parseDouble(m.group(1)) * scale;
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("bad frequency \"" + t + "\": expected a finite value above 0 Hz");
        }
        return value;
    }

    /** @return the frequencies, Hz, ascending; f_i = start + i (stop − start) / (points − 1), last = stop */
    public double[] values() {
        double[] f = new double[points];
        for (int i = 0; i < points; i++) {
            f[i] = points == 1 ? startHz : startHz + (stopHz - startHz) * i / (points - 1);
        }
        if (points > 1) {
            f[points - 1] = stopHz;
        }
        return f;
    }

    /** @return true for a sweep of two or more points */
    public boolean isSweep() {
        return points > 1;
    }
}
