package dev.yoke.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TextColor;
import com.googlecode.lanterna.gui2.DefaultWindowManager;
import com.googlecode.lanterna.gui2.EmptySpace;
import com.googlecode.lanterna.gui2.MultiWindowTextGUI;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.LoadedCatalog;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.model.Scenario;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Writes text captures of each workbench screen on the demo (virtual terminal, 100×30, UTF-8)
 * into a Markdown file, and the key tables into keys.md beside it. Run by hand: see docs/screens.md.
 */
public final class ScreenCaptures {

    /** The text above the key tables in docs/keys.md. */
    static final String KEYS_HEADING = "# Workbench keys\n\n"
            + "Generated from `dev.yoke.tui.KeyMap`, the one place the keys are defined: the help screen (`?`),\n"
            + "the footers and this page all come from it (`KeyMapDocsTest` fails when this page falls behind).\n"
            + "Ctrl+S/Q (terminal flow control) and Ctrl+H/I/J/M (they arrive as Backspace, Tab and Enter) are\n"
            + "never bound.\n";

    private ScreenCaptures() {
    }

    public static void main(String[] args) throws Exception {
        Path project = Path.of(args.length > 0 ? args[0] : ".");
        Path target = Path.of(args.length > 1 ? args[1] : "docs/screens.md");
        LoadedCatalog catalog = CatalogLoader.load(project.resolve("catalog"));
        Scenario demo = ScenarioLoader.load(project.resolve("demo-data/rover-wheel.yaml")).scenario();
        DefaultVirtualTerminal vt = new DefaultVirtualTerminal(new TerminalSize(100, 30));
        TerminalScreen screen = new TerminalScreen(vt);
        screen.startScreen();
        MultiWindowTextGUI gui = new MultiWindowTextGUI(screen, new DefaultWindowManager(), new EmptySpace(TextColor.ANSI.DEFAULT));
        Workbench wb = new Workbench(gui, new TerminalTraits(ColorDepth.INDEXED_256, true),
                new EngineBackend("docs", null, List.of()), demo, catalog.catalog(), catalog.implausibleIds(), Path.of("."));
        wb.open();
        wb.ranking().await(60_000);
        wb.tick();
        StringBuilder md = new StringBuilder();
        md.append("# Workbench screens\n\n")
                .append("Text captures of `yoke open` on the demo scenario (`demo-data/rover-wheel.yaml`, bundled\n")
                .append("invented catalog), taken from Lanterna's virtual terminal at 100×30 with a UTF-8 locale.\n")
                .append("Regenerate with:\n\n```sh\nmvn -B -q -DskipTests test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt\n")
                .append("java -cp target/test-classes:target/classes:$(cat target/cp.txt) dev.yoke.tui.ScreenCaptures . docs/screens.md\n```\n\n")
                .append("Marks: `\u25C6` Pareto front (`*` in ASCII), `!id` an implausible part, `ok`/`FAIL` the verdict,\n")
                .append("`\u25B2`/`\u25BC` sort direction (`^`/`v`), `\u25B6` the binding margin in the detail (`>`).\n")
                .append("The cursor row is drawn in reverse video (not visible in text captures).\n\n");
        update(gui);
        capture(md, "Shortlist (first screen)", vt);
        wb.grid().setSelectedColumn(ShortlistGridModel.indexOf(ShortlistColumn.COST));
        keys(gui, vt, new KeyStroke('f', false, false), new KeyStroke('s', false, false), new KeyStroke(KeyType.Home));
        capture(md, "Feasible only, sorted by cost (the grid scrolled sideways to the cost column)", vt);
        keys(gui, vt, new KeyStroke(KeyType.Enter));
        capture(md, "Pairing detail (Enter)", vt);
        keys(gui, vt, new KeyStroke(KeyType.PageDown));
        capture(md, "Pairing detail, scrolled: per segment, losses per switch", vt);
        keys(gui, vt, new KeyStroke(KeyType.End));
        capture(md, "Pairing detail, end: advisories and plots over the cycle", vt);
        keys(gui, vt, new KeyStroke(KeyType.Escape), new KeyStroke('?', false, false));
        capture(md, "Help (?)", vt);
        keys(gui, vt, new KeyStroke(KeyType.Escape), new KeyStroke('c', false, false));
        capture(md, "Cautions (c)", vt);
        keys(gui, vt, new KeyStroke(KeyType.Escape), new KeyStroke('x', false, false));
        capture(md, "Export prompt (x)", vt);
        keys(gui, vt, new KeyStroke(KeyType.Escape));
        vt.setTerminalSize(new TerminalSize(80, 24));
        update(gui);
        update(gui);
        capture(md, "The same at 80×24", vt);
        screen.stopScreen();
        Files.createDirectories(target.toAbsolutePath().getParent());
        Files.writeString(target, md.toString());
        System.out.println("wrote " + target);
        Path keys = target.resolveSibling("keys.md");
        Files.writeString(keys, KEYS_HEADING + KeyMap.markdown());
        System.out.println("wrote " + keys);
    }

    private static void keys(MultiWindowTextGUI gui, DefaultVirtualTerminal vt, KeyStroke... strokes) throws Exception {
        for (KeyStroke k : strokes) {
            vt.addInput(k);
            update(gui);
        }
    }

    private static void update(MultiWindowTextGUI gui) throws Exception {
        gui.getGUIThread().processEventsAndUpdate();
    }

    private static void capture(StringBuilder md, String title, DefaultVirtualTerminal vt) {
        md.append("## ").append(title).append("\n\n```text\n");
        for (String line : vt.toString().split("\n")) {
            md.append(line.replaceAll("\\s+$", "")).append('\n');
        }
        md.append("```\n\n");
    }
}
