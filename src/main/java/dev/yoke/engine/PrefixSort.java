package dev.yoke.engine;

import java.util.Arrays;
import java.util.List;

/**
 * Sorts row indexes by packing, for each row, an order-preserving code of the leading sort keys
 * and the row index into one {@code long} and sorting those primitives; rows whose codes tie are
 * then put in order by the full comparator. Correct for any keys because each code is a
 * non-decreasing function of the full order (a tie only defers to the comparator); several times
 * faster than comparator sorting because most rows differ in the first 32 bits (the classic
 * key-prefix technique of database sorting, e.g. Graefe, "Implementing sorting in database
 * systems", ACM Computing Surveys 38(3), 2006, §3).
 */
final class PrefixSort {

    private static final List<SortKey> IDENTITY = List.of(SortKey.ascending(Column.MOTOR),
            SortKey.ascending(Column.SWITCH), SortKey.ascending(Column.FREQUENCY), SortKey.ascending(Column.RATIO));

    private PrefixSort() {
    }

    static void sort(int[] rows, int count, RowStore store, PartRanks ranks, long[] pareto, List<SortKey> keys,
                     RowOrder full) {
        if (count < 64) {
            IntSort.sort(rows, count, full);
            return;
        }
        int rowBits = 64 - Long.numberOfLeadingZeros(Math.max(1, store.size - 1));
        int budget = 63 - rowBits; // the sign bit stays clear, so signed order is unsigned order
        long[] packed = new long[count];
        // Encode key by key, as many bits as fit; a key that does not fit whole gives its top bits.
        int used = 0;
        List<SortKey> all = new java.util.ArrayList<>(keys);
        all.addAll(IDENTITY); // every order ends with the identity tie-break
        for (SortKey key : all) {
            if (used >= budget) {
                break;
            }
            int width = width(key, store, ranks);
            int take = Math.min(width, budget - used);
            int drop = width - take;
            for (int i = 0; i < count; i++) {
                long code = code(key, rows[i], store, ranks, pareto) >>> drop;
                packed[i] = (packed[i] << take) | code;
            }
            used += take;
            if (drop > 0) {
                break;
            }
        }
        for (int i = 0; i < count; i++) {
            packed[i] = (packed[i] << rowBits) | rows[i];
        }
        Arrays.sort(packed);
        long rowMask = (1L << rowBits) - 1;
        for (int i = 0; i < count; i++) {
            rows[i] = (int) (packed[i] & rowMask);
        }
        // Rows with equal codes: order them by the whole comparator.
        int start = 0;
        int[] run = new int[16];
        for (int i = 1; i <= count; i++) {
            if (i == count || (packed[i] >>> rowBits) != (packed[start] >>> rowBits)) {
                int n = i - start;
                if (n > 1) {
                    if (run.length < n) {
                        run = new int[Math.max(n, run.length * 2)];
                    }
                    System.arraycopy(rows, start, run, 0, n);
                    IntSort.sort(run, n, full);
                    System.arraycopy(run, 0, rows, start, n);
                }
                start = i;
            }
        }
    }

    private static int width(SortKey key, RowStore store, PartRanks ranks) {
        return switch (key.column().kind()) {
            case METRIC -> key.column().metric() == Metric.FEASIBLE ? 2 : 32;
            case MOTOR -> bits(ranks.motor.length);
            case SWITCH -> bits(ranks.powerSwitch.length);
            case FREQUENCY -> bits(ranks.frequency.length);
            case RATIO -> bits(ranks.ratio.length);
            case PARETO -> 1;
        };
    }

    private static int bits(int distinct) {
        return Math.max(1, 32 - Integer.numberOfLeadingZeros(Math.max(1, distinct - 1)));
    }

    /** An unsigned code, within the key's width, that never decreases along the key's order. */
    private static long code(SortKey key, int row, RowStore s, PartRanks ranks, long[] pareto) {
        boolean desc = key.descending();
        switch (key.column().kind()) {
            case METRIC -> {
                float v = s.values[key.column().metric().ordinal()][row];
                if (key.column().metric() == Metric.FEASIBLE) {
                    if (v != v) {
                        return 3; // NaN last in both directions
                    }
                    long c = v > 0 ? 1 : 0;
                    return desc ? 1 - c : c;
                }
                if (v != v) {
                    return 0xFFFF_FFFFL; // NaN last in both directions
                }
                int bits = Float.floatToRawIntBits(v);
                int ordered = bits ^ ((bits >> 31) & 0x7FFF_FFFF); // signed order = Float.compare order
                long u = (ordered ^ 0x8000_0000) & 0xFFFF_FFFFL;
                // -Inf..+Inf map below 0xFFFF_FFFF in either direction, so NaN stays alone at the end
                return desc ? (~u & 0xFFFF_FFFFL) - 1 : u;
            }
            case MOTOR -> {
                int r = ranks.motor[s.motor[row]];
                return desc ? ranks.motor.length - 1 - r : r;
            }
            case SWITCH -> {
                int r = ranks.powerSwitch[s.powerSwitch[row]];
                return desc ? ranks.powerSwitch.length - 1 - r : r;
            }
            case FREQUENCY -> {
                int r = ranks.frequency[s.frequency[row]];
                return desc ? ranks.frequency.length - 1 - r : r;
            }
            case RATIO -> {
                int r = ranks.ratio[s.ratio[row]];
                return desc ? ranks.ratio.length - 1 - r : r;
            }
            default -> {
                long c = pareto != null && RowOrder.bit(pareto, row) ? 1 : 0;
                return desc ? 1 - c : c;
            }
        }
    }
}
