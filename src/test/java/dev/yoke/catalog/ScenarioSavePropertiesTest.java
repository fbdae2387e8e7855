package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

/**
 * Random editor sessions on scenario files of several layouts: whatever the user does, the saved
 * file loads back as exactly the scenario saved (the law a save must keep), and when no segment
 * was removed no comment line of the file is lost.
 */
class ScenarioSavePropertiesTest {

    /** The files edited: the commented fixture, the three demo scenarios and layout variants of the fixture. */
    private static final List<String> FILES = files();

    @Property(tries = 200)
    void anyEditSessionLoadsBackAsTheScenarioSaved(@ForAll @IntRange(min = 0, max = 6) int fileIndex,
            @ForAll long seed) throws Exception {
        Path folder = Files.createTempDirectory("yoke-scenario-save");
        try {
            Path file = folder.resolve("scenario.yaml");
            String original = FILES.get(fileIndex);
            Files.writeString(file, original);
            LoadedScenario loaded = ScenarioLoader.load(file);
            Session session = new Session(loaded.scenario());
            Random random = new Random(seed);
            for (int n = 1 + random.nextInt(4); n > 0; n--) {
                session.randomEdit(random);
            }
            Scenario edited = session.scenario;

            SavedScenario saved = ScenarioStore.save(edited, file, loaded.file());

            assertEquals(edited, saved.scenario());
            assertEquals(edited, ScenarioLoader.load(file).scenario());
            // Comments outside the segments, and those of every segment left as it was, are kept.
            String text = Files.readString(file);
            Map<String, Integer> kept = commentCounts(text);
            List<Map<String, Integer>> ofSegment = new ArrayList<>();
            Map<String, Integer> expected = commentsOutsideSegments(original, ofSegment);
            for (int i = 0; i < ofSegment.size(); i++) {
                if (session.origin.contains(i) && !session.touched.contains(i)) {
                    ofSegment.get(i).forEach((comment, count) -> expected.merge(comment, count, Integer::sum));
                }
            }
            expected.forEach((comment, count) -> assertTrue(kept.getOrDefault(comment, 0) >= count,
                    "comment kept: " + comment + "\n" + text.replace("\r", "")));
        } finally {
            try (var paths = Files.walk(folder)) {
                paths.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    /** An editor session: the scenario, and for each row the file segment it started as (-1: added). */
    private static final class Session {
        Scenario scenario;
        final List<Integer> origin = new ArrayList<>();
        final java.util.Set<Integer> touched = new java.util.HashSet<>();

        Session(Scenario start) {
            scenario = start;
            for (int i = 0; i < start.profile().segments().size(); i++) {
                origin.add(i);
            }
        }

        /** One editor action: a bench, limit or profile value, or a segment edited, added, removed or moved. */
        void randomEdit(Random random) {
            Scenario s = scenario;
            Bench b = s.bench();
            Profile p = s.profile();
            List<Segment> segments = new ArrayList<>(p.segments());
            int at = random.nextInt(segments.size());
            Segment seg = segments.get(at);
            switch (random.nextInt(10)) {
                case 0 -> { // nominal bus voltage between the minimum and the old nominal (keeps min <= bus <= max)
                    double bus = b.busVoltage() - (b.busVoltage() - b.busVoltageMin()) / 2;
                    scenario = new Scenario(s.name(), bench(b, bus, b.ambientTemp(), b.limits()), p);
                    return;
                }
                case 1 -> {
                    scenario = new Scenario(s.name(), bench(b, b.busVoltage(), b.ambientTemp() - 5, b.limits()), p);
                    return;
                }
                case 2 -> {
                    Limits l = b.limits();
                    Limits limits = new Limits(l.vdsDerating() * 0.9, l.junctionTempLimit(),
                            l.windingTempMargin() + 5, l.rippleFraction());
                    scenario = new Scenario(s.name() + " b", bench(b, b.busVoltage(), b.ambientTemp(), limits), p);
                    return;
                }
                case 3 -> {
                    scenario = new Scenario(s.name(), b, new Profile(p.loadInertia() * 2, !p.repeat(), segments));
                    return;
                }
                case 4 -> {
                    segments.set(at, new Segment(seg.label(), seg.duration() * 1.5, seg.speedStart(),
                            seg.speedEnd(), seg.torque()));
                    touched.add(origin.get(at));
                }
                case 5 -> {
                    segments.set(at, new Segment(seg.label() + " b", seg.duration(), seg.speedStart() + 1,
                            seg.speedEnd(), -seg.torque()));
                    touched.add(origin.get(at));
                }
                case 6 -> { // the editor's "add": a copy below
                    segments.add(at + 1, seg);
                    origin.add(at + 1, -1);
                }
                case 7 -> {
                    if (segments.size() > 1) {
                        segments.remove(at);
                        origin.remove(at);
                    }
                }
                case 8 -> {
                    int to = random.nextInt(segments.size());
                    segments.add(to, segments.remove(at));
                    origin.add(to, origin.remove(at));
                }
                default -> {
                    int to = random.nextInt(segments.size() + 1);
                    segments.add(to, new Segment("new " + random.nextInt(100), 0.25 + random.nextInt(8),
                            random.nextInt(5), -random.nextInt(5), random.nextInt(3) - 1));
                    origin.add(to, -1);
                }
            }
            scenario = new Scenario(s.name(), b, new Profile(p.loadInertia(), p.repeat(), segments));
        }
    }

    /**
     * The comments of {@code text} outside its segments (the comments above the first segment
     * describe the list and count as outside); each segment's own comments, from the line after
     * the previous segment's last value to its own last value, go to {@code ofSegment}.
     */
    private static Map<String, Integer> commentsOutsideSegments(String text, List<Map<String, Integer>> ofSegment) {
        Map<String, Integer> outside = new HashMap<>();
        String[] lines = text.split("\r?\n");
        int list = 0;
        while (!lines[list].strip().startsWith("segments:")) {
            list++;
        }
        String dashIndent = null;
        List<String> pending = new ArrayList<>(); // comments after the last value seen, before the next dash
        int line = list + 1;
        for (; line < lines.length; line++) {
            String l = lines[line];
            String stripped = l.strip();
            int indent = l.length() - l.stripLeading().length();
            if (stripped.isEmpty()) {
                continue;
            }
            if (stripped.startsWith("#")) {
                pending.add(comment(l));
                continue;
            }
            if (stripped.startsWith("- ") && (dashIndent == null || indent == dashIndent.length())) {
                dashIndent = " ".repeat(indent);
                Map<String, Integer> own = new HashMap<>();
                for (String c : pending) {
                    (ofSegment.isEmpty() ? outside : own).merge(c, 1, Integer::sum);
                }
                pending.clear();
                ofSegment.add(own);
            } else if (dashIndent == null || indent <= dashIndent.length()) {
                break; // the list ended
            } else {
                for (String c : pending) {
                    ofSegment.get(ofSegment.size() - 1).merge(c, 1, Integer::sum);
                }
                pending.clear();
            }
            if (l.contains("#")) {
                ofSegment.get(ofSegment.size() - 1).merge(comment(l), 1, Integer::sum);
            }
        }
        pending.forEach(c -> outside.merge(c, 1, Integer::sum));
        for (int k = 0; k < lines.length; k++) {
            if ((k <= list || k >= line) && lines[k].contains("#")) {
                outside.merge(comment(lines[k]), 1, Integer::sum);
            }
        }
        return outside;
    }

    private static String comment(String line) {
        return line.substring(line.indexOf('#'));
    }

    private static Bench bench(Bench b, double bus, double ambient, Limits limits) {
        return new Bench(bus, b.busVoltageMin(), b.busVoltageMax(), b.pwmFrequencies(), b.modulation(), b.deadTime(),
                b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(), ambient, b.switchRthCaseAmbient(),
                b.gearRatios(), b.gearEfficiency(), limits);
    }

    /** Each comment (the text from {@code #} on, of a line holding one) and how often it stands. */
    private static Map<String, Integer> commentCounts(String text) {
        Map<String, Integer> counts = new HashMap<>();
        for (String line : text.split("\r?\n")) {
            if (line.contains("#")) {
                counts.merge(comment(line), 1, Integer::sum);
            }
        }
        return counts;
    }

    private static List<String> files() {
        try {
            String commented;
            try (InputStream in = ScenarioSavePropertiesTest.class.getResourceAsStream("/store/commented-scenario.yaml")) {
                commented = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            }
            List<String> files = new ArrayList<>(List.of(commented,
                    // lists of numbers written as block lists
                    commented.replace("  pwm_frequencies: [16 kHz, 25 kHz]   # nothing audible\n",
                            "  pwm_frequencies:   # nothing audible\n    - 16 kHz\n    - 25 kHz\n"),
                    // the profile first, segments without blank lines and with quoted labels, CRLF line ends
                    reordered(commented).replace("\n\n    -", "\n    -").replace("label: hold", "label: \"hold\"")
                            .replace("\n", "\r\n"),
                    // a segment list not at the end of the file, with a comment after its last item, and a
                    // key with nothing after it (it loads as absent: speed_end follows speed_start)
                    reordered(commented).replace("      speed_start: 0 rad/s\n      torque: 1.5 N*m",
                            "      speed_start: 0 rad/s\n      speed_end:\n      torque: 1.5 N*m")
                            + "  # trailing note on the bench\n"));
            for (String demo : List.of("arm-joint.yaml", "conveyor.yaml", "rover-wheel.yaml")) {
                files.add(Files.readString(Path.of("demo-data", demo)));
            }
            return files;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The fixture with its profile section moved above the bench. */
    private static String reordered(String commented) {
        int bench = commented.indexOf("bench:\n");
        int profile = commented.indexOf("profile:\n");
        int end = commented.indexOf("# end of the cycle");
        return commented.substring(0, bench) + commented.substring(profile, end) + commented.substring(bench, profile);
    }
}
