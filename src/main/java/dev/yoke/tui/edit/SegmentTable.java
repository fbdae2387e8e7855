package dev.yoke.tui.edit;

import com.googlecode.lanterna.TerminalPosition;
import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TerminalTextUtils;
import com.googlecode.lanterna.gui2.AbstractInteractableComponent;
import com.googlecode.lanterna.gui2.Interactable;
import com.googlecode.lanterna.gui2.InteractableRenderer;
import com.googlecode.lanterna.gui2.TextGUIGraphics;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import dev.yoke.catalog.PartKind;
import dev.yoke.tui.LineEditor;
import dev.yoke.model.Segment;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The duty profile's segments as an editable table: one row per segment, one column per value,
 * each cell read with its unit like a form field.
 *
 * <p>Keys: arrows move between cells; Enter edits the cell, then typing changes it with
 * its message updated at every key, Enter or Tab keeps it, Esc puts the old text back;
 * {@code a}/Insert adds a segment below (a copy of the current one), {@code x}/Delete removes
 * the current one, {@code [} and {@code ]} move it up and down.
 */
public final class SegmentTable extends AbstractInteractableComponent<SegmentTable> {

    /** The columns, in order: their specs give the keys, units and checks. */
    public static final List<FormField> COLUMNS = List.of(
            FormField.of(PartKind.SEGMENT, "label"),
            FormField.of(PartKind.SEGMENT, "duration"),
            FormField.of(PartKind.SEGMENT, "speed_start"),
            FormField.of(PartKind.SEGMENT, "speed_end"),
            FormField.of(PartKind.SEGMENT, "torque"));
    private static final int[] WIDTHS = {14, 11, 14, 14, 14};
    private static final int ROW_MARK = 2;
    private static final int NUMBER = 3;

    private final List<String[]> rows = new ArrayList<>();
    private int visibleRows;
    private int row;
    private int column;
    private int top;
    private LineEditor editor;
    private String textBeforeEdit;
    private Consumer<SegmentTable> changeListener = t -> { };
    private Consumer<SegmentTable> editListener = t -> { };

    /** @param visibleRows segment lines shown; the header takes one more line */
    public SegmentTable(List<Segment> segments, int visibleRows) {
        this.visibleRows = Math.max(1, visibleRows);
        for (Segment s : segments) {
            rows.add(new String[] {
                COLUMNS.get(0).write(s.label()),
                COLUMNS.get(1).write(s.duration()),
                COLUMNS.get(2).write(s.speedStart()),
                COLUMNS.get(3).write(s.speedEnd()),
                COLUMNS.get(4).write(s.torque())});
        }
    }

    /** Called after a structural change or a kept edit. */
    public SegmentTable onChange(Consumer<SegmentTable> listener) {
        this.changeListener = listener;
        return this;
    }

    /** Called after every key that changed a cell's text during editing. */
    public SegmentTable onEdit(Consumer<SegmentTable> listener) {
        this.editListener = listener;
        return this;
    }

    /** Number of segments shown. */
    public synchronized int size() {
        return rows.size();
    }

    /** Index of the current segment. */
    public synchronized int selectedRow() {
        return row;
    }

    /** Whether a cell is being edited. */
    public synchronized boolean isEditing() {
        return editor != null;
    }

    /** The segments, or empty while a cell is invalid or there is none. */
    public synchronized Optional<List<Segment>> segments() {
        if (rows.isEmpty() || !problems().isEmpty()) {
            return Optional.empty();
        }
        List<Segment> out = new ArrayList<>();
        for (String[] r : rows) {
            out.add(new Segment(
                    (String) COLUMNS.get(0).read(r[0]),
                    (Double) COLUMNS.get(1).read(r[1]),
                    (Double) COLUMNS.get(2).read(r[2]),
                    (Double) COLUMNS.get(3).read(r[3]),
                    (Double) COLUMNS.get(4).read(r[4])));
        }
        return Optional.of(out);
    }

    /** Each problem as {@code segment 2 duration: must be > 0}; empty when all cells are valid. */
    public synchronized List<String> problems() {
        List<String> out = new ArrayList<>();
        if (rows.isEmpty()) {
            out.add("the profile needs at least one segment (a adds one)");
        }
        for (int r = 0; r < rows.size(); r++) {
            for (int c = 0; c < COLUMNS.size(); c++) {
                String p = problem(r, c);
                if (p != null) {
                    out.add("segment " + (r + 1) + " " + COLUMNS.get(c).key() + ": " + p);
                }
            }
        }
        return out;
    }

    /** Where each problem is, as {@code segment 2 duration}. */
    public synchronized List<String> problemPlaces() {
        List<String> out = new ArrayList<>();
        if (rows.isEmpty()) {
            out.add("segments (none)");
        }
        for (int r = 0; r < rows.size(); r++) {
            for (int c = 0; c < COLUMNS.size(); c++) {
                if (problem(r, c) != null) {
                    out.add("segment " + (r + 1) + " " + COLUMNS.get(c).key());
                }
            }
        }
        return out;
    }

    /** Text for a status line: the current cell's problem or what it expects. */
    public synchronized String selectedStatus() {
        if (rows.isEmpty()) {
            return "no segments: a or Insert adds one";
        }
        FormField spec = COLUMNS.get(column);
        String p = problem(row, column);
        String where = "segment " + (row + 1) + " " + spec.key();
        if (p != null) {
            return where + ": " + p;
        }
        String what = spec.unit().isEmpty() ? where : where + " [" + spec.unit() + "]";
        return spec.help().isEmpty() ? what : what + ": " + spec.help();
    }

    private String problem(int r, int c) {
        try {
            COLUMNS.get(c).read(rows.get(r)[c]);
            return null;
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
    }

    /** Adds a copy of the current segment below it (or a still first segment when there is none). */
    public synchronized void addSegment() {
        finishEdit(true);
        String[] copy = rows.isEmpty()
                ? new String[] {"hold", COLUMNS.get(1).write(1.0), COLUMNS.get(2).write(0.0),
                    COLUMNS.get(3).write(0.0), COLUMNS.get(4).write(0.0)}
                : rows.get(row).clone();
        int at = rows.isEmpty() ? 0 : row + 1;
        rows.add(at, copy);
        row = at;
        changed();
    }

    /** Removes the current segment. */
    public synchronized void removeSegment() {
        finishEdit(false);
        if (rows.isEmpty()) {
            return;
        }
        rows.remove(row);
        row = Math.max(0, Math.min(row, rows.size() - 1));
        changed();
    }

    /** Moves the current segment one place up ({@code -1}) or down ({@code +1}). */
    public synchronized void moveSegment(int step) {
        finishEdit(true);
        int to = row + step;
        if (rows.isEmpty() || to < 0 || to >= rows.size()) {
            return;
        }
        String[] moving = rows.remove(row);
        rows.add(to, moving);
        row = to;
        changed();
    }

    private void changed() {
        scrollToRow();
        invalidate();
        changeListener.accept(this);
    }

    private void scrollToRow() {
        if (row < top) {
            top = row;
        } else if (row >= top + visibleRows) {
            top = row - visibleRows + 1;
        }
        top = Math.max(0, Math.min(top, Math.max(0, rows.size() - visibleRows)));
    }

    private void startEdit() {
        if (rows.isEmpty()) {
            return;
        }
        textBeforeEdit = rows.get(row)[column];
        editor = new LineEditor(textBeforeEdit);
        invalidate();
    }

    /** Ends editing, keeping the text ({@code keep}) or putting the old one back. */
    private void finishEdit(boolean keep) {
        if (editor == null) {
            return;
        }
        String kept = keep ? editor.text() : textBeforeEdit;
        rows.get(row)[column] = kept;
        editor = null;
        invalidate();
        if (!kept.equals(textBeforeEdit)) {
            changeListener.accept(this);
        } else if (!keep) {
            editListener.accept(this);
        }
    }

    @Override
    protected void afterLeaveFocus(FocusChangeDirection direction, Interactable nextInFocus) {
        finishEdit(true);
    }

    @Override
    protected synchronized Result handleKeyStroke(KeyStroke key) {
        KeyType type = key.getKeyType();
        if (editor != null) {
            switch (type) {
                case Enter:
                    finishEdit(true);
                    return Result.HANDLED;
                case Escape:
                    finishEdit(false);
                    return Result.HANDLED;
                case F2:
                    finishEdit(true);
                    return Result.UNHANDLED; // the window saves
                case Tab:
                    finishEdit(true);
                    if (column < COLUMNS.size() - 1) {
                        column++;
                        startEdit();
                    }
                    return Result.HANDLED;
                case ReverseTab:
                    finishEdit(true);
                    if (column > 0) {
                        column--;
                        startEdit();
                    }
                    return Result.HANDLED;
                case ArrowUp:
                case ArrowDown:
                    finishEdit(true);
                    break;
                default:
                    String before = editor.text();
                    if (editor.edit(key)) {
                        if (!before.equals(editor.text())) {
                            rows.get(row)[column] = editor.text();
                            editListener.accept(this);
                        }
                        invalidate();
                        return Result.HANDLED;
                    }
                    return Result.UNHANDLED;
            }
        }
        switch (type) {
            case ArrowUp:
                if (row == 0) {
                    return Result.MOVE_FOCUS_UP;
                }
                row--;
                break;
            case ArrowDown:
                if (row >= rows.size() - 1) {
                    return Result.MOVE_FOCUS_DOWN;
                }
                row++;
                break;
            case ArrowLeft:
                column = Math.max(0, column - 1);
                break;
            case ArrowRight:
                column = Math.min(COLUMNS.size() - 1, column + 1);
                break;
            case Home:
                column = 0;
                break;
            case End:
                column = COLUMNS.size() - 1;
                break;
            case PageUp:
                row = Math.max(0, row - visibleRows);
                break;
            case PageDown:
                row = Math.max(0, Math.min(rows.size() - 1, row + visibleRows));
                break;
            case Enter:
                startEdit();
                return Result.HANDLED;
            case Insert:
                addSegment();
                return Result.HANDLED;
            case Delete:
                removeSegment();
                return Result.HANDLED;
            case Tab:
                return Result.MOVE_FOCUS_NEXT;
            case ReverseTab:
                return Result.MOVE_FOCUS_PREVIOUS;
            case Character:
                switch (key.getCharacter()) {
                    case 'a':
                        addSegment();
                        return Result.HANDLED;
                    case 'x':
                        removeSegment();
                        return Result.HANDLED;
                    case '[':
                        moveSegment(-1);
                        return Result.HANDLED;
                    case ']':
                        moveSegment(1);
                        return Result.HANDLED;
                    default:
                        return Result.UNHANDLED;
                }
            default:
                return Result.UNHANDLED;
        }
        scrollToRow();
        invalidate();
        editListener.accept(this);
        return Result.HANDLED;
    }

    @Override
    protected InteractableRenderer<SegmentTable> createDefaultRenderer() {
        return new Renderer();
    }

    private static int columnX(int c) {
        int x = ROW_MARK + NUMBER;
        for (int i = 0; i < c; i++) {
            x += WIDTHS[i] + 1;
        }
        return x;
    }

    /** Draws the header and the visible rows; the current cell is bracketed. */
    private static final class Renderer implements InteractableRenderer<SegmentTable> {

        @Override
        public TerminalSize getPreferredSize(SegmentTable t) {
            return new TerminalSize(columnX(COLUMNS.size()) + 1, t.visibleRows + 1);
        }

        @Override
        public TerminalPosition getCursorLocation(SegmentTable t) {
            synchronized (t) {
                if (t.editor == null || !t.isFocused()) {
                    return null;
                }
                int width = WIDTHS[t.column] - 2;
                LineEditor e = t.editor;
                int caret = TerminalTextUtils.getColumnWidth(e.text().substring(FieldForm.firstShown(e, width), e.caret()));
                return new TerminalPosition(columnX(t.column) + 1 + caret, 1 + t.row - t.top);
            }
        }

        @Override
        public void drawComponent(TextGUIGraphics g, SegmentTable t) {
            synchronized (t) {
                int rows = g.getSize().getRows() - 1;
                if (rows > 0 && rows != t.visibleRows) {
                    t.visibleRows = rows;
                    t.scrollToRow();
                }
                g.applyThemeStyle(t.getThemeDefinition().getNormal());
                g.fill(' ');
                g.putString(ROW_MARK, 0, " # ");
                for (int c = 0; c < COLUMNS.size(); c++) {
                    FormField spec = COLUMNS.get(c);
                    g.putString(columnX(c) + 1, 0, TerminalTextUtils.fitString(spec.key().replace('_', ' '), WIDTHS[c] - 1));
                }
                if (t.rows.isEmpty()) {
                    g.putString(ROW_MARK, 1, "(no segments: a adds one)");
                }
                for (int line = 0; line < rows; line++) {
                    int r = t.top + line;
                    if (r >= t.rows.size()) {
                        break;
                    }
                    drawRow(g, t, r, line + 1);
                }
                if (t.top > 0) {
                    g.putString(0, 1, "^");
                }
                if (t.top + rows < t.rows.size()) {
                    g.putString(0, rows, "v");
                }
            }
        }

        private static void drawRow(TextGUIGraphics g, SegmentTable t, int r, int y) {
            boolean currentRow = r == t.row;
            boolean invalidRow = false;
            g.putString(ROW_MARK, y, String.format("%2d ", r + 1));
            for (int c = 0; c < COLUMNS.size(); c++) {
                boolean invalid = t.problem(r, c) != null;
                invalidRow |= invalid;
                boolean current = currentRow && c == t.column && t.isFocused();
                String text = t.rows.get(r)[c];
                int width = WIDTHS[c] - 2;
                if (current && t.editor != null) {
                    text = text.substring(Math.min(text.length(), FieldForm.firstShown(t.editor, width)));
                }
                String cell = TerminalTextUtils.fitString(text, width);
                cell = cell + " ".repeat(Math.max(0, width - TerminalTextUtils.getColumnWidth(cell)));
                int x = columnX(c);
                if (current) {
                    g.applyThemeStyle(t.getThemeDefinition().getActive());
                    g.putString(x, y, (t.editor != null ? "[" : ">") + cell + (t.editor != null ? "]" : "<"));
                    g.applyThemeStyle(t.getThemeDefinition().getNormal());
                } else {
                    g.putString(x, y, (invalid ? "!" : " ") + cell + " ");
                }
            }
            if (invalidRow) {
                g.putString(1, y, "!");
            }
            if (currentRow) {
                g.putString(0, y, t.isFocused() ? ">" : "-");
            }
        }
    }
}
