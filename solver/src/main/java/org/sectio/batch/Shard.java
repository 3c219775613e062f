package org.sectio.batch;

/**
 * A deterministic share of a sweep for one job of an array: shard {@code index} of {@code count} runs
 * the chains (see {@link SweepDefinition}) whose number c has {@code c mod count = index}. The shards
 * 0 … count − 1 together run every point exactly once, whatever machine runs each.
 *
 * @param index 0 … count − 1 (a Slurm array task id when the array is 0 … count − 1)
 * @param count the number of shards, ≥ 1
 * @throws IllegalArgumentException if out of range
 */
public record Shard(int index, int count) {

    /** The whole sweep. */
    public static final Shard ALL = new Shard(0, 1);

    public Shard {
        if (count < 1 || index < 0 || index >= count) {
            throw new IllegalArgumentException("shard must be i/n with n ≥ 1 and 0 ≤ i < n, got " + index + "/" + count);
        }
    }

    /**
     * @param text {@code i/n}, e.g. {@code 3/16}
     * @return the shard
     * @throws IllegalArgumentException if the text is not of that form or out of range
     */
    public static Shard parse(String text) {
        String[] parts = text == null ? new String[0] : text.strip().split("/", -1);
        try {
            if (parts.length == 2) {
                return new Shard(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()));
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new IllegalArgumentException("shard must be written i/n, e.g. 0/16 … 15/16, got '" + text + "'");
    }

    /** @return whether chain {@code chain} belongs to this shard */
    public boolean owns(int chain) {
        return chain % count == index;
    }

    @Override
    public String toString() {
        return index + "/" + count;
    }
}
