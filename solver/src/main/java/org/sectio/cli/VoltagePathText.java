package org.sectio.cli;

import org.sectio.physics.VoltagePath;

/**
 * The text of {@code --voltage-path}: {@code X1,Y1:X2,Y2}, the two ends in millimetres in the
 * coordinates of the cross-section, e.g. {@code 11.43,0:11.43,10.16}.
 */
final class VoltagePathText {

    private static final String EXPECTED = "expected X1,Y1:X2,Y2 in mm, e.g. 11.43,0:11.43,10.16";

    private VoltagePathText() {
    }

    /**
     * @param text the option's value
     * @return the path, m
     * @throws IllegalArgumentException with a one-line message naming the option and the text
     */
    static VoltagePath parse(String text) {
        String[] ends = text.strip().split(":", -1);
        if (ends.length != 2) {
            throw new IllegalArgumentException("--voltage-path " + text + ": " + EXPECTED);
        }
        double[] v = new double[4];
        for (int e = 0; e < 2; e++) {
            String[] xy = ends[e].split(",", -1);
            if (xy.length != 2) {
                throw new IllegalArgumentException("--voltage-path " + text + ": " + EXPECTED);
            }
            for (int c = 0; c < 2; c++) {
                try {
                    v[2 * e + c] = Double.parseDouble(xy[c].strip()) * 1e-3;
                } catch (NumberFormatException ex) {
                    throw new IllegalArgumentException("--voltage-path " + text + ": \"" + xy[c].strip()
                            + "\" is not a number; " + EXPECTED);
                }
            }
        }
        try {
            return new VoltagePath(v[0], v[1], v[2], v[3]);
        } catch (IllegalArgumentException ex) {
            throw new IllegalArgumentException("--voltage-path " + text + ": " + ex.getMessage());
        }
    }
}
