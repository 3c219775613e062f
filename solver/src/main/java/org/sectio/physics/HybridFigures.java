package org.sectio.physics;

import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.modes.HybridField;
import org.sectio.modes.HybridMode;

/**
 * The engineering figures of a hybrid mode of a partially filled guide at one frequency, from the
 * full-vector solve (no matrices here: the mode carries β, its field scaled to 1 W, its power and
 * stored energy; the wall and path values are rebuilt from that field by {@link HybridFieldFits}).
 *
 * <p>Above cutoff: β′ from the eigenvalue, λg = 2π/β′, vp = ω/β′, vg = P/W (the energy velocity, equal
 * to the group velocity of a lossless guide: Collin, Field Theory of Guided Waves, ch. 5, energy
 * relations, from memory), α_d = −Im β from the complex eigenvalue of a lossy filling (0 for lossless
 * materials), the peak |E| at 1 W and the breakdown and rated powers of {@link Breakdown}.
 *
 * <p>Wall loss by the perturbation (power-loss) method (Pozar, Microwave Engineering, 4th ed., §2.7
 * and §3.3): α_c = P_wall / (2P), P_wall = (Rs/2) ∮ |H_tan|² dℓ over every wall, outer and inner, with
 * H_tan = Hz ẑ + (t̂·H_t) t̂ of the hybrid field on the exact walls and Rs of {@link Conductor} with the
 * roughness factor; P = ½ Re ∫ (E × H*)·ẑ dA of the discrete field. So α_c = Rs ∮ |H_tan|² dℓ / (4P).
 * The total attenuation of the mode is α_c + α_d.
 *
 * <p>Impedances along the {@link VoltagePath} of the settings (default {@link VoltagePath#automatic}),
 * as for the scalar modes ({@link ModeAnalysis}): V = −∫ E_t · dℓ, I the longitudinal current of the
 * wall the path ends on that flows the same way as at the end ({@link PathVoltageAndCurrent}),
 * Z_PV = |V|²/(2P), Z_PI = 2P/|I|², Z_VI = V/I. With a lossy material V and J_z are complex with a
 * common phase only to first order in the loss; the field is turned so that V is real and the current
 * is taken from Re J_z of the turned field. An E-like mode (Ez dominates the longitudinal field) has a
 * small path voltage (none at all for a pure TM mode, whose E_t is a gradient of Ez), so for it
 * power–current is reported, as for scalar TM modes; all three are given.
 *
 * <p>Not defined for a hybrid mode, and NaN with the reason: the wave impedance (E_t/H_t varies over
 * the section). Below cutoff: α only.
 */
public final class HybridFigures {

    private HybridFigures() {
    }

    /**
     * @param section the cross-section the mode was solved on (its walls and materials)
     * @param mode the hybrid mode at this frequency
     * @param label the row's mode label
     * @param frequencyHz f, finite and &gt; 0, Hz
     * @param cutoffHz the mode's cutoff from the scalar solve, Hz
     * @param settings wall metal and roughness (Rs), breakdown, impedance definition, voltage path
     * @return the figures; NaN where not available, with the reason in {@link ModeAtFrequency#limitation()}
     * @throws IllegalArgumentException if f is out of range or the settings' voltage path leaves the guide
     *     (with no path given and no automatic one to draw, the impedances are NaN with the reason)
     */
    public static ModeAtFrequency at(CrossSection section, HybridMode mode, String label, double frequencyHz,
                                     double cutoffHz, AnalysisSettings settings) {
        double nan = Double.NaN;
        double skin = settings.conductor().skinDepth(frequencyHz);
        double rs = settings.conductor().surfaceResistance(frequencyHz, settings.rmsRoughnessMetres());
        if (!mode.propagating()) {
            return new ModeAtFrequency(label, frequencyHz, cutoffHz, false, 0, mode.attenuation(),
                    Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 0, nan, nan, nan, nan, nan, skin, rs, nan, nan,
                    nan, nan, nan, nan, nan, nan, settings.definition(), nan,
                    "below cutoff (hybrid solve): the mode carries no power");
        }
        double omega = 2 * Math.PI * frequencyHz;
        double beta = mode.phaseConstant();
        HybridField field = mode.field();
        double power = field.powerWatts();
        double vg = power / field.storedEnergyJoulesPerMetre();
        double alphaD = mode.attenuation();
        double peak = field.peakElectricField() / Math.sqrt(power);
        Breakdown bd = settings.breakdown();
        boolean eLike = mode.longitudinalMagneticShare() < 0.5;
        ImpedanceDefinition chosen = eLike ? ImpedanceDefinition.POWER_CURRENT : settings.definition();
        VoltagePath path = settings.path();
        String noPath = null;
        if (path == null) {
            try {
                path = VoltagePath.automatic(section);
            } catch (IllegalArgumentException e) {
                noPath = e.getMessage();
            }
        }
        String head = "hybrid mode (full-vector solve): no wave impedance (E_t/H_t varies over the section); ";
        double alphaC = nan;
        double zpv = nan;
        double zpi = nan;
        double zvi = nan;
        String note = head + "wall loss from the wall H; impedances not computed: ";
        HybridFieldFits fits = HybridFieldFits.of(section, field);
        HybridFieldFits.Wall wall = null;
        try {
            wall = fits.wall();
            alphaC = rs * wall.tangentialSquared() / (4 * power);
        } catch (IllegalStateException coarse) {
            note = head + "wall loss and impedances not computed: " + coarse.getMessage();
        }
        if (wall != null && path == null) {
            note += noPath;
        } else if (wall != null) {
            try {
                double[] z = impedances(fits, wall, path, power);
                zpv = z[0];
                zpi = z[1];
                zvi = z[2];
                note = head + String.format(Locale.ROOT, "wall loss from the wall H, impedances along the voltage"
                        + " path (%.4g, %.4g)–(%.4g, %.4g) mm%s", path.x1() * 1e3, path.y1() * 1e3, path.x2() * 1e3,
                        path.y2() * 1e3, eLike ? "; E-like: power-current impedance reported" : "");
            } catch (IllegalStateException coarse) {
                note += coarse.getMessage();
            }
        }
        double z = switch (chosen) {
            case POWER_VOLTAGE -> zpv;
            case POWER_CURRENT -> zpi;
            case VOLTAGE_CURRENT -> zvi;
        };
        return new ModeAtFrequency(label, frequencyHz, cutoffHz, true, beta, 0, 2 * Math.PI / beta, omega / beta, vg,
                nan, alphaC, Neper.toDecibels(alphaC), alphaD, Neper.toDecibels(alphaD), skin, rs, peak, field.peakX(),
                field.peakY(), bd.maximumPower(1.0, peak), bd.ratedPower(1.0, peak), zpv, zpi, zvi, chosen, z, note);
    }

    /** {Z_PV, Z_PI, Z_VI} along the path, the field turned so that V is real (see the type description). */
    private static double[] impedances(HybridFieldFits fits, HybridFieldFits.Wall wall, VoltagePath path,
                                       double power) {
        double[] v = fits.voltage(path);
        double phase = Math.hypot(v[0], v[1]) > 0 ? Math.atan2(v[1], v[0]) : strongestPhase(wall);
        double cos = Math.cos(phase);
        double sin = Math.sin(phase);
        double[] density = new double[wall.currentReal().length];
        for (int p = 0; p < density.length; p++) {
            density[p] = wall.currentReal()[p] * cos + wall.currentImaginary()[p] * sin;
        }
        double current = PathVoltageAndCurrent.wallCurrent(wall.points(), density, path);
        double voltage = v[0] * cos + v[1] * sin;
        return new double[] {voltage * voltage / (2 * power), 2 * power / (current * current), voltage / current};
    }

    /** The phase of J_z where |J_z| is largest (0 if the wall carries no longitudinal current). */
    private static double strongestPhase(HybridFieldFits.Wall wall) {
        double best = 0;
        double phase = 0;
        for (int p = 0; p < wall.currentReal().length; p++) {
            double m = Math.hypot(wall.currentReal()[p], wall.currentImaginary()[p]);
            if (m > best) {
                best = m;
                phase = Math.atan2(wall.currentImaginary()[p], wall.currentReal()[p]);
            }
        }
        return phase;
    }
}
