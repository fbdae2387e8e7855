package dev.yoke.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.Metric;
import dev.yoke.engine.Ranking;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.SortKey;
import dev.yoke.engine.Sweep;
import dev.yoke.engine.TestEvaluators;
import java.io.OutputStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ShortlistCsvWriterTest {

    /** Ids and labels a spreadsheet would run as formulas, plus commas, quotes and line breaks. */
    static final List<String> HOSTILE_IDS = List.of("=cmd|' /C calc'!A0", "+1", "-2", "@SUM(1)", "\tTAB", "\rCR",
            "comma,inside", "quote\"inside", "line\r\nbreak", "plain-id");

    private static Shortlist hostileShortlist() {
        return Sweep.all(TestEvaluators.withIds(HOSTILE_IDS, HOSTILE_IDS));
    }

    private static String csv(Shortlist s, int[] order) throws Exception {
        StringWriter w = new StringWriter();
        ShortlistCsvWriter.write(s, order, w);
        return w.toString();
    }

    @Test
    void independentRfc4180ReaderAndJacksonReadTheSameCells() throws Exception {
        Shortlist s = hostileShortlist();
        int[] order = Ranking.order(s, SortKey.DEFAULT);
        String text = csv(s, order);

        List<List<String>> ours = Rfc4180Reader.read(text);
        CsvMapper mapper = new CsvMapper().enable(CsvParser.Feature.WRAP_AS_ARRAY);
        List<List<String>> jackson;
        try (MappingIterator<List<String>> it = mapper.readerFor(List.class).readValues(text)) {
            jackson = it.readAll();
        }
        assertEquals(ours, jackson);
        assertEquals(order.length + 1, ours.size(), "one header line and one line per pairing");
        assertEquals(ShortlistCsvWriter.header(), ours.get(0));
        for (List<String> record : ours) {
            assertEquals(ShortlistCsvWriter.header().size(), record.size());
        }
    }

    @Test
    void headerCarriesUnitsTheBindingConstraintAndEveryMargin() {
        List<String> header = ShortlistCsvWriter.header();
        assertTrue(header.contains("current_rms [A]"));
        assertTrue(header.contains("junction_temp_max [degC]"));
        assertTrue(header.contains("binding"));
        for (Constraint c : Constraint.values()) {
            assertTrue(header.contains(Metric.marginOf(c).key()), c.key());
        }
    }

    @Test
    void formulaLikeTextIsNeutralisedAndNumbersStayNumbers() throws Exception {
        Shortlist s = hostileShortlist();
        int[] order = Ranking.order(s, SortKey.DEFAULT);
        List<List<String>> records = Rfc4180Reader.read(csv(s, order));
        List<String> header = records.get(0);
        int motor = header.indexOf("motor");
        int label = header.indexOf("switch_label");
        int margin = header.indexOf("margin_vds");
        int rank = header.indexOf("rank");
        boolean sawNegative = false;
        for (List<String> r : records.subList(1, records.size())) {
            for (int col : new int[] {motor, label}) {
                String cell = r.get(col);
                char first = cell.charAt(0);
                // OWASP CSV injection: no text cell may start with = + - @ TAB CR
                assertFalse(first == '=' || first == '+' || first == '-' || first == '@' || first == '\t' || first == '\r', cell);
            }
            assertTrue(HOSTILE_IDS.contains(r.get(motor).startsWith("'") ? r.get(motor).substring(1) : r.get(motor)));
            String m = r.get(margin);
            Double.parseDouble(m); // a plain number, not neutralised
            sawNegative |= m.startsWith("-");
            Integer.parseInt(r.get(rank));
        }
        assertTrue(sawNegative, "negative margins are written as negative numbers, without an apostrophe");
        assertEquals("'=cmd|' /C calc'!A0", ShortlistCsvWriter.safeText("=cmd|' /C calc'!A0"));
        assertEquals("'+1", ShortlistCsvWriter.safeText("+1"));
        assertEquals("'-2", ShortlistCsvWriter.safeText("-2"));
        assertEquals("'@SUM(1)", ShortlistCsvWriter.safeText("@SUM(1)"));
        assertEquals("M-12", ShortlistCsvWriter.safeText("M-12"));
    }

    @Test
    void valuesRoundTripAtFloatPrecisionInTheViewOrder() throws Exception {
        Shortlist s = Sweep.all(TestEvaluators.small());
        int[] order = Ranking.view(s, SortKey.parseList("cost:desc"), dev.yoke.engine.RowFilter.ALL.withFeasibleOnly(true));
        List<List<String>> records = Rfc4180Reader.read(csv(s, order));
        List<String> header = records.get(0);
        int loss = header.indexOf("total_loss [W]");
        int eff = header.indexOf("efficiency");
        for (int i = 0; i < order.length; i++) {
            List<String> r = records.get(i + 1);
            assertEquals(s.motorId(order[i]), r.get(header.indexOf("motor")));
            assertEquals((float) s.value(order[i], Metric.TOTAL_LOSS), Float.parseFloat(r.get(loss)), 0f);
            double e = s.value(order[i], Metric.EFFICIENCY);
            if (Double.isNaN(e)) {
                assertEquals("", r.get(eff), "a missing value is an empty cell");
            } else {
                assertEquals((float) e, Float.parseFloat(r.get(eff)), 0f);
            }
            assertEquals("true", r.get(header.indexOf("feasible")));
        }
    }

    @Test
    void fileExportIsAtomicAndHasAReproducibleSidecar(@TempDir Path dir) throws Exception {
        Shortlist s = Sweep.all(TestEvaluators.small());
        int[] order = Ranking.order(s, SortKey.DEFAULT);
        Path target = dir.resolve("short.csv");
        Files.writeString(target, "old content");
        Meta meta = new Meta("9.9", Instant.parse("2026-01-02T03:04:05Z"),
                new Meta.SourceFile("bench.yaml", "ab".repeat(32), 10, Instant.EPOCH), List.of(
                new Meta.SourceFile("catalog/motors.yaml", "cd".repeat(32), 20, Instant.EPOCH)),
                List.of("rank", "bench.yaml", "--csv", "short.csv"), Map.of("sort", "default"));
        ShortlistCsvWriter.write(s, order, target, meta);
        byte[] written = Files.readAllBytes(target);
        assertEquals(csv(s, order), new String(written, StandardCharsets.UTF_8));
        assertEquals(List.of("short.csv", "short.csv.bak", "short.meta.json"), entries(dir),
                "the file it replaced is kept as a backup, and no temporary file is left behind");
        assertEquals("old content", Files.readString(dir.resolve("short.csv.bak")));
        JsonNode sidecar = new ObjectMapper().readTree(dir.resolve("short.meta.json").toFile());
        assertEquals("9.9", sidecar.get("yoke_version").asText());
        assertEquals("bench.yaml", sidecar.get("scenario").get("path").asText());
        assertEquals("cd".repeat(32), sidecar.get("catalog_files").get(0).get("sha256").asText());
        assertEquals(order.length, sidecar.get("rows").asInt());
        assertEquals("2026-01-02T03:04:05Z", sidecar.get("created").asText());
        assertEquals("--csv", sidecar.get("command").get(2).asText());
        assertEquals(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(written)),
                sidecar.get("export_sha256").asText());
    }

    /** A second export keeps the first one, and its sidecar, as NAME.bak beside the new ones. */
    @Test
    void backupHoldsThePreviousExportAndItsSidecar(@TempDir Path dir) throws Exception {
        Shortlist s = Sweep.all(TestEvaluators.small());
        Path target = dir.resolve("short.csv");
        Meta meta = new Meta("9.9", Instant.EPOCH, null, List.of(), List.of(), Map.of());
        ShortlistCsvWriter.write(s, Ranking.order(s, SortKey.DEFAULT), target, meta);
        byte[] first = Files.readAllBytes(target);
        byte[] firstSidecar = Files.readAllBytes(dir.resolve("short.meta.json"));
        int[] second = Ranking.view(s, SortKey.parseList("cost:desc"), dev.yoke.engine.RowFilter.ALL.withFeasibleOnly(true));

        ShortlistCsvWriter.write(s, second, target, meta);

        assertEquals(csv(s, second), Files.readString(target));
        assertArrayEquals(first, Files.readAllBytes(dir.resolve("short.csv.bak")));
        assertArrayEquals(firstSidecar, Files.readAllBytes(dir.resolve("short.meta.json.bak")));
        assertEquals(List.of("short.csv", "short.csv.bak", "short.meta.json", "short.meta.json.bak"), entries(dir));
    }

    /**
     * The export streams: the save's stream receives the first bytes after a small share of the rows
     * has been generated, and then many writes none larger than a buffer, so the CSV never exists
     * in memory as a whole. Rows generated are counted through the catalog look-ups the writer makes
     * for each row's part ids and labels.
     */
    @Test
    void largeExportIsStreamedRowByRowNotBuiltInMemory() throws Exception {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            ids.add("part-" + i);
        }
        CatalogCounter counted = new CatalogCounter(TestEvaluators.withIds(ids, ids));
        Shortlist s = Sweep.all(counted);
        int[] order = Ranking.order(s, SortKey.DEFAULT);
        counted.lookUps.set(0);
        SinkWatch sink = new SinkWatch(counted);

        ShortlistCsvWriter.content(s, order, MessageDigest.getInstance("SHA-256")).writeTo(sink);

        long rowsGenerated = counted.lookUps.get() / LOOK_UPS_PER_ROW;
        assertEquals(order.length, rowsGenerated, "four catalog look-ups per row (motor and switch id and label)");
        assertTrue(order.length >= 20_000, "a shortlist large enough to matter: " + order.length + " rows");
        assertTrue(sink.bytes > 4L << 20, "several megabytes of CSV: " + sink.bytes);
        assertTrue(sink.rowsBeforeFirstWrite < order.length / 100,
                "bytes reached the save after " + sink.rowsBeforeFirstWrite + " of " + order.length + " rows");
        assertTrue(sink.largestWrite <= 1 << 16, "no write larger than a buffer: " + sink.largestWrite);
        assertTrue(sink.writes > sink.bytes / (1 << 16), sink.writes + " writes");
    }

    /** Catalog look-ups per CSV row: motor id, motor label, switch id, switch label. */
    private static final long LOOK_UPS_PER_ROW = 4;

    /** An evaluator that counts how often its catalog is asked for (the writer asks per row). */
    private static final class CatalogCounter implements dev.yoke.engine.PairingEvaluator {
        final dev.yoke.engine.PairingEvaluator inner;
        final AtomicLong lookUps = new AtomicLong();

        CatalogCounter(dev.yoke.engine.PairingEvaluator inner) {
            this.inner = inner;
        }

        @Override
        public dev.yoke.model.Scenario scenario() {
            return inner.scenario();
        }

        @Override
        public dev.yoke.model.Catalog catalog() {
            lookUps.incrementAndGet();
            return inner.catalog();
        }

        @Override
        public MotorSide prepare(int motor, int frequency, int ratio) {
            return inner.prepare(motor, frequency, ratio);
        }

        @Override
        public void summarize(MotorSide motorSide, int switchIndex, double[] row) {
            inner.summarize(motorSide, switchIndex, row);
        }

        @Override
        public dev.yoke.engine.PairingResult explain(int motor, int switchIndex, int frequency, int ratio) {
            return inner.explain(motor, switchIndex, frequency, ratio);
        }
    }

    /** Stands in for the save's stream: counts bytes and writes, and how many rows existed at the first write. */
    private static final class SinkWatch extends OutputStream {
        final CatalogCounter counted;
        long bytes;
        long writes;
        long largestWrite;
        long rowsBeforeFirstWrite = -1;

        SinkWatch(CatalogCounter counted) {
            this.counted = counted;
        }

        @Override
        public void write(int b) {
            write(new byte[] {(byte) b}, 0, 1);
        }

        @Override
        public void write(byte[] b, int off, int len) {
            if (rowsBeforeFirstWrite < 0) {
                rowsBeforeFirstWrite = counted.lookUps.get() / LOOK_UPS_PER_ROW;
            }
            bytes += len;
            writes++;
            largestWrite = Math.max(largestWrite, len);
        }
    }

    private static List<String> entries(Path dir) throws Exception {
        try (var files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
