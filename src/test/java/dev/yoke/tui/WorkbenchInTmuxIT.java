package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The packaged jar in a real terminal: {@code src/test/e2e/tmux-e2e.sh} drives it in tmux (sort by
 * cost, detail, export, help, cautions, quit; then a scenario with a mistake) and this test checks
 * the captured screens, the CSV and the printed problems.
 * Runs after {@code package} (failsafe), skipped without tmux unless YOKE_REQUIRE_REFERENCES=1.
 */
class WorkbenchInTmuxIT {

    @TempDir
    Path out;

    @Test
    void sortDetailExportHelpAndQuitInARealTerminal() throws Exception {
        boolean required = "1".equals(System.getenv("YOKE_REQUIRE_REFERENCES"));
        boolean haveTmux = new ProcessBuilder("sh", "-c", "command -v tmux").start().waitFor() == 0;
        if (!haveTmux) {
            if (required) {
                fail("tmux is required for the end-to-end test (YOKE_REQUIRE_REFERENCES=1); install the Debian package tmux");
            }
            Assumptions.abort("tmux not installed: end-to-end terminal test skipped");
        }
        Path project = Path.of(System.getProperty("yoke.project", ".")).toAbsolutePath();
        Path jar = Path.of(System.getProperty("yoke.jar", "target/yoke.jar")).toAbsolutePath();
        assertTrue(Files.isRegularFile(jar), "packaged jar missing: " + jar);

        Process run = new ProcessBuilder("sh", project.resolve("src/test/e2e/tmux-e2e.sh").toString(), jar.toString(),
                project.toString(), out.toString())
                .redirectErrorStream(true).redirectOutput(out.resolve("script.log").toFile()).start();
        if (!run.waitFor(240, TimeUnit.SECONDS)) {
            run.destroyForcibly();
            fail("the end-to-end script did not finish in 240 s");
        }
        assertEquals(0, run.exitValue(), () -> "script failed: " + read("script.log") + read("timeout.txt"));

        String shortlist = read("01-shortlist.txt");
        String sorted = read("02-sorted-by-cost.txt");
        String detail = read("03-detail.txt");
        String exported = read("04-exported.txt");
        assertAll(
                () -> assertTrue(shortlist.contains("Rover wheel") && shortlist.contains(" shown / "), shortlist),
                () -> assertTrue(shortlist.contains("verdict") && shortlist.contains("? help"), shortlist),
                () -> assertTrue(sorted.contains("sort cost asc") && sorted.contains("cost \u25B2"), sorted),
                () -> assertTrue(detail.contains("Pairing detail") && detail.contains("Verdict"), detail),
                () -> assertTrue(detail.lines().anyMatch(l -> l.strip().startsWith("\u25B6") && l.strip().endsWith("binding")),
                        "the binding margin is marked: " + detail),
                () -> assertTrue(read("05-help.txt").contains("Help: keys"), read("05-help.txt")),
                () -> assertTrue(read("06-cautions.txt").contains("licensed electrician")),
                () -> assertTrue(read("07-after-quit.txt").contains("YOKE-EXIT=0"), read("07-after-quit.txt")));

        // A mistake in the scenario: printed after the screen closed, located, exit status 2, no stack trace.
        String loadError = read("08-load-error.txt");
        assertAll(
                () -> assertTrue(loadError.contains("broken.yaml:3:16: bus_voltage: expected volts (V), got '24 mH'"), loadError),
                () -> assertTrue(loadError.contains("YOKE-EXIT=2"), loadError),
                () -> assertFalse(loadError.contains("Exception"), loadError),
                () -> assertFalse(loadError.contains("Esc quit"), "the reading view is gone from the terminal: " + loadError));

        // The screen's cost column ascends from the top row down.
        List<String> lines = sorted.lines().toList();
        String header = lines.get(1);
        int end = header.indexOf("cost \u25B2") + "cost \u25B2".length();
        List<Double> screenCosts = new ArrayList<>();
        for (String line : lines.subList(2, lines.size() - 2)) {
            if (line.length() >= end && !line.isBlank()) {
                screenCosts.add(Double.parseDouble(line.substring(end - 8, end).strip()));
            }
        }
        assertTrue(screenCosts.size() > 20, "rows on screen: " + screenCosts);
        for (int i = 1; i < screenCosts.size(); i++) {
            assertTrue(screenCosts.get(i - 1) <= screenCosts.get(i), "screen costs ascend: " + screenCosts);
        }

        // The CSV holds the rows shown, in the order shown.
        Matcher shown = Pattern.compile("([\\d,]+) shown / ([\\d,]+) total").matcher(sorted);
        assertTrue(shown.find(), sorted);
        int rows = Integer.parseInt(shown.group(1).replace(",", ""));
        assertTrue(exported.contains(String.format(java.util.Locale.ROOT, "wrote %,d rows", rows)), exported);
        File csv = out.resolve("work/shortlist.csv").toFile();
        List<String[]> records = new ArrayList<>();
        try (MappingIterator<String[]> it = new CsvMapper().enable(CsvParser.Feature.WRAP_AS_ARRAY)
                .readerFor(String[].class).readValues(csv)) {
            it.forEachRemaining(records::add);
        }
        String[] head = records.get(0);
        assertEquals("rank", head[0]);
        assertEquals(rows + 1, records.size(), "a heading and one record per row shown");
        int costColumn = List.of(head).indexOf("cost");
        int motorColumn = List.of(head).indexOf("motor");
        assertTrue(costColumn > 0 && motorColumn > 0, String.join(",", head));
        for (int i = 2; i < records.size(); i++) {
            assertTrue(Double.parseDouble(records.get(i - 1)[costColumn]) <= Double.parseDouble(records.get(i)[costColumn]),
                    "CSV costs ascend at record " + i);
        }
        String firstScreenMotor = lines.get(2).substring(2).strip().split("\\s+")[0];
        assertEquals(firstScreenMotor, records.get(1)[motorColumn], "the CSV starts with the screen's first row");
        assertEquals(screenCosts.get(0), Double.parseDouble(records.get(1)[costColumn]), 0.005,
                "same first cost (screen shows two decimals)");
    }

    private String read(String name) {
        try {
            Path p = out.resolve(name);
            return Files.exists(p) ? Files.readString(p, StandardCharsets.UTF_8) : "";
        } catch (java.io.IOException e) {
            return e.toString();
        }
    }
}
