package dev.yoke.engine;

import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;

/**
 * Which rows to show. Every condition must hold.
 *
 * @param feasibleOnly only pairings with no negative margin
 * @param paretoOnly   only pairings on the cost–loss front
 * @param maxCost      cost at most this (positive infinity: no limit)
 * @param text         words separated by spaces; each must occur (case-insensitive) in the motor's
 *                     or the switch's id or label; empty: no text condition
 * @param atLeast      per metric, the least value allowed (e.g. {@code margin_junction ≥ 0.1})
 */
public record RowFilter(boolean feasibleOnly, boolean paretoOnly, double maxCost, String text, Map<Metric, Double> atLeast) {

    /** Shows every row. */
    public static final RowFilter ALL = new RowFilter(false, false, Double.POSITIVE_INFINITY, "", Map.of());

    public RowFilter {
        if (Double.isNaN(maxCost)) {
            throw new IllegalArgumentException("maxCost must be a number");
        }
        text = text == null ? "" : text.trim();
        atLeast = Map.copyOf(atLeast);
    }

    public RowFilter withFeasibleOnly(boolean on) {
        return new RowFilter(on, paretoOnly, maxCost, text, atLeast);
    }

    public RowFilter withParetoOnly(boolean on) {
        return new RowFilter(feasibleOnly, on, maxCost, text, atLeast);
    }

    public RowFilter withMaxCost(double cost) {
        return new RowFilter(feasibleOnly, paretoOnly, cost, text, atLeast);
    }

    public RowFilter withText(String words) {
        return new RowFilter(feasibleOnly, paretoOnly, maxCost, words, atLeast);
    }

    /** Adds (or replaces) a lower bound on one metric, typically a margin. */
    public RowFilter withAtLeast(Metric metric, double least) {
        EnumMap<Metric, Double> m = new EnumMap<>(Metric.class);
        m.putAll(atLeast);
        m.put(metric, least);
        return new RowFilter(feasibleOnly, paretoOnly, maxCost, text, m);
    }

    /** True when the filter lets every row through. */
    public boolean isEmpty() {
        return !feasibleOnly && !paretoOnly && maxCost == Double.POSITIVE_INFINITY && text.isEmpty() && atLeast.isEmpty();
    }

    /** The filter made ready for one catalog: the text matched once per part, not once per row. */
    Prepared prepare(Catalog catalog) {
        return new Prepared(this, catalog);
    }

    /** A filter bound to a catalog. */
    static final class Prepared {
        private final RowFilter filter;
        private final boolean[][] motorMatches;
        private final boolean[][] switchMatches;
        private final int[] boundMetric;
        private final float[] bound;

        Prepared(RowFilter filter, Catalog catalog) {
            this.filter = filter;
            String[] words = filter.text.isEmpty() ? new String[0] : filter.text.toLowerCase(Locale.ROOT).split("\\s+");
            motorMatches = new boolean[words.length][catalog.motors().size()];
            switchMatches = new boolean[words.length][catalog.switches().size()];
            for (int w = 0; w < words.length; w++) {
                for (int i = 0; i < catalog.motors().size(); i++) {
                    Motor m = catalog.motors().get(i);
                    motorMatches[w][i] = contains(m.id(), words[w]) || contains(m.label(), words[w]);
                }
                for (int i = 0; i < catalog.switches().size(); i++) {
                    PowerSwitch s = catalog.switches().get(i);
                    switchMatches[w][i] = contains(s.id(), words[w]) || contains(s.label(), words[w]);
                }
            }
            boundMetric = new int[filter.atLeast.size()];
            bound = new float[filter.atLeast.size()];
            int k = 0;
            for (Map.Entry<Metric, Double> e : sorted(filter.atLeast).entrySet()) {
                boundMetric[k] = e.getKey().ordinal();
                bound[k] = e.getValue().floatValue();
                k++;
            }
        }

        private static Map<Metric, Double> sorted(Map<Metric, Double> m) {
            EnumMap<Metric, Double> out = new EnumMap<>(Metric.class);
            out.putAll(m);
            return out;
        }

        private static boolean contains(String field, String word) {
            return field != null && field.toLowerCase(Locale.ROOT).contains(word);
        }

        /** Ordinals of the metric columns the filter reads. */
        int[] metricsRead() {
            java.util.BitSet used = new java.util.BitSet();
            if (filter.feasibleOnly) {
                used.set(Metric.FEASIBLE.ordinal());
            }
            if (filter.maxCost != Double.POSITIVE_INFINITY) {
                used.set(Metric.COST.ordinal());
            }
            for (int m : boundMetric) {
                used.set(m);
            }
            return used.stream().toArray();
        }

        /** Every condition but the Pareto one (which needs the whole sweep). */
        boolean testWithoutPareto(RowStore s, int row) {
            if (filter.feasibleOnly && !s.feasible(row)) {
                return false;
            }
            if (filter.maxCost != Double.POSITIVE_INFINITY && !(s.values[Metric.COST.ordinal()][row] <= filter.maxCost)) {
                return false;
            }
            for (int k = 0; k < bound.length; k++) {
                if (!(s.values[boundMetric[k]][row] >= bound[k])) {
                    return false;
                }
            }
            for (int w = 0; w < motorMatches.length; w++) {
                if (!motorMatches[w][s.motor[row]] && !switchMatches[w][s.powerSwitch[row]]) {
                    return false;
                }
            }
            return true;
        }

        boolean test(RowStore s, long[] pareto, int row) {
            return (!filter.paretoOnly || RowOrder.bit(pareto, row)) && testWithoutPareto(s, row);
        }
    }
}
