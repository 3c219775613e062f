package org.sectio.physics;

import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.Material;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;

/**
 * Field-based engineering figures of a computed mode at a frequency: conductor and dielectric loss,
 * transmitted power, peak field and breakdown power, characteristic impedances.
 *
 * <p>Fields (Pozar, Microwave Engineering, 4th ed., §3.1, eqs. (3.19)–(3.23) for TE and TM in terms of
 * Hz and Ez, numbers from memory; phasors e^{jωt − jβz}, power P = ½ Re ∫ E_t × H_t* · ẑ dA): with ψ the
 * computed potential and kc² = k² − β² the cutoff wavenumber in the filling,
 * <ul>
 * <li>TE: H_t = −(jβ/kc²) ∇_t Hz, E_t = Z_TE H_t × ẑ, Z_TE = ωμ/β; P = ½ Z_TE (β/kc)² ∫ Hz² dA;</li>
 * <li>TM: E_t = −(jβ/kc²) ∇_t Ez, H_t = ẑ × E_t / Z_TM, Z_TM = β/(ωε); P = ½ β²/(Z_TM kc²) ∫ Ez² dA;</li>
 * <li>TEM: E_t = −∇_t φ, H_t = ẑ × E_t / η; P = (1/2η) ∫ |∇φ|² dA;</li>
 * </ul>
 * the TE and TM powers by Green's identity ∫ |∇ψ|² = kc² ∫ ψ² (see {@code ModeFieldIntegrals}).
 *
 * <p>Conductor loss by the perturbation method (Pozar §2.7 and §3.3): α_c = P_wall / (2P),
 * P_wall = (Rs/2) ∮ |H_tan|² dℓ over every wall, outer and inner, with |H_tan|² = Hz² + (β/kc²)² (∂Hz/∂t)²
 * for TE, (ωε/kc²)² (∂Ez/∂n)² for TM and (∂φ/∂n / η)² for TEM, and Rs of {@link Conductor} times the
 * roughness factor. Wall values come from the exact walls by the fits of {@code PotentialSamples}
 * (second order, measured in the tests). Dielectric loss by the same method:
 * α_d = (ω / 4P) ∫ ε0 εr tanδ |E|² dA with |E|² = |E_t|² + |E_z|², which for a homogeneous filling is
 * k² tanδ / (2β) (Pozar §3.1).
 *
 * <p>Peak field: the largest |E_t| over the samples and the wall points, refined within one grid step,
 * scaled to 1 W. At a sharp metal edge (the corner of an unrounded ridge) the true field is unbounded
 * (∝ r^(−1/3) at a 270° edge), so the reported peak there is the value at the grid's scale and grows as
 * the grid is refined; a rounded edge converges. Breakdown power P_bd = 1 W (E_bd / E_peak(1 W))²
 * ({@link Breakdown}); the rated power divides it by the derating squared.
 *
 * <p>Impedances: V along the {@link VoltagePath} (default {@link VoltagePath#automatic}), I the
 * longitudinal current of the wall the path ends on ({@code PathVoltageAndCurrent}); Z_PV = |V|²/(2P),
 * Z_PI = 2P/|I|², Z_VI = V/I. Power–voltage is printed by default, the common practice for matching
 * rectangular and ridged guides. A TM mode's E_t is a gradient of Ez, which vanishes on every wall, so
 * its wall-to-wall voltage is zero: Z_PV and Z_VI are NaN and power–current is reported.
 *
 * <p>Only a homogeneously filled guide is analysed: with dielectric regions of another material the
 * modes above cutoff are hybrid and their β needs a solver at frequency, which this is not; the cutoff
 * is still given and every other figure is NaN. Below cutoff a mode carries no power: β = 0, α is given,
 * and the power, loss, peak-field and impedance figures are NaN.
 */
public final class ModeAnalysis {

    private final CrossSection section;
    private final Mode mode;
    private final Filling filling;
    private final String fillingLimitation;
    private final PotentialSamples samples;
    private final ModeFieldIntegrals integrals;

    private ModeAnalysis(CrossSection section, Mode mode) {
        this.section = section;
        this.mode = mode;
        Material fill = section.filling();
        boolean homogeneous = true;
        for (Dielectric d : section.dielectrics()) {
            homogeneous &= d.material().equals(fill);
        }
        if (!homogeneous) {
            filling = null;
            fillingLimitation = "partly filled guide: beta, loss, power and impedances need a solve at frequency"
                    + " (hybrid modes); only the cutoff is given";
        } else if (!(fill.lossTangent() < 1)) {
            throw new IllegalArgumentException("filling of " + section.name() + ": loss tangent must be < 1 for the"
                    + " low-loss relations, got " + fill.lossTangent());
        } else {
            filling = new Filling(fill.relativePermittivity(), fill.relativePermeability(), fill.lossTangent());
            fillingLimitation = "";
        }
        this.samples = filling == null ? null : new PotentialSamples(section, mode);
        this.integrals = filling == null ? null : ModeFieldIntegrals.of(section, mode, samples);
    }

    /**
     * Rebuilds the mode's wall fields and peak once, for evaluation at many frequencies.
     *
     * @param section the cross-section the mode was solved on
     * @param mode a mode from {@code ModeSolver} on that cross-section
     * @return the prepared analysis
     * @throws IllegalArgumentException if an argument is missing, the field map has no weights, or the
     *     filling's loss tangent is ≥ 1
     * @throws IllegalStateException if the grid is too coarse to rebuild the field near some wall point
     */
    public static ModeAnalysis prepare(CrossSection section, Mode mode) {
        if (section == null || mode == null) {
            throw new IllegalArgumentException("mode analysis needs a cross-section and a mode");
        }
        return new ModeAnalysis(section, mode);
    }

    /**
     * {@code prepare(section, mode).at(frequencyHz, settings)}.
     *
     * @param section the cross-section
     * @param mode the mode
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @param settings conductor, roughness, breakdown, impedance definition, voltage path
     * @return the figures
     * @throws IllegalArgumentException if a value is out of range or the voltage path leaves the guide
     */
    public static ModeAtFrequency at(CrossSection section, Mode mode, double frequencyHz, AnalysisSettings settings) {
        return prepare(section, mode).at(frequencyHz, settings);
    }

    /**
     * The figures of the prepared mode at one frequency (see the type description).
     *
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @param settings conductor, roughness, breakdown, impedance definition, voltage path
     * @return the figures; NaN where not available, with the reason in {@link ModeAtFrequency#limitation()}
     * @throws IllegalArgumentException if f is out of range, settings are missing or the path leaves the guide
     */
    public ModeAtFrequency at(double frequencyHz, AnalysisSettings settings) {
        if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz) || settings == null) {
            throw new IllegalArgumentException("mode analysis needs a finite frequency > 0 Hz and settings, got "
                    + frequencyHz + " Hz, " + settings);
        }
        Conductor metal = settings.conductor();
        double rs = metal.surfaceResistance(frequencyHz, settings.rmsRoughnessMetres());
        double skin = metal.skinDepth(frequencyHz);
        double fc = mode.cutoffFrequencyHz();
        ModeFamily family = mode.family();
        if (filling == null) {
            return unavailable(frequencyHz, frequencyHz > fc || family == ModeFamily.TEM, Double.NaN, skin, rs,
                    settings, fillingLimitation);
        }
        Propagation p = new Propagation(family, family == ModeFamily.TEM ? 0 : fc, frequencyHz, filling);
        if (!p.propagating()) {
            return unavailable(frequencyHz, false, p.attenuationConstant(), skin, rs, settings,
                    "below cutoff: the mode carries no power, so loss, peak field and impedances are not defined");
        }
        double omega = p.angularFrequency();
        double beta = p.phaseConstant();
        double kc2 = p.cutoffWavenumber() * p.cutoffWavenumber();
        double eta = filling.intrinsicImpedance();
        double eps = filling.permittivity();
        double zw = p.waveImpedance().getReal();
        double s = integrals.massNorm();
        // power, wall loss, ∫|E|² dA, |E_t| per |∇ψ|, and the voltage and current factors, per family
        double power;
        double wall;
        double fieldEnergy;
        double fieldPerGradient;
        double voltageFactor;
        double currentFactor;
        switch (family) {
            case TE -> {
                double hPerGradient = beta / kc2;
                power = 0.5 * zw * hPerGradient * hPerGradient * kc2 * s;
                wall = integrals.wallValueSquared() + hPerGradient * hPerGradient * integrals.wallTangentialSquared();
                fieldEnergy = zw * zw * hPerGradient * hPerGradient * kc2 * s;
                fieldPerGradient = zw * hPerGradient;
                voltageFactor = -zw * hPerGradient;
                currentFactor = hPerGradient;
            }
            case TM -> {
                double ePerGradient = beta / kc2;
                power = 0.5 * ePerGradient * ePerGradient * kc2 * s / zw;
                double hPerNormal = omega * eps / kc2;
                wall = hPerNormal * hPerNormal * integrals.wallNormalSquared();
                fieldEnergy = (ePerGradient * ePerGradient * kc2 + 1) * s;
                fieldPerGradient = ePerGradient;
                voltageFactor = -ePerGradient;
                currentFactor = ePerGradient / zw;
            }
            default -> {
                power = integrals.gradientEnergy() / (2 * eta);
                wall = integrals.wallNormalSquared() / (eta * eta);
                fieldEnergy = integrals.gradientEnergy();
                fieldPerGradient = 1;
                voltageFactor = 1;
                currentFactor = 1 / eta;
            }
        }
        double alphaC = 0.5 * rs * wall / (2 * power);
        double alphaD = omega * eps * filling.lossTangent() * fieldEnergy / (4 * power);
        double peak = fieldPerGradient * integrals.peakGradient() / Math.sqrt(power);
        Breakdown bd = settings.breakdown();
        VoltagePath path = settings.path() != null ? settings.path() : VoltagePath.automatic(section);
        PathVoltageAndCurrent vi = PathVoltageAndCurrent.of(section, samples, integrals, path);
        double v = voltageFactor * vi.voltage();
        double i = currentFactor * vi.current();
        boolean tm = family == ModeFamily.TM;
        double zpv = tm ? Double.NaN : v * v / (2 * power);
        double zpi = 2 * power / (i * i);
        double zvi = tm ? Double.NaN : v / i;
        ImpedanceDefinition chosen = tm ? ImpedanceDefinition.POWER_CURRENT : settings.definition();
        double z = switch (chosen) {
            case POWER_VOLTAGE -> zpv;
            case POWER_CURRENT -> zpi;
            case VOLTAGE_CURRENT -> zvi;
        };
        return new ModeAtFrequency(mode.label(), frequencyHz, fc, true, beta, 0, p.guideWavelength(),
                p.phaseVelocity(), p.groupVelocity(), zw, alphaC, Neper.toDecibels(alphaC), alphaD,
                Neper.toDecibels(alphaD), skin, rs, peak, integrals.peakX(), integrals.peakY(),
                bd.maximumPower(1.0, peak), bd.ratedPower(1.0, peak), zpv, zpi, zvi, chosen, z,
                tm ? "TM: the wall-to-wall voltage is zero (Ez = 0 on the walls); power-current impedance reported" : "");
    }

    private ModeAtFrequency unavailable(double f, boolean propagating, double alpha, double skin, double rs,
                                        AnalysisSettings settings, String why) {
        double nan = Double.NaN;
        boolean known = !Double.isNaN(alpha);
        return new ModeAtFrequency(mode.label(), f, mode.cutoffFrequencyHz(), propagating, known ? 0 : nan,
                alpha, known ? Double.POSITIVE_INFINITY : nan, known ? Double.POSITIVE_INFINITY : nan, known ? 0 : nan,
                nan, nan, nan, nan, nan, skin, rs, nan, nan, nan, nan, nan, nan, nan, nan, settings.definition(), nan,
                String.format(Locale.ROOT, "%s", why));
    }
}
