package dev.yoke.tui;

import dev.yoke.engine.Metric;

/**
 * The ranked pairings as the workbench reads them: one row per pairing, its part and setting
 * indexes, and one number per {@link Metric}. Indexes refer to the catalog's motors and switches
 * and the bench's PWM frequencies and gear ratios.
 */
public interface PairingTable {

    int size();

    int motorIndex(int row);

    int switchIndex(int row);

    int frequencyIndex(int row);

    int ratioIndex(int row);

    double value(int row, Metric metric);

    /** True when no other pairing is at least as good on every objective and better on one. */
    boolean isPareto(int row);

    /** A table with no rows (before the first ranking finishes). */
    PairingTable EMPTY = new PairingTable() {
        @Override
        public int size() {
            return 0;
        }

        @Override
        public int motorIndex(int row) {
            throw new IndexOutOfBoundsException(row);
        }

        @Override
        public int switchIndex(int row) {
            throw new IndexOutOfBoundsException(row);
        }

        @Override
        public int frequencyIndex(int row) {
            throw new IndexOutOfBoundsException(row);
        }

        @Override
        public int ratioIndex(int row) {
            throw new IndexOutOfBoundsException(row);
        }

        @Override
        public double value(int row, Metric metric) {
            throw new IndexOutOfBoundsException(row);
        }

        @Override
        public boolean isPareto(int row) {
            throw new IndexOutOfBoundsException(row);
        }
    };
}
