package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import dev.yoke.engine.Metric;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.Shortlist;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CountDownLatch;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The workbench driven through Lanterna's virtual terminal with key strokes, checking what the screen shows. */
class WorkbenchTest {

    @TempDir
    Path dir;

    private static KeyStroke key(char c) {
        return new KeyStroke(c, false, false);
    }

    /** Moves the column choice to a shortlist column (from the default, the binding margin). */
    private static void selectColumn(ScreenHarness h, ShortlistColumn column) throws Exception {
        h.workbench.grid().setSelectedColumn(ShortlistGridModel.indexOf(column));
        h.update();
    }

    private static int columnStart(String header, String title) {
        int at = header.indexOf(title);
        assertTrue(at >= 0, () -> "heading '" + title + "' not on screen: " + header);
        return at;
    }

    @Test
    void shortlistShowsStatusHeadingsRowsAndFooter() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            String status = h.line(0);
            String header = h.line(1);
            String footer = h.line(h.rows() - 1);
            assertAll(
                    () -> assertTrue(status.contains("test-bench"), status),
                    () -> assertTrue(status.contains("180 shown / 180 total"), status),
                    () -> assertTrue(header.contains("motor") && header.contains("switch") && header.contains("verdict"), header),
                    () -> assertTrue(h.line(2).contains("mo-"), h.line(2)),
                    () -> assertTrue(footer.contains("s sort") && footer.contains("? help") && footer.contains("q quit"), footer));
        }
    }

    @Test
    void sortingByCostPutsTheCheapestFirstAndAgainReverses() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            selectColumn(h, ShortlistColumn.COST);
            String before = h.line(2);
            h.press(key('s')).press(KeyType.Home);
            ShortlistGridModel m = h.workbench.gridModel();
            double first = m.shortlist().value(m.shortlistRow(0), Metric.COST);
            double last = m.shortlist().value(m.shortlistRow(m.rowCount() - 1), Metric.COST);
            String header = h.line(1);
            int costEnd = columnStart(header, "cost ^") + "cost ^".length();
            String firstCell = h.line(2).substring(costEnd - 8, costEnd).strip();
            assertAll(
                    () -> assertTrue(first <= last, "ascending"),
                    () -> assertEquals(Cells.fixed(first, 2), firstCell, "the screen's first row shows the smallest cost"),
                    () -> assertTrue(header.contains("cost ^"), header),
                    () -> assertNotEquals(before, h.line(2), "the first row changed"));
            h.press(key('s'));
            double firstAfter = h.workbench.gridModel().shortlist().value(h.workbench.gridModel().shortlistRow(0), Metric.COST);
            assertAll(
                    () -> assertEquals(last, firstAfter, "reversed: the most expensive first"),
                    () -> assertTrue(h.line(1).contains("cost v"), h.line(1)));
        }
    }

    @Test
    void secondSortKeyOrdersTiesOfTheFirst() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            selectColumn(h, ShortlistColumn.MOTOR);
            h.press(key('s'));
            selectColumn(h, ShortlistColumn.COST);
            h.press(key('S'));
            ShortlistGridModel m = h.workbench.gridModel();
            for (int i = 1; i < m.rowCount(); i++) {
                int a = m.shortlistRow(i - 1);
                int b = m.shortlistRow(i);
                Shortlist s = m.shortlist();
                assertTrue(s.motorId(a).compareTo(s.motorId(b)) <= 0, "motor ids ascend");
                if (s.motorIndex(a) == s.motorIndex(b)) {
                    assertTrue(s.value(a, Metric.COST) <= s.value(b, Metric.COST), "cost ascends within a motor");
                }
            }
            assertTrue(h.line(0).contains("sort motor asc, cost asc"), h.line(0));
            assertTrue(h.line(1).contains("cost ^2"), h.line(1));
        }
    }

    @Test
    void feasibleFilterHidesFailingRows() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(KeyType.End);
            assertTrue(h.text().contains("FAIL"), "some pairings fail before filtering");
            h.press(key('f'));
            String screen = h.text();
            int shown = h.workbench.gridModel().rowCount();
            assertAll(
                    () -> assertFalse(screen.contains("FAIL"), screen),
                    () -> assertEquals(h.workbench.gridModel().shortlist().feasibleCount(), shown),
                    () -> assertTrue(shown > 0 && shown < 180),
                    () -> assertTrue(h.line(0).contains(shown + " shown / 180 total / " + shown + " feasible"), h.line(0)),
                    () -> assertTrue(h.line(0).contains("only feasible"), h.line(0)));
            h.press(key('z'));
            assertTrue(h.line(0).contains("180 shown"), h.line(0));
        }
    }

    @Test
    void paretoFilterKeepsOnlyMarkedRows() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('p'));
            int shown = h.workbench.gridModel().rowCount();
            assertTrue(shown > 0 && shown < 180);
            assertEquals(h.workbench.gridModel().shortlist().paretoCount(), shown);
            for (int row = 2; row < 2 + Math.min(shown, 20); row++) {
                assertEquals('*', h.line(row).charAt(0), "every row shown carries the Pareto mark: " + h.line(row));
            }
        }
    }

    @Test
    void textFilterKeepsPartsWhoseIdOrLabelMatches() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('/'));
            assertTrue(h.line(h.rows() - 2).contains("find in part ids and labels"), h.line(h.rows() - 2));
            h.type("sw-c").press(KeyType.Enter);
            int shown = h.workbench.gridModel().rowCount();
            assertEquals(6 * 3 * 2, shown, "6 motors x 1 switch x 3 frequencies x 2 ratios");
        }
    }

    @Test
    void marginThresholdHidesThinnerMargins() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            selectColumn(h, ShortlistColumn.MARGIN_JUNCTION);
            h.press(key('m')).type("20").press(KeyType.Enter);
            ShortlistGridModel m = h.workbench.gridModel();
            assertTrue(m.rowCount() > 0 && m.rowCount() < 180);
            for (int i = 0; i < m.rowCount(); i++) {
                assertTrue(m.shortlist().value(m.shortlistRow(i), Metric.MARGIN_JUNCTION) >= 0.2);
            }
            assertEquals("m:Tj>=+20.0%", h.workbench.view().describeFilters());
            assertTrue(h.line(0).contains(m.rowCount() + " shown"), h.line(0));
        }
    }

    @Test
    void badThresholdIsRefusedWithAMessage() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('m')).type("lots").press(KeyType.Enter);
            assertTrue(h.line(h.rows() - 2).contains("expected a percentage"), h.line(h.rows() - 2));
            h.press(KeyType.Escape);
            assertEquals(180, h.workbench.gridModel().rowCount());
        }
    }

    @Test
    void detailShowsTheBindingMarginMarkedAndGoesBack() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(KeyType.End);
            ShortlistGridModel m = h.workbench.gridModel();
            PairingResult expected = m.shortlist().explain(m.shortlistRow(m.rowCount() - 1));
            assertFalse(expected.feasible(), "the last row of the default order fails");
            h.press(KeyType.Enter);
            String screen = h.text();
            String title = expected.binding().title();
            String bindingLine = screen.lines().filter(l -> l.strip().startsWith(">")).findFirst().orElse("");
            assertAll(
                    () -> assertTrue(h.line(0).contains("Pairing detail: " + expected.motor().id()), h.line(0)),
                    () -> assertTrue(screen.contains("FAIL"), "the verdict is a word"),
                    () -> assertTrue(screen.contains("binding: " + title + ", margin "
                            + Cells.signedPercent(expected.bindingMargin())), screen),
                    () -> assertTrue(bindingLine.contains(title), "the marked margin is the binding one: " + bindingLine),
                    () -> assertTrue(bindingLine.contains("violated") && bindingLine.endsWith("binding"), bindingLine));
            h.press(KeyType.PageDown).press(KeyType.PageDown);
            String lower = h.text();
            assertAll(
                    () -> assertTrue(lower.contains("Losses per switch"), lower),
                    () -> assertTrue(lower.contains("Advisories"), lower),
                    () -> assertTrue(lower.contains("I rms A") && lower.contains("Tw C"), "current and temperature plots"));
            h.press(KeyType.Escape);
            assertTrue(h.line(0).contains("shown /"), "back on the shortlist: " + h.line(0));
        }
    }

    @Test
    void resizingKeepsStatusHeadingAndFooterReadable() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.resize(80, 24);
            assertAll(
                    () -> assertTrue(h.line(0).contains("test-bench"), h.line(0)),
                    () -> assertTrue(h.line(1).contains("motor") && h.line(1).contains("verdict"), h.line(1)),
                    () -> assertTrue(h.line(23).contains("? help"), h.line(23)),
                    () -> assertTrue(h.line(2).contains("mo-"), h.line(2)));
            h.resize(160, 50);
            assertAll(
                    () -> assertTrue(h.line(49).contains("? help") && h.line(49).contains("b bench"), h.line(49)),
                    () -> assertTrue(h.line(1).contains("ripple A"), "more columns fit at 160: " + h.line(1)),
                    () -> assertTrue(h.line(47).contains("mo-"), "more rows fit at 50: " + h.line(47)));
        }
    }

    @Test
    void sidewaysScrollKeepsIdentityColumns() throws Exception {
        try (ScreenHarness h = new ScreenHarness(80, 24, TerminalTraits.PLAIN, dir).ranked()) {
            selectColumn(h, ShortlistColumn.MARGIN_DUTY);
            String header = h.line(1);
            assertAll(
                    () -> assertTrue(header.contains("m:duty"), header),
                    () -> assertTrue(header.contains("motor") && header.contains("switch"), header),
                    () -> assertFalse(header.contains("verdict"), "scrolled past: " + header));
            h.press(KeyType.ArrowLeft);
            h.press(KeyType.Home);
            selectColumn(h, ShortlistColumn.FREQUENCY);
            assertTrue(h.line(1).contains("kHz"), h.line(1));
        }
    }

    @Test
    void monochromeStillMarksVerdictsAndCursor() throws Exception {
        TerminalTraits mono = new TerminalTraits(ColorDepth.MONOCHROME, false);
        try (ScreenHarness h = new ScreenHarness(100, 30, mono, dir).ranked()) {
            assertTrue(h.text().contains(" ok "), "verdicts are words");
            h.press(KeyType.End);
            assertTrue(h.text().contains("FAIL"), "verdicts are words");
            h.press(KeyType.Home);
            assertTrue(h.at(5, 2).getModifiers().contains(SGR.REVERSE), "cursor row in reverse video");
            assertFalse(h.at(5, 3).getModifiers().contains(SGR.REVERSE), "other rows not reversed");
            h.press(KeyType.ArrowDown);
            assertTrue(h.at(5, 3).getModifiers().contains(SGR.REVERSE), "cursor moved down");
        }
    }

    @Test
    void unicodeTerminalsGetUnicodeMarks() throws Exception {
        TerminalTraits utf = new TerminalTraits(ColorDepth.INDEXED_256, true);
        try (ScreenHarness h = new ScreenHarness(100, 30, utf, dir).ranked()) {
            assertTrue(h.line(1).contains("verdict \u25BC"), h.line(1));
            assertTrue(h.text().contains("\u2502"), "column rule");
        }
    }

    @Test
    void implausiblePartsCarryAMark() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir, new Fixtures.TestBackend(6, 5),
                Set.of("sw-a")).ranked()) {
            h.press(key('/')).type("sw-a").press(KeyType.Enter);
            assertTrue(h.line(2).contains("!sw-a"), h.line(2));
        }
    }

    /** At 80 columns every help description is whole: long ones wrap under themselves instead of being cut. */
    @Test
    void helpWrapsLongDescriptionsAt80Columns() throws Exception {
        try (ScreenHarness h = new ScreenHarness(80, 24, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('?'));
            StringBuilder seen = new StringBuilder();
            for (int page = 0; page < 4; page++) {
                seen.append(h.text()).append('\n');
                h.press(KeyType.PageDown);
            }
            String words = seen.toString().replaceAll("\\s+", " ");
            assertAll(
                    () -> assertTrue(words.contains("reaches a minimum"), words),
                    () -> assertTrue(words.contains("is both cheaper and less lossy"), words));
        }
    }

    @Test
    void helpAndCautionsAreOneKeyAway() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('?'));
            String help = h.text();
            assertAll(
                    () -> assertTrue(help.contains("Help: keys"), help),
                    () -> assertTrue(help.contains("sort by the chosen column"), help),
                    () -> assertTrue(help.contains("Pairing detail"), help));
            h.press(key('c'));
            String cautions = h.text();
            assertAll(
                    () -> assertTrue(cautions.contains("measure the"), cautions),
                    () -> assertTrue(cautions.contains("burn skin"), cautions),
                    () -> assertTrue(cautions.contains("licensed electrician"), cautions),
                    () -> assertTrue(cautions.contains("Measure temperatures"), cautions));
            h.press(key('q')).press(KeyType.Escape);
            assertTrue(h.line(0).contains("shown /"), h.line(0));
            assertFalse(h.workbench.isFinished(), "q on a page goes back, it does not quit");
        }
    }

    @Test
    void exportWritesTheViewInItsOrder() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            selectColumn(h, ShortlistColumn.COST);
            h.press(key('s')).press(key('f'));
            h.press(key('x'));
            assertTrue(h.line(h.rows() - 2).contains("shortlist.csv"), h.line(h.rows() - 2));
            h.press(KeyType.Enter);
            for (int i = 0; i < 2000 && h.workbench.isExporting(); i++) {
                Thread.sleep(5);
                h.press(KeyType.ArrowLeft);
            }
            Path csv = dir.resolve("shortlist.csv");
            List<String> lines = Files.readAllLines(csv);
            ShortlistGridModel m = h.workbench.gridModel();
            assertEquals(m.rowCount() + 1, lines.size(), "a heading and one line per row shown");
            Shortlist s = m.shortlist();
            for (int i = 0; i < m.rowCount(); i++) {
                String[] cells = lines.get(i + 1).split(",");
                assertEquals(String.valueOf(i + 1), cells[0], "rank column");
                assertEquals(s.motorId(m.shortlistRow(i)), cells[1], "motor of row " + i);
                assertEquals(s.switchId(m.shortlistRow(i)), cells[3], "switch of row " + i);
            }
            assertTrue(lines.get(0).startsWith("rank,motor,"), lines.get(0));
            assertTrue(h.line(h.rows() - 2).contains("wrote " + m.rowCount() + " rows"), h.line(h.rows() - 2));
        }
    }

    @Test
    void exportRefusesNamesOutsideTheFolderAndAsksBeforeReplacing() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('x'));
            for (int i = 0; i < ExportTarget.DEFAULT_NAME.length(); i++) {
                h.press(KeyType.Backspace);
            }
            h.type("../escape").press(KeyType.Enter);
            assertTrue(h.line(h.rows() - 2).contains("without folders"), h.line(h.rows() - 2));
            assertFalse(Files.exists(dir.getParent().resolve("escape.csv")));
            h.press(KeyType.Escape);
            Files.writeString(dir.resolve("kept.csv"), "mine");
            h.press(key('x'));
            for (int i = 0; i < ExportTarget.DEFAULT_NAME.length(); i++) {
                h.press(KeyType.Backspace);
            }
            h.type("kept").press(KeyType.Enter);
            assertTrue(h.line(h.rows() - 2).contains("exists"), h.line(h.rows() - 2));
            assertEquals("mine", Files.readString(dir.resolve("kept.csv")));
            h.press(KeyType.Escape);
            assertEquals("mine", Files.readString(dir.resolve("kept.csv")), "Esc keeps the file");
        }
    }

    @Test
    void longRankingShowsProgressAndEscStopsIt() throws Exception {
        Fixtures.TestBackend backend = new Fixtures.TestBackend(6, 5);
        backend.hold = new CountDownLatch(1);
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir, backend, Set.of())) {
            for (int i = 0; i < 200 && Double.isNaN(h.workbench.ranking().fraction()); i++) {
                Thread.sleep(5);
            }
            h.update();
            h.workbench.tick();
            h.update();
            assertTrue(h.line(h.rows() - 2).contains("ranking 33%"), h.line(h.rows() - 2));
            assertTrue(h.line(h.rows() - 2).contains("Esc stops"), h.line(h.rows() - 2));
            h.press(KeyType.ArrowDown);
            BackgroundRanking run = h.workbench.ranking();
            h.press(KeyType.Escape);
            run.await(5000);
            h.press(KeyType.ArrowDown);
            assertEquals(BackgroundRanking.State.CANCELLED, run.state());
            assertTrue(h.text().contains("ranking stopped"), h.text());
            backend.hold = null;
            h.press(key('r'));
            h.ranked();
            assertTrue(h.line(0).contains("180 shown"), h.line(0));
        }
    }

    @Test
    void ctrlCQuitsFromAnyScreen() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(KeyType.Enter);
            h.press(new KeyStroke('c', true, false));
            assertTrue(h.workbench.isFinished());
        }
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.press(key('q'));
            assertTrue(h.workbench.isFinished());
        }
    }

    @Test
    void editorChangesRankAgain() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.workbench.catalogChanged(Fixtures.catalog(3, 2), Set.of());
            h.ranked();
            assertTrue(h.line(0).contains("36 shown / 36 total"), h.line(0));
            assertEquals(2, h.backend.rankings);
        }
    }

    @Test
    void largeShortlistsSortOnAWorkerWhileTheScreenAnswers() throws Exception {
        try (ScreenHarness h = new ScreenHarness(100, 30, TerminalTraits.PLAIN, dir).ranked()) {
            h.workbench.setSortOnScreenThreadLimit(0);
            selectColumn(h, ShortlistColumn.COST);
            h.press(key('s'));
            for (int i = 0; i < 500 && h.workbench.isSorting(); i++) {
                h.press(KeyType.ArrowDown);
                Thread.sleep(2);
            }
            h.press(KeyType.Home);
            ShortlistGridModel m = h.workbench.gridModel();
            assertFalse(h.workbench.isSorting());
            assertEquals("cost asc", m.view().describeSort(), "the sorted view was swapped in");
            for (int i = 1; i < m.rowCount(); i++) {
                assertTrue(m.shortlist().value(m.shortlistRow(i - 1), Metric.COST)
                        <= m.shortlist().value(m.shortlistRow(i), Metric.COST));
            }
        }
    }
}
