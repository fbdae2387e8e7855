package dev.yoke.tui;

import java.util.Locale;
import java.util.Map;

/**
 * What the user's terminal can show, decided from the environment before the terminal is opened,
 * because Lanterna detects neither colour depth nor the locale's character set by itself.
 *
 * @param colorDepth colours to use
 * @param unicode    true when the locale says UTF-8: box lines, arrows and blocks; else ASCII stand-ins
 */
public record TerminalTraits(ColorDepth colorDepth, boolean unicode) {

    /** Plain ASCII in 16 colours: what tests and unknown terminals get. */
    public static final TerminalTraits PLAIN = new TerminalTraits(ColorDepth.SIXTEEN, false);

    /**
     * Reads {@code TERM}, {@code COLORTERM}, {@code NO_COLOR} and the locale variables
     * ({@code LC_ALL}, then {@code LC_CTYPE}, then {@code LANG}: the POSIX order of precedence).
     * {@code NO_COLOR} follows the informal convention that any non-empty value turns colour off.
     */
    public static TerminalTraits fromEnvironment(Map<String, String> env) {
        return new TerminalTraits(colorDepthOf(env), localeIsUtf8(env));
    }

    static ColorDepth colorDepthOf(Map<String, String> env) {
        String noColor = env.get("NO_COLOR");
        if (noColor != null && !noColor.isEmpty()) {
            return ColorDepth.MONOCHROME;
        }
        String term = env.getOrDefault("TERM", "").toLowerCase(Locale.ROOT);
        String colorTerm = env.getOrDefault("COLORTERM", "").toLowerCase(Locale.ROOT);
        if (term.contains("256color") || colorTerm.equals("truecolor") || colorTerm.equals("24bit")) {
            return ColorDepth.INDEXED_256;
        }
        if (term.contains("color") || !colorTerm.isEmpty()) {
            return ColorDepth.SIXTEEN;
        }
        for (String family : new String[] {"xterm", "screen", "tmux", "rxvt", "linux", "konsole", "putty", "cygwin", "ansi"}) {
            if (term.startsWith(family)) {
                return ColorDepth.SIXTEEN;
            }
        }
        return ColorDepth.MONOCHROME;
    }

    static boolean localeIsUtf8(Map<String, String> env) {
        for (String name : new String[] {"LC_ALL", "LC_CTYPE", "LANG"}) {
            String value = env.get(name);
            if (value != null && !value.isEmpty()) {
                String v = value.toLowerCase(Locale.ROOT);
                return v.contains("utf-8") || v.contains("utf8");
            }
        }
        return false;
    }

    /** A copy with another colour depth (command-line override). */
    public TerminalTraits withColorDepth(ColorDepth depth) {
        return new TerminalTraits(depth, unicode);
    }

    /** A copy with Unicode turned on or off (command-line override). */
    public TerminalTraits withUnicode(boolean on) {
        return new TerminalTraits(colorDepth, on);
    }

    /** The marks and lines matching {@link #unicode}. */
    public Glyphs glyphs() {
        return unicode ? Glyphs.UNICODE : Glyphs.ASCII;
    }

    /** The colours matching {@link #colorDepth}. */
    public Palette palette() {
        return Palette.of(colorDepth);
    }
}
