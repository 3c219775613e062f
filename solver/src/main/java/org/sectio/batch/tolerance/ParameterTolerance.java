package org.sectio.batch.tolerance;

import java.util.Locale;

/**
 * A manufacturing tolerance on one parameter: the part's value lies within nominal ± {@code plusMinus},
 * and for Monte Carlo is drawn from a distribution: uniform over the band, or normal with the band as
 * ±3σ (σ = plusMinus / 3, common practice for a process held to its tolerance).
 *
 * @param parameter the parameter's name
 * @param plusMinus the half-width of the band, template units, finite and &gt; 0
 * @param distribution how Monte Carlo draws it
 */
public record ParameterTolerance(String parameter, double plusMinus, Distribution distribution) {

    /** How a parameter's deviation is drawn. */
    public enum Distribution {
        /** Normal, mean 0, σ = plusMinus / 3. */
        NORMAL,
        /** Uniform over [−plusMinus, +plusMinus]. */
        UNIFORM;

        /**
         * @param text "normal" or "uniform", any case
         * @return the distribution
         * @throws IllegalArgumentException naming the known ones
         */
        public static Distribution parse(String text) {
            String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
            return switch (t) {
                case "normal" -> NORMAL;
                case "uniform" -> UNIFORM;
                default -> throw new IllegalArgumentException("unknown distribution '" + text
                        + "'; use normal (±tolerance = ±3σ) or uniform");
            };
        }
    }

    /** @throws IllegalArgumentException if the tolerance is not finite and positive or a part is missing */
    public ParameterTolerance {
        if (parameter == null || distribution == null) {
            throw new IllegalArgumentException("a tolerance needs a parameter and a distribution");
        }
        if (!(plusMinus > 0) || Double.isInfinite(plusMinus)) {
            throw new IllegalArgumentException("tolerance of " + parameter + " must be a finite value > 0, got "
                    + plusMinus);
        }
    }
}
