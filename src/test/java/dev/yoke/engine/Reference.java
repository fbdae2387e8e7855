package dev.yoke.engine;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Independent reference for the ranking tests: rows copied into plain objects and sorted with
 * {@link java.util.List#sort} and a {@link Comparator} chain, and a quadratic Pareto check
 * straight from the definition.
 */
final class Reference {

    record Row(int row, String motorId, String switchId, double frequency, double ratio, boolean pareto, double[] values) {
        double value(Column c) {
            return switch (c.kind()) {
                case METRIC -> values[c.metric().ordinal()];
                case FREQUENCY -> frequency;
                case RATIO -> ratio;
                case PARETO -> pareto ? 1 : 0;
                default -> throw new IllegalArgumentException();
            };
        }

        /** Identity as text, to compare sequences of rows between shortlists. */
        String identity() {
            return motorId + "|" + switchId + "|" + frequency + "|" + ratio;
        }
    }

    private Reference() {
    }

    static List<Row> rows(Shortlist s) {
        List<Row> out = new ArrayList<>();
        for (int r = 0; r < s.size(); r++) {
            double[] v = new double[Metric.COUNT];
            for (Metric m : Metric.values()) {
                v[m.ordinal()] = s.value(r, m);
            }
            out.add(new Row(r, s.motorId(r), s.switchId(r), s.frequency(r), s.ratio(r), s.isPareto(r), v));
        }
        return out;
    }

    static Comparator<Row> comparator(List<SortKey> keys) {
        Comparator<Row> c = (a, b) -> 0;
        for (SortKey k : keys) {
            Comparator<Row> one = switch (k.column().kind()) {
                case MOTOR -> Comparator.comparing(Row::motorId);
                case SWITCH -> Comparator.comparing(Row::switchId);
                default -> (a, b) -> {
                    double x = a.value(k.column());
                    double y = b.value(k.column());
                    if (Double.isNaN(x) || Double.isNaN(y)) {
                        return 0; // handled below so NaN is last in both directions
                    }
                    return Double.compare(x, y);
                };
            };
            Comparator<Row> directed = k.descending() ? one.reversed() : one;
            if (k.column().kind() == Column.Kind.METRIC) {
                Comparator<Row> nanLast = Comparator.comparing(r -> Double.isNaN(r.value(k.column())));
                directed = nanLast.thenComparing(directed);
            }
            c = c.thenComparing(directed);
        }
        return c.thenComparing(Row::motorId).thenComparing(Row::switchId)
                .thenComparingDouble(Row::frequency).thenComparingDouble(Row::ratio);
    }

    /** Straight from the definition: feasible, and no feasible row is no worse in both and better in one. */
    static boolean onFrontBruteForce(List<Row> rows, Row p) {
        double cost = p.values[Metric.COST.ordinal()];
        double loss = p.values[Metric.TOTAL_LOSS.ordinal()];
        if (p.values[Metric.FEASIBLE.ordinal()] == 0 || Double.isNaN(cost) || Double.isNaN(loss)) {
            return false;
        }
        for (Row q : rows) {
            if (q.values[Metric.FEASIBLE.ordinal()] == 0) {
                continue;
            }
            double c = q.values[Metric.COST.ordinal()];
            double l = q.values[Metric.TOTAL_LOSS.ordinal()];
            if (c <= cost && l <= loss && (c < cost || l < loss)) {
                return false;
            }
        }
        return true;
    }
}
