package dev.yoke.tui;

import com.googlecode.lanterna.input.KeyStroke;

/**
 * The text of a one-line prompt and its caret: printable characters insert, Backspace and Delete
 * remove, Left/Right/Home/End move. Plain state, no drawing.
 */
public final class LineEditor {

    private final StringBuilder text;
    private int caret;

    public LineEditor(String initial) {
        this.text = new StringBuilder(initial == null ? "" : initial);
        this.caret = text.length();
    }

    public String text() {
        return text.toString();
    }

    public int caret() {
        return caret;
    }

    /** Applies an editing key; returns false when the key is not an editing key. */
    public boolean edit(KeyStroke key) {
        switch (key.getKeyType()) {
            case Character -> {
                if (key.isCtrlDown() || key.isAltDown()) {
                    return false;
                }
                text.insert(caret++, key.getCharacter().charValue());
            }
            case Backspace -> {
                if (caret > 0) {
                    text.deleteCharAt(--caret);
                }
            }
            case Delete -> {
                if (caret < text.length()) {
                    text.deleteCharAt(caret);
                }
            }
            case ArrowLeft -> caret = Math.max(0, caret - 1);
            case ArrowRight -> caret = Math.min(text.length(), caret + 1);
            case Home -> caret = 0;
            case End -> caret = text.length();
            default -> {
                return false;
            }
        }
        return true;
    }
}
