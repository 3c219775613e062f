package org.sectio.modes;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The three-grid estimate on sequences whose error is known exactly: q(h) = q + C h^p gives an
 * estimate of exactly twice the true error when p is 1 or 2 (Richardson extrapolation, e.g. Roache,
 * Verification and Validation in Computational Science and Engineering, 1998, ch. 5).
 */
class RichardsonEstimateTest {

    private static final double Q = 406.685;

    private static double value(double h, double order, double c) {
        return Q + c * Math.pow(h, order);
    }

    @Test
    void aSecondOrderSequenceIsEstimatedAtTwiceItsError() {
        double fine = value(0.01, 2, 3.0);
        double estimate = RichardsonEstimate.relativeError(fine, value(0.02, 2, 3.0), value(0.04, 2, 3.0), 2.0);
        assertEquals(2 * Math.abs(fine - Q) / fine, estimate, 1e-9 * estimate);
    }

    @Test
    void aFirstOrderSequenceIsEstimatedAtTwiceItsErrorNotAThirdOfThat() {
        double fine = value(0.01, 1, -0.5);
        double estimate = RichardsonEstimate.relativeError(fine, value(0.02, 1, -0.5), value(0.04, 1, -0.5), 2.0);
        assertEquals(2 * Math.abs(fine - Q) / fine, estimate, 1e-9 * estimate);
    }

    @Test
    void anOrderAboveTheSchemesIsNotCredited() {
        double fine = value(0.01, 3, 7.0);
        double coarse = value(0.02, 3, 7.0);
        double estimate = RichardsonEstimate.relativeError(fine, coarse, value(0.04, 3, 7.0), 2.0);
        assertEquals(2 * Math.abs(fine - coarse) / (3 * fine), estimate, 1e-12 * estimate);
    }

    @Test
    void stepsOfOppositeSignAreTreatedAsFirstOrder() {
        double estimate = RichardsonEstimate.relativeError(Q + 1e-3, Q - 1e-3, Q + 5e-3, 2.0);
        assertEquals(2 * 2e-3 / (Q + 1e-3), estimate, 1e-15);
    }

    @Test
    void withoutTheCoarsestGridTheSchemesOrderIsUsed() {
        assertEquals(2 * 3e-3 / (3 * Q), RichardsonEstimate.relativeError(Q, Q - 3e-3, Double.NaN, 2.0), 1e-15);
        assertEquals(2 * 3e-3 / Q, RichardsonEstimate.relativeError(Q, Q - 3e-3, Double.NaN, 1.0), 1e-15);
    }

    @Test
    void aFirstOrderSchemeIsNeverCreditedMore() {
        double fine = value(0.01, 2, 3.0);
        double coarse = value(0.02, 2, 3.0);
        assertEquals(2 * Math.abs(fine - coarse) / fine,
                RichardsonEstimate.relativeError(fine, coarse, value(0.04, 2, 3.0), 1.0), 1e-15);
    }
}
