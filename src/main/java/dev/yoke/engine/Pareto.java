package dev.yoke.engine;

/**
 * The cost–loss Pareto front: a pairing is on it when it is feasible and no other feasible
 * pairing is both no more expensive and no lossier (total loss over the cycle) while strictly
 * better in one of the two. Infeasible pairings are never on the front: a cheaper pairing that
 * burns is no alternative. Pairings with equal cost and equal loss are all on the front.
 *
 * <p>O(n log n): sort by cost then loss and sweep, keeping the least loss seen at a strictly
 * lower cost (the maxima-of-a-point-set sweep, Kung, Luccio &amp; Preparata, J. ACM 22(4), 1975).
 */
final class Pareto {

    private Pareto() {
    }

    /** The front's rows of {@code store[0..size)} as a bit set. */
    static long[] mark(RowStore store) {
        int n = store.size;
        long[] bits = new long[(n + 63) >>> 6];
        float[] cost = store.values[Metric.COST.ordinal()];
        float[] loss = store.values[Metric.TOTAL_LOSS.ordinal()];
        int[] rows = new int[n];
        int count = 0;
        for (int r = 0; r < n; r++) {
            if (store.feasible(r) && !Float.isNaN(cost[r]) && !Float.isNaN(loss[r])) {
                rows[count++] = r;
            }
        }
        IntSort.sort(rows, count, (a, b) -> {
            int c = Float.compare(cost[a], cost[b]);
            return c != 0 ? c : Float.compare(loss[a], loss[b]);
        });
        float bestBelow = Float.POSITIVE_INFINITY;   // least loss among strictly cheaper rows
        int i = 0;
        while (i < count) {
            float groupCost = cost[rows[i]];
            float groupLeast = loss[rows[i]];       // sorted: the first of the group has its least loss
            int j = i;
            while (j < count && cost[rows[j]] == groupCost) {
                int r = rows[j];
                if (loss[r] == groupLeast && groupLeast < bestBelow) {
                    RowOrder.setBit(bits, r);
                }
                j++;
            }
            bestBelow = Math.min(bestBelow, groupLeast);
            i = j;
        }
        return bits;
    }
}
