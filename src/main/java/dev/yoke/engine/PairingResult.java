package dev.yoke.engine;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The whole evaluation of one pairing (motor × switch × PWM frequency × gear ratio) over
 * the duty profile: what {@code yoke explain}, the JSON report and the detail screen show.
 *
 * @param motor        the motor
 * @param powerSwitch  the switch used four times
 * @param pwmFrequency Hz
 * @param gearRatio    N
 * @param margins      every constraint's signed margin (negative = violated)
 * @param binding      the constraint with the smallest margin
 * @param advisories   warnings that do not fail the pairing by themselves
 * @param totals       per-cycle figures
 * @param segments     per-segment figures, in profile order
 */
public record PairingResult(
        Motor motor,
        PowerSwitch powerSwitch,
        double pwmFrequency,
        double gearRatio,
        Map<Constraint, Double> margins,
        Constraint binding,
        Set<Advisory> advisories,
        Totals totals,
        List<SegmentResult> segments) {

    public PairingResult {
        margins = Map.copyOf(new EnumMap<>(margins));
        advisories = advisories.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(advisories));
        segments = List.copyOf(segments);
    }

    /** Feasible when no margin is negative. */
    public boolean feasible() {
        return margins.values().stream().allMatch(m -> m >= 0);
    }

    /** The binding constraint's margin. */
    public double bindingMargin() {
        return margins.get(binding);
    }
}
