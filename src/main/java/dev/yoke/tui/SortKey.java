package dev.yoke.tui;

/** One sort key of the shortlist: a column and a direction. */
public record SortKey(ShortlistColumn column, boolean descending) {

    /** The same column in the other direction. */
    public SortKey reversed() {
        return new SortKey(column, !descending);
    }

    /** A key in the column's natural first direction (largest first for margins and efficiency). */
    public static SortKey natural(ShortlistColumn column) {
        return new SortKey(column, column.largerIsBetter());
    }
}
