package dev.yoke.tui;

/** How many colours the user's terminal shows; meaning never rests on colour alone at any depth. */
public enum ColorDepth {
    /** No colour: bold and reverse video only (also chosen when {@code NO_COLOR} is set). */
    MONOCHROME,
    /** The sixteen ANSI colours every colour terminal has. */
    SIXTEEN,
    /** The xterm 256-colour palette. */
    INDEXED_256
}
