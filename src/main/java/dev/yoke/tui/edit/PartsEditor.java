package dev.yoke.tui.edit;

import com.googlecode.lanterna.gui2.Direction;
import com.googlecode.lanterna.gui2.Label;
import com.googlecode.lanterna.gui2.LinearLayout;
import com.googlecode.lanterna.gui2.Panel;
import com.googlecode.lanterna.gui2.Window;
import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import com.googlecode.lanterna.input.KeyStroke;

import dev.yoke.catalog.ChangedOnDiskException;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.function.Consumer;


/**
 * The parts editor: browse the catalog's motors or switches, filter them by id and label, and
 * add, copy, edit or delete a part. Every write goes through the {@link PartStore} (atomic, with
 * a backup) and is followed by {@code onSaved}, so the workbench ranks again.
 *
 * <p>Keys: Up/Down/PgUp/PgDn/Home/End move; Tab switches motors and switches; {@code /} filters
 * (typing narrows the list at once, Enter keeps the filter, Esc clears it); Enter or {@code e}
 * edits; {@code a} adds; {@code c} copies; {@code d} or Delete deletes after a question; Esc closes.
 */
public final class PartsEditor extends EditorWindow {

    private static final String LIST_KEYS =
            "Tab motors/switches  / filter  Enter edit  a add  c copy  d delete  Esc close";
    private static final String FILTER_KEYS = "type to filter by id or label  Enter keep filter  Esc clear filter";

    private final WindowBasedTextGUI gui;
    private final PartStore store;
    private final Runnable onSaved;
    private final PartListView list;
    private final Label title = new Label("");
    private final Label status = new Label("");
    private final Label keys = new Label("");
    private EditablePart<Object> kind = kind(MotorEditing.INSTANCE);
    private String filter = "";
    private boolean filtering;
    private int selected;
    private List<Object> shown = List.of();

    private PartsEditor(WindowBasedTextGUI gui, PartStore store, Runnable onSaved) {
        super("Parts");
        this.gui = gui;
        this.store = Objects.requireNonNull(store, "store");
        this.onSaved = Objects.requireNonNull(onSaved, "onSaved");
        setHints(List.of(Window.Hint.FULL_SCREEN, Window.Hint.NO_DECORATIONS));
        list = new PartListView(gui.getScreen().getTerminalSize().getRows() - 4);
        Panel panel = new Panel(new LinearLayout(Direction.VERTICAL).setSpacing(0));
        panel.addComponent(title);
        panel.addComponent(list, LinearLayout.createLayoutData(LinearLayout.Alignment.Fill,
                LinearLayout.GrowPolicy.CanGrow));
        panel.addComponent(status);
        panel.addComponent(keys);
        setComponent(panel);
        refresh();
    }

    /**
     * Opens the parts editor over the workbench.
     *
     * @param gui     the workbench's window manager
     * @param store   the loaded catalog files
     * @param onSaved run after every successful write (the workbench re-ranks)
     */
    public static PartsEditor open(WindowBasedTextGUI gui, PartStore store, Runnable onSaved) {
        PartsEditor editor = new PartsEditor(gui, store, onSaved);
        gui.addWindow(editor);
        return editor;
    }

    @SuppressWarnings("unchecked")
    private static EditablePart<Object> kind(EditablePart<?> k) {
        return (EditablePart<Object>) k;
    }

    /** Ids of the parts the list shows now (after the filter), in order. */
    public List<String> shownIds() {
        List<String> ids = new ArrayList<>();
        for (Object p : shown) {
            ids.add(kind.id(p));
        }
        return ids;
    }

    /** The kind shown now, {@code motors} or {@code switches}. */
    public String shownKind() {
        return kind.plural();
    }

    @Override
    void refresh() {
        List<Object> all = kind.parts(store.catalog());
        String needle = filter.toLowerCase(Locale.ROOT);
        List<Object> out = new ArrayList<>();
        for (Object p : all) {
            String label = kind.label(p) == null ? "" : kind.label(p);
            if (needle.isEmpty() || kind.id(p).toLowerCase(Locale.ROOT).contains(needle)
                    || label.toLowerCase(Locale.ROOT).contains(needle)) {
                out.add(p);
            }
        }
        shown = out;
        selected = Math.max(0, Math.min(selected, shown.size() - 1));
        list.show(kind, shown, selected);
        boolean motors = kind == kind(MotorEditing.INSTANCE);
        int motorCount = store.catalog().motors().size();
        int switchCount = store.catalog().switches().size();
        String tabs = motors
                ? "[MOTORS " + motorCount + "]  switches " + switchCount
                : "motors " + motorCount + "  [SWITCHES " + switchCount + "]";
        String filterText = filtering ? "filter: " + filter + "_"
                : filter.isEmpty() ? "" : "filter: " + filter + " (" + shown.size() + " of " + all.size() + ")";
        show(title, "PARTS  " + tabs + "   " + filterText);
        if (!message.isEmpty()) {
            show(status, message);
        } else if (shown.isEmpty()) {
            show(status, filter.isEmpty() ? "No " + kind.plural() + " yet: a adds one."
                    : "Nothing matches '" + filter + "'.");
        } else {
            Object p = shown.get(selected);
            show(status, kind.noun() + " " + kind.id(p) + " in "
                    + store.fileOf(kind.id(p)).map(Path::toString).orElse("(no file)"));
        }
        show(keys, filtering ? FILTER_KEYS : LIST_KEYS);
    }

    @Override
    public boolean handleInput(KeyStroke key) {
        message = "";
        boolean handled = filtering ? filterKey(key) : listKey(key);
        refresh();
        return handled || super.handleInput(key);
    }

    private boolean filterKey(KeyStroke key) {
        switch (key.getKeyType()) {
            case Enter:
                filtering = false;
                return true;
            case Escape:
                filtering = false;
                filter = "";
                return true;
            case Backspace:
                if (!filter.isEmpty()) {
                    filter = filter.substring(0, filter.length() - 1);
                }
                selected = 0;
                return true;
            case Character:
                filter = filter + key.getCharacter();
                selected = 0;
                return true;
            case ArrowUp:
            case ArrowDown:
                filtering = false;
                return listKey(key);
            default:
                return true;
        }
    }

    private boolean listKey(KeyStroke key) {
        switch (key.getKeyType()) {
            case ArrowUp:
                selected = Math.max(0, selected - 1);
                return true;
            case ArrowDown:
                selected = Math.min(shown.size() - 1, selected + 1);
                return true;
            case PageUp:
                selected = Math.max(0, selected - list.pageRows());
                return true;
            case PageDown:
                selected = Math.min(shown.size() - 1, selected + list.pageRows());
                return true;
            case Home:
                selected = 0;
                return true;
            case End:
                selected = shown.size() - 1;
                return true;
            case Tab:
            case ReverseTab:
                kind = kind == kind(MotorEditing.INSTANCE) ? kind(SwitchEditing.INSTANCE) : kind(MotorEditing.INSTANCE);
                selected = 0;
                return true;
            case Enter:
                edit();
                return true;
            case Delete:
                delete();
                return true;
            case Escape:
                if (!filter.isEmpty()) {
                    filter = "";
                } else {
                    close();
                }
                return true;
            case Character:
                switch (key.getCharacter()) {
                    case '/':
                        filtering = true;
                        return true;
                    case 'e':
                        edit();
                        return true;
                    case 'a':
                        add();
                        return true;
                    case 'c':
                        copy();
                        return true;
                    case 'd':
                        delete();
                        return true;
                    default:
                        return false;
                }
            default:
                return false;
        }
    }

    private Object current() {
        return shown.isEmpty() ? null : shown.get(selected);
    }

    private Set<String> allIds() {
        Set<String> ids = new LinkedHashSet<>();
        store.catalog().motors().forEach(m -> ids.add(m.id()));
        store.catalog().switches().forEach(s -> ids.add(s.id()));
        return ids;
    }

    private void edit() {
        Object part = current();
        if (part == null) {
            return;
        }
        String id = kind.id(part);
        Path file = store.fileOf(id).orElse(defaultFile());
        Set<String> others = allIds();
        others.remove(id);
        PartForm.open(gui, this, kind, kind.values(part), id, List.of(file), others).useUnicode(unicode);
    }

    private void add() {
        Map<String, Object> blank = new LinkedHashMap<>();
        PartForm.open(gui, this, kind, blank, null, filesWithFirst(defaultFile()), allIds()).useUnicode(unicode);
    }

    private void copy() {
        Object part = current();
        if (part == null) {
            return;
        }
        Map<String, Object> values = new LinkedHashMap<>(kind.values(part));
        Set<String> ids = allIds();
        values.put("id", freshId(kind.id(part), ids));
        Path from = store.fileOf(kind.id(part)).orElse(defaultFile());
        PartForm.open(gui, this, kind, values, null, filesWithFirst(from), ids).useUnicode(unicode);
    }

    /** {@code id-copy}, {@code id-copy2}, … whichever is free. */
    static String freshId(String id, Set<String> taken) {
        String candidate = id + "-copy";
        for (int n = 2; taken.contains(candidate); n++) {
            candidate = id + "-copy" + n;
        }
        return candidate;
    }

    private Path defaultFile() {
        return store.files().isEmpty() ? Path.of("catalog.yaml") : store.files().get(0);
    }

    private List<Path> filesWithFirst(Path first) {
        List<Path> files = new ArrayList<>();
        files.add(first);
        for (Path f : store.files()) {
            if (!f.equals(first)) {
                files.add(f);
            }
        }
        return files;
    }

    private void delete() {
        Object part = current();
        if (part == null) {
            return;
        }
        String id = kind.id(part);
        Path file = store.fileOf(id).orElse(defaultFile());
        LinkedHashMap<String, Runnable> answers = new LinkedHashMap<>();
        answers.put("Delete", () -> write(new PartChange.Remove(part, id, file), problem -> { }));
        answers.put("Keep", () -> { });
        ChoiceWindow.ask(gui, "Delete " + kind.noun(),
                "Delete " + kind.noun() + " " + id + " from " + file.getFileName()
                        + "? The previous file is kept as " + file.getFileName() + ".bak.", answers, unicode);
    }

    /**
     * Writes a change; when the file changed on disk, asks whether to reload it first or keep both.
     * {@code done} receives null once the change is written, otherwise why it was not.
     */
    void write(PartChange change, Consumer<String> done) {
        try {
            store.apply(change);
            written(change, "Saved " + describe(change) + " to " + change.file().getFileName()
                    + " (previous version in " + change.file().getFileName() + ".bak)");
            done.accept(null);
        } catch (ChangedOnDiskException e) {
            askAboutConflict(change, e.file(), done);
        } catch (IOException | RuntimeException e) {
            message = "NOT saved: " + change.file() + ": " + e.getMessage();
            refresh();
            done.accept(message);
        }
    }

    private void askAboutConflict(PartChange change, Path file, Consumer<String> done) {
        LinkedHashMap<String, Runnable> answers = new LinkedHashMap<>();
        answers.put("Reload, then apply mine", () -> {
            try {
                store.reload();
            } catch (IOException | RuntimeException e) {
                message = "NOT saved: cannot reload " + file + ": " + e.getMessage();
                refresh();
                done.accept(message);
                return;
            }
            write(change, done);
        });
        if (change instanceof PartChange.Put) {
            answers.put("Keep both", () -> keepBoth(change, file, done));
        }
        answers.put("Back", () -> done.accept("NOT saved: " + file + " changed on disk; nothing written"));
        ChoiceWindow.ask(gui, "File changed on disk",
                file + " was changed by someone else since it was loaded.", answers, unicode);
    }

    private void keepBoth(PartChange change, Path file, Consumer<String> done) {
        try {
            PartStore.Kept kept = store.applyBeside(change);
            written(change, "Kept " + file.getFileName() + " as it is on disk; yours is " + kept.id()
                    + " in " + kept.file());
            done.accept(null);
        } catch (IOException | RuntimeException e) {
            message = "NOT saved: " + e.getMessage();
            refresh();
            done.accept(message);
        }
    }

    private void written(PartChange change, String text) {
        message = text;
        if (change instanceof PartChange.Put put) {
            select(kind.id(put.part()));
        }
        refresh();
        onSaved.run();
    }

    private void select(String id) {
        filter = "";
        List<Object> all = kind.parts(store.catalog());
        for (int i = 0; i < all.size(); i++) {
            if (kind.id(all.get(i)).equals(id)) {
                selected = i;
            }
        }
    }

    private String describe(PartChange change) {
        if (change instanceof PartChange.Put put) {
            return kind.noun() + " " + kind.id(put.part());
        }
        return "deletion of " + kind.noun() + " " + ((PartChange.Remove) change).id();
    }

    @Override
    void unicodeChanged(boolean on) {
        list.setUnicode(on);
    }
}
