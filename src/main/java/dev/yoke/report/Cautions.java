package dev.yoke.report;

/**
 * The safety words every report ends with: results are estimates, high-current drives can burn,
 * and wiring must follow local codes and licensed practice (common practice for design tools
 * that size power electronics).
 */
public final class Cautions {

    /** One line, under 100 columns, for the end of a table. */
    public static final String LINE = "Estimates only; high-current drives can burn; follow local electrical codes and licensed practice.";

    /** The full wording, for explain output and documentation. */
    public static final String FULL = "Results are estimates for shortlisting, not a substitute for measuring the built drive.\n"
            + "High-current drives can burn, and battery- and mains-powered equipment must follow local\n"
            + "electrical codes and licensed practice. Verify temperatures on the real hardware before\n"
            + "relying on them.";

    private Cautions() {
    }
}
