package dev.yoke.tui;

import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Scenario;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Set;

/**
 * What the shortlist needs besides the table: the parts and settings the indexes point to,
 * the alphabetical rank of each part id (so ids sort as numbers) and the ids the catalog check
 * found implausible.
 */
public final class ShortlistContext {

    private final Catalog catalog;
    private final Scenario scenario;
    private final Set<String> suspectIds;
    private final int[] motorRank;
    private final int[] switchRank;
    private final double[] frequencies;
    private final double[] ratios;

    public ShortlistContext(Catalog catalog, Scenario scenario, Set<String> suspectIds) {
        this.catalog = catalog;
        this.scenario = scenario;
        this.suspectIds = Set.copyOf(suspectIds);
        this.motorRank = rankOf(catalog.motors().stream().map(Motor::id).toList());
        this.switchRank = rankOf(catalog.switches().stream().map(PowerSwitch::id).toList());
        this.frequencies = scenario.bench().pwmFrequencies().stream().mapToDouble(Double::doubleValue).toArray();
        this.ratios = scenario.bench().gearRatios().stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static int[] rankOf(List<String> ids) {
        Integer[] order = new Integer[ids.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparing(ids::get, String.CASE_INSENSITIVE_ORDER));
        int[] rank = new int[ids.size()];
        for (int r = 0; r < order.length; r++) {
            rank[order[r]] = r;
        }
        return rank;
    }

    public Catalog catalog() {
        return catalog;
    }

    public Scenario scenario() {
        return scenario;
    }

    public Motor motor(int index) {
        return catalog.motors().get(index);
    }

    public PowerSwitch powerSwitch(int index) {
        return catalog.switches().get(index);
    }

    /** Alphabetical position of a motor's id. */
    public int motorRank(int index) {
        return motorRank[index];
    }

    /** Alphabetical position of a switch's id. */
    public int switchRank(int index) {
        return switchRank[index];
    }

    /** PWM frequency, Hz. */
    public double frequency(int index) {
        return frequencies[index];
    }

    public double ratio(int index) {
        return ratios[index];
    }

    /** Whether the catalog check found this part id implausible. */
    public boolean isSuspect(String partId) {
        return suspectIds.contains(partId);
    }

    public boolean hasSuspects() {
        return !suspectIds.isEmpty();
    }
}
