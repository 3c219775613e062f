package org.sectio.batch;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What a sweep records at every point, and the names of the columns (CSV) or keys (JSON Lines) that
 * hold it. Modes are numbered 1, 2, … in order of cutoff over all solved families, as the solve
 * reports them; their family and index within the family ("TE 1") are recorded beside, because the
 * order can change along a sweep.
 *
 * @param cutoffs the first n modes whose cutoff frequency (Hz) is recorded, 0 … the modes solved
 * @param errorEstimates whether the estimated relative error of each recorded cutoff is recorded
 * @param singleModeBand whether fc1, fc2 and the usable band 1.25 fc1 … 0.95 fc2 are recorded (Hz)
 * @param attenuationModes modes (1-based) whose wall loss α_c is recorded, dB/m
 * @param attenuationHz the frequencies of α_c, Hz
 * @param impedanceModes modes (1-based) whose characteristic impedance (the chosen definition) is recorded, Ω
 * @param impedanceHz the frequencies of the impedance, Hz
 */
public record RecordPlan(int cutoffs, boolean errorEstimates, boolean singleModeBand, List<Integer> attenuationModes,
                         List<Double> attenuationHz, List<Integer> impedanceModes, List<Double> impedanceHz) {

    public RecordPlan {
        attenuationModes = List.copyOf(attenuationModes);
        attenuationHz = List.copyOf(attenuationHz);
        impedanceModes = List.copyOf(impedanceModes);
        impedanceHz = List.copyOf(impedanceHz);
        if (cutoffs < 0) {
            throw new IllegalArgumentException("cutoffs to record must be ≥ 0, got " + cutoffs);
        }
    }

    /** @return the names of the recorded figures, in record order (parameters and status not included) */
    public List<String> columns() {
        List<String> names = new ArrayList<>();
        for (int k = 1; k <= cutoffs; k++) {
            names.add("mode" + k);
            names.add("mode" + k + "_cutoff_hz");
            if (errorEstimates) {
                names.add("mode" + k + "_error_estimate");
            }
        }
        if (singleModeBand) {
            names.add("single_mode_low_hz");
            names.add("single_mode_high_hz");
            names.add("usable_low_hz");
            names.add("usable_high_hz");
        }
        for (int m : attenuationModes) {
            for (double f : attenuationHz) {
                names.add("mode" + m + "_alpha_c_db_per_m_at_" + ghz(f));
            }
        }
        for (int m : impedanceModes) {
            for (double f : impedanceHz) {
                names.add("mode" + m + "_impedance_ohm_at_" + ghz(f));
            }
        }
        return names;
    }

    /** @return the highest mode number the plan refers to */
    public int highestMode() {
        int top = cutoffs;
        for (int m : attenuationModes) {
            top = Math.max(top, m);
        }
        for (int m : impedanceModes) {
            top = Math.max(top, m);
        }
        return top;
    }

    private static String ghz(double hz) {
        String text = String.format(Locale.ROOT, "%.6f", hz / 1e9).replaceAll("0+$", "").replaceAll("\\.$", "");
        return text + "ghz";
    }
}
