package dev.yoke.tui.edit;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TerminalTextUtils;
import com.googlecode.lanterna.gui2.AbstractComponent;
import com.googlecode.lanterna.gui2.ComponentRenderer;
import com.googlecode.lanterna.gui2.TextGUIGraphics;

import java.util.List;

/**
 * The parts list of the parts editor: id, label and a few key values per line, the current line
 * marked with {@code >}. It only draws; the editor window handles the keys.
 */
final class PartListView extends AbstractComponent<PartListView> {

    private static final int ID_WIDTH = 16;

    private EditablePart<Object> kind;
    private List<Object> parts = List.of();
    private int selected;
    private int top;
    private int rows;
    private boolean unicode = true;

    PartListView(int rows) {
        this.rows = Math.max(2, rows);
    }

    synchronized void show(EditablePart<Object> kind, List<Object> parts, int selected) {
        this.kind = kind;
        this.parts = List.copyOf(parts);
        this.selected = selected;
        int visible = rows - 1;
        if (selected < top) {
            top = selected;
        } else if (selected >= top + visible) {
            top = selected - visible + 1;
        }
        top = Math.max(0, Math.min(top, Math.max(0, parts.size() - visible)));
        invalidate();
    }

    synchronized void setUnicode(boolean on) {
        this.unicode = on;
        invalidate();
    }

    synchronized int pageRows() {
        return Math.max(1, rows - 1);
    }

    @Override
    protected ComponentRenderer<PartListView> createDefaultRenderer() {
        return new ComponentRenderer<>() {
            @Override
            public TerminalSize getPreferredSize(PartListView v) {
                return new TerminalSize(78, v.rows);
            }

            @Override
            public void drawComponent(TextGUIGraphics g, PartListView v) {
                synchronized (v) {
                    draw(g, v);
                }
            }
        };
    }

    private static void draw(TextGUIGraphics g, PartListView v) {
        g.applyThemeStyle(v.getThemeDefinition().getNormal());
        g.fill(' ');
        if (v.kind == null) {
            return;
        }
        int width = g.getSize().getColumns();
        int height = g.getSize().getRows();
        if (height != v.rows && height > 1) {
            v.rows = height;
        }
        int valuesWidth = 0;
        for (EditablePart.Column<Object> c : v.kind.columns()) {
            valuesWidth += c.width() + 1;
        }
        int labelWidth = Math.max(8, width - 2 - ID_WIDTH - 1 - valuesWidth);
        StringBuilder head = new StringBuilder("  ").append(pad("id", ID_WIDTH)).append(' ')
                .append(pad("label", labelWidth));
        for (EditablePart.Column<Object> c : v.kind.columns()) {
            head.append(' ').append(padLeft(c.header(), c.width()));
        }
        g.putString(0, 0, TerminalTextUtils.fitString(AsciiText.of(head.toString(), v.unicode), width));
        if (v.parts.isEmpty()) {
            g.putString(2, 1, "(no " + v.kind.plural() + " to show)");
        }
        for (int line = 1; line < height; line++) {
            int i = v.top + line - 1;
            if (i >= v.parts.size()) {
                break;
            }
            Object part = v.parts.get(i);
            StringBuilder b = new StringBuilder(i == v.selected ? "> " : "  ")
                    .append(pad(v.kind.id(part), ID_WIDTH)).append(' ')
                    .append(pad(v.kind.label(part), labelWidth));
            for (EditablePart.Column<Object> c : v.kind.columns()) {
                b.append(' ').append(padLeft(c.value().apply(part), c.width()));
            }
            if (i == v.selected) {
                g.applyThemeStyle(v.getThemeDefinition().getSelected());
            }
            g.putString(0, line, TerminalTextUtils.fitString(AsciiText.of(b.toString(), v.unicode), width));
            g.applyThemeStyle(v.getThemeDefinition().getNormal());
        }
        if (v.top > 0) {
            g.putString(width - 1, 1, "^");
        }
        if (v.top + height - 1 < v.parts.size()) {
            g.putString(width - 1, height - 1, "v");
        }
    }

    private static String pad(String s, int width) {
        String fitted = TerminalTextUtils.fitString(s == null ? "" : s, width);
        return fitted + " ".repeat(Math.max(0, width - TerminalTextUtils.getColumnWidth(fitted)));
    }

    private static String padLeft(String s, int width) {
        String fitted = TerminalTextUtils.fitString(s, width);
        return " ".repeat(Math.max(0, width - TerminalTextUtils.getColumnWidth(fitted))) + fitted;
    }
}
