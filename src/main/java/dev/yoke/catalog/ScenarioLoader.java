package dev.yoke.catalog;

import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Loads a scenario file: the machine's bench and duty profile, every problem reported at once. */
public final class ScenarioLoader {

    private ScenarioLoader() {
    }

    /**
     * The scenario in {@code path}.
     *
     * @throws InputException listing every error (and the warnings found alongside)
     */
    public static LoadedScenario load(Path path) throws InputException {
        List<Problem> problems = new ArrayList<>();
        SourceFile source = SourceFile.read(path, problems);
        Scenario scenario = null;
        if (source != null) {
            YamlNode root = YamlReader.read(path, source.bytes(), problems);
            if (root != null) {
                scenario = read(root, new SectionReader(path, problems));
            }
        }
        if (scenario == null || problems.stream().anyMatch(p -> !p.warning())) {
            if (problems.isEmpty()) {
                problems.add(Problem.error(path, 0, 0, "", "could not be read as a scenario"));
            }
            throw new InputException(problems);
        }
        return new LoadedScenario(scenario, source.identity(), problems);
    }

    private static Scenario read(YamlNode root, SectionReader reader) {
        if (root instanceof YamlNode.Mapping map
                && (map.entries().containsKey("motors") || map.entries().containsKey("switches"))) {
            reader.error(map.line(), map.column(), "", "this is a catalog file (it has 'motors:' or 'switches:'),"
                    + " not a scenario file");
            return null;
        }
        SectionValues top = reader.read(root, PartKind.SCENARIO, "", "the scenario");
        if (top == null) {
            return null;
        }
        Bench bench = top.has("bench") ? readBench(top.node("bench"), reader) : null;
        Profile profile = top.has("profile") ? readProfile(top.node("profile"), reader) : null;
        if (top.failed() || bench == null || profile == null) {
            return null;
        }
        return new Scenario(top.text("name"), bench, profile);
    }

    private static Bench readBench(YamlNode node, SectionReader reader) {
        SectionValues v = reader.read(node, PartKind.BENCH, "bench", "the bench");
        if (v == null) {
            return null;
        }
        SectionValues l = v.has("limits") ? reader.read(v.node("limits"), PartKind.LIMITS, "limits", "the limits")
                : null;
        if (v.failed() || l == null || l.failed()) {
            return null;
        }
        double bus = v.number("bus_voltage");
        Limits limits = new Limits(l.number("vds_derating"), l.number("junction_temp_limit"),
                l.number("winding_temp_margin"), l.number("ripple_fraction"));
        Bench bench = new Bench(bus, v.has("bus_voltage_min") ? v.number("bus_voltage_min") : bus,
                v.has("bus_voltage_max") ? v.number("bus_voltage_max") : bus, v.numbers("pwm_frequencies"),
                v.modulation("modulation"), v.number("dead_time"), v.number("gate_drive_voltage"),
                v.number("gate_resistance"), v.number("max_duty"), v.number("ambient_temp"),
                v.number("switch_rth_case_ambient"), v.numbers("gear_ratios"), v.number("gear_efficiency"), limits);
        boolean ok = true;
        for (PartRules.FieldIssue issue : PartRules.benchErrors(bench)) {
            SectionValues where = issue.field().equals("junction_temp_limit") ? l : v;
            reader.error(where.line(issue.field()), where.column(issue.field()), issue.field(), issue.message());
            ok = false;
        }
        for (PartRules.FieldIssue issue : Plausibility.benchWarnings(bench)) {
            reader.warning(v.line(issue.field()), v.column(issue.field()), issue.field(), issue.message());
        }
        return ok ? bench : null;
    }

    private static Profile readProfile(YamlNode node, SectionReader reader) {
        SectionValues v = reader.read(node, PartKind.PROFILE, "profile", "the profile");
        if (v == null || v.failed()) {
            return null;
        }
        List<Segment> segments = new ArrayList<>();
        boolean ok = true;
        int n = 0;
        for (YamlNode item : ((YamlNode.Sequence) v.node("segments")).items()) {
            n++;
            SectionValues s = reader.read(item, PartKind.SEGMENT, "segments", "segment #" + n);
            if (s == null || s.failed()) {
                ok = false;
                continue;
            }
            String label = s.has("label") && !s.text("label").isEmpty() ? s.text("label") : "segment " + n;
            double start = s.number("speed_start");
            double end = s.has("speed_end") ? s.number("speed_end") : start;
            segments.add(new Segment(label, s.number("duration"), start, end, s.number("torque")));
        }
        return ok ? new Profile(v.number("load_inertia"), v.flag("repeat"), segments) : null;
    }
}
