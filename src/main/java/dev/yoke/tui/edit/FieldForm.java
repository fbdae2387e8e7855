package dev.yoke.tui.edit;

import com.googlecode.lanterna.SGR;
import com.googlecode.lanterna.TerminalPosition;
import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TerminalTextUtils;
import com.googlecode.lanterna.gui2.AbstractInteractableComponent;
import com.googlecode.lanterna.gui2.Interactable;
import com.googlecode.lanterna.gui2.InteractableRenderer;
import com.googlecode.lanterna.gui2.TextGUIGraphics;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import dev.yoke.tui.LineEditor;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * A scrolling form of unit-aware fields, one per line:
 * {@code > ! key        [text           ] unit  message}.
 *
 * <p>Every key press re-reads the edited field and re-runs the cross-field rules, so the message
 * beside a field is always current; {@code !} marks an invalid field and {@code ?} a doubtful but
 * possible one (meaning never rests on colour). The form hands out values only when every field
 * is valid; doubts never block.
 *
 * <p>Keys: Up/Down move between fields, Enter moves on, PgUp/PgDn page, Tab/Shift+Tab leave the form;
 * typing, Backspace, Delete, Left, Right, Home and End edit; on a field with fixed options
 * Space, Left and Right cycle them.
 */
public final class FieldForm extends AbstractInteractableComponent<FieldForm> {

    private static final int MIN_VALUE_WIDTH = 18;
    private static final int MAX_VALUE_WIDTH = 34;
    private static final int MESSAGE_ROOM = 30;

    private final List<FormField> fields;
    private final List<FormRule> rules;
    private final List<LineEditor> editors = new ArrayList<>();
    private final Map<String, String> problems = new LinkedHashMap<>();
    private final Map<String, Object> validValues = new LinkedHashMap<>();
    private final Map<String, String> notes = new LinkedHashMap<>();
    private List<FormRule> noteRules = List.of();
    private final int labelWidth;
    private final int unitWidth;
    private int visibleRows;
    private int selected;
    private int top;
    private int selectedLine;
    private int valueWidth = MIN_VALUE_WIDTH;
    private boolean unicode = true;
    private boolean changedSinceCommit;
    private Consumer<FieldForm> editListener = f -> { };
    private Consumer<FieldForm> commitListener = f -> { };

    /**
     * @param fields      in display order
     * @param rules       cross-field checks
     * @param visibleRows lines the form takes on screen; longer forms scroll
     */
    public FieldForm(List<FormField> fields, List<FormRule> rules, int visibleRows) {
        this.fields = List.copyOf(fields);
        this.rules = List.copyOf(rules);
        this.visibleRows = Math.max(1, visibleRows);
        int lw = 4;
        int uw = 0;
        for (FormField f : this.fields) {
            editors.add(new LineEditor(""));
            lw = Math.max(lw, TerminalTextUtils.getColumnWidth(f.key()));
            uw = Math.max(uw, TerminalTextUtils.getColumnWidth(f.unit()));
        }
        this.labelWidth = lw;
        this.unitWidth = uw;
        revalidate();
    }

    /**
     * Checks whose findings are doubts, not errors (a value possible but unusual): shown beside the
     * field with {@code ?} while the form is otherwise valid; they never block.
     */
    public synchronized FieldForm setNoteRules(List<FormRule> rules) {
        this.noteRules = List.copyOf(rules);
        revalidate();
        invalidate();
        return this;
    }

    /** Field key to doubt, while the form is valid; see {@link #setNoteRules}. */
    public synchronized Map<String, String> notes() {
        return Collections.unmodifiableMap(new LinkedHashMap<>(notes));
    }

    /** Called after every edit, valid or not. */
    public FieldForm onEdit(Consumer<FieldForm> listener) {
        this.editListener = listener;
        return this;
    }

    /** Called when the user leaves a field they changed (move, Enter, focus away). */
    public FieldForm onCommit(Consumer<FieldForm> listener) {
        this.commitListener = listener;
        return this;
    }

    /** Sets a field from a value (formatted by its spec) without firing listeners. */
    public synchronized FieldForm setValue(String key, Object value) {
        return setText(key, fields.get(indexOf(key)).write(value));
    }

    /** Sets a field's raw text without firing listeners. */
    public synchronized FieldForm setText(String key, String text) {
        editors.set(indexOf(key), new LineEditor(text));
        revalidate();
        invalidate();
        return this;
    }

    /** The raw text of a field. */
    public synchronized String text(String key) {
        return editors.get(indexOf(key)).text();
    }

    /** Every field's value, or empty while any field or rule fails. */
    public synchronized Optional<Map<String, Object>> values() {
        return problems.isEmpty() ? Optional.of(Collections.unmodifiableMap(new LinkedHashMap<>(validValues)))
                : Optional.empty();
    }

    /** Field key to message, in field order; empty when the form is valid. */
    public synchronized Map<String, String> problems() {
        return Collections.unmodifiableMap(new LinkedHashMap<>(problems));
    }

    /** One short line saying why the form cannot be used, e.g. {@code 2 problems: resistance, peak_current}. */
    public synchronized String problemSummary() {
        if (problems.isEmpty()) {
            return "";
        }
        return (problems.size() == 1 ? "1 problem: " : problems.size() + " problems: ")
                + String.join(", ", problems.keySet());
    }

    /** The key of the field under the cursor. */
    public synchronized String selectedKey() {
        return fields.get(selected).key();
    }

    /** Moves the cursor to a field. */
    public synchronized FieldForm select(String key) {
        moveTo(indexOf(key));
        return this;
    }

    /** Whether units and messages may use Unicode symbols; when not they are spelt in ASCII. */
    public synchronized FieldForm setUnicode(boolean on) {
        this.unicode = on;
        invalidate();
        return this;
    }

    /** Lines the form takes on screen. */
    public synchronized FieldForm setVisibleRows(int rows) {
        this.visibleRows = Math.max(1, rows);
        scrollToSelected();
        invalidate();
        return this;
    }

    /** Text for a status line: the selected field's problem, or what it expects. */
    public synchronized String selectedStatus() {
        FormField f = fields.get(selected);
        String problem = problems.get(f.key());
        if (problem != null) {
            return f.key() + ": " + problem;
        }
        if (notes.containsKey(f.key())) {
            return f.key() + ": check: " + notes.get(f.key());
        }
        if (f.isChoice()) {
            return f.key() + ": one of " + String.join(", ", f.choices()) + " (Space cycles)";
        }
        String what = f.unit().isEmpty() ? f.key() : f.key() + " [" + f.unit() + "]";
        return f.help().isEmpty() ? what : what + ": " + f.help();
    }

    private int indexOf(String key) {
        for (int i = 0; i < fields.size(); i++) {
            if (fields.get(i).key().equals(key)) {
                return i;
            }
        }
        throw new IllegalArgumentException("no field " + key);
    }

    private void revalidate() {
        problems.clear();
        validValues.clear();
        for (int i = 0; i < fields.size(); i++) {
            FormField f = fields.get(i);
            try {
                validValues.put(f.key(), f.read(editors.get(i).text()));
            } catch (IllegalArgumentException e) {
                problems.put(f.key(), e.getMessage() == null ? "invalid" : e.getMessage());
            }
        }
        Map<String, String> ruleProblems = new LinkedHashMap<>();
        for (FormRule rule : rules) {
            rule.check(validValues).forEach(ruleProblems::putIfAbsent);
        }
        if (!ruleProblems.isEmpty()) {
            // keep field order in the problem list
            Map<String, String> ordered = new LinkedHashMap<>();
            for (FormField f : fields) {
                String m = problems.containsKey(f.key()) ? problems.get(f.key()) : ruleProblems.get(f.key());
                if (m != null) {
                    ordered.put(f.key(), m);
                }
            }
            problems.clear();
            problems.putAll(ordered);
        }
        notes.clear();
        if (problems.isEmpty()) {
            for (FormRule rule : noteRules) {
                rule.check(validValues).forEach(notes::putIfAbsent);
            }
        }
    }

    /** The message shown beside field {@code key}: its problem ({@code !}), else its doubt ({@code ?}). */
    private String remark(String key) {
        String p = problems.get(key);
        if (p != null) {
            return "! " + p;
        }
        String n = notes.get(key);
        return n == null ? null : "? " + n;
    }

    private void moveTo(int row) {
        int target = Math.max(0, Math.min(fields.size() - 1, row));
        if (target != selected) {
            commit();
        }
        selected = target;
        scrollToSelected();
        invalidate();
    }

    /** Nothing to do until drawing: lines depend on the width (a long message takes its own line). */
    private void scrollToSelected() {
        invalidate();
    }

    /** Display lines for a width: each field, then its message when it does not fit beside it. */
    private List<int[]> layout(int width) {
        List<int[]> lines = new ArrayList<>();
        int messageColumn = messageColumn();
        for (int i = 0; i < fields.size(); i++) {
            lines.add(new int[] {i, 0});
            String r = remark(fields.get(i).key());
            if (r != null && TerminalTextUtils.getColumnWidth(r) > width - messageColumn) {
                lines.add(new int[] {i, 1});
            }
        }
        return lines;
    }

    private int messageColumn() {
        return 4 + labelWidth + 1 + valueWidth + 2 + 1 + unitWidth + 2;
    }

    /** Moves {@code top} so that the selected field and its message line are on screen. */
    private void fitTop(List<int[]> lines, int rows) {
        int first = -1;
        int last = -1;
        for (int n = 0; n < lines.size(); n++) {
            if (lines.get(n)[0] == selected) {
                last = n;
                if (first < 0) {
                    first = n;
                }
            }
        }
        if (first < top) {
            top = first;
        } else if (last >= top + rows) {
            top = last - rows + 1;
        }
        top = Math.max(0, Math.min(top, Math.max(0, lines.size() - rows)));
        selectedLine = first - top;
    }

    private void commit() {
        if (changedSinceCommit) {
            changedSinceCommit = false;
            commitListener.accept(this);
        }
    }

    @Override
    protected void afterLeaveFocus(FocusChangeDirection direction, Interactable nextInFocus) {
        commit();
    }

    @Override
    protected synchronized Result handleKeyStroke(KeyStroke key) {
        KeyType type = key.getKeyType();
        switch (type) {
            case ArrowUp:
                moveTo(selected - 1);
                return Result.HANDLED;
            case ArrowDown:
                if (selected == fields.size() - 1) {
                    commit();
                    return Result.MOVE_FOCUS_DOWN;
                }
                moveTo(selected + 1);
                return Result.HANDLED;
            case Enter:
                if (selected == fields.size() - 1) {
                    commit();
                    return Result.MOVE_FOCUS_NEXT;
                }
                moveTo(selected + 1);
                return Result.HANDLED;
            case Tab:
                commit();
                return Result.MOVE_FOCUS_NEXT;
            case ReverseTab:
                commit();
                return Result.MOVE_FOCUS_PREVIOUS;
            case PageUp:
                moveTo(selected - visibleRows);
                return Result.HANDLED;
            case PageDown:
                moveTo(selected + visibleRows);
                return Result.HANDLED;
            default:
                break;
        }
        FormField field = fields.get(selected);
        LineEditor editor = editors.get(selected);
        if (field.isChoice()) {
            int step = 0;
            if (type == KeyType.ArrowRight || (type == KeyType.Character && key.getCharacter() == ' ')) {
                step = 1;
            } else if (type == KeyType.ArrowLeft) {
                step = -1;
            }
            if (step == 0) {
                return Result.UNHANDLED;
            }
            List<String> words = field.choices();
            int at = Math.max(0, words.indexOf(editor.text()));
            editors.set(selected, new LineEditor(words.get(Math.floorMod(at + step, words.size()))));
            edited();
            return Result.HANDLED;
        }
        String before = editor.text();
        if (!editor.edit(key)) {
            return Result.UNHANDLED;
        }
        if (!before.equals(editor.text())) {
            edited();
        }
        invalidate();
        return Result.HANDLED;
    }

    /** Index of the first character shown in {@code width} columns so that the caret stays visible. */
    static int firstShown(LineEditor e, int width) {
        return width <= 0 || e.caret() < width ? 0 : e.caret() - width + 1;
    }

    private void edited() {
        changedSinceCommit = true;
        revalidate();
        invalidate();
        editListener.accept(this);
    }

    @Override
    protected InteractableRenderer<FieldForm> createDefaultRenderer() {
        return new Renderer();
    }

    /** Draws the visible lines and puts the terminal cursor at the caret. */
    private static final class Renderer implements InteractableRenderer<FieldForm> {

        @Override
        public TerminalSize getPreferredSize(FieldForm form) {
            synchronized (form) {
                int width = form.messageColumn() + MESSAGE_ROOM;
                return new TerminalSize(width, form.visibleRows);
            }
        }

        @Override
        public TerminalPosition getCursorLocation(FieldForm form) {
            synchronized (form) {
                if (!form.isFocused() || form.fields.get(form.selected).isChoice()) {
                    return null;
                }
                LineEditor e = form.editors.get(form.selected);
                int caretColumn = TerminalTextUtils.getColumnWidth(
                        e.text().substring(firstShown(e, form.valueWidth), e.caret()));
                return new TerminalPosition(4 + form.labelWidth + 2 + caretColumn, form.selectedLine);
            }
        }

        @Override
        public void drawComponent(TextGUIGraphics g, FieldForm form) {
            synchronized (form) {
                int width = g.getSize().getColumns();
                int rows = g.getSize().getRows();
                if (rows <= 0) {
                    return;
                }
                int fixed = 4 + form.labelWidth + 1 + 2 + 1 + form.unitWidth + 2;
                form.valueWidth = Math.max(MIN_VALUE_WIDTH, Math.min(MAX_VALUE_WIDTH, width - fixed - MESSAGE_ROOM));
                List<int[]> lines = form.layout(width);
                form.fitTop(lines, rows);
                g.applyThemeStyle(form.getThemeDefinition().getNormal());
                g.fill(' ');
                for (int line = 0; line < rows; line++) {
                    int n = form.top + line;
                    if (n >= lines.size()) {
                        break;
                    }
                    int[] entry = lines.get(n);
                    if (entry[1] == 0) {
                        drawLine(g, form, entry[0], line, width, n + 1 < lines.size() && lines.get(n + 1)[1] == 1);
                    } else {
                        String r = form.remark(form.fields.get(entry[0]).key());
                        int x = 4 + form.labelWidth + 1;
                        g.putString(2, line, r.substring(0, 1));
                        g.putString(x, line, TerminalTextUtils.fitString(AsciiText.of(r, form.unicode),
                                Math.max(0, width - x)));
                    }
                }
                if (form.top > 0) {
                    g.putString(0, 0, "^");
                }
                if (form.top + rows < lines.size()) {
                    g.putString(0, rows - 1, "v");
                }
            }
        }

        private static void drawLine(TextGUIGraphics g, FieldForm form, int i, int line, int width,
                                     boolean messageBelow) {
            FormField f = form.fields.get(i);
            boolean current = i == form.selected;
            String remark = form.remark(f.key());
            g.applyThemeStyle(form.getThemeDefinition().getNormal());
            if (current && form.isFocused()) {
                g.putString(1, line, ">");
            }
            if (remark != null) {
                g.putString(2, line, remark.substring(0, 1));
            }
            g.putString(4, line, TerminalTextUtils.fitString(f.key(), form.labelWidth));
            int x = 4 + form.labelWidth + 1;
            LineEditor e = form.editors.get(i);
            String shown;
            if (f.isChoice()) {
                shown = "< " + e.text() + " >";
            } else {
                int from = current && form.isFocused() ? firstShown(e, form.valueWidth) : 0;
                shown = e.text().substring(Math.min(from, e.text().length()));
            }
            shown = TerminalTextUtils.fitString(shown, form.valueWidth);
            shown = shown + " ".repeat(Math.max(0, form.valueWidth - TerminalTextUtils.getColumnWidth(shown)));
            g.putString(x, line, "[");
            if (current && form.isFocused()) {
                g.applyThemeStyle(form.getThemeDefinition().getActive());
                g.putString(x + 1, line, shown, SGR.BOLD);
                g.applyThemeStyle(form.getThemeDefinition().getNormal());
            } else {
                g.putString(x + 1, line, shown);
            }
            g.putString(x + 1 + form.valueWidth, line, "]");
            int ux = x + form.valueWidth + 3;
            g.putString(ux, line, AsciiText.of(f.unit(), form.unicode));
            int mx = ux + form.unitWidth + 2;
            if (remark != null && !messageBelow && mx < width) {
                g.putString(mx, line, TerminalTextUtils.fitString(AsciiText.of(remark, form.unicode), width - mx));
            }
        }
    }
}
