package dev.yoke.tui;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.TextColor;
import java.util.EnumMap;
import java.util.Map;
import java.util.Set;

/**
 * Colours and styles per {@link Tone} for one {@link ColorDepth}. Colour only ever repeats what a
 * word or mark already says; in monochrome the bars and cursor use reverse video and headings bold.
 */
public final class Palette {

    /** Colours and styles for one tone. */
    public record Style(TextColor foreground, TextColor background, Set<SGR> modifiers) {
        public Style {
            modifiers = Set.copyOf(modifiers);
        }
    }

    private final ColorDepth depth;
    private final Map<Tone, Style> styles;

    private Palette(ColorDepth depth, Map<Tone, Style> styles) {
        this.depth = depth;
        this.styles = styles;
    }

    /** The palette for a colour depth. */
    public static Palette of(ColorDepth depth) {
        Map<Tone, Style> s = new EnumMap<>(Tone.class);
        TextColor none = TextColor.ANSI.DEFAULT;
        switch (depth) {
            case MONOCHROME -> {
                s.put(Tone.NORMAL, new Style(none, none, Set.of()));
                s.put(Tone.HEADING, new Style(none, none, Set.of(SGR.BOLD)));
                s.put(Tone.GOOD, new Style(none, none, Set.of()));
                s.put(Tone.BAD, new Style(none, none, Set.of(SGR.BOLD)));
                s.put(Tone.WARN, new Style(none, none, Set.of(SGR.BOLD)));
                s.put(Tone.DIM, new Style(none, none, Set.of()));
                s.put(Tone.BAR, new Style(none, none, Set.of(SGR.REVERSE)));
            }
            case SIXTEEN -> {
                s.put(Tone.NORMAL, new Style(none, none, Set.of()));
                s.put(Tone.HEADING, new Style(TextColor.ANSI.CYAN, none, Set.of(SGR.BOLD)));
                s.put(Tone.GOOD, new Style(TextColor.ANSI.GREEN, none, Set.of()));
                s.put(Tone.BAD, new Style(TextColor.ANSI.RED, none, Set.of(SGR.BOLD)));
                s.put(Tone.WARN, new Style(TextColor.ANSI.YELLOW, none, Set.of()));
                s.put(Tone.DIM, new Style(TextColor.ANSI.BLUE_BRIGHT, none, Set.of()));
                s.put(Tone.BAR, new Style(TextColor.ANSI.BLACK, TextColor.ANSI.CYAN, Set.of()));
            }
            case INDEXED_256 -> {
                s.put(Tone.NORMAL, new Style(none, none, Set.of()));
                s.put(Tone.HEADING, new Style(new TextColor.Indexed(110), none, Set.of(SGR.BOLD)));
                s.put(Tone.GOOD, new Style(new TextColor.Indexed(71), none, Set.of()));
                s.put(Tone.BAD, new Style(new TextColor.Indexed(203), none, Set.of(SGR.BOLD)));
                s.put(Tone.WARN, new Style(new TextColor.Indexed(179), none, Set.of()));
                s.put(Tone.DIM, new Style(new TextColor.Indexed(244), none, Set.of()));
                s.put(Tone.BAR, new Style(new TextColor.Indexed(231), new TextColor.Indexed(24), Set.of()));
            }
            default -> throw new IllegalStateException(depth.name());
        }
        return new Palette(depth, s);
    }

    public ColorDepth depth() {
        return depth;
    }

    /** Colours and styles of a tone. */
    public Style style(Tone tone) {
        return styles.get(tone);
    }
}
