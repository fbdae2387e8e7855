package dev.yoke.tui;

import dev.yoke.engine.Metric;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Applies {@link ViewSettings} to a table: the rows that pass the filters, in sort order.
 * Sorts an array of row indexes with primitive keys (never the data), stable, so equal keys keep
 * the table's order and a second key refines the first; NaN sorts last in both directions.
 */
public final class ViewOrder {

    private ViewOrder() {
    }

    /** Row indexes of {@code table} to show, in order. */
    public static int[] compute(PairingTable table, ShortlistContext context, ViewSettings view) {
        int n = table.size();
        boolean[] motorMatch = null;
        boolean[] switchMatch = null;
        String needle = view.needle();
        if (!needle.isEmpty()) {
            List<Motor> motors = context.catalog().motors();
            motorMatch = new boolean[motors.size()];
            for (int i = 0; i < motorMatch.length; i++) {
                motorMatch[i] = contains(motors.get(i).id(), needle) || contains(motors.get(i).label(), needle);
            }
            List<PowerSwitch> switches = context.catalog().switches();
            switchMatch = new boolean[switches.size()];
            for (int i = 0; i < switchMatch.length; i++) {
                switchMatch[i] = contains(switches.get(i).id(), needle) || contains(switches.get(i).label(), needle);
            }
        }
        Metric[] thresholdMetrics = new Metric[view.thresholds().size()];
        double[] thresholdValues = new double[thresholdMetrics.length];
        int t = 0;
        for (Map.Entry<ShortlistColumn, Double> e : view.thresholds().entrySet()) {
            thresholdMetrics[t] = e.getKey().metric();
            thresholdValues[t++] = e.getValue();
        }

        int[] rows = new int[n];
        int count = 0;
        for (int r = 0; r < n; r++) {
            if (view.feasibleOnly() && !(table.value(r, Metric.FEASIBLE) >= 0.5)) {
                continue;
            }
            if (view.paretoOnly() && !table.isPareto(r)) {
                continue;
            }
            if (motorMatch != null && !motorMatch[table.motorIndex(r)] && !switchMatch[table.switchIndex(r)]) {
                continue;
            }
            boolean pass = true;
            for (int i = 0; i < thresholdMetrics.length && pass; i++) {
                pass = table.value(r, thresholdMetrics[i]) >= thresholdValues[i];
            }
            if (pass) {
                rows[count++] = r;
            }
        }
        rows = count == n ? rows : Arrays.copyOf(rows, count);

        List<SortKey> sort = view.sort();
        double[] first = keys(table, context, rows, sort.get(0));
        double[] second = sort.size() > 1 ? keys(table, context, rows, sort.get(1)) : null;
        int[] positions = new int[count];
        for (int i = 0; i < count; i++) {
            positions[i] = i;
        }
        mergeSort(positions, new int[count], 0, count, first, second);
        int[] out = new int[count];
        for (int i = 0; i < count; i++) {
            out[i] = rows[positions[i]];
        }
        return out;
    }

    private static boolean contains(String haystack, String needle) {
        return haystack != null && haystack.toLowerCase(Locale.ROOT).contains(needle);
    }

    /** Sort keys by position, negated for descending so the sort itself always ascends. */
    private static double[] keys(PairingTable table, ShortlistContext context, int[] rows, SortKey key) {
        double[] k = new double[rows.length];
        for (int i = 0; i < rows.length; i++) {
            double v = key.column().sortKey(table, rows[i], context);
            k[i] = key.descending() ? -v : v;
        }
        return k;
    }

    private static int compare(int a, int b, double[] first, double[] second) {
        int c = compareKey(first[a], first[b]);
        if (c == 0 && second != null) {
            c = compareKey(second[a], second[b]);
        }
        return c;
    }

    /** Ascending with NaN after every number. */
    private static int compareKey(double x, double y) {
        boolean xn = Double.isNaN(x);
        boolean yn = Double.isNaN(y);
        if (xn || yn) {
            return xn == yn ? 0 : xn ? 1 : -1;
        }
        return x < y ? -1 : x > y ? 1 : 0;
    }

    /** Stable top-down merge sort of {@code a[from, to)}; insertion sort below 32 elements. */
    private static void mergeSort(int[] a, int[] tmp, int from, int to, double[] first, double[] second) {
        if (to - from < 32) {
            for (int i = from + 1; i < to; i++) {
                int v = a[i];
                int j = i - 1;
                while (j >= from && compare(a[j], v, first, second) > 0) {
                    a[j + 1] = a[j];
                    j--;
                }
                a[j + 1] = v;
            }
            return;
        }
        int mid = (from + to) >>> 1;
        mergeSort(a, tmp, from, mid, first, second);
        mergeSort(a, tmp, mid, to, first, second);
        if (compare(a[mid - 1], a[mid], first, second) <= 0) {
            return;
        }
        System.arraycopy(a, from, tmp, from, to - from);
        int i = from;
        int j = mid;
        int k = from;
        while (i < mid && j < to) {
            a[k++] = compare(tmp[j], tmp[i], first, second) < 0 ? tmp[j++] : tmp[i++];
        }
        while (i < mid) {
            a[k++] = tmp[i++];
        }
        while (j < to) {
            a[k++] = tmp[j++];
        }
    }
}
