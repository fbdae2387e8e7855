package dev.yoke.tui;

import com.googlecode.lanterna.TerminalPosition;
import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.gui2.AbstractInteractableComponent;
import com.googlecode.lanterna.gui2.InteractableRenderer;
import com.googlecode.lanterna.gui2.TextGUIGraphics;
import com.googlecode.lanterna.input.KeyStroke;
import java.util.List;
import java.util.function.Predicate;

/**
 * A spreadsheet-like grid that draws only the rows and columns on screen, so a million rows cost
 * what a hundred do. The leading (frozen) columns stay put while the others scroll sideways to
 * the chosen column; the cursor row is drawn in reverse video so it shows without colour.
 *
 * <p>Arrows, PgUp/PgDn and Home/End move here; every other key goes to the screen's handler.
 */
public final class GridComponent extends AbstractInteractableComponent<GridComponent> {

    private GridModel model;
    private final TerminalTraits traits;
    private Predicate<KeyStroke> keyHandler = k -> false;
    private String emptyMessage = "no rows";
    private int cursorRow;
    private int topRow;
    private int selectedColumn;
    private int firstScrollingColumn;
    private int pageRows = 10;

    public GridComponent(GridModel model, TerminalTraits traits) {
        this.model = model;
        this.traits = traits;
        this.firstScrollingColumn = model.frozenColumns();
    }

    /** Shows another model (a new sort, filter or ranking), keeping the cursor in range. */
    public synchronized GridComponent setModel(GridModel newModel) {
        this.model = newModel;
        clampCursor();
        selectedColumn = Math.min(selectedColumn, newModel.columns().size() - 1);
        invalidate();
        return this;
    }

    public synchronized GridModel getModel() {
        return model;
    }

    /** Called with every key the grid does not use itself (the screen's keys). */
    public synchronized GridComponent setKeyHandler(Predicate<KeyStroke> handler) {
        this.keyHandler = handler;
        return this;
    }

    /** Shown in place of rows when the model is empty. */
    public synchronized GridComponent setEmptyMessage(String message) {
        this.emptyMessage = message;
        invalidate();
        return this;
    }

    public synchronized int getCursorRow() {
        return cursorRow;
    }

    /** Moves the cursor to a row (clamped) and scrolls it into view. */
    public synchronized GridComponent setCursorRow(int row) {
        cursorRow = row;
        clampCursor();
        invalidate();
        return this;
    }

    public synchronized int getTopRow() {
        return topRow;
    }

    public synchronized int getSelectedColumn() {
        return selectedColumn;
    }

    public synchronized GridComponent setSelectedColumn(int column) {
        selectedColumn = Math.max(0, Math.min(column, model.columns().size() - 1));
        invalidate();
        return this;
    }

    /** Index of the first scrolling column on screen (right of the frozen ones). */
    public synchronized int getFirstScrollingColumn() {
        return firstScrollingColumn;
    }

    private void clampCursor() {
        int n = model.rowCount();
        cursorRow = n == 0 ? 0 : Math.max(0, Math.min(cursorRow, n - 1));
    }

    @Override
    protected synchronized Result handleKeyStroke(KeyStroke key) {
        int n = model.rowCount();
        switch (key.getKeyType()) {
            case ArrowUp -> cursorRow--;
            case ArrowDown -> cursorRow++;
            case PageUp -> cursorRow -= pageRows;
            case PageDown -> cursorRow += pageRows;
            case Home -> cursorRow = 0;
            case End -> cursorRow = n - 1;
            case ArrowLeft -> selectedColumn = Math.max(0, selectedColumn - 1);
            case ArrowRight -> selectedColumn = Math.min(model.columns().size() - 1, selectedColumn + 1);
            default -> {
                keyHandler.test(key);
                // Keys are never passed on: Tab must not move focus away from the only grid.
                return Result.HANDLED;
            }
        }
        clampCursor();
        invalidate();
        return Result.HANDLED;
    }

    @Override
    protected InteractableRenderer<GridComponent> createDefaultRenderer() {
        return new Renderer();
    }

    /** Draws the heading row and the visible slice of rows. */
    private static final class Renderer implements InteractableRenderer<GridComponent> {

        @Override
        public TerminalPosition getCursorLocation(GridComponent component) {
            return null;
        }

        @Override
        public TerminalSize getPreferredSize(GridComponent component) {
            return new TerminalSize(40, 10);
        }

        @Override
        public void drawComponent(TextGUIGraphics g, GridComponent grid) {
            synchronized (grid) {
                grid.paint(g);
            }
        }
    }

    private void paint(TextGUIGraphics g) {
        Palette palette = traits.palette();
        Glyphs glyphs = traits.glyphs();
        int width = g.getSize().getColumns();
        int height = g.getSize().getRows();
        Painter.apply(g, palette, Tone.NORMAL, false);
        g.fill(' ');
        if (width <= 0 || height <= 0) {
            return;
        }
        List<GridColumn> columns = model.columns();
        int frozen = Math.min(model.frozenColumns(), columns.size());
        int frozenWidth = 0;
        for (int c = 0; c < frozen; c++) {
            frozenWidth += columns.get(c).width() + 1;
        }
        int ruleWidth = frozen > 0 ? 2 : 0;
        scrollToSelected(columns, frozen, width - frozenWidth - ruleWidth);

        // Which columns go where on this line: frozen, then from the first scrolling column.
        int[] xs = new int[columns.size()];
        int[] ws = new int[columns.size()];
        int count = 0;
        int[] order = new int[columns.size()];
        int x = 0;
        for (int c = 0; c < frozen && x < width; c++) {
            order[count] = c;
            xs[count] = x;
            ws[count] = Math.min(columns.get(c).width(), width - x);
            x += columns.get(c).width() + 1;
            count++;
        }
        int ruleX = frozen > 0 && x < width ? x : -1;
        x += ruleWidth;
        for (int c = Math.max(frozen, firstScrollingColumn); c < columns.size() && x < width; c++) {
            order[count] = c;
            xs[count] = x;
            ws[count] = Math.min(columns.get(c).width(), width - x);
            x += columns.get(c).width() + 1;
            count++;
        }

        // Heading.
        for (int i = 0; i < count; i++) {
            int c = order[i];
            GridColumn col = columns.get(c);
            String mark = model.headerMark(c);
            String title = mark.isEmpty() ? col.title() : col.title() + mark;
            Painter.apply(g, palette, Tone.HEADING, c == selectedColumn);
            g.putString(xs[i], 0, Painter.fit(title, ws[i], col.alignRight(), glyphs.ellipsis()));
        }
        Painter.apply(g, palette, Tone.DIM, false);
        if (ruleX >= 0) {
            for (int y = 0; y < height; y++) {
                g.setCharacter(ruleX, y, glyphs.columnRule());
            }
        }

        int visible = Math.max(1, height - 1);
        pageRows = Math.max(1, visible - 1);
        int n = model.rowCount();
        if (cursorRow < topRow) {
            topRow = cursorRow;
        } else if (cursorRow >= topRow + visible) {
            topRow = cursorRow - visible + 1;
        }
        topRow = Math.max(0, Math.min(topRow, Math.max(0, n - visible)));
        if (n == 0) {
            Painter.apply(g, palette, Tone.DIM, false);
            g.putString(1, Math.min(1, height - 1), Painter.clip(emptyMessage, width - 1));
            return;
        }
        for (int line = 0; line < visible && topRow + line < n; line++) {
            int row = topRow + line;
            boolean cursor = row == cursorRow;
            int y = line + 1;
            if (cursor) {
                Painter.apply(g, palette, Tone.NORMAL, true);
                g.putString(0, y, " ".repeat(width));
            }
            for (int i = 0; i < count; i++) {
                int c = order[i];
                GridColumn col = columns.get(c);
                Painter.apply(g, palette, model.tone(row, c), cursor);
                g.putString(xs[i], y, Painter.fit(model.cell(row, c), ws[i], col.alignRight(), glyphs.ellipsis()));
            }
            if (ruleX >= 0) {
                Painter.apply(g, palette, Tone.DIM, cursor);
                g.setCharacter(ruleX, y, glyphs.columnRule());
            }
        }
    }

    /** Moves the sideways scroll so the chosen column is fully on screen when it is a scrolling one. */
    private void scrollToSelected(List<GridColumn> columns, int frozen, int room) {
        firstScrollingColumn = Math.max(frozen, Math.min(firstScrollingColumn, columns.size() - 1));
        if (selectedColumn < frozen) {
            return;
        }
        if (selectedColumn < firstScrollingColumn) {
            firstScrollingColumn = selectedColumn;
            return;
        }
        while (firstScrollingColumn < selectedColumn) {
            int used = 0;
            for (int c = firstScrollingColumn; c <= selectedColumn; c++) {
                used += columns.get(c).width() + 1;
            }
            if (used - 1 <= room) {
                break;
            }
            firstScrollingColumn++;
        }
    }
}
