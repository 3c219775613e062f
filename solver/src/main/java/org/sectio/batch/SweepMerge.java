package org.sectio.batch;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.sectio.io.AtomicFile;

/**
 * Joins the outputs of the shards of one sweep into one file sorted by point index, after checking
 * that together they hold every point exactly once; the result is written whole or not at all
 * ({@link AtomicFile}). Records are copied byte for byte, so merging the shards of a sweep gives the
 * same file as merging the output of one run of the whole sweep.
 */
public final class SweepMerge {

    private SweepMerge() {
    }

    /**
     * @param target the merged file (replaced whole); its layout is that of the shards
     * @param shards the shard outputs, all CSV with the same header or all JSON Lines
     * @return the number of points written
     * @throws IOException if a file cannot be read or the target cannot be written
     * @throws IllegalArgumentException if the shards disagree in layout, header or point total, a point
     *     is repeated or missing, or a line is no record (one line naming the file, line and point)
     */
    public static int merge(Path target, List<Path> shards) throws IOException {
        if (shards.isEmpty()) {
            throw new IllegalArgumentException("name at least one shard output to merge");
        }
        RecordFormat format = null;
        String header = null;
        int total = -1;
        Path totalFrom = null;
        TreeMap<Integer, String> lines = new TreeMap<>();
        TreeMap<Integer, String> origin = new TreeMap<>();
        for (Path shard : shards) {
            String text = Files.readString(shard, StandardCharsets.UTF_8);
            // a torn last line (a killed run) holds no complete record: its point counts as missing
            int end = text.lastIndexOf('\n') + 1;
            List<String> content = new ArrayList<>(List.of(text.substring(0, end).split("\n", -1)));
            content.remove(content.size() - 1);
            if (content.isEmpty()) {
                continue; // a shard with no chain of its own (more shards than chains) writes no JSON line
            }
            RecordFormat here = content.get(0).startsWith("{") ? RecordFormat.JSONL : RecordFormat.CSV;
            if (format != null && here != format) {
                throw new IllegalArgumentException("'" + shard + "' is " + here + " but '" + shards.get(0) + "' is "
                        + format + "; merge outputs of one layout");
            }
            format = here;
            int first = 0;
            if (format == RecordFormat.CSV) {
                if (header == null) {
                    header = content.get(0);
                } else if (!header.equals(content.get(0))) {
                    throw new IllegalArgumentException("'" + shard + "' has another header than '" + shards.get(0)
                            + "'; its records are of another sweep");
                }
                first = 1;
            }
            for (int k = first; k < content.size(); k++) {
                String where = "'" + shard + "' line " + (k + 1);
                RecordFormat.Key key;
                try {
                    key = format.key(content.get(k), -1);
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException(where + " " + e.getMessage());
                }
                if (total < 0) {
                    total = key.total();
                    totalFrom = shard;
                } else if (key.total() != total) {
                    throw new IllegalArgumentException(where + ": point " + key.index() + " is of a sweep of "
                            + key.total() + " points, but '" + totalFrom + "' holds a sweep of " + total);
                }
                if (key.index() < 0 || key.index() >= total) {
                    throw new IllegalArgumentException(where + ": point " + key.index() + " is outside 0 … " + (total - 1));
                }
                String earlier = origin.putIfAbsent(key.index(), where);
                if (earlier != null) {
                    throw new IllegalArgumentException("point " + key.index() + " is repeated: " + earlier + " and " + where);
                }
                lines.put(key.index(), content.get(k));
            }
        }
        if (total < 0) {
            throw new IllegalArgumentException("the shards hold no records");
        }
        if (lines.size() != total) {
            int missing = 0;
            while (lines.containsKey(missing)) {
                missing++;
            }
            throw new IllegalArgumentException("point " + missing + " of " + total + " is missing from the shards ("
                    + (total - lines.size()) + " missing in all); run its shard again");
        }
        String top = header;
        AtomicFile.write(target, out -> {
            if (top != null) {
                out.write((top + "\n").getBytes(StandardCharsets.UTF_8));
            }
            for (String line : lines.values()) {
                out.write((line + "\n").getBytes(StandardCharsets.UTF_8));
            }
        });
        return lines.size();
    }
}
