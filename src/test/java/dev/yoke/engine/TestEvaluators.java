package dev.yoke.engine;

import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.util.ArrayList;
import java.util.List;

/** Fake evaluators for tests outside this package (reports, commands). Not physics. */
public final class TestEvaluators {

    private TestEvaluators() {
    }

    /** A few hundred pairings with ties and NaN values. */
    public static PairingEvaluator small() {
        return new FakeEvaluator(12, 9, 2, 2, 4);
    }

    /** Parts with the given ids (used as labels too). */
    public static PairingEvaluator withIds(List<String> motorIds, List<String> switchIds) {
        List<Motor> motors = new ArrayList<>();
        for (int i = 0; i < motorIds.size(); i++) {
            motors.add(FakeEvaluator.motor(motorIds.get(i), motorIds.get(i), 10 + i));
        }
        List<PowerSwitch> switches = new ArrayList<>();
        for (int i = 0; i < switchIds.size(); i++) {
            switches.add(FakeEvaluator.powerSwitch(switchIds.get(i), switchIds.get(i), 1 + i * 0.25));
        }
        Catalog catalog = new Catalog(motors, switches);
        return new FakeEvaluator(motorIds.size(), switchIds.size(), 1, 2, 8) {
            @Override
            public Catalog catalog() {
                return catalog;
            }
        };
    }
}
