package dev.yoke.tui;

import com.googlecode.lanterna.TerminalTextUtils;
import java.util.ArrayList;
import java.util.List;

/**
 * A table of right-aligned columns after a label column, laid out to fit a screen width so that
 * every column can be read without scrolling sideways: the roomy layout (eight columns a cell)
 * when it fits, else each column as narrow as its widest cell, else two lines a row (the first
 * half of the columns beside the label, the second half indented below it). Only when even that
 * is too wide does the page's sideways scroll have to help.
 */
final class FittedTable {

    /** How the table was laid out, for tests. */
    enum Fit { ROOMY, COMPACT, TWO_LINES }

    private static final int ROOMY_CELL = 8;
    private static final String INDENT = "  ";

    private final List<String> headers;
    private final List<String> labels = new ArrayList<>();
    private final List<List<String>> rows = new ArrayList<>();
    private final int labelWidth;
    private final String labelHeader;

    /**
     * @param labelHeader the label column's title
     * @param labelWidth  the label column's width (longer labels are cut)
     * @param headers     the titles of the value columns
     */
    FittedTable(String labelHeader, int labelWidth, List<String> headers) {
        this.labelHeader = labelHeader;
        this.labelWidth = labelWidth;
        this.headers = List.copyOf(headers);
    }

    /** Adds a row: its label and one cell per value column. */
    FittedTable add(String label, List<String> cells) {
        if (cells.size() != headers.size()) {
            throw new IllegalArgumentException(cells.size() + " cells for " + headers.size() + " columns");
        }
        labels.add(label);
        rows.add(List.copyOf(cells));
        return this;
    }

    /** The layout chosen for a width. */
    Fit fitFor(int width) {
        int fixed = INDENT.length() + labelWidth;
        if (fixed + ROOMY_CELL * headers.size() <= width) {
            return Fit.ROOMY;
        }
        int[] natural = naturalWidths();
        return fixed + sum(natural, 0, natural.length) <= width ? Fit.COMPACT : Fit.TWO_LINES;
    }

    /** The heading line(s) then the rows, in the heading tone and the normal tone. */
    List<Line> lines(int width) {
        Fit fit = fitFor(width);
        int[] cellWidths = fit == Fit.ROOMY ? roomyWidths()
                : fit == Fit.COMPACT ? spread(naturalWidths(), width - INDENT.length() - labelWidth) : naturalWidths();
        int split = fit == Fit.TWO_LINES ? (headers.size() + 1) / 2 : headers.size();
        List<Line> out = new ArrayList<>();
        String blankLabel = " ".repeat(labelWidth);
        out.add(Line.of(Tone.DIM, INDENT + KeyMap.pad(labelHeader, labelWidth) + cells(headers, cellWidths, 0, split)));
        if (split < headers.size()) {
            out.add(Line.of(Tone.DIM, INDENT + blankLabel + cells(headers, cellWidths, split, headers.size())));
        }
        for (int r = 0; r < rows.size(); r++) {
            String label = KeyMap.pad(Painter.clip(labels.get(r), labelWidth), labelWidth);
            out.add(Line.of(INDENT + label + cells(rows.get(r), cellWidths, 0, split)));
            if (split < headers.size()) {
                out.add(Line.of(INDENT + blankLabel + cells(rows.get(r), cellWidths, split, headers.size())));
            }
        }
        return out;
    }

    private int[] roomyWidths() {
        int[] w = naturalWidths();
        for (int i = 0; i < w.length; i++) {
            w[i] = Math.max(ROOMY_CELL, w[i]);
        }
        return w;
    }

    /** Widens narrow columns one space at a time, in turn, toward the roomy width while {@code room} allows. */
    private static int[] spread(int[] widths, int room) {
        int slack = room - sum(widths, 0, widths.length);
        boolean grew = true;
        while (slack > 0 && grew) {
            grew = false;
            for (int i = 0; i < widths.length && slack > 0; i++) {
                if (widths[i] < ROOMY_CELL) {
                    widths[i]++;
                    slack--;
                    grew = true;
                }
            }
        }
        return widths;
    }

    /** Each column's widest cell or title plus one space before it. */
    private int[] naturalWidths() {
        int[] w = new int[headers.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = TerminalTextUtils.getColumnWidth(headers.get(i));
            for (List<String> row : rows) {
                w[i] = Math.max(w[i], TerminalTextUtils.getColumnWidth(row.get(i)));
            }
            w[i] += 1;
        }
        return w;
    }

    private static String cells(List<String> values, int[] widths, int from, int to) {
        StringBuilder s = new StringBuilder();
        for (int i = from; i < to; i++) {
            String v = values.get(i);
            s.append(" ".repeat(Math.max(0, widths[i] - TerminalTextUtils.getColumnWidth(v)))).append(v);
        }
        return s.toString();
    }

    private static int sum(int[] v, int from, int to) {
        int s = 0;
        for (int i = from; i < to; i++) {
            s += v[i];
        }
        return s;
    }
}
