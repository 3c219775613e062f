package org.sectio.eigen;

/**
 * Settings of the implicitly restarted shift-invert Lanczos iteration ({@link ShiftInvertLanczos}).
 *
 * @param count how many eigenpairs are wanted, {@code ≥ 1} (and, at solve time, below the order n)
 * @param lanczosVectors the Krylov basis size kept between restarts (ARPACK's {@code ncv}),
 *        {@code > count}; it is capped at the order n when solving
 * @param relativeTolerance ARPACK's convergence tolerance: a Ritz value θ of the shift-inverted operator
 *        is accepted when its Ritz estimate is at most {@code relativeTolerance · |θ|}; in (0, 0.1]
 * @param maxRestarts the most implicit restarts, {@code ≥ 1} (ARPACK's {@code iparam(3)} on entry; ARPACK then
 *        builds at most {@code maxRestarts + 1} Lanczos factorizations)
 * @param seed seeds the {@link java.util.Random} that draws the starting vector, so runs are reproducible
 */
public record LanczosSettings(int count, int lanczosVectors, double relativeTolerance, int maxRestarts, long seed) {

    /** The default tolerance, {@code 1e-12}. */
    public static final double DEFAULT_TOLERANCE = 1e-12;

    /** The default restart limit, 500. */
    public static final int DEFAULT_MAX_RESTARTS = 500;

    /** The default seed of the starting vector. */
    public static final long DEFAULT_SEED = 20_240_601L;

    /**
     * @throws IllegalArgumentException if a value is out of the range stated on the record
     */
    public LanczosSettings {
        if (count < 1) {
            throw new IllegalArgumentException("count = " + count + ": ask for at least one eigenpair");
        }
        if (lanczosVectors <= count) {
            throw new IllegalArgumentException("lanczosVectors = " + lanczosVectors + " must exceed count = "
                    + count + "; use at least " + defaultLanczosVectors(count));
        }
        if (!(relativeTolerance > 0 && relativeTolerance <= 0.1)) {
            throw new IllegalArgumentException("relativeTolerance = " + relativeTolerance
                    + " must lie in (0, 0.1]; 1e-12 is the default");
        }
        if (maxRestarts < 1) {
            throw new IllegalArgumentException("maxRestarts = " + maxRestarts + " must be at least 1");
        }
    }

    /**
     * The defaults for {@code count} pairs: {@code ncv = max(2 count + 1, count + 8)}, tolerance
     * {@value #DEFAULT_TOLERANCE}, {@value #DEFAULT_MAX_RESTARTS} restarts, a fixed seed.
     *
     * @param count how many eigenpairs are wanted, {@code ≥ 1}
     * @return the default settings
     * @throws IllegalArgumentException if {@code count < 1}
     */
    public static LanczosSettings forCount(int count) {
        return new LanczosSettings(count, defaultLanczosVectors(count), DEFAULT_TOLERANCE, DEFAULT_MAX_RESTARTS,
                DEFAULT_SEED);
    }

    /**
     * @param tolerance the new relative tolerance
     * @return these settings with another tolerance
     */
    public LanczosSettings withRelativeTolerance(double tolerance) {
        return new LanczosSettings(count, lanczosVectors, tolerance, maxRestarts, seed);
    }

    /**
     * @param restarts the new restart limit
     * @return these settings with another restart limit
     */
    public LanczosSettings withMaxRestarts(int restarts) {
        return new LanczosSettings(count, lanczosVectors, relativeTolerance, restarts, seed);
    }

    /**
     * @param vectors the new Krylov basis size
     * @return these settings with another Krylov basis size
     */
    public LanczosSettings withLanczosVectors(int vectors) {
        return new LanczosSettings(count, vectors, relativeTolerance, maxRestarts, seed);
    }

    /**
     * @param newSeed the new seed
     * @return these settings with another starting vector seed
     */
    public LanczosSettings withSeed(long newSeed) {
        return new LanczosSettings(count, lanczosVectors, relativeTolerance, maxRestarts, newSeed);
    }

    private static int defaultLanczosVectors(int count) {
        return Math.max(2 * Math.max(count, 0) + 1, count + 8);
    }
}
