package org.sectio.batch.tolerance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sectio.batch.size.GuidePoint;
import org.sectio.modes.Mode;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAnalysis;
import org.sectio.physics.ModeAtFrequency;

/**
 * The quantities a tolerance study follows, fixed from the nominal guide: the cutoff of each of its
 * first modes (by family and index, "TE 1", so that a mode keeps its name when a perturbation reorders
 * families), the single-mode band edges fc1 and fc2, and, at each frequency asked for, the wall loss
 * α_c and the characteristic impedance of the dominant mode. Values in SI units (Hz, Np/m, Ω).
 *
 * @param modeLabels the followed modes, e.g. "TE 1", "TM 1"
 * @param frequenciesHz where α_c and the impedance are taken (may be empty)
 * @param analysis conductor and impedance definition for those
 */
public record QuantityPlan(List<String> modeLabels, double[] frequenciesHz, AnalysisSettings analysis) {

    /** What a quantity is. */
    public enum Kind {
        /** A mode's cutoff frequency, Hz. */
        CUTOFF,
        /** The dominant mode's cutoff fc1, Hz. */
        BAND_LOW,
        /** The first higher mode's cutoff fc2, Hz. */
        BAND_HIGH,
        /** The dominant mode's wall loss α_c, Np/m. */
        WALL_LOSS,
        /** The dominant mode's characteristic impedance, Ω. */
        IMPEDANCE
    }

    /**
     * One followed quantity.
     *
     * @param name e.g. "fc TE 1", "alpha_c @ 10 GHz"
     * @param kind what it is
     * @param modeLabel the mode (CUTOFF), else ""
     * @param frequencyHz where (WALL_LOSS, IMPEDANCE), else NaN
     */
    public record Quantity(String name, Kind kind, String modeLabel, double frequencyHz) {
        /** @return the value in printing units per SI unit (GHz, dB/m, Ω) */
        public double printScale() {
            return switch (kind) {
                case CUTOFF, BAND_LOW, BAND_HIGH -> 1e-9;
                case WALL_LOSS -> 20 / Math.log(10);
                case IMPEDANCE -> 1;
            };
        }

        /** @return the printing unit */
        public String printUnit() {
            return switch (kind) {
                case CUTOFF, BAND_LOW, BAND_HIGH -> "GHz";
                case WALL_LOSS -> "dB/m";
                case IMPEDANCE -> "ohm";
            };
        }
    }

    public QuantityPlan {
        modeLabels = List.copyOf(modeLabels);
        frequenciesHz = frequenciesHz.clone();
    }

    /**
     * @param nominal the nominal solve
     * @param modes how many of its modes to follow (TE and TM, lowest first)
     * @param frequenciesHz where α_c and the impedance are wanted
     * @param analysis conductor and impedance definition
     * @return the plan
     */
    public static QuantityPlan of(GuidePoint nominal, int modes, double[] frequenciesHz, AnalysisSettings analysis) {
        List<String> labels = new ArrayList<>();
        for (Mode m : nominal.modes().modes()) {
            if (labels.size() < modes && m.cutoffFrequencyHz() > 0) {
                labels.add(m.label());
            }
        }
        return new QuantityPlan(labels, frequenciesHz, analysis);
    }

    @Override
    public double[] frequenciesHz() {
        return frequenciesHz.clone();
    }

    /** @return the quantities in report order */
    public List<Quantity> quantities() {
        List<Quantity> out = new ArrayList<>();
        for (String label : modeLabels) {
            out.add(new Quantity("fc " + label, Kind.CUTOFF, label, Double.NaN));
        }
        out.add(new Quantity("fc1 (dominant)", Kind.BAND_LOW, "", Double.NaN));
        out.add(new Quantity("fc2 (first higher)", Kind.BAND_HIGH, "", Double.NaN));
        for (double f : frequenciesHz) {
            String at = String.format(Locale.ROOT, " @ %.6g GHz", f / 1e9);
            out.add(new Quantity("alpha_c" + at, Kind.WALL_LOSS, "", f));
            out.add(new Quantity("Z" + at, Kind.IMPEDANCE, "", f));
        }
        return out;
    }

    /**
     * @param point a solved guide
     * @return the value of every quantity there, SI units; NaN where it cannot be had (a followed mode
     *     missing from the solve, the first higher mode unknown, the dominant mode cut off)
     */
    public double[] values(GuidePoint point) {
        List<Quantity> qs = quantities();
        double[] out = new double[qs.size()];
        GuideSummary s = point.summary();
        ModeAnalysis dominant = null;
        for (int k = 0; k < out.length; k++) {
            Quantity q = qs.get(k);
            out[k] = switch (q.kind()) {
                case CUTOFF -> find(point, q.modeLabel()) == null ? Double.NaN : find(point, q.modeLabel()).cutoffFrequencyHz();
                case BAND_LOW -> s.singleModeLowHz();
                case BAND_HIGH -> s.singleModeHighHz();
                case WALL_LOSS, IMPEDANCE -> {
                    if (!(q.frequencyHz() > s.dominant().cutoffFrequencyHz())) {
                        yield Double.NaN;
                    }
                    if (dominant == null) {
                        dominant = ModeAnalysis.prepare(point.section(), s.dominant());
                    }
                    ModeAtFrequency at = dominant.at(q.frequencyHz(), analysis);
                    yield q.kind() == Kind.WALL_LOSS ? at.conductorAttenuation() : at.chosenImpedance();
                }
            };
        }
        return out;
    }

    /**
     * @param point a solved guide
     * @return the estimated absolute error of every quantity (the solver's estimate for cutoffs; NaN for
     *     α_c and the impedance, which the solver does not estimate)
     */
    public double[] errors(GuidePoint point) {
        List<Quantity> qs = quantities();
        double[] out = new double[qs.size()];
        GuideSummary s = point.summary();
        for (int k = 0; k < out.length; k++) {
            Quantity q = qs.get(k);
            Mode m = switch (q.kind()) {
                case CUTOFF -> find(point, q.modeLabel());
                case BAND_LOW -> s.dominant();
                case BAND_HIGH -> s.firstHigher().orElse(null);
                default -> null;
            };
            out[k] = m == null ? Double.NaN : m.relativeErrorEstimate() * m.cutoffFrequencyHz();
        }
        return out;
    }

    /** @return the mode of the followed label in the solve, or null */
    static Mode find(GuidePoint point, String label) {
        for (Mode m : point.modes().modes()) {
            if (m.label().equals(label)) {
                return m;
            }
        }
        return null;
    }
}
