package dev.yoke.engine;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One level of a sort: a column and its direction. Missing values (NaN) always sort last,
 * whatever the direction.
 *
 * <p>Text form: {@code KEY} or {@code KEY:asc} ascending, {@code KEY:desc} descending;
 * several keys separated by commas, e.g. {@code feasible:desc,total_loss,cost}.
 */
public record SortKey(Column column, boolean descending) {

    /**
     * The order used when the user asks for none: feasible pairings first, then the least total
     * loss over the cycle (bridge + motor + gate drive), ties by cost, then by motor id, switch id,
     * PWM frequency and gear ratio (the identity tie-break every order ends with).
     */
    public static final List<SortKey> DEFAULT = List.of(
            new SortKey(Column.of(Metric.FEASIBLE), true),
            new SortKey(Column.of(Metric.TOTAL_LOSS), false),
            new SortKey(Column.of(Metric.COST), false));

    public static SortKey ascending(Column column) {
        return new SortKey(column, false);
    }

    public static SortKey descending(Column column) {
        return new SortKey(column, true);
    }

    /**
     * Parses {@code KEY[:asc|:desc][,KEY…]}.
     *
     * @throws IllegalArgumentException naming the bad part and the expected form
     */
    public static List<SortKey> parseList(String text) {
        List<SortKey> keys = new ArrayList<>();
        for (String part : text.split(",")) {
            if (part.isBlank()) {
                continue;
            }
            keys.add(parse(part));
        }
        if (keys.isEmpty()) {
            throw new IllegalArgumentException("expected KEY[:asc|:desc][,KEY...] but was '" + text + "'");
        }
        return List.copyOf(keys);
    }

    /** Parses one {@code KEY[:asc|:desc]}. */
    public static SortKey parse(String text) {
        String t = text.trim();
        boolean desc = false;
        int colon = t.lastIndexOf(':');
        if (colon >= 0) {
            String dir = t.substring(colon + 1).trim().toLowerCase(Locale.ROOT);
            if (dir.equals("desc")) {
                desc = true;
            } else if (!dir.equals("asc")) {
                throw new IllegalArgumentException("sort direction must be 'asc' or 'desc' but was '" + dir + "' in '" + t + "'");
            }
            t = t.substring(0, colon);
        }
        return new SortKey(Column.parse(t), desc);
    }

    @Override
    public String toString() {
        return column.key() + (descending ? ":desc" : "");
    }
}
