package dev.yoke.tui;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * How the shortlist is shown: up to two sort keys and the filters. Immutable; each change gives
 * a new value, so the export writes exactly the view on screen.
 *
 * @param sort         first and (optional) second sort key
 * @param feasibleOnly hide pairings with a negative margin
 * @param paretoOnly   hide pairings off the Pareto front
 * @param text         keep pairings whose motor or switch id or label contains this (case ignored); "" keeps all
 * @param thresholds   per margin column, the smallest margin kept (signed fraction)
 */
public record ViewSettings(
        List<SortKey> sort,
        boolean feasibleOnly,
        boolean paretoOnly,
        String text,
        Map<ShortlistColumn, Double> thresholds) {

    /** Safest pairings first (largest binding margin), no filters. */
    public static final ViewSettings DEFAULT = new ViewSettings(
            List.of(new SortKey(ShortlistColumn.BINDING_MARGIN, true)), false, false, "", Map.of());

    public ViewSettings {
        if (sort.isEmpty() || sort.size() > 2) {
            throw new IllegalArgumentException("one or two sort keys expected, got " + sort.size());
        }
        sort = List.copyOf(sort);
        text = text == null ? "" : text.strip();
        for (ShortlistColumn c : thresholds.keySet()) {
            if (!c.isMargin()) {
                throw new IllegalArgumentException("thresholds apply to margin columns only, got " + c);
            }
        }
        thresholds = thresholds.isEmpty() ? Map.of() : Collections.unmodifiableMap(new EnumMap<>(thresholds));
    }

    /** Sorts by a column first: in its natural direction, or reversed when it already is first. */
    public ViewSettings sortedBy(ShortlistColumn column) {
        SortKey first = sort.get(0);
        List<SortKey> keys = new ArrayList<>();
        keys.add(first.column() == column ? first.reversed() : SortKey.natural(column));
        if (sort.size() > 1 && sort.get(1).column() != column) {
            keys.add(sort.get(1));
        }
        return new ViewSettings(keys, feasibleOnly, paretoOnly, text, thresholds);
    }

    /** Sets the second sort key, reversing it when it already is second; ignored for the first key's column. */
    public ViewSettings thenSortedBy(ShortlistColumn column) {
        SortKey first = sort.get(0);
        if (first.column() == column) {
            return this;
        }
        SortKey second = sort.size() > 1 && sort.get(1).column() == column ? sort.get(1).reversed() : SortKey.natural(column);
        return new ViewSettings(List.of(first, second), feasibleOnly, paretoOnly, text, thresholds);
    }

    public ViewSettings withFeasibleOnly(boolean on) {
        return new ViewSettings(sort, on, paretoOnly, text, thresholds);
    }

    public ViewSettings withParetoOnly(boolean on) {
        return new ViewSettings(sort, feasibleOnly, on, text, thresholds);
    }

    public ViewSettings withText(String newText) {
        return new ViewSettings(sort, feasibleOnly, paretoOnly, newText, thresholds);
    }

    /** Adds or replaces a margin threshold; NaN removes it. */
    public ViewSettings withThreshold(ShortlistColumn column, double minimum) {
        Map<ShortlistColumn, Double> t = new EnumMap<>(ShortlistColumn.class);
        t.putAll(thresholds);
        if (Double.isNaN(minimum)) {
            t.remove(column);
        } else {
            t.put(column, minimum);
        }
        return new ViewSettings(sort, feasibleOnly, paretoOnly, text, t);
    }

    /** Same sort, no filters. */
    public ViewSettings withoutFilters() {
        return new ViewSettings(sort, false, false, "", Map.of());
    }

    public boolean hasFilters() {
        return feasibleOnly || paretoOnly || !text.isEmpty() || !thresholds.isEmpty();
    }

    /** The sort in words, e.g. "margin desc, cost asc". */
    public String describeSort() {
        StringBuilder s = new StringBuilder();
        for (SortKey k : sort) {
            if (s.length() > 0) {
                s.append(", ");
            }
            s.append(k.column() == ShortlistColumn.FRONT ? "front" : k.column().title())
                    .append(k.descending() ? " desc" : " asc");
        }
        return s.toString();
    }

    /** The filters in words, e.g. "feasible, Pareto, /mx, margin>=+5.0%"; "" when none. */
    public String describeFilters() {
        List<String> parts = new ArrayList<>();
        if (feasibleOnly) {
            parts.add("feasible");
        }
        if (paretoOnly) {
            parts.add("Pareto");
        }
        if (!text.isEmpty()) {
            parts.add("/" + text);
        }
        for (Map.Entry<ShortlistColumn, Double> e : thresholds.entrySet()) {
            parts.add(e.getKey().title() + ">=" + Cells.signedPercent(e.getValue()));
        }
        return String.join(", ", parts);
    }

    String needle() {
        return text.toLowerCase(Locale.ROOT);
    }
}
