package dev.yoke.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.gui2.AbstractComponent;
import com.googlecode.lanterna.gui2.ComponentRenderer;
import com.googlecode.lanterna.gui2.TextGUIGraphics;
import java.util.function.IntFunction;

/**
 * One line across the screen: the status line, the message line and the footer. The text is
 * asked for with the width on screen, so it can be fitted (the footer drops keys that do not fit).
 */
public final class Bar extends AbstractComponent<Bar> {

    private final TerminalTraits traits;
    private final Tone tone;
    private IntFunction<String> text;
    private int highlightFrom = -1;
    private int highlightTo = -1;
    private int caret = -1;

    public Bar(TerminalTraits traits, Tone tone, IntFunction<String> text) {
        this.traits = traits;
        this.tone = tone;
        this.text = text;
    }

    /** Replaces the text source and redraws. */
    public synchronized Bar setText(IntFunction<String> newText) {
        this.text = newText;
        invalidate();
        return this;
    }

    /**
     * Draws columns [from, to) in reverse video (the field of a prompt) except the caret column;
     * from &lt; 0 for none. Does not ask for a redraw: it is called while the text is drawn.
     */
    synchronized void setHighlightQuietly(int from, int to, int caretColumn) {
        this.highlightFrom = from;
        this.highlightTo = to;
        this.caret = caretColumn;
    }

    /** The text for a width (tests and captures). */
    public synchronized String textFor(int width) {
        return text.apply(width);
    }

    @Override
    protected ComponentRenderer<Bar> createDefaultRenderer() {
        return new ComponentRenderer<>() {
            @Override
            public TerminalSize getPreferredSize(Bar bar) {
                return new TerminalSize(20, 1);
            }

            @Override
            public void drawComponent(TextGUIGraphics g, Bar bar) {
                synchronized (bar) {
                    int width = g.getSize().getColumns();
                    Painter.apply(g, bar.traits.palette(), bar.tone, false);
                    g.fill(' ');
                    String line = Painter.clip(bar.text.apply(width), width);
                    g.putString(0, 0, line);
                    if (bar.highlightFrom >= 0 && bar.highlightFrom < width) {
                        Painter.apply(g, bar.traits.palette(), bar.tone, true);
                        for (int x = bar.highlightFrom; x < Math.min(width, bar.highlightTo); x++) {
                            if (x != bar.caret) {
                                g.setCharacter(x, 0, x < line.length() ? line.charAt(x) : ' ');
                            }
                        }
                    }
                }
            }
        };
    }
}
