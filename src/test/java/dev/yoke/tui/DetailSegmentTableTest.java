package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.input.KeyType;
import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.LoadedCatalog;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.SegmentResult;
import dev.yoke.model.Scenario;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The pairing detail's per-segment table on the demo (whose segment labels are long enough to
 * push the table past 100 columns in the roomy layout): every column must be readable on screen.
 */
class DetailSegmentTableTest {

    private static final List<String> HEADERS = List.of(
            "time s", "rpm", "N*m", "I avg", "I rms", "I pk", "V", "duty%", "ripple", "Tw C", "Tj C");

    @TempDir
    Path dir;

    private ScreenHarness demo(int columns, int rows) throws Exception {
        LoadedCatalog catalog = CatalogLoader.load(Path.of("catalog"));
        Scenario scenario = ScenarioLoader.load(Path.of("demo-data/rover-wheel.yaml")).scenario();
        return new ScreenHarness(columns, rows, TerminalTraits.PLAIN, dir, new Fixtures.TestBackend(0, 0), scenario,
                catalog.catalog(), catalog.implausibleIds()).ranked();
    }

    /** Opens the detail of the first row and scrolls down (arrow key) until the table's heading is well on screen. */
    private static int openTable(ScreenHarness h) throws Exception {
        h.press(KeyType.Enter);
        for (int presses = 0; presses < 200; presses++) {
            for (int row = 1; row < h.rows() - 6; row++) {
                if (h.line(row).strip().equals("Per segment")) {
                    return row;
                }
            }
            h.press(KeyType.ArrowDown);
        }
        throw new AssertionError("'Per segment' never came on screen: " + h.text());
    }

    /** Each heading in order in the text; returns where the last one ends. */
    private static int assertInOrder(String text, List<String> titles) {
        int from = 0;
        for (String title : titles) {
            int at = text.indexOf(title, from);
            assertTrue(at >= 0, () -> "'" + title + "' not found in order in: " + text);
            from = at + title.length();
        }
        return from;
    }

    private static String tjOf(SegmentResult s) {
        double tj = Double.NEGATIVE_INFINITY;
        for (double j : s.junctionTemps()) {
            tj = Math.max(tj, j);
        }
        return Cells.number(tj);
    }

    @Test
    void everySegmentColumnIsOnScreenAt100By30() throws Exception {
        try (ScreenHarness h = demo(100, 30)) {
            ShortlistGridModel m = h.workbench.gridModel();
            PairingResult shown = m.shortlist().explain(m.shortlistRow(0));
            int at = openTable(h);
            String header = h.line(at + 1);
            String first = h.line(at + 2);
            int tjEnd = assertInOrder(header, HEADERS);
            String tj = tjOf(shown.segments().get(0));
            assertAll(
                    () -> assertTrue(first.startsWith("  " + shown.segments().get(0).label().substring(0, 9)), first),
                    // Right-aligned under its heading: the first segment's hottest junction, as the engine gives it.
                    () -> assertEquals(tj, first.substring(tjEnd - tj.length(), tjEnd), first),
                    () -> assertEquals(FittedTable.Fit.COMPACT, fitAt(shown, h.workbench.scenario(), 100)));
        }
    }

    @Test
    void narrowScreensPutEachSegmentOnTwoLines() throws Exception {
        try (ScreenHarness h = demo(80, 24)) {
            ShortlistGridModel m = h.workbench.gridModel();
            PairingResult shown = m.shortlist().explain(m.shortlistRow(0));
            int at = openTable(h);
            int split = (HEADERS.size() + 1) / 2;
            assertInOrder(h.line(at + 1), HEADERS.subList(0, split));
            int tjEnd = assertInOrder(h.line(at + 2), HEADERS.subList(split, HEADERS.size()));
            String tj = tjOf(shown.segments().get(0));
            String second = h.line(at + 4);
            assertAll(
                    () -> assertTrue(h.line(at + 3).startsWith("  pull away"), h.line(at + 3)),
                    () -> assertEquals(tj, second.substring(tjEnd - tj.length(), tjEnd), second),
                    () -> assertEquals(FittedTable.Fit.TWO_LINES, fitAt(shown, h.workbench.scenario(), 80)));
        }
    }

    @Test
    void wideScreensKeepTheRoomyLayout() throws Exception {
        try (ScreenHarness h = demo(120, 40)) {
            ShortlistGridModel m = h.workbench.gridModel();
            PairingResult shown = m.shortlist().explain(m.shortlistRow(0));
            assertEquals(FittedTable.Fit.ROOMY, fitAt(shown, h.workbench.scenario(), 120));
        }
    }

    @Test
    void noTableLineIsWiderThanTheScreenItWasLaidOutFor() throws Exception {
        try (ScreenHarness h = demo(100, 30)) {
            ShortlistGridModel m = h.workbench.gridModel();
            PairingResult shown = m.shortlist().explain(m.shortlistRow(0));
            for (int width = 64; width <= 160; width++) {
                List<Line> lines = DetailReport.lines(shown, h.workbench.scenario(), TerminalTraits.PLAIN, width);
                int start = lines.indexOf(Line.of(Tone.HEADING, "Per segment"));
                assertTrue(start >= 0);
                for (int i = start; i < lines.size() && !lines.get(i).spans().isEmpty(); i++) {
                    int w = width;
                    String text = lines.get(i).text();
                    assertTrue(text.length() <= width, () -> "at " + w + ": " + text);
                }
            }
        }
    }

    private static FittedTable.Fit fitAt(PairingResult r, Scenario scenario, int width) {
        return DetailReport.segmentTable(r.segments(), DetailReport.labelWidth(r.segments()), "C").fitFor(width);
    }
}
