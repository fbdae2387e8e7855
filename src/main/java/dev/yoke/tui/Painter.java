package dev.yoke.tui;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.TerminalTextUtils;
import com.googlecode.lanterna.graphics.TextGraphics;
import java.util.EnumSet;

/** Small drawing helpers shared by the screens: styles from the {@link Palette}, text cut to fit. */
final class Painter {

    private Painter() {
    }

    /** Sets the colours and modifiers of a tone, plus reverse video when asked (the cursor row). */
    static void apply(TextGraphics g, Palette palette, Tone tone, boolean reverse) {
        Palette.Style s = palette.style(tone);
        g.setForegroundColor(s.foreground());
        g.setBackgroundColor(s.background());
        EnumSet<SGR> mods = EnumSet.noneOf(SGR.class);
        mods.addAll(s.modifiers());
        if (reverse) {
            if (mods.contains(SGR.REVERSE)) {
                mods.remove(SGR.REVERSE);
            } else {
                mods.add(SGR.REVERSE);
            }
        }
        g.setModifiers(mods);
    }

    /** Text padded or cut to exactly {@code width} columns, with an ellipsis when cut. */
    static String fit(String text, int width, boolean alignRight, char ellipsis) {
        if (width <= 0) {
            return "";
        }
        String t = text == null ? "" : text;
        int w = TerminalTextUtils.getColumnWidth(t);
        if (w > width) {
            String cut = TerminalTextUtils.fitString(t, Math.max(0, width - 1));
            return pad(cut + ellipsis, width, false);
        }
        return pad(t, width, alignRight);
    }

    /** Text cut to at most {@code width} columns, no padding. */
    static String clip(String text, int width) {
        return TerminalTextUtils.fitString(text, Math.max(0, width));
    }

    private static String pad(String t, int width, boolean alignRight) {
        int w = TerminalTextUtils.getColumnWidth(t);
        if (w >= width) {
            return t;
        }
        String spaces = " ".repeat(width - w);
        return alignRight ? spaces + t : t + spaces;
    }
}
