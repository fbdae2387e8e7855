package dev.yoke.tui;

import com.googlecode.lanterna.TerminalPosition;
import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TerminalTextUtils;
import com.googlecode.lanterna.gui2.AbstractInteractableComponent;
import com.googlecode.lanterna.gui2.InteractableRenderer;
import com.googlecode.lanterna.gui2.TextGUIGraphics;
import com.googlecode.lanterna.input.KeyStroke;
import java.util.List;
import java.util.function.IntFunction;
import java.util.function.Predicate;

/**
 * A page of styled lines that scrolls up, down and sideways: the pairing detail, help and
 * cautions. The content is laid out for the width on screen and laid out again after a resize.
 */
public final class TextPage extends AbstractInteractableComponent<TextPage> {

    private final IntFunction<List<Line>> layout;
    private final TerminalTraits traits;
    private Predicate<KeyStroke> keyHandler = k -> false;
    private List<Line> lines;
    private int laidOutWidth = -1;
    private int top;
    private int left;
    private int pageRows = 10;

    /** @param layout gives the lines for a width in columns */
    public TextPage(IntFunction<List<Line>> layout, TerminalTraits traits) {
        this.layout = layout;
        this.traits = traits;
    }

    /** Called with every key the page does not use for scrolling. */
    public synchronized TextPage setKeyHandler(Predicate<KeyStroke> handler) {
        this.keyHandler = handler;
        return this;
    }

    public synchronized int getTop() {
        return top;
    }

    /** Lays the content out again on the next draw (content that changes while shown: the reading progress). */
    public synchronized void relayout() {
        lines = null;
        invalidate();
    }

    /** The lines as last laid out (for tests and captures). */
    public synchronized List<Line> lines() {
        return lines == null ? layout.apply(100) : lines;
    }

    @Override
    protected synchronized Result handleKeyStroke(KeyStroke key) {
        switch (key.getKeyType()) {
            case ArrowUp -> top--;
            case ArrowDown -> top++;
            case PageUp -> top -= pageRows;
            case PageDown -> top += pageRows;
            case Home -> top = 0;
            case End -> top = Integer.MAX_VALUE / 2;
            case ArrowLeft -> left = Math.max(0, left - 8);
            case ArrowRight -> left += 8;
            default -> {
                keyHandler.test(key);
                return Result.HANDLED;
            }
        }
        invalidate();
        return Result.HANDLED;
    }

    @Override
    protected InteractableRenderer<TextPage> createDefaultRenderer() {
        return new InteractableRenderer<>() {
            @Override
            public TerminalPosition getCursorLocation(TextPage component) {
                return null;
            }

            @Override
            public TerminalSize getPreferredSize(TextPage component) {
                return new TerminalSize(40, 10);
            }

            @Override
            public void drawComponent(TextGUIGraphics g, TextPage page) {
                synchronized (page) {
                    page.paint(g);
                }
            }
        };
    }

    private void paint(TextGUIGraphics g) {
        Palette palette = traits.palette();
        int width = g.getSize().getColumns();
        int height = g.getSize().getRows();
        Painter.apply(g, palette, Tone.NORMAL, false);
        g.fill(' ');
        if (width != laidOutWidth || lines == null) {
            lines = layout.apply(width);
            laidOutWidth = width;
        }
        pageRows = Math.max(1, height - 1);
        top = Math.max(0, Math.min(top, Math.max(0, lines.size() - height)));
        int widest = 0;
        for (Line line : lines) {
            widest = Math.max(widest, TerminalTextUtils.getColumnWidth(line.text()));
        }
        left = Math.max(0, Math.min(left, Math.max(0, widest - width)));
        for (int y = 0; y < height && top + y < lines.size(); y++) {
            int x = -left;
            for (Line.Span span : lines.get(top + y).spans()) {
                String text = span.text();
                int w = TerminalTextUtils.getColumnWidth(text);
                if (x + w > 0 && x < width) {
                    String visible = text;
                    int startX = x;
                    if (x < 0) {
                        visible = text.substring(Math.min(text.length(), -x));
                        startX = 0;
                    }
                    Painter.apply(g, palette, span.tone(), span.reverse());
                    g.putString(startX, y, Painter.clip(visible, width - startX));
                }
                x += w;
            }
        }
    }
}
