package dev.yoke.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.dataformat.csv.CsvFactory;
import com.fasterxml.jackson.dataformat.csv.CsvGenerator;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import dev.yoke.catalog.AtomicFile;
import dev.yoke.engine.Advisory;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.Metric;
import dev.yoke.engine.Shortlist;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * Writes a shortlist view as CSV (RFC 4180: comma separated, CRLF line ends, fields quoted when
 * they hold a comma, a quote or a line break) through Jackson's CSV generator: one row per
 * pairing in the order given, units in the header ({@code current_rms [A]}), the binding
 * constraint and every margin.
 *
 * <p>Text cells that a spreadsheet would run as a formula (starting with {@code = + - @}, tab or
 * carriage return) get a leading apostrophe (the OWASP advice against CSV injection); numbers are
 * written as numbers. Metric values have the shortlist's float precision; missing values (NaN)
 * are empty cells.
 */
public final class ShortlistCsvWriter {

    private ShortlistCsvWriter() {
    }

    /** The header, in column order. */
    public static List<String> header() {
        List<String> h = new ArrayList<>(List.of("rank", "motor", "motor_label", "switch", "switch_label",
                "pwm_frequency [Hz]", "gear_ratio", "feasible", "pareto", "binding", "binding_margin"));
        for (Metric m : valueMetrics()) {
            h.add(m.unit().isEmpty() ? m.key() : m.key() + " [" + m.unit() + "]");
        }
        h.add("advisories");
        return h;
    }

    /** Every metric shown as its own numeric column (the packed or coded ones are spelled out instead). */
    static List<Metric> valueMetrics() {
        List<Metric> out = new ArrayList<>();
        for (Metric m : Metric.values()) {
            if (m != Metric.FEASIBLE && m != Metric.BINDING && m != Metric.BINDING_MARGIN && m != Metric.ADVISORIES) {
                out.add(m);
            }
        }
        return out;
    }

    /**
     * Writes the rows {@code visibleOrder} of {@code shortlist} to {@code target} and then the
     * sidecar {@link Meta#sidecarOf}, each through {@link AtomicFile}: streamed into a temporary
     * file in the same folder, forced to the device and renamed over the target, the previous
     * version kept as {@code NAME.bak}. The CSV is never held in memory as a whole.
     *
     * @throws IOException when the folder is missing or not writable; the target is then unchanged
     */
    public static void write(Shortlist shortlist, int[] visibleOrder, Path target, Meta meta) throws IOException {
        Path file = target.toAbsolutePath();
        MessageDigest digest = sha256();
        AtomicFile.write(file, content(shortlist, visibleOrder, digest));
        byte[] sidecar = meta.toJson(file.getFileName().toString(), visibleOrder.length,
                HexFormat.of().formatHex(digest.digest()));
        AtomicFile.write(Meta.sidecarOf(file), sidecar);
    }

    /** The CSV as UTF-8 bytes streamed into a save, every byte also fed to {@code digest} (for the sidecar). */
    static AtomicFile.Content content(Shortlist shortlist, int[] visibleOrder, MessageDigest digest) {
        return out -> {
            try (Writer w = new OutputStreamWriter(new DigestOutputStream(out, digest), StandardCharsets.UTF_8)) {
                write(shortlist, visibleOrder, w);
            }
        };
    }

    /** Writes the CSV text to {@code out} (for {@code --csv -}); the caller closes {@code out}. */
    public static void write(Shortlist shortlist, int[] visibleOrder, Writer out) throws IOException {
        CsvSchema.Builder schema = CsvSchema.builder().setUseHeader(true).setLineSeparator("\r\n");
        for (String h : header()) {
            schema.addColumn(h);
        }
        CsvFactory factory = new CsvFactory();
        List<Metric> metrics = valueMetrics();
        try (CsvGenerator g = factory.createGenerator(new NonClosing(out))) {
            g.setSchema(schema.build());
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            int rank = 0;
            for (int row : visibleOrder) {
                g.writeStartArray();
                g.writeNumber(++rank);
                int m = shortlist.motorIndex(row);
                int s = shortlist.switchIndex(row);
                g.writeString(safeText(shortlist.evaluator().catalog().motors().get(m).id()));
                g.writeString(safeText(shortlist.evaluator().catalog().motors().get(m).label()));
                g.writeString(safeText(shortlist.evaluator().catalog().switches().get(s).id()));
                g.writeString(safeText(shortlist.evaluator().catalog().switches().get(s).label()));
                number(g, shortlist.frequency(row));
                number(g, shortlist.ratio(row));
                g.writeString(shortlist.feasible(row) ? "true" : "false");
                g.writeString(shortlist.isPareto(row) ? "true" : "false");
                Constraint binding = shortlist.binding(row);
                g.writeString(binding.key());
                number(g, (float) shortlist.bindingMargin(row));
                for (Metric metric : metrics) {
                    number(g, (float) shortlist.value(row, metric));
                }
                StringBuilder advisories = new StringBuilder();
                for (Advisory a : shortlist.advisories(row)) {
                    if (advisories.length() > 0) {
                        advisories.append(';');
                    }
                    advisories.append(a.key());
                }
                g.writeString(advisories.toString());
                g.writeEndArray();
            }
        }
        out.flush();
    }

    private static void number(CsvGenerator g, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumber(v);
        } else {
            g.writeNull();
        }
    }

    private static void number(CsvGenerator g, float v) throws IOException {
        if (Float.isFinite(v)) {
            g.writeNumber(v);
        } else {
            g.writeNull();
        }
    }

    /**
     * A text cell a spreadsheet will not evaluate: a leading apostrophe before {@code = + - @},
     * tab or carriage return (OWASP, "CSV Injection").
     */
    public static String safeText(String text) {
        if (text == null || text.isEmpty()) {
            return text == null ? "" : text;
        }
        char c = text.charAt(0);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r' ? "'" + text : text;
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    /** Keeps the generator from closing the caller's writer (standard output). */
    private static final class NonClosing extends java.io.FilterWriter {
        NonClosing(Writer w) {
            super(w);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }
}
