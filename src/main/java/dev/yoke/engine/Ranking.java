package dev.yoke.engine;

import java.util.Arrays;
import java.util.List;

/**
 * Orders and filters the rows of a {@link Shortlist} as arrays of row indexes; the rows never move.
 *
 * <p>Every order ends with the identity tie-break (motor id, switch id, PWM frequency, gear ratio),
 * so it is total and the same on every run. {@link SortKey#DEFAULT}: feasible first, then least
 * total loss over the cycle, ties by cost.
 */
public final class Ranking {

    private Ranking() {
    }

    /** All rows in the given order. */
    public static int[] order(Shortlist shortlist, List<SortKey> keys) {
        return view(shortlist, keys, RowFilter.ALL);
    }

    /** The rows that pass {@code filter}, in the given order: what a screen or an export shows. */
    public static int[] view(Shortlist shortlist, List<SortKey> keys, RowFilter filter) {
        RowStore store = shortlist.store();
        int n = store.size;
        int[] rows = new int[n];
        int count = 0;
        if (filter.isEmpty()) {
            for (int r = 0; r < n; r++) {
                rows[r] = r;
            }
            count = n;
        } else {
            RowFilter.Prepared f = filter.prepare(shortlist.evaluator().catalog());
            long[] pareto = shortlist.paretoBits();
            for (int r = 0; r < n; r++) {
                if (f.test(store, pareto, r)) {
                    rows[count++] = r;
                }
            }
        }
        RowOrder full = new RowOrder(store, shortlist.ranks(), shortlist.paretoBits(), keys);
        PrefixSort.sort(rows, count, store, shortlist.ranks(), shortlist.paretoBits(), keys, full);
        return count == n ? rows : Arrays.copyOf(rows, count);
    }

    /** The rows that pass {@code filter}, in their stored order (no sort). */
    public static int[] filter(Shortlist shortlist, int[] rows, RowFilter filter) {
        if (filter.isEmpty()) {
            return rows.clone();
        }
        RowFilter.Prepared f = filter.prepare(shortlist.evaluator().catalog());
        int[] out = new int[rows.length];
        int count = 0;
        for (int r : rows) {
            if (f.test(shortlist.store(), shortlist.paretoBits(), r)) {
                out[count++] = r;
            }
        }
        return Arrays.copyOf(out, count);
    }
}
