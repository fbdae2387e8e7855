package dev.yoke.tui;

/**
 * Marks and lines drawn on screen, in a Unicode set and an ASCII set for terminals whose locale
 * is not UTF-8 (Java then writes '?' for anything outside ASCII).
 *
 * @param columnRule   vertical line between the frozen columns and the scrolling ones
 * @param horizontal   horizontal rule
 * @param ascending    sort mark, smallest first
 * @param descending   sort mark, largest first
 * @param paretoMark   pairing on the Pareto front (no other pairing is better on every objective)
 * @param suspectMark  a part the catalog check found implausible
 * @param bindingMark  the binding constraint in the detail screen
 * @param barFull      filled cell of a bar
 * @param barEmpty     unfilled cell of a bar
 * @param levels       eight heights for sparklines, lowest first
 * @param ellipsis     marks text cut to fit
 */
public record Glyphs(
        char columnRule,
        char horizontal,
        char ascending,
        char descending,
        char paretoMark,
        char suspectMark,
        char bindingMark,
        char barFull,
        char barEmpty,
        String levels,
        char ellipsis) {

    /** For UTF-8 terminals. */
    public static final Glyphs UNICODE = new Glyphs('\u2502', '\u2500', '\u25B2', '\u25BC', '\u25C6', '!', '\u25B6',
            '\u2588', '\u00B7', "\u2581\u2582\u2583\u2584\u2585\u2586\u2587\u2588", '\u2026');

    /** For terminals whose locale is not UTF-8. */
    public static final Glyphs ASCII = new Glyphs('|', '-', '^', 'v', '*', '!', '>', '#', '.', "_.,-=+*#", '~');

    /** A sparkline character for a value in [0, 1]. */
    public char level(double fraction) {
        double f = Double.isNaN(fraction) ? 0 : Math.max(0, Math.min(1, fraction));
        int i = (int) Math.round(f * (levels.length() - 1));
        return levels.charAt(i);
    }
}
