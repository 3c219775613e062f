package org.sectio.batch.size;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.BandRule;
import org.sectio.physics.GuideSummary;
import org.sectio.physics.ModeAnalysis;
import org.sectio.physics.ModeAtFrequency;

/**
 * What {@link ParameterSizer} sizes a parameter for: a quantity of the solved guide and the value it
 * should take. The sizer finds the root of {@code quantity(p) − wanted()}. Frequencies in Hz,
 * impedances in Ω.
 */
public sealed interface SizeTarget {

    /** @return the quantity at a solved point (NaN when it cannot be had there) */
    double quantity(GuidePoint point);

    /** @return the value the quantity should take */
    double wanted();

    /**
     * @param point a solved point
     * @param coarse the same point solved on a grid with half the cells, or null when not solved
     * @return the estimated absolute error of {@link #quantity} at the point, or NaN when unknown
     */
    double absoluteError(GuidePoint point, GuidePoint coarse);

    /** @return whether {@link #absoluteError} needs the coarse solve */
    default boolean needsCoarseSolve() {
        return false;
    }

    /** @return what the quantity is, e.g. "cutoff of TE 1" */
    String quantityName();

    /** @return a value of the quantity with its unit, e.g. "6.557000 GHz" */
    String format(double value);

    /**
     * @param absoluteError an error of the quantity
     * @param quantity the quantity
     * @return the error for a report: relative to the quantity (or absolute where the quantity is a margin)
     */
    default String errorText(double absoluteError, double quantity) {
        return Double.isFinite(absoluteError) ? String.format(Locale.ROOT, "%.2e rel.", absoluteError / Math.abs(quantity))
                : "unknown";
    }

    /** @return how many modes the solves need */
    int modeCount();

    /** @return which families the solves need */
    Set<ModeFamily> families();

    /** @return the target in words, e.g. "cutoff of TE 1 = 6.557 GHz" */
    default String describe() {
        return quantityName() + " = " + format(wanted());
    }

    /** The modes for the band targets: enough to pass a degenerate dominant pair (a circle's TE11 needs 3). */
    int BAND_MODES = 4;

    private static String ghz(double hz) {
        return String.format(Locale.ROOT, "%.6f GHz", hz / 1e9);
    }

    /**
     * The cutoff of one mode at a frequency.
     *
     * @param family TE or TM, or null for the index-th mode of all families
     * @param index 1-based, lowest cutoff first, 1 … {@code SolveSettings.MAX_MODES}
     * @param frequencyHz the wanted cutoff, finite and &gt; 0
     */
    record Cutoff(ModeFamily family, int index, double frequencyHz) implements SizeTarget {
        /** @throws IllegalArgumentException if a value is out of range */
        public Cutoff {
            if (family == ModeFamily.TEM) {
                throw new IllegalArgumentException("a TEM mode has no cutoff to size for; name a TE or TM mode");
            }
            if (index < 1 || index > 200) {
                throw new IllegalArgumentException("mode index must be 1 … 200, got " + index);
            }
            if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz)) {
                throw new IllegalArgumentException("the wanted cutoff must be a frequency > 0, got " + frequencyHz + " Hz");
            }
        }

        @Override
        public double quantity(GuidePoint point) {
            return point.mode(family, index).cutoffFrequencyHz();
        }

        @Override
        public double wanted() {
            return frequencyHz;
        }

        @Override
        public double absoluteError(GuidePoint point, GuidePoint coarse) {
            Mode m = point.mode(family, index);
            return m.relativeErrorEstimate() * m.cutoffFrequencyHz();
        }

        @Override
        public String quantityName() {
            return "cutoff of " + (family == null ? "mode " + index : family + " " + index);
        }

        @Override
        public String format(double value) {
            return ghz(value);
        }

        @Override
        public int modeCount() {
            return index;
        }

        @Override
        public Set<ModeFamily> families() {
            return family == null ? EnumSet.of(ModeFamily.TE, ModeFamily.TM) : EnumSet.of(family);
        }
    }

    /**
     * The single-mode bandwidth ratio fc2 / fc1 (first higher mode over dominant mode).
     *
     * @param ratio the wanted ratio, finite and &gt; 1
     */
    record BandRatio(double ratio) implements SizeTarget {
        /** @throws IllegalArgumentException if the ratio is not above 1 */
        public BandRatio {
            if (!(ratio > 1) || Double.isInfinite(ratio)) {
                throw new IllegalArgumentException("a single-mode bandwidth ratio fc2/fc1 must be > 1, got " + ratio);
            }
        }

        @Override
        public double quantity(GuidePoint point) {
            return point.summary().band().map(BandRule::bandRatio).orElse(Double.NaN);
        }

        @Override
        public double wanted() {
            return ratio;
        }

        @Override
        public double absoluteError(GuidePoint point, GuidePoint coarse) {
            GuideSummary s = point.summary();
            return s.firstHigher().map(next -> (next.relativeErrorEstimate() + s.dominant().relativeErrorEstimate())
                    * quantity(point)).orElse(Double.NaN);
        }

        @Override
        public String quantityName() {
            return "single-mode ratio fc2/fc1";
        }

        @Override
        public String format(double value) {
            return String.format(Locale.ROOT, "%.6f", value);
        }

        @Override
        public int modeCount() {
            return BAND_MODES;
        }

        @Override
        public Set<ModeFamily> families() {
            return EnumSet.of(ModeFamily.TE, ModeFamily.TM);
        }
    }

    /**
     * The dominant mode's characteristic impedance at a frequency ({@link ModeAnalysis}, the definition of
     * the settings). Its error is estimated like a cutoff's, from the same figure on the coarser grid:
     * 2|Z(h) − Z(2h)| / 3.
     *
     * @param frequencyHz where, finite and &gt; 0
     * @param ohms the wanted impedance, finite and &gt; 0
     * @param analysis conductor, impedance definition and voltage path
     */
    record Impedance(double frequencyHz, double ohms, AnalysisSettings analysis) implements SizeTarget {
        /** @throws IllegalArgumentException if a value is out of range */
        public Impedance {
            if (!(frequencyHz > 0) || Double.isInfinite(frequencyHz) || !(ohms > 0) || Double.isInfinite(ohms)
                    || analysis == null) {
                throw new IllegalArgumentException("an impedance target needs a frequency > 0 and an impedance > 0,"
                        + " got " + frequencyHz + " Hz and " + ohms + " ohm");
            }
        }

        @Override
        public double quantity(GuidePoint point) {
            Mode dominant = point.summary().dominant();
            if (dominant.cutoffFrequencyHz() >= frequencyHz) {
                return Double.NaN;
            }
            ModeAtFrequency at = ModeAnalysis.at(point.section(), dominant, frequencyHz, analysis);
            return at.chosenImpedance();
        }

        @Override
        public double wanted() {
            return ohms;
        }

        @Override
        public boolean needsCoarseSolve() {
            return true;
        }

        @Override
        public double absoluteError(GuidePoint point, GuidePoint coarse) {
            return coarse == null ? Double.NaN : 2 * Math.abs(quantity(point) - quantity(coarse)) / 3;
        }

        @Override
        public String quantityName() {
            return "impedance of the dominant mode at " + ghz(frequencyHz);
        }

        @Override
        public String format(double value) {
            return String.format(Locale.ROOT, "%.3f ohm", value);
        }

        @Override
        public int modeCount() {
            return 1;
        }

        @Override
        public Set<ModeFamily> families() {
            return EnumSet.of(ModeFamily.TE, ModeFamily.TM);
        }
    }

    /**
     * A usable band (1.25 fc1 … 0.95 fc2, {@link BandRule}, common practice) that covers [low, high] with
     * the same relative margin at both ends: the root of ln(low / usableLow) − ln(usableHigh / high).
     * Where the guide's usable band is wider than asked this centres it on the band; the result says
     * whether both margins are ≥ 0.
     *
     * @param lowHz the band's lower edge, &gt; 0
     * @param highHz its upper edge, &gt; lowHz
     */
    record Coverage(double lowHz, double highHz) implements SizeTarget {
        /** @throws IllegalArgumentException if the band is empty or reversed */
        public Coverage {
            if (!(lowHz > 0) || !(highHz > lowHz) || Double.isInfinite(highHz)) {
                throw new IllegalArgumentException("the band to cover must be LOW:HIGH with 0 < LOW < HIGH, got "
                        + lowHz + " … " + highHz + " Hz");
            }
        }

        @Override
        public double quantity(GuidePoint point) {
            return lowMargin(point) - highMargin(point);
        }

        /** @return ln(low / usableLow): ≥ 0 when the usable band starts at or below low */
        public double lowMargin(GuidePoint point) {
            return Math.log(lowHz / point.summary().usableLowHz());
        }

        /** @return ln(usableHigh / high): ≥ 0 when the usable band ends at or above high */
        public double highMargin(GuidePoint point) {
            return Math.log(point.summary().usableHighHz() / highHz);
        }

        @Override
        public double wanted() {
            return 0;
        }

        @Override
        public double absoluteError(GuidePoint point, GuidePoint coarse) {
            GuideSummary s = point.summary();
            return s.firstHigher().map(next -> next.relativeErrorEstimate() + s.dominant().relativeErrorEstimate())
                    .orElse(Double.NaN);
        }

        @Override
        public String quantityName() {
            return "margin balance ln(f1/usable low) − ln(usable high/f2) for " + ghz(lowHz) + " … " + ghz(highHz);
        }

        @Override
        public String errorText(double absoluteError, double quantity) {
            return Double.isFinite(absoluteError) ? String.format(Locale.ROOT, "%.2e", absoluteError) : "unknown";
        }

        @Override
        public String describe() {
            return "usable band covering " + ghz(lowHz) + " … " + ghz(highHz) + " with equal margins";
        }

        @Override
        public String format(double value) {
            return String.format(Locale.ROOT, "%+.6f", value);
        }

        @Override
        public int modeCount() {
            return BAND_MODES;
        }

        @Override
        public Set<ModeFamily> families() {
            return EnumSet.of(ModeFamily.TE, ModeFamily.TM);
        }
    }
}
