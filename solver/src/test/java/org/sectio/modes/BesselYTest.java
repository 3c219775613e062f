package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The test-side Y0 and Y1 series against Abramowitz &amp; Stegun, Handbook of Mathematical Functions,
 * Table 9.1 (values quoted from memory, ten figures).
 */
class BesselYTest {

    @Test
    void seriesMatchTheTabulatedValues() {
        // A&S Table 9.1 (from memory): Y0(1), Y1(1), Y0(5), Y1(5), Y0(10), Y1(10)
        assertEquals(0.0882569642, BesselY.y0(1.0), 1e-10);
        assertEquals(-0.7812128213, BesselY.y1(1.0), 1e-10);
        assertEquals(-0.3085176252, BesselY.y0(5.0), 1e-10);
        assertEquals(0.1478631434, BesselY.y1(5.0), 1e-10);
        assertEquals(0.0556711673, BesselY.y0(10.0), 1e-10);
        assertEquals(0.2490154242, BesselY.y1(10.0), 1e-10);
    }

    @Test
    void theWronskianHolds() {
        // A&S 9.1.16: J1(x) Y0(x) − J0(x) Y1(x) = 2 / (π x)
        for (double x : new double[] {0.3, 2.7, 8.1, 11.9}) {
            double w = org.apache.commons.math3.special.BesselJ.value(1, x) * BesselY.y0(x)
                    - org.apache.commons.math3.special.BesselJ.value(0, x) * BesselY.y1(x);
            assertEquals(2 / (Math.PI * x), w, 1e-11);
        }
    }
}
