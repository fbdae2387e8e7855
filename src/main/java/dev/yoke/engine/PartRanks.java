package dev.yoke.engine;

import dev.yoke.model.Catalog;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Position of each motor, switch, frequency and ratio in sorted order (ids alphabetically,
 * frequencies and ratios by value), so rows compare by identity with integer comparisons.
 */
final class PartRanks {

    final int[] motor;
    final int[] powerSwitch;
    final int[] frequency;
    final int[] ratio;
    final double[] frequencyValue;
    final double[] ratioValue;

    PartRanks(PairingEvaluator evaluator) {
        Catalog catalog = evaluator.catalog();
        motor = rankStrings(catalog.motors().stream().map(m -> m.id()).toArray(String[]::new));
        powerSwitch = rankStrings(catalog.switches().stream().map(s -> s.id()).toArray(String[]::new));
        frequencyValue = toArray(evaluator.scenario().bench().pwmFrequencies());
        ratioValue = toArray(evaluator.scenario().bench().gearRatios());
        frequency = rankNumbers(frequencyValue);
        ratio = rankNumbers(ratioValue);
    }

    private static double[] toArray(List<Double> values) {
        double[] out = new double[values.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = values.get(i);
        }
        return out;
    }

    private static int[] rankStrings(String[] ids) {
        Integer[] idx = new Integer[ids.length];
        for (int i = 0; i < idx.length; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, Comparator.<Integer, String>comparing(i -> ids[i]).thenComparing(i -> i));
        int[] rank = new int[ids.length];
        for (int r = 0; r < idx.length; r++) {
            rank[idx[r]] = r;
        }
        return rank;
    }

    private static int[] rankNumbers(double[] values) {
        Integer[] idx = new Integer[values.length];
        for (int i = 0; i < idx.length; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, Comparator.<Integer>comparingDouble(i -> values[i]).thenComparing(i -> i));
        int[] rank = new int[values.length];
        for (int r = 0; r < idx.length; r++) {
            rank[idx[r]] = r;
        }
        return rank;
    }
}
