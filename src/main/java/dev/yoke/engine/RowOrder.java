package dev.yoke.engine;

import java.util.List;

/**
 * Compares rows of a store by a list of {@link SortKey}s, then by identity (motor id, switch id,
 * frequency, ratio) so that the order is total and repeatable. NaN sorts last in either direction.
 */
final class RowOrder implements IntSort.RowComparator {

    private static final int METRIC = 0;
    private static final int MOTOR = 1;
    private static final int SWITCH = 2;
    private static final int FREQUENCY = 3;
    private static final int RATIO = 4;
    private static final int PARETO = 5;

    private final RowStore store;
    private final PartRanks ranks;
    private final long[] pareto;
    private final int[] kind;
    private final boolean[] descending;
    private final float[][] column;

    /**
     * @param pareto the Pareto bits of the store, or null to treat every row as equal on that key
     *               (while streaming, when the front is not yet known)
     */
    RowOrder(RowStore store, PartRanks ranks, long[] pareto, List<SortKey> keys) {
        this.store = store;
        this.ranks = ranks;
        this.pareto = pareto;
        int n = keys.size();
        kind = new int[n];
        descending = new boolean[n];
        column = new float[n][];
        for (int k = 0; k < n; k++) {
            SortKey key = keys.get(k);
            descending[k] = key.descending();
            switch (key.column().kind()) {
                case METRIC -> {
                    kind[k] = METRIC;
                    column[k] = store.values[key.column().metric().ordinal()];
                }
                case MOTOR -> kind[k] = MOTOR;
                case SWITCH -> kind[k] = SWITCH;
                case FREQUENCY -> kind[k] = FREQUENCY;
                case RATIO -> kind[k] = RATIO;
                case PARETO -> kind[k] = PARETO;
                default -> throw new IllegalStateException();
            }
        }
    }

    @Override
    public int compare(int a, int b) {
        RowStore s = store;
        for (int k = 0; k < kind.length; k++) {
            int c;
            switch (kind[k]) {
                case METRIC -> {
                    float x = column[k][a];
                    float y = column[k][b];
                    boolean nx = x != x;
                    boolean ny = y != y;
                    if (nx || ny) {
                        c = nx == ny ? 0 : (nx ? 1 : -1);
                        if (c != 0) {
                            return c;
                        }
                        continue;
                    }
                    c = Float.compare(x, y);
                }
                case MOTOR -> c = Integer.compare(ranks.motor[s.motor[a]], ranks.motor[s.motor[b]]);
                case SWITCH -> c = Integer.compare(ranks.powerSwitch[s.powerSwitch[a]], ranks.powerSwitch[s.powerSwitch[b]]);
                case FREQUENCY -> c = Integer.compare(ranks.frequency[s.frequency[a]], ranks.frequency[s.frequency[b]]);
                case RATIO -> c = Integer.compare(ranks.ratio[s.ratio[a]], ranks.ratio[s.ratio[b]]);
                default -> c = pareto == null ? 0 : Boolean.compare(bit(pareto, a), bit(pareto, b));
            }
            if (c != 0) {
                return descending[k] ? -c : c;
            }
        }
        int c = Integer.compare(ranks.motor[s.motor[a]], ranks.motor[s.motor[b]]);
        if (c == 0) {
            c = Integer.compare(ranks.powerSwitch[s.powerSwitch[a]], ranks.powerSwitch[s.powerSwitch[b]]);
        }
        if (c == 0) {
            c = Integer.compare(ranks.frequency[s.frequency[a]], ranks.frequency[s.frequency[b]]);
        }
        if (c == 0) {
            c = Integer.compare(ranks.ratio[s.ratio[a]], ranks.ratio[s.ratio[b]]);
        }
        return c;
    }

    static boolean bit(long[] bits, int row) {
        return (bits[row >>> 6] & (1L << row)) != 0;
    }

    static void setBit(long[] bits, int row) {
        bits[row >>> 6] |= 1L << row;
    }
}
