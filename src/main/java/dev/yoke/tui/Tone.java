package dev.yoke.tui;

/** The role of a piece of text on screen; the {@link Palette} maps it to colours and styles. */
public enum Tone {
    /** Ordinary text. */
    NORMAL,
    /** Column headings and section titles. */
    HEADING,
    /** Passes: feasible verdicts, positive margins. */
    GOOD,
    /** Fails: infeasible verdicts, negative margins. */
    BAD,
    /** Worth a look: implausible parts, advisories, thin margins. */
    WARN,
    /** Less important text: units, legends. */
    DIM,
    /** The status line and the footer. */
    BAR
}
