package dev.yoke.tui.edit;

import com.googlecode.lanterna.input.KeyStroke;

/**
 * One line of editable text with a caret: the keys every text field shares
 * (printable characters, Backspace, Delete, Left, Right, Home, End).
 */
final class LineEditor {

    private final StringBuilder text = new StringBuilder();
    private int caret;

    LineEditor(String initial) {
        set(initial);
    }

    String text() {
        return text.toString();
    }

    int caret() {
        return caret;
    }

    /** Replaces the text and puts the caret at its end. */
    void set(String value) {
        text.setLength(0);
        text.append(value == null ? "" : value);
        caret = text.length();
    }

    /**
     * Applies an editing key.
     *
     * @return true when the key was an editing key (whether or not the text changed)
     */
    boolean handle(KeyStroke key) {
        switch (key.getKeyType()) {
            case Character:
                if (key.isCtrlDown() || key.isAltDown()) {
                    return false;
                }
                text.insert(caret, key.getCharacter().charValue());
                caret++;
                return true;
            case Backspace:
                if (caret > 0) {
                    text.deleteCharAt(caret - 1);
                    caret--;
                }
                return true;
            case Delete:
                if (caret < text.length()) {
                    text.deleteCharAt(caret);
                }
                return true;
            case ArrowLeft:
                caret = Math.max(0, caret - 1);
                return true;
            case ArrowRight:
                caret = Math.min(text.length(), caret + 1);
                return true;
            case Home:
                caret = 0;
                return true;
            case End:
                caret = text.length();
                return true;
            default:
                return false;
        }
    }

    /**
     * The part of the text that fits {@code width} columns with the caret visible.
     *
     * @return the first shown character's index
     */
    int scrollFor(int width) {
        if (width <= 0 || caret < width) {
            return 0;
        }
        return caret - width + 1;
    }
}
