package dev.yoke.tui.edit;

import com.googlecode.lanterna.gui2.BasicWindow;
import com.googlecode.lanterna.gui2.Label;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;

/**
 * What the editor windows share: a one-line message that the next key clears, the terminal's
 * Unicode setting applied to every label, and the F2 save / Esc leave keys of a form.
 */
abstract class EditorWindow extends BasicWindow {

    /** Shown in place of the usual status until the next key. */
    String message = "";
    /** Whether the terminal shows Unicode; when not, symbols are spelt in ASCII. */
    boolean unicode = true;

    EditorWindow(String title) {
        super(title);
    }

    /** Redraws every label from the current state. */
    abstract void refresh();

    /** Passes the Unicode setting on to the window's own components. */
    abstract void unicodeChanged(boolean on);

    /**
     * Whether the terminal shows Unicode; when not, unit symbols and marks are spelt in ASCII
     * ({@code Ohm}, {@code degC}, {@code N*m}) so nothing prints as '?'.
     */
    public final void useUnicode(boolean on) {
        this.unicode = on;
        unicodeChanged(on);
        refresh();
    }

    final void show(Label label, String text) {
        label.setText(AsciiText.of(text, unicode));
    }

    /**
     * A form's keys: the focused component first; when it does not take the key, F2 saves and
     * Esc leaves.
     */
    final boolean saveOrLeave(KeyStroke key, Runnable save, Runnable leave) {
        message = "";
        boolean handled = super.handleInput(key);
        if (!handled) {
            if (key.getKeyType() == KeyType.F2) {
                save.run();
                return true;
            }
            if (key.getKeyType() == KeyType.Escape) {
                leave.run();
                return true;
            }
        }
        refresh();
        return handled;
    }
}
