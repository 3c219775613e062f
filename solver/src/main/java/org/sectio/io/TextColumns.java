package org.sectio.io;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table with columns as wide as their widest cell, two spaces apart: the header and
 * every row padded on the left (numbers line up on the right) except for the columns marked as text,
 * which are padded on the right. Lines end in {@code \n} and carry no trailing blanks.
 */
final class TextColumns {

    private final List<String> header;
    private final boolean[] text;
    private final List<List<String>> rows = new ArrayList<>();

    /**
     * @param header the column titles
     * @param textColumns positions of the left-aligned (text) columns
     */
    TextColumns(List<String> header, int... textColumns) {
        this.header = List.copyOf(header);
        this.text = new boolean[header.size()];
        for (int c : textColumns) {
            text[c] = true;
        }
    }

    /**
     * @param cells one cell per column
     * @throws IllegalArgumentException if the count differs from the header's
     */
    void add(List<String> cells) {
        if (cells.size() != header.size()) {
            throw new IllegalArgumentException("table row has " + cells.size() + " cells for " + header.size()
                    + " columns");
        }
        rows.add(List.copyOf(cells));
    }

    /** @return the header line and the rows */
    String render() {
        int[] width = new int[header.size()];
        for (int c = 0; c < width.length; c++) {
            width[c] = header.get(c).length();
            for (List<String> row : rows) {
                width[c] = Math.max(width[c], row.get(c).length());
            }
        }
        StringBuilder out = new StringBuilder();
        line(out, header, width);
        for (List<String> row : rows) {
            line(out, row, width);
        }
        return out.toString();
    }

    private void line(StringBuilder out, List<String> cells, int[] width) {
        StringBuilder line = new StringBuilder();
        for (int c = 0; c < cells.size(); c++) {
            String cell = cells.get(c);
            String pad = " ".repeat(width[c] - cell.length());
            line.append(c == 0 ? "" : "  ").append(text[c] ? cell + pad : pad + cell);
        }
        out.append(line.toString().stripTrailing()).append('\n');
    }
}
