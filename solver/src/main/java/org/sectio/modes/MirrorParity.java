package org.sectio.modes;

/**
 * The parity of a mode about one mirror line of its cross-section and how well it holds.
 *
 * <p>{@code agreement} is the weighted correlation c = Σ w ψ(p) ψ(p′) / √(Σ w ψ(p)² · Σ w ψ(p′)²)
 * over the field samples p inside the guide, p′ their mirror images (w the sample's dual-cell area):
 * +1 for an exactly even field, −1 for an exactly odd one. The parity is {@link Parity#EVEN} when
 * c ≥ {@value #THRESHOLD}, {@link Parity#ODD} when c ≤ −{@value #THRESHOLD}, else
 * {@link Parity#MIXED}; {@link Parity#NONE} (agreement NaN) when the guide lacks the mirror.
 *
 * @param parity the class
 * @param agreement c in [−1, 1], or NaN with {@link Parity#NONE}
 * @throws IllegalArgumentException if agreement is outside [−1, 1] (beyond rounding) or NaN/non-NaN
 *     does not match the parity
 */
public record MirrorParity(Parity parity, double agreement) {

    /** |c| needed to call a field even or odd. */
    public static final double THRESHOLD = 0.9;

    public MirrorParity {
        if (parity == null) {
            throw new IllegalArgumentException("mirror parity: no parity given");
        }
        boolean none = parity == Parity.NONE;
        if (none != Double.isNaN(agreement) || Math.abs(agreement) > 1 + 1e-9) {
            throw new IllegalArgumentException("mirror parity " + parity + ": agreement must be in [−1, 1] (NaN only"
                    + " when the guide has no mirror), got " + agreement);
        }
    }

    /** The parity a correlation c implies (see the record description). */
    static MirrorParity fromAgreement(double c) {
        if (Double.isNaN(c)) {
            return new MirrorParity(Parity.MIXED, 0.0);
        }
        double clamped = Math.max(-1, Math.min(1, c));
        Parity p = clamped >= THRESHOLD ? Parity.EVEN : clamped <= -THRESHOLD ? Parity.ODD : Parity.MIXED;
        return new MirrorParity(p, clamped);
    }

    /** No mirror of this kind in the guide. */
    static MirrorParity absent() {
        return new MirrorParity(Parity.NONE, Double.NaN);
    }
}
