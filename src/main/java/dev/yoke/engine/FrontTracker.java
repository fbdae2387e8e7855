package dev.yoke.engine;

import java.util.Arrays;

/**
 * Collects, from a stream of rows, every row that may be on the cost–loss front of feasible
 * pairings, in memory proportional to the front. A candidate dominated by the front known at the
 * last compaction is dropped at once (binary search: along the front, loss falls as cost rises);
 * the others are kept, and the store is cut back to its own front whenever it doubles.
 */
final class FrontTracker {

    final RowStore store = new RowStore(256);
    private float[] frontCost = new float[0];
    private float[] frontLoss = new float[0];
    private int compactAt = 1024;

    /** Considers a feasible pairing's summary row. */
    void offer(double[] summary, int motor, int powerSwitch, int frequency, int ratio) {
        float cost = (float) summary[Metric.COST.ordinal()];
        float loss = (float) summary[Metric.TOTAL_LOSS.ordinal()];
        if (Float.isNaN(cost) || Float.isNaN(loss) || dominated(cost, loss)) {
            return;
        }
        store.ensureCapacity(store.size + 1);
        store.set(store.size++, motor, powerSwitch, frequency, ratio, summary);
        if (store.size >= compactAt) {
            compact();
        }
    }

    private boolean dominated(float cost, float loss) {
        int lo = 0;
        int hi = frontCost.length - 1;
        int found = -1;
        while (lo <= hi) {
            int mid = (lo + hi) >>> 1;
            if (frontCost[mid] <= cost) {
                found = mid;
                lo = mid + 1;
            } else {
                hi = mid - 1;
            }
        }
        return found >= 0 && frontLoss[found] <= loss && !(frontCost[found] == cost && frontLoss[found] == loss);
    }

    /** Cuts the store back to its front and refreshes the quick test. */
    void compact() {
        long[] bits = Pareto.mark(store);
        int[] rows = new int[store.size];
        int n = 0;
        for (int r = 0; r < store.size; r++) {
            if (RowOrder.bit(bits, r)) {
                rows[n++] = r;
            }
        }
        store.compact(rows, n);
        float[] cost = store.values[Metric.COST.ordinal()];
        float[] loss = store.values[Metric.TOTAL_LOSS.ordinal()];
        int[] byCost = Arrays.copyOf(rows, n);
        for (int i = 0; i < n; i++) {
            byCost[i] = i;
        }
        IntSort.sort(byCost, n, (a, b) -> {
            int c = Float.compare(cost[a], cost[b]);
            return c != 0 ? c : Float.compare(loss[a], loss[b]);
        });
        frontCost = new float[n];
        frontLoss = new float[n];
        int k = 0;
        for (int i = 0; i < n; i++) {
            int r = byCost[i];
            if (k > 0 && frontCost[k - 1] == cost[r]) {
                continue; // equal cost and (on a front) equal loss: one entry is enough
            }
            frontCost[k] = cost[r];
            frontLoss[k] = loss[r];
            k++;
        }
        frontCost = Arrays.copyOf(frontCost, k);
        frontLoss = Arrays.copyOf(frontLoss, k);
        compactAt = Math.max(1024, 2 * n);
    }
}
