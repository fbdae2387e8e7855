package dev.yoke.engine;

/**
 * Keeps the first N rows of an order out of a stream of rows in bounded memory: N kept slots
 * plus a batch of pending slots. A new row worse than the current N-th is dropped at once;
 * when the batch is full it is sorted and merged with the kept rows (O(B log B + N) per batch).
 * Rows are written in place and never moved; only slot numbers are shuffled.
 */
final class TopBuffer {

    final RowStore store;
    private final int limit;
    private final RowOrder order;
    private int[] kept;
    private int keptCount;
    private final int[] pending;
    private int pendingCount;
    private final int[] free;
    private int freeCount;
    private int[] merged;

    TopBuffer(int limit, PartRanks ranks, java.util.List<SortKey> keys) {
        this.limit = limit;
        int batch = Math.max(1024, Math.min(limit, 1 << 16));
        int capacity = limit + batch;
        store = new RowStore(capacity);
        store.size = capacity;
        order = new RowOrder(store, ranks, null, keys);
        kept = new int[limit];
        merged = new int[limit];
        pending = new int[capacity];
        free = new int[capacity];
        for (int i = 0; i < capacity; i++) {
            free[i] = capacity - 1 - i;
        }
        freeCount = capacity;
    }

    /** A free slot to write the next candidate row into. */
    int claim() {
        return free[freeCount - 1];
    }

    /**
     * Whether the row in {@link #claim()}'s slot would be kept: false when it is not better than
     * the N-th kept row. Only the sort-key columns of the slot need to be written for this.
     */
    boolean wouldKeep() {
        return keptCount < limit || order.compare(free[freeCount - 1], kept[limit - 1]) < 0;
    }

    /** Keeps the row just written into {@link #claim()}'s slot (after {@link #wouldKeep()} said yes). */
    void offer() {
        int slot = free[freeCount - 1];
        freeCount--;
        pending[pendingCount++] = slot;
        if (freeCount == 0) {
            flush();
        }
    }

    /** Sorts the pending rows and merges them into the kept rows. */
    void flush() {
        if (pendingCount == 0) {
            return;
        }
        IntSort.sort(pending, pendingCount, order);
        int i = 0;
        int j = 0;
        int n = 0;
        while (n < limit && (i < keptCount || j < pendingCount)) {
            if (j >= pendingCount || (i < keptCount && order.compare(kept[i], pending[j]) <= 0)) {
                merged[n++] = kept[i++];
            } else {
                merged[n++] = pending[j++];
            }
        }
        while (i < keptCount) {
            free[freeCount++] = kept[i++];
        }
        while (j < pendingCount) {
            free[freeCount++] = pending[j++];
        }
        int[] swap = kept;
        kept = merged;
        merged = swap;
        keptCount = n;
        pendingCount = 0;
    }

    /** Kept slots in order (after {@link #flush()}). */
    int[] keptRows() {
        return java.util.Arrays.copyOf(kept, keptCount);
    }
}
