package dev.yoke.engine;

import java.util.Arrays;

/**
 * Growable columnar storage of summary rows: part and bench indexes as primitive arrays and one
 * {@code float} column per {@link Metric}. About 136 bytes a row, so a million rows take about
 * 130 MB. Package-private: {@link Shortlist} is the read-only face; the sweep writes here.
 */
final class RowStore {

    int size;
    int[] motor;
    int[] powerSwitch;
    short[] frequency;
    short[] ratio;
    /** {@code values[metric.ordinal()][row]}. */
    float[][] values;

    RowStore(int capacity) {
        int c = Math.max(1, capacity);
        motor = new int[c];
        powerSwitch = new int[c];
        frequency = new short[c];
        ratio = new short[c];
        values = new float[Metric.COUNT][c];
    }

    int capacity() {
        return motor.length;
    }

    /** Makes room for at least {@code needed} rows. */
    void ensureCapacity(int needed) {
        if (needed <= motor.length) {
            return;
        }
        int c = (int) Math.min(Integer.MAX_VALUE - 8, Math.max((long) needed, motor.length * 2L));
        motor = Arrays.copyOf(motor, c);
        powerSwitch = Arrays.copyOf(powerSwitch, c);
        frequency = Arrays.copyOf(frequency, c);
        ratio = Arrays.copyOf(ratio, c);
        for (int m = 0; m < values.length; m++) {
            values[m] = Arrays.copyOf(values[m], c);
        }
    }

    /** Writes one row from the engine's summary (doubles narrowed to float). */
    void set(int row, int motorIndex, int switchIndex, int frequencyIndex, int ratioIndex, double[] summary) {
        motor[row] = motorIndex;
        powerSwitch[row] = switchIndex;
        frequency[row] = (short) frequencyIndex;
        ratio[row] = (short) ratioIndex;
        float[][] v = values;
        for (int m = 0; m < v.length; m++) {
            v[m][row] = (float) summary[m];
        }
    }

    /** Writes the identity and only the listed metric columns (the rest may stay stale until {@link #set}). */
    void setSome(int row, int motorIndex, int switchIndex, int frequencyIndex, int ratioIndex, double[] summary, int[] metrics) {
        motor[row] = motorIndex;
        powerSwitch[row] = switchIndex;
        frequency[row] = (short) frequencyIndex;
        ratio[row] = (short) ratioIndex;
        for (int m : metrics) {
            values[m][row] = (float) summary[m];
        }
    }

    /** Copies row {@code src} of {@code from} into row {@code dst} of this store. */
    void copyRow(RowStore from, int src, int dst) {
        motor[dst] = from.motor[src];
        powerSwitch[dst] = from.powerSwitch[src];
        frequency[dst] = from.frequency[src];
        ratio[dst] = from.ratio[src];
        for (int m = 0; m < values.length; m++) {
            values[m][dst] = from.values[m][src];
        }
    }

    /** A new store holding {@code rows[0..count)} of this one, in that order. */
    RowStore select(int[] rows, int count) {
        RowStore out = new RowStore(count);
        for (int i = 0; i < count; i++) {
            out.copyRow(this, rows[i], i);
        }
        out.size = count;
        return out;
    }

    /** Keeps {@code rows[0..count)} in that order, in place (rows may be any permutation subset). */
    void compact(int[] rows, int count) {
        RowStore kept = select(rows, count);
        int c = capacity();
        System.arraycopy(kept.motor, 0, motor, 0, count);
        System.arraycopy(kept.powerSwitch, 0, powerSwitch, 0, count);
        System.arraycopy(kept.frequency, 0, frequency, 0, count);
        System.arraycopy(kept.ratio, 0, ratio, 0, count);
        for (int m = 0; m < values.length; m++) {
            System.arraycopy(kept.values[m], 0, values[m], 0, count);
        }
        size = Math.min(count, c);
    }

    boolean feasible(int row) {
        return values[Metric.FEASIBLE.ordinal()][row] != 0f;
    }

    double value(int row, Metric metric) {
        return values[metric.ordinal()][row];
    }

    /** Identity of a row as one number, for de-duplication: motor, switch, frequency, ratio. */
    long identity(int row, int switches, int frequencies, int ratios) {
        return ((((long) motor[row] * switches + powerSwitch[row]) * frequencies + frequency[row]) * ratios) + ratio[row];
    }
}
