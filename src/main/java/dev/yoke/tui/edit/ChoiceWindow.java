package dev.yoke.tui.edit;

import com.googlecode.lanterna.gui2.BasicWindow;
import com.googlecode.lanterna.gui2.Button;
import com.googlecode.lanterna.gui2.Direction;
import com.googlecode.lanterna.gui2.Label;
import com.googlecode.lanterna.gui2.LinearLayout;
import com.googlecode.lanterna.gui2.Panel;
import com.googlecode.lanterna.gui2.Window;
import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import dev.yoke.tui.Cautions;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small modal question with one button per answer. It never blocks the caller: each answer
 * runs its action after the window closes, so it works the same under the virtual terminal.
 * Esc chooses the last answer (by convention the one that changes nothing).
 */
final class ChoiceWindow extends BasicWindow {

    private final Runnable onEscape;

    private ChoiceWindow(String title, Runnable onEscape) {
        super(title);
        this.onEscape = onEscape;
        setHints(List.of(Window.Hint.MODAL, Window.Hint.CENTERED));
    }

    /**
     * Shows the question.
     *
     * @param answers button label to action, in order; the first has the focus
     * @param unicode whether the terminal shows Unicode (else symbols are spelt in ASCII)
     */
    static ChoiceWindow ask(WindowBasedTextGUI gui, String title, String message, LinkedHashMap<String, Runnable> answers,
                            boolean unicode) {
        Runnable last = () -> { };
        for (Runnable r : answers.values()) {
            last = r;
        }
        ChoiceWindow window = new ChoiceWindow(title, last);
        Panel panel = new Panel(new LinearLayout(Direction.VERTICAL));
        panel.addComponent(new Label(String.join("\n", Cautions.wrap(AsciiText.of(message, unicode), 60))));
        Panel buttons = new Panel(new LinearLayout(Direction.HORIZONTAL));
        for (Map.Entry<String, Runnable> a : answers.entrySet()) {
            Runnable action = a.getValue();
            buttons.addComponent(new Button(a.getKey(), () -> {
                window.close();
                action.run();
            }));
        }
        panel.addComponent(buttons);
        panel.addComponent(new Label("Left/Right choose  Enter confirm  Esc " + lastKey(answers)));
        window.setComponent(panel);
        gui.addWindow(window);
        return window;
    }

    private static String lastKey(LinkedHashMap<String, Runnable> answers) {
        String last = "";
        for (String k : answers.keySet()) {
            last = k;
        }
        return last.toLowerCase();
    }

    @Override
    public boolean handleInput(KeyStroke key) {
        if (key.getKeyType() == KeyType.Escape) {
            close();
            onEscape.run();
            return true;
        }
        return super.handleInput(key);
    }
}
