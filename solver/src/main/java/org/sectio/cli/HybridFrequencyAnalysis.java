package org.sectio.cli;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Dielectric;
import org.sectio.mesh.TensorGrid;
import org.sectio.modes.FieldMap;
import org.sectio.modes.HybridField;
import org.sectio.modes.HybridMode;
import org.sectio.modes.HybridModeSolver;
import org.sectio.modes.HybridSweep;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentity;
import org.sectio.modes.SolveProgress;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.HybridFigures;
import org.sectio.physics.ModeAtFrequency;

/**
 * The figures at frequency of a partly filled guide, whose modes above cutoff are hybrid: the
 * full-vector solver ({@link HybridModeSolver}) runs at every frequency on the grid of the cutoff
 * solve, the modes are tracked over the band ({@link HybridSweep}), and each tracked curve is joined
 * to the scalar mode of the cutoff table whose longitudinal field (Hz for TE, Ez for TM) it overlaps
 * most, ∫ ψ_s u dA / (‖ψ_s‖ ‖u‖) with u the curve's Hz or Ez, taken at the frequency where the overlap
 * is largest. So each row of the table keeps its cutoff and its identity and gains β(f), vg, α_d, the
 * wall loss α_c, the impedances and the power figures of {@link HybridFigures}.
 */
final class HybridFrequencyAnalysis {

    /** Least overlap for a curve to be joined to a scalar mode. */
    private static final double JOIN_OVERLAP = 0.3;
    /** Extra hybrid modes computed per frequency beyond the table's TE and TM rows. */
    private static final int SPARE_MODES = 2;

    private HybridFrequencyAnalysis() {
    }

    /** @return whether a dielectric region differs from the filling (the modes above cutoff are hybrid) */
    static boolean applies(CrossSection section) {
        for (Dielectric d : section.dielectrics()) {
            if (!d.material().equals(section.filling())) {
                return true;
            }
        }
        return false;
    }

    /**
     * @param section a partly filled cross-section
     * @param modes its modes from the cutoff solve, lowest cutoff first
     * @param identities their identities, same order
     * @param frequenciesHz ascending, Hz
     * @param settings analysis settings
     * @param scalarFigures the figures of the scalar analysis, used for TEM rows
     * @return per frequency, per mode, the figures
     */
    static List<List<ModeAtFrequency>> figures(CrossSection section, List<Mode> modes, List<ModeIdentity> identities,
                                               double[] frequenciesHz, AnalysisSettings settings,
                                               List<List<ModeAtFrequency>> scalarFigures) {
        TensorGrid grid = gridOf(section, modes);
        int wanted = (int) modes.stream().filter(m -> m.family() != ModeFamily.TEM).count() + SPARE_MODES;
        HybridModeSolver.Prepared prepared = HybridModeSolver.prepare(section, grid);
        HybridSweep.Result sweep = HybridSweep.run(() -> prepared, frequenciesHz, Math.min(wanted,
                prepared.pencil().size() - 3), true, SolveProgress.SILENT);
        List<HybridSweep.Curve> curves = sweep.curves();
        int[] curveOf = join(modes, curves);
        List<List<ModeAtFrequency>> out = new ArrayList<>();
        for (int i = 0; i < frequenciesHz.length; i++) {
            List<ModeAtFrequency> row = new ArrayList<>();
            for (int k = 0; k < modes.size(); k++) {
                Mode mode = modes.get(k);
                String label = identities.get(k).label();
                HybridMode hybrid = curveOf[k] < 0 ? null : curves.get(curveOf[k]).modes().get(i);
                if (mode.family() == ModeFamily.TEM) {
                    row.add(scalarFigures.get(i).get(k));
                } else if (hybrid == null) {
                    row.add(missing(label, frequenciesHz[i], mode.cutoffFrequencyHz(), settings, String.format(
                            Locale.ROOT, "not among the %d hybrid modes of largest beta² computed here; ask for more"
                                    + " modes (-n)", wanted)));
                } else {
                    row.add(HybridFigures.at(section, hybrid, label, frequenciesHz[i], mode.cutoffFrequencyHz(),
                            settings));
                }
            }
            out.add(row);
        }
        return out;
    }

    /** Greedy unique joining of scalar modes to curves by their best longitudinal overlap. */
    private static int[] join(List<Mode> modes, List<HybridSweep.Curve> curves) {
        List<double[]> candidates = new ArrayList<>();
        for (int k = 0; k < modes.size(); k++) {
            if (modes.get(k).family() == ModeFamily.TEM) {
                continue;
            }
            for (int c = 0; c < curves.size(); c++) {
                double best = 0;
                for (HybridMode m : curves.get(c).modes()) {
                    if (m != null) {
                        best = Math.max(best, overlap(modes.get(k), m.field()));
                    }
                }
                if (best >= JOIN_OVERLAP) {
                    candidates.add(new double[] {best, k, c});
                }
            }
        }
        candidates.sort((p, q) -> Double.compare(q[0], p[0]));
        int[] curveOf = new int[modes.size()];
        Arrays.fill(curveOf, -1);
        boolean[] used = new boolean[curves.size()];
        for (double[] cand : candidates) {
            int k = (int) cand[1];
            int c = (int) cand[2];
            if (curveOf[k] < 0 && !used[c]) {
                curveOf[k] = c;
                used[c] = true;
            }
        }
        return curveOf;
    }

    /** |∫ ψ u dA| / (‖ψ‖ ‖u‖) of the scalar mode's field and the hybrid Hz (TE) or Ez (TM) on the same samples. */
    static double overlap(Mode scalar, HybridField field) {
        FieldMap psi = scalar.field();
        HybridField.Samples u = scalar.family() == ModeFamily.TE ? field.hz() : field.ez();
        if (psi.values().length != u.real().length || psi.weights().length == 0) {
            return 0;
        }
        double[] v = psi.values();
        double[] w = psi.weights();
        double re = 0;
        double im = 0;
        double nPsi = 0;
        double nU = 0;
        for (int s = 0; s < v.length; s++) {
            if (Double.isNaN(v[s]) || Double.isNaN(u.real()[s])) {
                continue;
            }
            re += w[s] * v[s] * u.real()[s];
            im += w[s] * v[s] * u.imaginary()[s];
            nPsi += w[s] * v[s] * v[s];
            nU += w[s] * (u.real()[s] * u.real()[s] + u.imaginary()[s] * u.imaginary()[s]);
        }
        return nPsi > 0 && nU > 0 ? Math.hypot(re, im) / Math.sqrt(nPsi * nU) : 0;
    }

    /**
     * The grid of the cutoff solve, read back from a mode's field: a TM or TEM field sits on the grid's
     * nodes; a TE field on its cell centres, from which the lines follow, the first on the bounding box.
     */
    static TensorGrid gridOf(CrossSection section, List<Mode> modes) {
        for (Mode m : modes) {
            if (m.family() != ModeFamily.TE) {
                return new TensorGrid(m.field().xCoordinates(), m.field().yCoordinates());
            }
        }
        FieldMap te = modes.get(0).field();
        return new TensorGrid(lines(te.xCoordinates(), section.bounds().minX(), section.bounds().maxX()),
                lines(te.yCoordinates(), section.bounds().minY(), section.bounds().maxY()));
    }

    /**
     * The lines around the given centres from the first; the last, rebuilt through every centre, can fall
     * short of the bounding box by round-off (then the grid would not cover the section), so a last
     * line within 1e-9 of the span of the box's far side is put on it.
     */
    private static double[] lines(double[] centres, double first, double last) {
        double[] out = new double[centres.length + 1];
        out[0] = first;
        for (int k = 0; k < centres.length; k++) {
            out[k + 1] = 2 * centres[k] - out[k];
        }
        int end = out.length - 1;
        if (Math.abs(out[end] - last) <= 1e-9 * (last - first)) {
            out[end] = last;
        }
        return out;
    }

    private static ModeAtFrequency missing(String label, double f, double fc, AnalysisSettings settings, String why) {
        double nan = Double.NaN;
        return new ModeAtFrequency(label, f, fc, f > fc, nan, nan, nan, nan, nan, nan, nan, nan, nan, nan,
                settings.conductor().skinDepth(f), settings.conductor().surfaceResistance(f,
                settings.rmsRoughnessMetres()), nan, nan, nan, nan, nan, nan, nan, nan, settings.definition(), nan,
                why);
    }
}
