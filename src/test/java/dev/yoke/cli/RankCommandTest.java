package dev.yoke.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.yoke.app.Main;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RankCommandTest {

    static final String DEMO = "demo-data/rover-wheel.yaml";

    /** Exit status, standard output and standard error of one run. */
    record Run(int status, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.run(new PrintWriter(out), new PrintWriter(err), args);
        return new Run(status, out.toString(), err.toString());
    }

    @Test
    void demoRanksWithFeasiblePairingsAndExitsZero() {
        Run r = run("rank", DEMO);
        assertEquals(0, r.status(), r.err());
        String[] lines = r.out().split("\n");
        assertTrue(lines[0].contains("binding margin"), lines[0]);
        assertTrue(r.out().contains("licensed"), "the cautions line");
        assertTrue(r.out().matches("(?s).*[0-9,]+ pairings, [0-9,]+ feasible, \\d+ on the cost-loss front; 20 of .*"), r.out());
        for (String line : lines) {
            assertTrue(line.length() <= 100, line);
        }
        assertFalse(r.err().contains("Exception"));
    }

    @Test
    void noFeasiblePairingExitsOne(@TempDir Path dir) throws Exception {
        // 400 V on the bus: beyond every switch of the demo catalog (V_DS margin negative for all)
        String text = Files.readString(Path.of(DEMO)).replace("bus_voltage_max: 29.4 V", "bus_voltage_max: 400 V");
        Path scenario = dir.resolve("overvoltage.yaml");
        Files.writeString(scenario, text);
        Run r = run("rank", scenario.toString());
        assertEquals(1, r.status(), r.out() + r.err());
        assertTrue(r.out().contains(" 0 feasible"), r.out());
    }

    @Test
    void missingFileIsBadInputWithoutAStackTrace() {
        Run r = run("rank", "no/such/scenario.yaml");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("no/such/scenario.yaml"), r.err());
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
    }

    @Test
    void badValueInTheScenarioIsReportedWithFileLineColumnAndField(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of(DEMO)).replace("dead_time: 300 ns", "dead_time: 300 kV");
        Path scenario = dir.resolve("bad.yaml");
        Files.writeString(scenario, text);
        int line = 0;
        List<String> lines = Files.readAllLines(scenario);
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).contains("dead_time")) {
                line = i + 1;
            }
        }
        Run r = run("rank", scenario.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().contains(scenario + ":" + line + ":"), r.err());
        assertTrue(r.err().contains("dead_time"), r.err());
        assertFalse(r.err().contains("\tat "), r.err());
    }

    @Test
    void unknownSortKeyIsBadInputNamingTheKnownKeys() {
        Run r = run("rank", DEMO, "--sort", "cheapness:desc");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("cheapness") && r.err().contains("total_loss"), r.err());
    }

    @Test
    void sortAndFilterOptionsShapeTheList() throws Exception {
        Run r = run("rank", DEMO, "--sort", "cost,total_loss", "--feasible-only", "--max-cost", "12", "--json", "-");
        assertEquals(0, r.status(), r.err());
        JsonNode array = new ObjectMapper().readTree(r.out());
        assertTrue(array.isArray() && array.size() > 0);
        double previous = -1;
        for (JsonNode o : array) {
            assertTrue(o.get("feasible").asBoolean());
            double cost = o.get("totals").get("cost").asDouble();
            assertTrue(cost <= 12 + 1e-9);
            assertTrue(cost >= previous - 1e-4, "ascending cost (float precision in the shortlist)");
            previous = cost;
            assertFalse(o.has("segments"), "segments only with --segments");
            assertTrue(o.has("pareto") && o.has("margins") && o.has("binding") && o.has("warnings"));
        }
        assertTrue(r.err().contains("licensed"), "words go to standard error when data is on standard output");
    }

    @Test
    void marginThresholdKeepsOnlyPairingsAboveIt() throws Exception {
        Run r = run("rank", DEMO, "--at-least", "margin_junction=50%", "--at-least", "margin_winding=0.1", "--json", "-");
        assertTrue(r.status() <= 1, r.err());
        JsonNode array = new ObjectMapper().readTree(r.out());
        assertTrue(array.size() > 0);
        for (JsonNode o : array) {
            // float storage in the shortlist: compare with a float-sized tolerance
            assertTrue(o.get("margins").get("junction").asDouble() >= 0.5 - 1e-6);
            assertTrue(o.get("margins").get("winding").asDouble() >= 0.1 - 1e-6);
        }
        assertEquals(2, run("rank", DEMO, "--at-least", "motor=3").status(), "ids are not metrics");
        assertEquals(2, run("rank", DEMO, "--at-least", "margin_junction=lots").status());
    }

    @Test
    void topNWithSegmentsGivesNObjectsWithSegments() throws Exception {
        Run r = run("rank", DEMO, "--top", "3", "--json", "-", "--segments");
        assertEquals(0, r.status(), r.err());
        JsonNode array = new ObjectMapper().readTree(r.out());
        assertEquals(3, array.size());
        assertEquals(6, array.get(0).get("segments").size(), "the demo profile has 6 segments");
    }

    @Test
    void csvExportHasAMetaSidecarWithTheInputDigests(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("rover.csv");
        Run r = run("rank", DEMO, "--csv", csv.toString(), "--top", "5");
        assertEquals(0, r.status(), r.err());
        List<String> lines = Files.readAllLines(csv);
        assertEquals(6, lines.size(), "header and five rows");
        JsonNode meta = new ObjectMapper().readTree(dir.resolve("rover.meta.json").toFile());
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(Path.of(DEMO))));
        assertEquals(sha, meta.get("scenario").get("sha256").asText());
        assertTrue(meta.get("catalog_files").size() >= 2);
        assertEquals("rank", meta.get("command").get(0).asText());
        assertEquals("5", meta.get("options").get("top").asText());
        assertEquals(5, meta.get("rows").asInt());
    }

    /** A JSON export file is streamed through the atomic save: it parses, and the previous export is kept as NAME.bak. */
    @Test
    void jsonExportToAFileKeepsThePreviousExportAsBackup(@TempDir Path dir) throws Exception {
        Path json = dir.resolve("rover.json");
        Run first = run("rank", DEMO, "--json", json.toString(), "--top", "2");
        assertEquals(0, first.status(), first.err());
        byte[] previous = Files.readAllBytes(json);
        assertEquals(2, new ObjectMapper().readTree(previous).size());
        Run second = run("rank", DEMO, "--json", json.toString(), "--top", "4");
        assertEquals(0, second.status(), second.err());
        assertEquals(4, new ObjectMapper().readTree(json.toFile()).size());
        assertTrue(java.util.Arrays.equals(previous, Files.readAllBytes(dir.resolve("rover.json.bak"))),
                "the backup holds the first export byte for byte");
    }
}
