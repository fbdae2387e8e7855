package dev.yoke.tui;

import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Every key of the workbench in one place, so the help screen, the footers and the README agree.
 * Ctrl+S/Q (terminal flow control), Ctrl+H/I/J/M (arrive as Backspace, Tab and Enter) are never bound.
 */
public final class KeyMap {

    private KeyMap() {
    }

    /** The screens that have keys of their own. */
    public enum View {
        SHORTLIST("Shortlist"),
        DETAIL("Pairing detail"),
        PAGE("Help and cautions"),
        DIALOG("Dialogs"),
        LOADING("While the catalog and scenario are read");

        private final String title;

        View(String title) {
            this.title = title;
        }

        public String title() {
            return title;
        }
    }

    /** One binding: the keys, the word shown in the footer and the sentence shown in help. */
    public enum Action {
        ROW_MOVE(View.SHORTLIST, "Up Down PgUp PgDn Home End", "move", "move the cursor row", false,
                KeyType.ArrowUp, KeyType.ArrowDown, KeyType.PageUp, KeyType.PageDown, KeyType.Home, KeyType.End),
        COLUMN_MOVE(View.SHORTLIST, "Left Right", "column", "choose a column; the grid scrolls sideways to it", false,
                KeyType.ArrowLeft, KeyType.ArrowRight),
        OPEN_DETAIL(View.SHORTLIST, "Enter", "detail", "open the pairing under the cursor", true, KeyType.Enter),
        SORT(View.SHORTLIST, "s", "sort", "sort by the chosen column; again reverses it", true, 's'),
        SORT_SECOND(View.SHORTLIST, "S", "2nd key", "second sort key on the chosen column; again reverses it", false, 'S'),
        FEASIBLE_ONLY(View.SHORTLIST, "f", "feasible", "show feasible pairings only (toggle)", true, 'f'),
        PARETO_ONLY(View.SHORTLIST, "p", "Pareto", "show the Pareto front only (toggle)", true, 'p'),
        FIND(View.SHORTLIST, "/", "find", "keep pairings whose motor or switch id or label contains a text", true, '/'),
        THRESHOLD(View.SHORTLIST, "m", "margin", "keep pairings whose chosen margin (or binding margin) reaches a minimum",
                true, 'm'),
        CLEAR_FILTERS(View.SHORTLIST, "z", "clear", "clear every filter", false, 'z'),
        EXPORT(View.SHORTLIST, "x", "export", "write the rows shown, in their order, to a CSV file", true, 'x'),
        RERANK(View.SHORTLIST, "r", "re-rank", "rank again from the scenario and catalog", false, 'r'),
        CANCEL_RANKING(View.SHORTLIST, "Esc", "stop", "stop a ranking that is still running", false, KeyType.Escape),
        EDIT_PARTS(View.SHORTLIST, "e", "parts", "edit the parts catalog", true, 'e'),
        EDIT_BENCH(View.SHORTLIST, "b", "bench", "edit the bench and duty profile", true, 'b'),
        QUIT(View.SHORTLIST, "q Ctrl+C", "quit", "leave Yoke", true, 'q'),

        SCROLL(View.DETAIL, "Up Down PgUp PgDn Home End Left Right", "scroll", "scroll the page", false,
                KeyType.ArrowUp, KeyType.ArrowDown, KeyType.PageUp, KeyType.PageDown, KeyType.Home, KeyType.End,
                KeyType.ArrowLeft, KeyType.ArrowRight),
        BACK(View.DETAIL, "Esc q", "back", "back to the shortlist", true, KeyType.Escape, 'q'),

        PAGE_SCROLL(View.PAGE, "Up Down PgUp PgDn Home End", "scroll", "scroll the page", false,
                KeyType.ArrowUp, KeyType.ArrowDown, KeyType.PageUp, KeyType.PageDown, KeyType.Home, KeyType.End),
        PAGE_BACK(View.PAGE, "Esc q", "back", "back to the previous screen", true, KeyType.Escape, 'q'),

        LEAVE_WHILE_READING(View.LOADING, "Esc q Ctrl+C", "quit", "stop reading and leave Yoke", true, KeyType.Escape, 'q'),

        ACCEPT(View.DIALOG, "Enter", "accept", "accept the text typed", true, KeyType.Enter),
        DISMISS(View.DIALOG, "Esc", "cancel", "close without changing anything", true, KeyType.Escape),

        HELP(null, "?", "help", "this list of keys", true, '?'),
        CAUTIONS(null, "c", "cautions", "safety cautions: what these estimates are and are not", true, 'c');

        private final View view;
        private final String keys;
        private final String footerWord;
        private final String description;
        private final boolean inFooter;
        private final Object[] strokes;

        Action(View view, String keys, String footerWord, String description, boolean inFooter, Object... strokes) {
            this.view = view;
            this.keys = keys;
            this.footerWord = footerWord;
            this.description = description;
            this.inFooter = inFooter;
            this.strokes = strokes;
        }

        /** The screen this key belongs to; null for the keys that work on the shortlist, detail and pages. */
        public View view() {
            return view;
        }

        /** The keys as the user types them, e.g. "Esc q". */
        public String keys() {
            return keys;
        }

        public String footerWord() {
            return footerWord;
        }

        public String description() {
            return description;
        }

        /** Whether the footer lists this key (the help screen lists them all). */
        public boolean inFooter() {
            return inFooter;
        }

        /** Whether a key stroke triggers this action. */
        public boolean matches(KeyStroke stroke) {
            for (Object s : strokes) {
                if (s instanceof KeyType type && stroke.getKeyType() == type && !stroke.isAltDown()) {
                    return true;
                }
                if (s instanceof Character c && stroke.getKeyType() == KeyType.Character
                        && stroke.getCharacter() == c.charValue() && !stroke.isCtrlDown() && !stroke.isAltDown()) {
                    return true;
                }
            }
            return (this == QUIT || this == LEAVE_WHILE_READING) && isInterrupt(stroke);
        }

        private boolean worksOn(View screen) {
            return view == screen || (view == null && screen != View.DIALOG && screen != View.LOADING);
        }
    }

    /** Ctrl+C, trapped as a key rather than killing the program (the terminal is restored first). */
    public static boolean isInterrupt(KeyStroke stroke) {
        return stroke.getKeyType() == KeyType.Character && stroke.isCtrlDown()
                && Character.toLowerCase(stroke.getCharacter()) == 'c';
    }

    /** The actions of a screen, in help order (its own keys, then the shared ones). */
    public static List<Action> actionsOf(View screen) {
        List<Action> out = new ArrayList<>();
        for (Action a : Action.values()) {
            if (a.worksOn(screen)) {
                out.add(a);
            }
        }
        return out;
    }

    /** The action a key stroke triggers on a screen, if any. */
    public static Optional<Action> actionFor(View screen, KeyStroke stroke) {
        for (Action a : actionsOf(screen)) {
            if (a.matches(stroke)) {
                return Optional.of(a);
            }
        }
        return Optional.empty();
    }

    /**
     * The footer line of a screen, fitted to a width: the way out and "? help" always, then as
     * many of the screen's other footer keys as fit, in their order.
     */
    public static String footer(View screen, int width) {
        List<String> pinned = new ArrayList<>();
        List<String> others = new ArrayList<>();
        for (Action a : actionsOf(screen)) {
            if (!a.inFooter()) {
                continue;
            }
            String item = firstKey(a) + " " + a.footerWord();
            boolean isPinned = a == Action.QUIT || a == Action.HELP || a == Action.BACK || a == Action.PAGE_BACK
                    || a == Action.DISMISS || a == Action.LEAVE_WHILE_READING;
            (isPinned ? pinned : others).add(item);
        }
        String tail = String.join("  ", pinned);
        StringBuilder line = new StringBuilder();
        for (String item : others) {
            int needed = (line.length() == 0 ? 0 : 2) + item.length() + (tail.isEmpty() ? 0 : 2 + tail.length());
            if (line.length() + needed > width) {
                break;
            }
            if (line.length() > 0) {
                line.append("  ");
            }
            line.append(item);
        }
        if (!tail.isEmpty()) {
            if (line.length() > 0) {
                line.append("  ");
            }
            line.append(tail);
        }
        return line.toString();
    }

    private static String firstKey(Action a) {
        String k = a.keys();
        int space = k.indexOf(' ');
        return space < 0 ? k : k.substring(0, space);
    }

    /** The heading of the keys that work on the shortlist, detail and pages. */
    private static final String SHARED_TITLE = "Everywhere but in dialogs and while reading";

    /** Keys longer than this go on a line of their own in help, the description below them. */
    private static final int HELP_KEY_WIDTH = 10;

    /** Help text: for each screen its title, then one line per key (two when the keys are long). */
    public static List<String> helpLines() {
        List<String> lines = new ArrayList<>();
        for (View screen : new View[] {View.SHORTLIST, View.DETAIL, View.PAGE, View.DIALOG, View.LOADING}) {
            lines.add(screen.title());
            for (Action a : Action.values()) {
                if (a.view() == screen) {
                    addHelpLine(lines, a);
                }
            }
            lines.add("");
        }
        lines.add(SHARED_TITLE);
        addHelpLine(lines, Action.HELP);
        addHelpLine(lines, Action.CAUTIONS);
        return lines;
    }

    private static void addHelpLine(List<String> lines, Action a) {
        if (a.keys().length() > HELP_KEY_WIDTH) {
            lines.add("  " + a.keys());
            lines.add("  " + " ".repeat(HELP_KEY_WIDTH) + "  " + a.description());
        } else {
            lines.add("  " + pad(a.keys(), HELP_KEY_WIDTH) + "  " + a.description());
        }
    }

    /** The keys as a Markdown table per screen, for the documentation (docs/keys.md is checked against it). */
    public static String markdown() {
        StringBuilder md = new StringBuilder();
        for (View screen : new View[] {View.SHORTLIST, View.DETAIL, View.PAGE, View.DIALOG, View.LOADING, null}) {
            md.append("\n### ").append(screen == null ? SHARED_TITLE : screen.title()).append("\n\n");
            md.append("| keys | what they do |\n|---|---|\n");
            for (Action a : Action.values()) {
                if (a.view() == screen) {
                    md.append("| `").append(a.keys().replace("|", "\\|")).append("` | ").append(a.description()).append(" |\n");
                }
            }
        }
        return md.toString();
    }

    static String pad(String s, int width) {
        return s.length() >= width ? s : s + " ".repeat(width - s.length());
    }
}
