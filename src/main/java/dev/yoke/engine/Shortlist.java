package dev.yoke.engine;

import java.util.List;

/**
 * The summary rows of a sweep, stored by column in primitive arrays (indexes as {@code int} and
 * {@code short}, metrics as {@code float}, the Pareto flag as bits): about 136 bytes a pairing,
 * so a million pairings rank in a 512 MB heap. Read-only; sorting and filtering produce arrays
 * of row indexes ({@link Ranking}) and never move the rows.
 *
 * <p>Metric values are the engine's doubles narrowed to float (about 7 significant digits),
 * enough to rank and to show; {@link PairingEvaluator#explain} gives the full detail of a row.
 */
public final class Shortlist {

    private final PairingEvaluator evaluator;
    private final RowStore store;
    private final long[] pareto;
    private final PartRanks ranks;
    private final long evaluated;
    private final long feasibleEvaluated;

    Shortlist(PairingEvaluator evaluator, PartRanks ranks, RowStore store, long[] pareto, long evaluated, long feasibleEvaluated) {
        this.evaluator = evaluator;
        this.ranks = ranks;
        this.store = store;
        this.pareto = pareto;
        this.evaluated = evaluated;
        this.feasibleEvaluated = feasibleEvaluated;
    }

    /** The evaluator (scenario and catalog) these rows came from. */
    public PairingEvaluator evaluator() {
        return evaluator;
    }

    /** Number of rows held. */
    public int size() {
        return store.size;
    }

    /** Pairings evaluated by the sweep (more than {@link #size()} when only the top N were kept). */
    public long evaluatedCount() {
        return evaluated;
    }

    /** Feasible pairings among all evaluated (not only the rows kept). */
    public long feasibleCount() {
        return feasibleEvaluated;
    }

    /** Pareto-front pairings among the rows held. */
    public int paretoCount() {
        int n = 0;
        for (long word : pareto) {
            n += Long.bitCount(word);
        }
        return n;
    }

    /** Index into {@code catalog().motors()}. */
    public int motorIndex(int row) {
        check(row);
        return store.motor[row];
    }

    /** Index into {@code catalog().switches()}. */
    public int switchIndex(int row) {
        check(row);
        return store.powerSwitch[row];
    }

    /** Index into the bench's PWM frequencies. */
    public int frequencyIndex(int row) {
        check(row);
        return store.frequency[row];
    }

    /** Index into the bench's gear ratios. */
    public int ratioIndex(int row) {
        check(row);
        return store.ratio[row];
    }

    /** PWM frequency of a row, Hz. */
    public double frequency(int row) {
        return ranks.frequencyValue[frequencyIndex(row)];
    }

    /** Gear ratio of a row. */
    public double ratio(int row) {
        return ranks.ratioValue[ratioIndex(row)];
    }

    /** A metric of a row (float precision; FEASIBLE is 0 or 1, BINDING a Constraint ordinal). */
    public double value(int row, Metric metric) {
        check(row);
        return store.values[metric.ordinal()][row];
    }

    /** Any column as a number: ids give their index, the Pareto flag 0 or 1. */
    public double number(int row, Column column) {
        return switch (column.kind()) {
            case METRIC -> value(row, column.metric());
            case MOTOR -> motorIndex(row);
            case SWITCH -> switchIndex(row);
            case FREQUENCY -> frequency(row);
            case RATIO -> ratio(row);
            case PARETO -> isPareto(row) ? 1 : 0;
        };
    }

    /** On the cost–loss front of feasible pairings (see {@link Pareto}). */
    public boolean isPareto(int row) {
        check(row);
        return RowOrder.bit(pareto, row);
    }

    /** No margin is negative. */
    public boolean feasible(int row) {
        check(row);
        return store.feasible(row);
    }

    /** The constraint with the smallest margin. */
    public Constraint binding(int row) {
        int ordinal = (int) value(row, Metric.BINDING);
        Constraint[] all = Constraint.values();
        return ordinal >= 0 && ordinal < all.length ? all[ordinal] : Constraint.values()[0];
    }

    /** The binding constraint's margin, signed fraction. */
    public double bindingMargin(int row) {
        return value(row, Metric.BINDING_MARGIN);
    }

    /** The advisories raised for a row. */
    public List<Advisory> advisories(int row) {
        int bits = (int) value(row, Metric.ADVISORIES);
        java.util.ArrayList<Advisory> out = new java.util.ArrayList<>();
        for (Advisory a : Advisory.values()) {
            if ((bits & a.bit()) != 0) {
                out.add(a);
            }
        }
        return out;
    }

    /** The motor's id. */
    public String motorId(int row) {
        return evaluator.catalog().motors().get(motorIndex(row)).id();
    }

    /** The switch's id. */
    public String switchId(int row) {
        return evaluator.catalog().switches().get(switchIndex(row)).id();
    }

    /** The whole evaluation of a row (the detailed, slower path). */
    public PairingResult explain(int row) {
        return evaluator.explain(motorIndex(row), switchIndex(row), frequencyIndex(row), ratioIndex(row));
    }

    RowStore store() {
        return store;
    }

    PartRanks ranks() {
        return ranks;
    }

    long[] paretoBits() {
        return pareto;
    }

    private void check(int row) {
        if (row < 0 || row >= store.size) {
            throw new IndexOutOfBoundsException("row " + row + " of " + store.size);
        }
    }
}
