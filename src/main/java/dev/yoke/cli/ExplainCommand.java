package dev.yoke.cli;

import dev.yoke.catalog.InputException;
import dev.yoke.engine.DriveEvaluator;
import dev.yoke.engine.PairingEvaluator;
import dev.yoke.engine.PairingResult;
import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Scenario;
import dev.yoke.report.ExplainText;
import dev.yoke.report.PairingJson;
import dev.yoke.units.Dimension;
import dev.yoke.units.UnitException;
import dev.yoke.units.Units;
import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code yoke explain}: the whole evaluation of one pairing, segment by segment, with every
 * margin and the binding one marked. Exit 0 when the pairing is feasible, 1 when not, 2 for bad input.
 */
@Command(name = "explain", mixinStandardHelpOptions = true,
        description = "Show why one pairing passes or fails: per-segment currents, losses, temperatures and margins.")
public final class ExplainCommand implements Callable<Integer> {

    @Mixin
    ScenarioArgument scenarioArgument;

    @Option(names = "--motor", paramLabel = "ID", required = true, description = "Motor id from the catalog.")
    String motorId;

    @Option(names = "--switch", paramLabel = "ID", required = true, description = "Switch id from the catalog.")
    String switchId;

    @Option(names = "--pwm", paramLabel = "F",
            description = "PWM frequency, e.g. 20kHz (default: the bench's first). Need not be one of the bench's.")
    String pwm;

    @Option(names = "--ratio", paramLabel = "N",
            description = "Gear ratio (default: the bench's first). Need not be one of the bench's.")
    String ratio;

    @Mixin
    CatalogOption catalogOption;

    @Option(names = "--json", description = "Print one JSON object (fields in docs/json-report.md).")
    boolean json;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Inputs inputs;
        try {
            inputs = Inputs.load(scenarioArgument.scenarioFile, catalogOption.catalogDir, err);
        } catch (InputException e) {
            return Inputs.report(e, err);
        }
        Catalog catalog = inputs.catalog().catalog();
        Scenario scenario = inputs.scenario().scenario();
        List<String> motorIds = catalog.motors().stream().map(Motor::id).toList();
        List<String> switchIds = catalog.switches().stream().map(PowerSwitch::id).toList();
        int motor = motorIds.indexOf(motorId);
        int powerSwitch = switchIds.indexOf(switchId);
        if (motor < 0 || powerSwitch < 0) {
            if (motor < 0) {
                err.println("yoke explain: --motor: no motor '" + motorId + "' in " + catalogOption.catalogDir + hint(motorId, motorIds));
            }
            if (powerSwitch < 0) {
                err.println("yoke explain: --switch: no switch '" + switchId + "' in " + catalogOption.catalogDir + hint(switchId, switchIds));
            }
            err.flush();
            return YokeCommand.BAD_INPUT;
        }
        Bench bench = scenario.bench();
        int f = 0;
        int n = 0;
        String option = "--pwm";
        try {
            if (pwm != null) {
                double hz = Units.parse(pwm, Dimension.FREQUENCY);
                if (!(hz > 0)) {
                    throw new UnitException("must be above 0, got '" + pwm + "'");
                }
                f = indexOf(bench.pwmFrequencies(), hz);
                if (f < 0) {
                    bench = withFrequency(bench, hz);
                    f = 0;
                }
            }
            if (ratio != null) {
                option = "--ratio";
                double r = Units.parse(ratio, Dimension.DIMENSIONLESS);
                if (!(r > 0)) {
                    throw new UnitException("must be above 0, got '" + ratio + "'");
                }
                n = indexOf(bench.gearRatios(), r);
                if (n < 0) {
                    bench = withRatio(bench, r);
                    n = 0;
                }
            }
        } catch (UnitException e) {
            err.println("yoke explain: " + option + ": " + e.getMessage());
            err.flush();
            return YokeCommand.BAD_INPUT;
        }
        if (bench.pwmFrequencies().isEmpty() || bench.gearRatios().isEmpty()) {
            err.println("yoke explain: the bench lists no PWM frequency or gear ratio; give --pwm and --ratio");
            err.flush();
            return YokeCommand.BAD_INPUT;
        }
        scenario = new Scenario(scenario.name(), bench, scenario.profile());
        PairingEvaluator evaluator = DriveEvaluator.of(scenario, catalog);
        PairingResult result = evaluator.explain(motor, powerSwitch, f, n);
        if (json) {
            out.println(PairingJson.mapper().writerWithDefaultPrettyPrinter()
                    .writeValueAsString(PairingJson.of(result, true, null)));
        } else {
            out.print(ExplainText.render(result));
        }
        out.flush();
        return result.feasible() ? YokeCommand.OK : YokeCommand.NONE_FEASIBLE;
    }

    private static String hint(String typed, List<String> known) {
        String best = Suggestions.closest(typed, known);
        return best == null ? "" : "; did you mean '" + best + "'?";
    }

    /** Index of {@code value} in {@code list} (to a part in a billion), or -1. */
    private static int indexOf(List<Double> list, double value) {
        for (int i = 0; i < list.size(); i++) {
            if (Math.abs(list.get(i) - value) <= 1e-9 * Math.abs(value)) {
                return i;
            }
        }
        return -1;
    }

    private static Bench withFrequency(Bench b, double hz) {
        return new Bench(b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(), List.of(hz), b.modulation(), b.deadTime(),
                b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(), b.ambientTemp(), b.switchRthCaseAmbient(),
                b.gearRatios(), b.gearEfficiency(), b.limits());
    }

    private static Bench withRatio(Bench b, double n) {
        return new Bench(b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(), b.pwmFrequencies(), b.modulation(), b.deadTime(),
                b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(), b.ambientTemp(), b.switchRthCaseAmbient(),
                List.of(n), b.gearEfficiency(), b.limits());
    }
}
