package dev.yoke.report;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table for terminals: columns sized to their widest cell, text left-aligned and
 * numbers right-aligned, one space (or more) between columns, cells cut with "…" when a column
 * has a width cap.
 */
final class TextTable {

    private final List<String> headers = new ArrayList<>();
    private final List<Boolean> rightAligned = new ArrayList<>();
    private final List<Integer> caps = new ArrayList<>();
    private final List<String[]> rows = new ArrayList<>();
    private final String gap;

    TextTable(String gap) {
        this.gap = gap;
    }

    TextTable() {
        this(" ");
    }

    /** Adds a column; {@code cap} &le; 0 means no width limit. */
    TextTable column(String header, boolean right, int cap) {
        headers.add(header);
        rightAligned.add(right);
        caps.add(cap);
        return this;
    }

    TextTable left(String header) {
        return column(header, false, 0);
    }

    TextTable right(String header) {
        return column(header, true, 0);
    }

    void row(String... cells) {
        if (cells.length != headers.size()) {
            throw new IllegalArgumentException(cells.length + " cells for " + headers.size() + " columns");
        }
        rows.add(cells.clone());
    }

    /** Sets a width cap on column {@code index} (used to fit a total width). */
    void cap(int index, int width) {
        caps.set(index, width);
    }

    /** Natural width of column {@code index} (widest cell, header included). */
    int naturalWidth(int index) {
        int w = headers.get(index).length();
        for (String[] r : rows) {
            w = Math.max(w, r[index].length());
        }
        return w;
    }

    int columns() {
        return headers.size();
    }

    /** Total width with the current caps. */
    int width() {
        int total = 0;
        for (int c = 0; c < headers.size(); c++) {
            total += width(c) + (c == 0 ? 0 : gap.length());
        }
        return total;
    }

    private int width(int c) {
        int w = naturalWidth(c);
        int cap = caps.get(c);
        return cap > 0 ? Math.min(w, cap) : w;
    }

    /** The header line, then one line per row, each ending in a line break. */
    String render() {
        StringBuilder out = new StringBuilder();
        line(out, headers.toArray(new String[0]));
        for (String[] r : rows) {
            line(out, r);
        }
        return out.toString();
    }

    private void line(StringBuilder out, String[] cells) {
        StringBuilder line = new StringBuilder();
        for (int c = 0; c < cells.length; c++) {
            int w = width(c);
            String cell = cells[c];
            if (cell.length() > w) {
                cell = w <= 1 ? cell.substring(0, w) : cell.substring(0, w - 1) + "…";
            }
            if (c > 0) {
                line.append(gap);
            }
            String pad = " ".repeat(w - cell.length());
            line.append(rightAligned.get(c) ? pad + cell : cell + pad);
        }
        out.append(line.toString().stripTrailing()).append('\n');
    }
}
