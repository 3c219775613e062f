package org.sectio.geometry.family;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.StringJoiner;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The EIA standard rectangular waveguide sizes WR-10 to WR-2300, largest first, with inner dimensions
 * and recommended bands.
 *
 * <p>Source: the inner dimensions of EIA RS-261-B (the WR designations; the same guides are the R
 * sizes of IEC 60153-2). <b>Every value below is from memory</b>, not copied from a copy of either
 * standard: the inner dimensions in inches as commonly tabulated, and the recommended bands as
 * commonly quoted (about 1.25 to 1.9 times the TE10 cutoff c / 2a). Check a size against the standard
 * before relying on its last digit.
 */
public final class StandardSizes {

    // designation, a (in), b (in), band (GHz) — all from memory, see the class comment
    private static final List<StandardSize> ALL = List.of(
            size("WR-2300", 23.000, 11.500, 0.32, 0.49),
            size("WR-2100", 21.000, 10.500, 0.35, 0.53),
            size("WR-1800", 18.000, 9.000, 0.41, 0.62),
            size("WR-1500", 15.000, 7.500, 0.49, 0.75),
            size("WR-1150", 11.500, 5.750, 0.64, 0.96),
            size("WR-975", 9.750, 4.875, 0.75, 1.12),
            size("WR-770", 7.700, 3.850, 0.96, 1.45),
            size("WR-650", 6.500, 3.250, 1.12, 1.70),
            size("WR-510", 5.100, 2.550, 1.45, 2.20),
            size("WR-430", 4.300, 2.150, 1.70, 2.60),
            size("WR-340", 3.400, 1.700, 2.20, 3.30),
            size("WR-284", 2.840, 1.340, 2.60, 3.95),
            size("WR-229", 2.290, 1.145, 3.30, 4.90),
            size("WR-187", 1.872, 0.872, 3.95, 5.85),
            size("WR-159", 1.590, 0.795, 4.90, 7.05),
            size("WR-137", 1.372, 0.622, 5.85, 8.20),
            size("WR-112", 1.122, 0.497, 7.05, 10.00),
            size("WR-90", 0.900, 0.400, 8.20, 12.40),
            size("WR-75", 0.750, 0.375, 10.00, 15.00),
            size("WR-62", 0.622, 0.311, 12.40, 18.00),
            size("WR-51", 0.510, 0.255, 15.00, 22.00),
            size("WR-42", 0.420, 0.170, 18.00, 26.50),
            size("WR-34", 0.340, 0.170, 22.00, 33.00),
            size("WR-28", 0.280, 0.140, 26.50, 40.00),
            size("WR-22", 0.224, 0.112, 33.00, 50.00),
            size("WR-19", 0.188, 0.094, 40.00, 60.00),
            size("WR-15", 0.148, 0.074, 50.00, 75.00),
            size("WR-12", 0.122, 0.061, 60.00, 90.00),
            size("WR-10", 0.100, 0.050, 75.00, 110.00));

    private static final Pattern WR_NUMBER = Pattern.compile("WR(\\d+)");

    private StandardSizes() {
    }

    private static StandardSize size(String designation, double aInches, double bInches, double lowGhz, double highGhz) {
        return new StandardSize(designation, aInches, bInches, hertz(lowGhz), hertz(highGhz));
    }

    /** @return {@code ghz} in hertz, rounded to the kilohertz so that 8.2 GHz is exactly 8.2e9 Hz */
    private static double hertz(double ghz) {
        return Math.round(ghz * 1e6) * 1e3;
    }

    /** @return every size in the table, largest first */
    public static List<StandardSize> all() {
        return ALL;
    }

    /**
     * @param name a designation such as "WR-90", "wr90", "WR90" or "WR 90" (case, spaces, hyphens and
     *     underscores are ignored)
     * @return the size of that designation
     * @throws IllegalArgumentException listing the nearest designations (by WR number) if the name is in
     *     the WR form but not in the table, or every designation otherwise
     */
    public static StandardSize byName(String name) {
        String wanted = normalized(name);
        for (StandardSize s : ALL) {
            if (normalized(s.designation()).equals(wanted)) {
                return s;
            }
        }
        Matcher m = WR_NUMBER.matcher(wanted);
        if (m.matches() && Integer.parseInt(m.group(1)) > 0) {
            double number = Double.parseDouble(m.group(1));
            List<StandardSize> nearest = new ArrayList<>(ALL);
            nearest.sort(Comparator.comparingDouble(s -> Math.abs(Math.log(wrNumber(s) / number))));
            throw new IllegalArgumentException("unknown standard rectangular size '" + name + "'; nearest: "
                    + designations(nearest.subList(0, 3)));
        }
        throw new IllegalArgumentException("unknown standard rectangular size '" + name
                + "'; expected a designation such as WR-90, one of: " + designations(ALL));
    }

    /** @return the number of a designation, e.g. 90 for "WR-90" */
    static double wrNumber(StandardSize size) {
        Matcher m = WR_NUMBER.matcher(normalized(size.designation()));
        if (!m.matches()) {
            throw new IllegalStateException("not a WR designation: " + size.designation());
        }
        return Double.parseDouble(m.group(1));
    }

    private static String normalized(String name) {
        return name == null ? "" : name.toUpperCase(Locale.ROOT).replaceAll("[\\s_-]", "");
    }

    private static String designations(List<StandardSize> sizes) {
        StringJoiner joiner = new StringJoiner(", ");
        sizes.forEach(s -> joiner.add(s.designation()));
        return joiner.toString();
    }
}
