package dev.yoke.tui;

import dev.yoke.engine.Column;
import dev.yoke.engine.Metric;
import dev.yoke.engine.RowFilter;
import dev.yoke.engine.SortKey;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * How the shortlist is shown: the engine's sort keys and row filter. Immutable; each change gives a
 * new value, so the export writes exactly the view on screen.
 *
 * @param sort   sort keys, first first (the engine adds the identity tie-break)
 * @param filter which rows show
 */
public record ViewSettings(List<SortKey> sort, RowFilter filter) {

    /** The engine's default order (feasible first, least total loss, then cost) and no filter. */
    public static final ViewSettings DEFAULT = new ViewSettings(SortKey.DEFAULT, RowFilter.ALL);

    public ViewSettings {
        if (sort.isEmpty()) {
            throw new IllegalArgumentException("at least one sort key expected");
        }
        sort = List.copyOf(sort);
    }

    private static SortKey natural(ShortlistColumn column) {
        return new SortKey(column.column(), column.largerIsBetter());
    }

    /**
     * Sorts by a column first: in its natural direction, or reversed when it already is first.
     * A user's second key stays; the engine's three-key default is replaced.
     */
    public ViewSettings sortedBy(ShortlistColumn column) {
        SortKey first = sort.get(0);
        List<SortKey> keys = new ArrayList<>();
        if (first.column().equals(column.column())) {
            keys.add(new SortKey(first.column(), !first.descending()));
            keys.addAll(sort.subList(1, sort.size()));
        } else {
            keys.add(natural(column));
            if (sort.size() == 2 && !sort.get(1).column().equals(column.column())) {
                keys.add(sort.get(1));
            }
        }
        return new ViewSettings(keys, filter);
    }

    /** Sets the second sort key, reversing it when it already is second; ignored on the first key's column. */
    public ViewSettings thenSortedBy(ShortlistColumn column) {
        SortKey first = sort.get(0);
        if (first.column().equals(column.column())) {
            return this;
        }
        SortKey second = sort.size() > 1 && sort.get(1).column().equals(column.column())
                ? new SortKey(sort.get(1).column(), !sort.get(1).descending()) : natural(column);
        return new ViewSettings(List.of(first, second), filter);
    }

    public ViewSettings withFilter(RowFilter newFilter) {
        return new ViewSettings(sort, newFilter);
    }

    /** Adds or replaces a lower bound on a margin column; NaN removes it. */
    public ViewSettings withThreshold(ShortlistColumn column, double minimum) {
        Map<Metric, Double> bounds = new java.util.EnumMap<>(Metric.class);
        bounds.putAll(filter.atLeast());
        if (Double.isNaN(minimum)) {
            bounds.remove(column.metric());
        } else {
            bounds.put(column.metric(), minimum);
        }
        return withFilter(new RowFilter(filter.feasibleOnly(), filter.paretoOnly(), filter.maxCost(), filter.text(), bounds));
    }

    /** The lower bound on a margin column, or null. */
    public Double threshold(ShortlistColumn column) {
        return filter.atLeast().get(column.metric());
    }

    /** Same sort, no filter. */
    public ViewSettings withoutFilters() {
        return withFilter(RowFilter.ALL);
    }

    /** Position of a column among the sort keys, or -1. */
    public int sortPosition(ShortlistColumn column) {
        for (int i = 0; i < sort.size(); i++) {
            if (sort.get(i).column().equals(column.column())) {
                return i;
            }
        }
        return -1;
    }

    /** The sort in words, e.g. "cost asc, margin desc". */
    public String describeSort() {
        StringBuilder s = new StringBuilder();
        for (SortKey k : sort) {
            if (s.length() > 0) {
                s.append(", ");
            }
            ShortlistColumn c = ShortlistColumn.of(k.column());
            s.append(c == null ? k.column().key() : c == ShortlistColumn.FRONT ? "front" : c.title())
                    .append(k.descending() ? " desc" : " asc");
        }
        return s.toString();
    }

    /** The filter in words, e.g. "feasible, Pareto, /mx, m:Tj>=+5.0%"; "" when none. */
    public String describeFilters() {
        List<String> parts = new ArrayList<>();
        if (filter.feasibleOnly()) {
            parts.add("feasible");
        }
        if (filter.paretoOnly()) {
            parts.add("Pareto");
        }
        if (!filter.text().isEmpty()) {
            parts.add("/" + filter.text());
        }
        if (filter.maxCost() < Double.POSITIVE_INFINITY) {
            parts.add("cost<=" + Cells.fixed(filter.maxCost(), 2));
        }
        for (Map.Entry<Metric, Double> e : filter.atLeast().entrySet()) {
            ShortlistColumn c = ShortlistColumn.of(Column.of(e.getKey()));
            parts.add((c == null ? e.getKey().key() : c.title()) + ">=" + Cells.signedPercent(e.getValue()));
        }
        return String.join(", ", parts);
    }
}
