package dev.yoke.tui.edit;

import com.googlecode.lanterna.gui2.Direction;
import com.googlecode.lanterna.gui2.Label;
import com.googlecode.lanterna.gui2.LinearLayout;
import com.googlecode.lanterna.gui2.Panel;
import com.googlecode.lanterna.gui2.Window;
import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import com.googlecode.lanterna.input.KeyStroke;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The form of one part: every field of its kind with its unit, checked as the user types.
 * F2 saves when every field is valid and otherwise says why not; Esc goes back, asking first
 * when something was changed. A new part also has a {@code file} field choosing where it goes.
 */
final class PartForm extends EditorWindow {

    private static final String FILE = "file";
    private static final String KEYS =
            "Up/Down field  type to edit  Space choice  F2 save  Esc back";

    private final WindowBasedTextGUI gui;
    private final PartsEditor editor;
    private final EditablePart<Object> kind;
    private final String replacedId;
    private final List<Path> files;
    private final FieldForm form;
    private final Map<String, String> initialTexts = new LinkedHashMap<>();
    private final Label title = new Label("");
    private final Label status = new Label("");
    private final Label state = new Label("");

    private PartForm(WindowBasedTextGUI gui, PartsEditor editor, EditablePart<Object> kind, Map<String, Object> values,
                     String replacedId, List<Path> files, Set<String> takenIds) {
        super(kind.noun());
        this.gui = gui;
        this.editor = editor;
        this.kind = kind;
        this.replacedId = replacedId;
        this.files = List.copyOf(files);
        setHints(List.of(Window.Hint.FULL_SCREEN, Window.Hint.NO_DECORATIONS));
        List<FormField> fields = new ArrayList<>();
        if (replacedId == null) {
            List<String> names = this.files.stream().map(Path::toString).toList();
            fields.add(FormField.choice(FILE, names, name -> name, String::valueOf));
        }
        fields.addAll(kind.fields());
        List<FormRule> rules = new ArrayList<>(kind.rules());
        rules.add(v -> takenIds.contains(v.get("id")) ? Map.of("id", "already used by another part") : Map.of());
        int rows = Math.max(4, gui.getScreen().getTerminalSize().getRows() - 4);
        form = new FieldForm(fields, rules, rows).setNoteRules(kind.doubts());
        if (replacedId == null) {
            form.setText(FILE, this.files.get(0).toString());
        }
        for (FormField f : kind.fields()) {
            if (values.containsKey(f.key())) {
                form.setValue(f.key(), values.get(f.key()));
            }
        }
        for (FormField f : fields) {
            initialTexts.put(f.key(), form.text(f.key()));
        }
        if (replacedId == null) {
            form.select("id");
        }
        form.onEdit(f -> refresh());
        Panel panel = new Panel(new LinearLayout(Direction.VERTICAL).setSpacing(0));
        panel.addComponent(title);
        panel.addComponent(form, LinearLayout.createLayoutData(LinearLayout.Alignment.Fill,
                LinearLayout.GrowPolicy.CanGrow));
        panel.addComponent(status);
        panel.addComponent(state);
        panel.addComponent(new Label(KEYS));
        setComponent(panel);
        setFocusedInteractable(form);
        refresh();
    }

    /**
     * Opens the form.
     *
     * @param replacedId id of the part being edited, or null for a new part (add or copy)
     * @param files      for an edit, the part's file; for a new part, the files offered, default first
     * @param takenIds   ids the part may not take
     */
    static PartForm open(WindowBasedTextGUI gui, PartsEditor editor, EditablePart<Object> kind, Map<String, Object> values,
                         String replacedId, List<Path> files, Set<String> takenIds) {
        PartForm window = new PartForm(gui, editor, kind, values, replacedId, files, takenIds);
        gui.addWindow(window);
        return window;
    }

    /** The form (for tests and the workbench's help). */
    FieldForm form() {
        return form;
    }

    @Override
    void refresh() {
        String what = replacedId == null ? "NEW " + kind.noun().toUpperCase()
                : "EDIT " + kind.noun().toUpperCase() + " " + replacedId;
        show(title, what + (replacedId == null ? "" : "   file " + files.get(0)));
        show(status, form.selectedStatus());
        if (!message.isEmpty()) {
            show(state, message);
        } else if (form.problems().isEmpty()) {
            show(state, form.notes().isEmpty() ? "All fields valid: F2 saves."
                    : "All fields valid: F2 saves. Doubtful (marked ?, check the datasheet): "
                    + String.join(", ", form.notes().keySet()));
        } else {
            show(state, "Cannot save, " + form.problemSummary() + " (marked !)");
        }
    }

    private boolean changed() {
        for (Map.Entry<String, String> e : initialTexts.entrySet()) {
            if (!form.text(e.getKey()).equals(e.getValue())) {
                return true;
            }
        }
        return false;
    }

    private void save() {
        Optional<Map<String, Object>> values = form.values();
        if (values.isEmpty()) {
            message = "NOT saved, " + form.problemSummary();
            refresh();
            return;
        }
        Object part = kind.build(values.get());
        Path file = replacedId == null ? Path.of((String) values.get().get(FILE)) : files.get(0);
        editor.write(new PartChange.Put(part, replacedId, file), problem -> {
            if (problem == null) {
                close();
            } else {
                message = problem;
                refresh();
            }
        });
    }

    @Override
    public boolean handleInput(KeyStroke key) {
        return saveOrLeave(key, this::save, this::back);
    }

    private void back() {
        if (!changed()) {
            close();
            return;
        }
        LinkedHashMap<String, Runnable> answers = new LinkedHashMap<>();
        answers.put("Discard", this::close);
        answers.put("Keep editing", this::refresh);
        ChoiceWindow.ask(gui, "Unsaved " + kind.noun(), "Discard the changes to this " + kind.noun() + "?", answers, unicode);
    }

    @Override
    void unicodeChanged(boolean on) {
        form.setUnicode(on);
    }
}
