package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;

/**
 * Propagation of a mode in a homogeneously filled guide against the relations of Pozar, Microwave
 * Engineering, 4th ed., §3.1, each evaluated a second way, and against hand-worked WR-90 numbers.
 */
class PropagationTest {

    private static final double C = 299_792_458.0; // m/s, exact (SI definition of the metre)
    /** WR-90 TE10 cutoff c / (2a), a = 22.86 mm (Pozar §3.3). */
    private static final double FC_WR90 = C / (2 * 0.02286);

    @Test
    @DisplayName("The free-space constants match CODATA 2018: ε0 = 8.8541878128e-12 F/m and η0 = 376.730313668 Ω")
    void freeSpaceConstantsMatchCodata() {
        // CODATA 2018 recommended values (from memory): ε0 = 8.8541878128(13)e-12 F/m, Z0 = 376.730313668(57) Ω
        assertEquals(8.8541878128e-12, FreeSpace.PERMITTIVITY, 2e-21);
        assertEquals(376.730313668, FreeSpace.IMPEDANCE, 1e-8);
        // η0 = √(μ0/ε0), written differently from μ0 c
        assertEquals(Math.sqrt(FreeSpace.PERMEABILITY / FreeSpace.PERMITTIVITY), FreeSpace.IMPEDANCE, 1e-9);
    }

    @Test
    @DisplayName("β from √(k² − kc²) equals 2π/λg with λg = λ/√(1 − (fc/f)²) across a filled guide's band")
    void phaseConstantAgreesWithGuideWavelengthForm() {
        Filling teflon = Filling.dielectric(2.08);
        double fc = 9.7e9;
        for (double f = 9.8e9; f < 40e9; f *= 1.37) {
            Propagation p = new Propagation(ModeFamily.TE, fc, f, teflon);
            double lambda = C / (f * Math.sqrt(2.08)); // wavelength in the filling
            double lambdaG = lambda / Math.sqrt(1 - (fc / f) * (fc / f)); // Pozar §3.1 / §3.3
            assertEquals(2 * Math.PI / lambdaG, p.phaseConstant(), 1e-9 * p.phaseConstant(), "f = " + f);
            assertEquals(lambdaG, p.guideWavelength(), 1e-9 * lambdaG, "f = " + f);
        }
    }

    @Test
    @DisplayName("WR-90 TE10 at 10 GHz has β = 158.2 rad/m, λg = 39.7 mm and Z_TE = 499.0 Ω (hand-worked)")
    void wr90AtTenGigahertzMatchesHandWorking() {
        // k0 = 2π·1e10/c = 209.585 rad/m; kc = π/a = π/0.02286 = 137.427 rad/m;
        // β = √(209.585² − 137.427²) = √(43925.9 − 18886.2) = √25039.7 = 158.24 rad/m;
        // λg = 2π/β = 39.71 mm; Z_TE = η0 / √(1 − (6.5571/10)²) = 376.73 / 0.75500 = 498.97 Ω
        Propagation p = new Propagation(ModeFamily.TE, FC_WR90, 10e9, Filling.VACUUM);
        assertEquals(209.585, p.wavenumber(), 1e-3);
        assertEquals(137.427, p.cutoffWavenumber(), 1e-3);
        assertEquals(158.24, p.phaseConstant(), 0.01);
        assertEquals(39.71e-3, p.guideWavelength(), 0.01e-3);
        assertEquals(498.97, p.waveImpedance().getReal(), 0.01);
        assertEquals(0.0, p.waveImpedance().getImaginary(), 0.0);
    }

    @Test
    @DisplayName("The Teflon-filled K-band guide at 15 GHz has k = 453.1 and β = 345.1 rad/m as in Pozar Example 3.1")
    void pozarKBandExampleWavenumbers() {
        // Pozar §3.3 Example 3.1 (values from memory): a = 1.07 cm, εr = 2.08, f = 15 GHz, k = 453.1 m⁻¹,
        // β10 = 345.1 m⁻¹; the book rounds c to 3e8 m/s, which shifts k by 0.07 %
        Filling teflon = Filling.dielectric(2.08);
        double fc = C / (2 * 0.0107 * Math.sqrt(2.08));
        Propagation p = new Propagation(ModeFamily.TE, fc, 15e9, teflon);
        assertEquals(453.1, p.wavenumber(), 453.1 * 1e-3);
        assertEquals(345.1, p.phaseConstant(), 345.1 * 1.5e-3);
    }

    @Test
    @DisplayName("vp·vg equals v² and vg equals dω/dβ taken by a finite difference of ω(β) = v√(β² + kc²)")
    void groupVelocityIsTheSlopeOfTheDispersionCurve() {
        Filling filling = new Filling(2.2, 1.3, 0);
        double v = C / Math.sqrt(2.2 * 1.3);
        double fc = 5e9;
        Propagation p = new Propagation(ModeFamily.TM, fc, 7.5e9, filling);
        assertEquals(v * v, p.phaseVelocity() * p.groupVelocity(), 1e-9 * v * v);
        double kc = 2 * Math.PI * fc / v;
        double beta = p.phaseConstant();
        double h = beta * 1e-5;
        double slope = (v * Math.sqrt((beta + h) * (beta + h) + kc * kc) - v * Math.sqrt((beta - h) * (beta - h) + kc * kc))
                / (2 * h);
        assertEquals(slope, p.groupVelocity(), 1e-7 * slope);
        assertTrue(p.phaseVelocity() > v && p.groupVelocity() < v, "vp > v > vg in a hollow guide (Pozar §3.10)");
    }

    @Test
    @DisplayName("Z_TE = η/√(1 − (fc/f)²), Z_TM = η√(1 − (fc/f)²) and Z_TEM = η for a magnetic dielectric")
    void waveImpedancesMatchTheCutoffRatioForms() {
        Filling filling = new Filling(4.0, 2.0, 0);
        double eta = 376.730313668 * Math.sqrt(2.0 / 4.0);
        double fc = 3e9;
        double f = 4e9;
        double s = Math.sqrt(1 - (fc / f) * (fc / f));
        assertEquals(eta / s, new Propagation(ModeFamily.TE, fc, f, filling).waveImpedance().getReal(), 1e-9 * eta);
        assertEquals(eta * s, new Propagation(ModeFamily.TM, fc, f, filling).waveImpedance().getReal(), 1e-9 * eta);
        Propagation tem = new Propagation(ModeFamily.TEM, 0, f, filling);
        assertEquals(eta, tem.waveImpedance().getReal(), 1e-9 * eta);
        assertTrue(tem.propagating());
        assertEquals(tem.wavenumber(), tem.phaseConstant(), 0.0);
    }

    @Test
    @DisplayName("Below cutoff WR-90 TE10 at 5 GHz decays at α = 88.9 Np/m and its TE impedance is inductive, TM capacitive")
    void evanescentModeDecaysWithReactiveImpedance() {
        // k0 = 2π·5e9/c = 104.79 rad/m; α = √(137.427² − 104.79²) = √(18886.2 − 10981.5) = √7904.7 = 88.91 Np/m
        Propagation p = new Propagation(ModeFamily.TE, FC_WR90, 5e9, Filling.VACUUM);
        assertFalse(p.propagating());
        assertEquals(88.91, p.attenuationConstant(), 0.01);
        assertEquals(0.0, p.phaseConstant(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, p.guideWavelength());
        assertEquals(0.0, p.groupVelocity(), 0.0);
        // jωμ0/α: 2π·5e9·1.25664e-6 / 88.91 = 39478.4/88.91 = 444.0 Ω, inductive (Pozar §3.1)
        Complex zTe = p.waveImpedance();
        assertEquals(0.0, zTe.getReal(), 0.0);
        assertEquals(444.0, zTe.getImaginary(), 0.2);
        Complex zTm = new Propagation(ModeFamily.TM, FC_WR90, 5e9, Filling.VACUUM).waveImpedance();
        assertTrue(zTm.getImaginary() < 0, "TM below cutoff is capacitive, got " + zTm);
        // −jα/(ωε0) = −j 88.91 / (2π·5e9·8.8542e-12) = −j 319.6 Ω
        assertEquals(-319.6, zTm.getImaginary(), 0.2);
    }

    @Test
    @DisplayName("Exactly at cutoff nothing propagates or decays: β = α = 0, λg and Z_TE infinite, Z_TM zero")
    void exactlyAtCutoff() {
        // Pozar §3.1: at f = fc, β = 0, so λg = 2π/β and Z_TE = ωμ/β grow without bound and Z_TM = β/(ωε) vanishes
        Propagation te = new Propagation(ModeFamily.TE, 10e9, 10e9, Filling.VACUUM);
        assertFalse(te.propagating());
        assertEquals(0.0, te.phaseConstant(), 0.0);
        assertEquals(0.0, te.attenuationConstant(), 0.0);
        assertEquals(Double.POSITIVE_INFINITY, te.guideWavelength());
        assertEquals(Double.POSITIVE_INFINITY, te.waveImpedance().getImaginary());
        assertEquals(0.0, new Propagation(ModeFamily.TM, 10e9, 10e9, Filling.VACUUM).waveImpedance().abs(), 0.0);
    }

    @Test
    @DisplayName("A computed mode's cutoff frequency feeds the propagation directly")
    void propagationOfAComputedMode() {
        Mode te10 = new Mode(ModeFamily.TE, 1, 137.427, FC_WR90, 1e-13, Double.NaN, null);
        Propagation p = Propagation.of(te10, 10e9, Filling.VACUUM);
        assertEquals(new Propagation(ModeFamily.TE, FC_WR90, 10e9, Filling.VACUUM), p);
    }

    @Test
    @DisplayName("A negative frequency, a TE mode with zero cutoff and a TEM mode with a cutoff are refused with the value")
    void invalidInputsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Propagation(ModeFamily.TE, 1e9, -2e9, Filling.VACUUM));
        assertTrue(e.getMessage().contains("-2.0E9"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Propagation(ModeFamily.TE, 0, 1e9, Filling.VACUUM));
        assertThrows(IllegalArgumentException.class, () -> new Propagation(ModeFamily.TEM, 1e9, 2e9, Filling.VACUUM));
        IllegalArgumentException f = assertThrows(IllegalArgumentException.class, () -> Filling.dielectric(0.5));
        assertTrue(f.getMessage().contains("0.5"), f.getMessage());
    }
}
