package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Terminal traits, key map, export names, the line editor and cell formats. */
class SmallPartsTest {

    @Test
    void colourDepthFollowsTermColortermAndNoColor() {
        assertAll(
                () -> assertEquals(ColorDepth.INDEXED_256, TerminalTraits.colorDepthOf(Map.of("TERM", "xterm-256color"))),
                () -> assertEquals(ColorDepth.INDEXED_256, TerminalTraits.colorDepthOf(Map.of("TERM", "xterm", "COLORTERM", "truecolor"))),
                () -> assertEquals(ColorDepth.SIXTEEN, TerminalTraits.colorDepthOf(Map.of("TERM", "screen"))),
                () -> assertEquals(ColorDepth.MONOCHROME, TerminalTraits.colorDepthOf(Map.of("TERM", "vt100"))),
                () -> assertEquals(ColorDepth.MONOCHROME, TerminalTraits.colorDepthOf(Map.of("TERM", "xterm-256color", "NO_COLOR", "1"))));
    }

    @Test
    void localeVariablesFollowPosixPrecedence() {
        Map<String, String> env = new HashMap<>();
        env.put("LANG", "en_GB.UTF-8");
        assertTrue(TerminalTraits.localeIsUtf8(env));
        env.put("LC_ALL", "C");
        assertFalse(TerminalTraits.localeIsUtf8(env), "LC_ALL overrides LANG (POSIX)");
        assertFalse(TerminalTraits.localeIsUtf8(Map.of()));
    }

    @Test
    void noTwoActionsOfAScreenShareAKey() {
        KeyStroke[] probes = {new KeyStroke(KeyType.Enter), new KeyStroke(KeyType.Escape), new KeyStroke(KeyType.ArrowUp),
                new KeyStroke('q', false, false), new KeyStroke('c', false, false), new KeyStroke('?', false, false),
                new KeyStroke('s', false, false), new KeyStroke('S', false, false), new KeyStroke('/', false, false)};
        for (KeyMap.View view : KeyMap.View.values()) {
            for (KeyStroke k : probes) {
                long matches = KeyMap.actionsOf(view).stream().filter(a -> a.matches(k)).count();
                assertTrue(matches <= 1, view + " binds " + k + " twice");
            }
        }
    }

    @ParameterizedTest
    @ValueSource(chars = {'s', 'q', 'h', 'i', 'j', 'm'})
    void flowControlAndAliasedControlKeysAreUnbound(char c) {
        // Ctrl+S/Q are eaten by XON/XOFF flow control; Ctrl+H/I/J/M arrive as Backspace, Tab, Enter (common practice).
        KeyStroke ctrl = new KeyStroke(c, true, false);
        for (KeyMap.View view : KeyMap.View.values()) {
            assertEquals(Optional.empty(), KeyMap.actionFor(view, ctrl));
        }
    }

    @Test
    void footerAlwaysKeepsTheWayOutAndHelp() {
        String narrow = KeyMap.footer(KeyMap.View.SHORTLIST, 30);
        assertTrue(narrow.length() <= 30, narrow);
        assertTrue(narrow.contains("q quit") && narrow.contains("? help"), narrow);
        assertTrue(KeyMap.footer(KeyMap.View.DETAIL, 80).contains("Esc back"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"../x.csv", "/etc/passwd", "a/b.csv", "..", ".hidden", "c:x.csv", "a\\b.csv", "  "})
    void exportNamesThatLeaveTheFolderAreRefused(String name) {
        assertThrows(IllegalArgumentException.class, () -> ExportTarget.resolve(Path.of("/tmp/out"), name));
    }

    @Test
    void exportNameGetsCsvExtensionInTheFolder() {
        assertEquals(Path.of("/tmp/out/best.csv"), ExportTarget.resolve(Path.of("/tmp/out"), "best"));
        assertEquals(Path.of("/tmp/out/a.CSV"), ExportTarget.resolve(Path.of("/tmp/out"), "a.CSV"));
    }

    @Test
    void lineEditorInsertsDeletesAndMoves() {
        LineEditor e = new LineEditor("ac");
        e.edit(new KeyStroke(KeyType.ArrowLeft));
        e.edit(new KeyStroke('b', false, false));
        assertEquals("abc", e.text());
        e.edit(new KeyStroke(KeyType.Home));
        e.edit(new KeyStroke(KeyType.Delete));
        e.edit(new KeyStroke(KeyType.End));
        e.edit(new KeyStroke(KeyType.Backspace));
        assertEquals("b", e.text());
        assertFalse(e.edit(new KeyStroke(KeyType.Tab)));
    }

    @Test
    void engineeringFormatUsesPowersOfAThousand() {
        // SI prefixes step by 10^3 (SI Brochure, 9th ed., table 7).
        assertAll(
                () -> assertEquals("4.70 mH", Cells.engineering(4.7e-3, "H")),
                () -> assertEquals("20.0 kHz", Cells.engineering(20e3, "Hz")),
                () -> assertEquals("1.00 kHz", Cells.engineering(999.99, "Hz"), "rounding carries to the next prefix"),
                () -> assertEquals("330 nC", Cells.engineering(330e-9, "C")),
                () -> assertEquals("+12.5%", Cells.signedPercent(0.125)),
                () -> assertEquals("-", Cells.number(Double.NaN)));
    }

    @Test
    void sortKeyPressesReverseAndKeepTheSecondKey() {
        ViewSettings cost = ViewSettings.DEFAULT.sortedBy(ShortlistColumn.COST);
        assertEquals(1, cost.sort().size(), "the three-key default is replaced");
        assertFalse(cost.sort().get(0).descending(), "cost: smallest first");
        assertTrue(cost.sortedBy(ShortlistColumn.COST).sort().get(0).descending(), "again: reversed");
        ViewSettings two = cost.thenSortedBy(ShortlistColumn.EFFICIENCY);
        assertEquals(2, two.sort().size());
        assertTrue(two.sort().get(1).descending(), "efficiency: largest first");
        assertEquals(2, two.sortedBy(ShortlistColumn.MOTOR).sort().size(), "a new first key keeps the second");
        assertEquals(two, two.thenSortedBy(ShortlistColumn.COST), "the first key cannot also be second");
        assertEquals("cost asc, eff% desc", two.describeSort());
    }

    @Test
    void thresholdsOnlyOnMarginsAndRemovable() {
        ViewSettings v = ViewSettings.DEFAULT.withThreshold(ShortlistColumn.MARGIN_JUNCTION, 0.1);
        assertEquals(0.1, v.threshold(ShortlistColumn.MARGIN_JUNCTION));
        assertEquals("m:Tj>=+10.0%", v.describeFilters());
        assertEquals("", v.withThreshold(ShortlistColumn.MARGIN_JUNCTION, Double.NaN).describeFilters());
        assertTrue(ShortlistColumn.BINDING_MARGIN.isMargin());
        assertFalse(ShortlistColumn.COST.isMargin());
    }
}
