package org.sectio.io;

import java.util.List;
import org.sectio.modes.FieldMap;
import org.sectio.modes.GridSummary;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.SolveTiming;

/** Hand-built results for writer tests: the first modes of a 22.86 × 10.16 mm rectangle. */
final class SampleModes {

    static final double LIGHT_SPEED = 299_792_458.0;

    private SampleModes() {
    }

    /** A 3 × 2 field: the middle of the top row lies outside the guide. */
    static FieldMap smallField() {
        return new FieldMap(new double[] {0.0, 0.005, 0.01}, new double[] {0.0, 0.002},
                new double[] {0.25, -1.0, 0.5, 1.0, Double.NaN, -0.125});
    }

    static Mode mode(ModeFamily family, int index, double kc, double error) {
        return new Mode(family, index, kc, LIGHT_SPEED * kc / (2 * Math.PI), 3.5e-13, error, smallField());
    }

    /** Three modes given out of order; TE 2 has no error estimate. */
    static ModeSet rectangleModes() {
        double a = 0.02286;
        double b = 0.01016;
        return new ModeSet("rectangle 22.86 × 10.16 mm", List.of(
                mode(ModeFamily.TE, 2, 2 * Math.PI / a, Double.NaN),
                mode(ModeFamily.TE, 1, Math.PI / a, 2.5e-6),
                mode(ModeFamily.TM, 1, Math.hypot(Math.PI / a, Math.PI / b), 1.25e-5)),
                new GridSummary(200, 89, 1.143e-4, 1.1416e-4, 17_890, 17_402),
                new SolveTiming(0.125, 0.5, 0.75, 1.5));
    }
}
