package dev.yoke.tui.edit;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.gui2.Direction;
import com.googlecode.lanterna.gui2.Label;
import com.googlecode.lanterna.gui2.LinearLayout;
import com.googlecode.lanterna.gui2.Panel;
import com.googlecode.lanterna.gui2.Window;
import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import com.googlecode.lanterna.input.KeyStroke;
import dev.yoke.catalog.ChangedOnDiskException;
import dev.yoke.catalog.InputException;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import dev.yoke.units.Dimension;
import dev.yoke.units.Units;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The scenario editor: the bench, its limits and the profile's scalars as a form, the profile's
 * segments as a table. Every valid change is passed to {@code onChange} when the user leaves the
 * changed field or cell (so half-typed values are not ranked); an invalid value is shown beside
 * its field and passed nowhere. F2 writes the file (atomically, keeping a backup), editing it in
 * place; when its layout does not allow that (segments written on one line), it asks first, since
 * the body is then written anew and its comments are kept only in the backup. Esc closes, asking
 * first when the file is behind the screen.
 */
public final class ScenarioEditor extends EditorWindow {

    private static final String FORM_KEYS =
            "Up/Down field  type to edit  Space choice  Tab segments  F2 save file  Esc close";
    private static final String TABLE_KEYS =
            "Enter edit  a add  x remove  [ ] move up/down  Tab bench  F2 save  Esc close";
    private static final String EDIT_KEYS =
            "type to edit  Enter keep  Esc undo  Tab next cell  Shift+Tab previous cell";

    private final WindowBasedTextGUI gui;
    private final Path file;
    private final Consumer<Scenario> onChange;
    private final ScenarioSaver saver;
    private final FieldForm form;
    private final SegmentTable table;
    private final Label title = new Label("");
    private final Label heading = new Label("");
    private final Label status = new Label("");
    private final Label state = new Label("");
    private final Label keys = new Label("");
    private Scenario passedOn;
    private Scenario saved;

    private ScenarioEditor(WindowBasedTextGUI gui, Scenario scenario, Path file, Consumer<Scenario> onChange,
                           ScenarioSaver saver) {
        super("Scenario");
        this.gui = gui;
        this.file = file;
        this.onChange = Objects.requireNonNull(onChange, "onChange");
        this.saver = Objects.requireNonNull(saver, "saver");
        this.passedOn = scenario;
        this.saved = onDisk(file);
        setHints(List.of(Window.Hint.FULL_SCREEN, Window.Hint.NO_DECORATIONS));
        TerminalSize screen = gui.getScreen().getTerminalSize();
        // title, heading, table header, status, state and keys take a line each; the rest is shared,
        // the table getting room for its segments plus two added ones, at most half
        int spare = Math.max(8, screen.getRows() - 6);
        int tableRows = Math.max(3, Math.min(scenario.profile().segments().size() + 2, spare / 2));
        int formRows = Math.max(4, spare - tableRows);
        form = new FieldForm(ScenarioFields.fields(), ScenarioFields.rules(), formRows)
                .setNoteRules(ScenarioFields.doubts());
        ScenarioFields.fill(form, scenario);
        table = new SegmentTable(scenario.profile().segments(), tableRows);
        form.onEdit(f -> refresh()).onCommit(f -> passOn());
        table.onEdit(t -> refresh()).onChange(t -> passOn());

        Panel panel = new Panel(new LinearLayout(Direction.VERTICAL).setSpacing(0));
        panel.addComponent(title);
        panel.addComponent(form, LinearLayout.createLayoutData(LinearLayout.Alignment.Fill));
        panel.addComponent(heading);
        panel.addComponent(table, LinearLayout.createLayoutData(LinearLayout.Alignment.Fill,
                LinearLayout.GrowPolicy.CanGrow));
        panel.addComponent(status);
        panel.addComponent(state);
        panel.addComponent(keys);
        setComponent(panel);
        setFocusedInteractable(form);
        refresh();
    }

    /**
     * Opens the editor on top of the workbench, saving through the catalog package's scenario writer.
     * The file as it is on disk now counts as the version being edited: if someone else changes it
     * before F2, the editor asks before overwriting.
     *
     * @param gui      the workbench's window manager
     * @param scenario what the workbench ranks now
     * @param file     where F2 writes the scenario
     * @param onChange receives each valid edited scenario (on the GUI thread: hand it to a background ranker)
     */
    public static ScenarioEditor open(WindowBasedTextGUI gui, Scenario scenario, Path file,
                                      Consumer<Scenario> onChange) {
        return open(gui, scenario, file, onChange, ScenarioFiles.startingFromDisk(file));
    }

    /** Like {@link #open(WindowBasedTextGUI, Scenario, Path, Consumer)} with the file writer given. */
    public static ScenarioEditor open(WindowBasedTextGUI gui, Scenario scenario, Path file,
                                      Consumer<Scenario> onChange, ScenarioSaver saver) {
        ScenarioEditor editor = new ScenarioEditor(gui, scenario, file, onChange, saver);
        gui.addWindow(editor);
        return editor;
    }

    /** The scenario on screen, or empty while any value is invalid. */
    public Optional<Scenario> current() {
        Optional<Map<String, Object>> values = form.values();
        Optional<List<Segment>> segments = table.segments();
        if (values.isEmpty() || segments.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(ScenarioFields.build(values.get(), segments.get()));
    }

    /** Every current problem, form first, then segments. */
    public List<String> problems() {
        List<String> out = new ArrayList<>();
        form.problems().forEach((k, v) -> out.add(k + ": " + v));
        out.addAll(table.problems());
        return out;
    }

    private void passOn() {
        current().ifPresent(s -> {
            if (!s.equals(passedOn)) {
                passedOn = s;
                onChange.accept(s);
            }
        });
        refresh();
    }

    /** The scenario the file holds now, or null when there is none that loads. */
    private static Scenario onDisk(Path file) {
        if (file == null || !Files.isRegularFile(file)) {
            return null;
        }
        try {
            return ScenarioLoader.load(file).scenario();
        } catch (InputException e) {
            return null;
        }
    }

    /** Writes the file when everything is valid; otherwise says why not. */
    public void save() {
        Optional<Scenario> s = current();
        if (s.isEmpty()) {
            message = "Not saved: " + summary();
            refresh();
            return;
        }
        passOn();
        Optional<String> rewrite = saver.rewriteNeeded(s.get(), file);
        if (rewrite.isPresent()) {
            askBeforeRewriting(s.get(), rewrite.get());
        } else {
            write(s.get(), false);
        }
        refresh();
    }

    /** Saves {@code scenario}; {@code warned}: the user already agreed to a body written anew. */
    private void write(Scenario scenario, boolean warned) {
        try {
            savedAs(scenario, "", saver.save(scenario, file), warned);
        } catch (ChangedOnDiskException e) {
            askAboutChangedFile(scenario);
        } catch (IOException | RuntimeException e) {
            message = "Not saved: " + file + ": " + e.getMessage();
        }
    }

    /** Asks before a save that would drop the comments in the file's body ({@code why}: what Yoke cannot edit in place). */
    private void askBeforeRewriting(Scenario scenario, String why) {
        String name = file.getFileName().toString();
        LinkedHashMap<String, Runnable> answers = new LinkedHashMap<>();
        answers.put("Save anyway", () -> {
            write(scenario, true);
            refresh();
        });
        answers.put("Back", () -> {
            message = "Not saved: " + name + " is as it was; your edits are still here";
            refresh();
        });
        ChoiceWindow.ask(gui, "Save writes the file anew", "Yoke cannot edit " + name + " in place (" + why
                + "), so saving writes its body anew in Yoke's layout: the comment lines at the top stay,"
                + " comments further down are dropped from " + name + " (the previous file, comments and all,"
                + " is kept as " + name + ".bak). To keep them, go back, write that part one value per line"
                + " (block style) in a text editor and open the scenario again. Save anyway?", answers, unicode);
    }

    /**
     * Records a save and says so; when the file's body was written anew ({@code rewritten} says
     * why), the user's comments inside it are gone from the file, so a notice says where they are,
     * unless the user was {@code warned} before and chose to save.
     */
    private void savedAs(Scenario scenario, String note, Optional<String> rewritten, boolean warned) {
        saved = scenario;
        String name = file.getFileName().toString();
        if (rewritten.isEmpty()) {
            message = "Saved " + name + note + " (previous version kept as " + name + ".bak)";
            return;
        }
        message = "Saved " + name + note + "; body written anew, its comments are only in " + name + ".bak";
        if (warned) {
            return; // the user was told before and chose to save
        }
        LinkedHashMap<String, Runnable> ok = new LinkedHashMap<>();
        ok.put("OK", this::refresh);
        ChoiceWindow.ask(gui, "Saved; comments dropped", "Saved " + name + note + ", but Yoke could not edit it"
                + " in place (" + rewritten.get() + "), so it wrote the file's body anew in its own layout."
                + " The comment lines at the top are kept; comments further down are gone from " + name
                + ". The previous file, comments and all, is " + name + ".bak. To keep comments in"
                + " future saves, write that part one value per line (block style).", ok, unicode);
    }

    private void askAboutChangedFile(Scenario scenario) {
        LinkedHashMap<String, Runnable> answers = new LinkedHashMap<>();
        answers.put("Overwrite", () -> {
            try {
                savedAs(scenario, " over the other version", saver.overwrite(scenario, file), false);
            } catch (IOException | RuntimeException e) {
                message = "Not saved: " + file + ": " + e.getMessage();
            }
            refresh();
        });
        answers.put("Back", () -> {
            message = "Not saved: " + file.getFileName() + " changed on disk; your edits are still here";
            refresh();
        });
        ChoiceWindow.ask(gui, "Scenario file changed on disk", file + " was changed by someone else since it was"
                + " read. Overwrite it? The other version is then kept as " + file.getFileName() + ".bak.",
                answers, unicode);
    }

    private String summary() {
        List<String> p = problems();
        if (p.isEmpty()) {
            return "";
        }
        List<String> where = new ArrayList<>(form.problems().keySet());
        where.addAll(table.problemPlaces());
        return (p.size() == 1 ? "1 problem: " : p.size() + " problems: ") + String.join(", ", where);
    }

    @Override
    void refresh() {
        String name = form.text(ScenarioFields.NAME);
        show(title, "SCENARIO " + name + "   file " + (file == null ? "(none)" : file.toString()));
        double cycle = 0;
        Optional<List<Segment>> segments = table.segments();
        if (segments.isPresent()) {
            for (Segment seg : segments.get()) {
                cycle += seg.duration();
            }
        }
        show(heading, "PROFILE SEGMENTS  " + table.size() + " segments"
                + (segments.isPresent() ? ", cycle " + Units.format(cycle, Dimension.TIME) : ""));
        boolean inTable = getFocusedInteractable() == table;
        show(status, inTable ? table.selectedStatus() : form.selectedStatus());
        String problems = summary();
        String fileState = Objects.equals(current().orElse(null), saved) ? "file up to date" : "unsaved (F2 saves)";
        if (!message.isEmpty()) {
            show(state, message);
        } else if (problems.isEmpty()) {
            show(state, "All values valid, passed to the ranking; " + fileState + ".");
        } else {
            show(state, "NOT passed on: " + problems);
        }
        show(keys, inTable ? (table.isEditing() ? EDIT_KEYS : TABLE_KEYS) : FORM_KEYS);
    }

    @Override
    public boolean handleInput(KeyStroke key) {
        return saveOrLeave(key, this::save, this::closeAsking);
    }

    private void closeAsking() {
        passOn();
        if (Objects.equals(current().orElse(null), saved)) {
            close();
            return;
        }
        LinkedHashMap<String, Runnable> answers = new LinkedHashMap<>();
        answers.put("Save", () -> {
            save();
            if (Objects.equals(current().orElse(null), saved)) {
                close();
            }
        });
        answers.put("Close unsaved", this::close);
        answers.put("Stay", this::refresh);
        ChoiceWindow.ask(gui, "Scenario file not saved",
                current().isPresent() ? "The file is older than the screen. Save it?"
                        : "Some values are invalid and the file is older than the screen.", answers, unicode);
    }

    @Override
    void unicodeChanged(boolean on) {
        form.setUnicode(on);
    }
}
