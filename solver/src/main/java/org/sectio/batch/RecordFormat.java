package org.sectio.batch;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The two record layouts of a sweep output, one point per line, every line complete with its
 * newline: CSV with one header line, or JSON Lines (one object per line, no header). Numbers are
 * written with {@link Double#toString(double)}, the shortest text that reads back to the same double,
 * so a record is a deterministic function of its figures; a figure that is not available is an empty
 * CSV field or a JSON {@code null}.
 *
 * <p>Fields of every record, in this order: {@code point} (0-based index), {@code points_total},
 * {@code status} ({@code ok} or {@code failed}), the swept parameters by name, the figures of the
 * {@link RecordPlan} and {@code reason} (empty unless failed).
 */
public enum RecordFormat {
    /** Comma-separated values (RFC 4180 quoting), with a header line. */
    CSV("csv"),
    /** JSON Lines: one JSON object per line. */
    JSONL("jsonl");

    private static final ObjectMapper JSON = new ObjectMapper();

    private final String extension;

    RecordFormat(String extension) {
        this.extension = extension;
    }

    /** @return the usual file extension, without the dot */
    public String extension() {
        return extension;
    }

    /** @return the header line with its newline (CSV), or "" (JSON Lines has none) */
    public String header(List<String> parameters, List<String> columns) {
        if (this == JSONL) {
            return "";
        }
        List<String> names = new ArrayList<>(List.of("point", "points_total", "status"));
        names.addAll(parameters);
        names.addAll(columns);
        names.add("reason");
        List<String> quoted = names.stream().map(RecordFormat::csvField).toList();
        return String.join(",", quoted) + "\n";
    }

    /** @return the record as one line with its newline */
    public String line(PointRecord r, List<String> parameters, List<String> columns) {
        if (this == CSV) {
            List<String> fields = new ArrayList<>();
            fields.add(Integer.toString(r.index()));
            fields.add(Integer.toString(r.total()));
            fields.add(r.failed() ? "failed" : "ok");
            r.parameters().forEach(v -> fields.add(number(v)));
            for (int k = 0; k < columns.size(); k++) {
                Object f = r.failed() ? null : r.figures().get(k);
                fields.add(f == null ? "" : f instanceof Double d ? number(d) : csvField(f.toString()));
            }
            fields.add(csvField(r.reason()));
            return String.join(",", fields) + "\n";
        }
        ObjectNode o = JSON.createObjectNode();
        o.put("point", r.index());
        o.put("points_total", r.total());
        o.put("status", r.failed() ? "failed" : "ok");
        ObjectNode p = o.putObject("parameters");
        for (int k = 0; k < parameters.size(); k++) {
            p.put(parameters.get(k), r.parameters().get(k));
        }
        ObjectNode v = o.putObject("values");
        for (int k = 0; k < columns.size(); k++) {
            Object f = r.failed() ? null : r.figures().get(k);
            if (f == null || f instanceof Double d && !Double.isFinite(d)) {
                v.putNull(columns.get(k));
            } else if (f instanceof Double d) {
                v.put(columns.get(k), d);
            } else {
                v.put(columns.get(k), f.toString());
            }
        }
        o.put("reason", r.reason());
        try {
            return JSON.writeValueAsString(o) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a sweep record does not serialize: " + e.getMessage(), e);
        }
    }

    /**
     * Reads back what a resume and a merge need from one complete line (without its newline).
     *
     * @param parameterCount the number of swept parameters, or −1 to read the index and total only
     * @return the point index, the total and the swept values as written
     * @throws IllegalArgumentException if the line is not a record of this layout with that many parameters
     */
    public Key key(String line, int parameterCount) {
        try {
            if (this == CSV) {
                List<String> fields = csvFields(line);
                int wanted = Math.max(0, parameterCount);
                if (fields.size() < 4 + wanted) {
                    throw new IllegalArgumentException("has " + fields.size() + " fields, expected at least "
                            + (4 + wanted));
                }
                return new Key(Integer.parseInt(fields.get(0)), Integer.parseInt(fields.get(1)),
                        List.copyOf(fields.subList(3, 3 + wanted)));
            }
            JsonNode o = JSON.readTree(line);
            if (o == null || !o.isObject() || !o.path("point").canConvertToInt() || !o.path("points_total").canConvertToInt()
                    || !o.path("parameters").isObject()
                    || parameterCount >= 0 && o.path("parameters").size() != parameterCount) {
                throw new IllegalArgumentException("is not a sweep record object with point, points_total and "
                        + parameterCount + " parameters");
            }
            List<String> values = new ArrayList<>();
            o.path("parameters").elements().forEachRemaining(n -> values.add(number(n.doubleValue())));
            return new Key(o.get("point").intValue(), o.get("points_total").intValue(), values);
        } catch (NumberFormatException | JsonProcessingException e) {
            throw new IllegalArgumentException("is not a sweep record: " + e.getMessage());
        }
    }

    /**
     * A record's identity.
     *
     * @param index the point index
     * @param total the sweep's number of points
     * @param parameters the swept values as {@link #number} writes them
     */
    public record Key(int index, int total, List<String> parameters) {
    }

    /** @return how a number is written: {@link Double#toString(double)}, "" for NaN or infinities */
    static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    /** @return the format a file name's extension stands for: .jsonl or .json → JSON Lines, else CSV */
    public static RecordFormat ofFileName(String name) {
        String lower = name.toLowerCase(Locale.ROOT);
        return lower.endsWith(".jsonl") || lower.endsWith(".json") ? JSONL : CSV;
    }

    private static String csvField(String text) {
        if (text.isEmpty() || text.chars().noneMatch(c -> c == ',' || c == '"' || c == '\n' || c == '\r')) {
            return text;
        }
        return '"' + text.replace("\"", "\"\"") + '"';
    }

    private static List<String> csvFields(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    field.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                out.add(field.toString());
                field.setLength(0);
            } else {
                field.append(c);
            }
        }
        if (quoted) {
            throw new IllegalArgumentException("has an unclosed quote");
        }
        out.add(field.toString());
        return out;
    }
}
