package dev.yoke.report;

import java.util.List;

/**
 * The safety words every report ends with: results are estimates, high-current drives can burn,
 * and wiring must follow local codes and licensed practice (common practice for design tools
 * that size power electronics). The one place this wording lives: the workbench renders
 * {@link #PARAGRAPHS}, the batch commands print {@link #LINE} and {@link #FULL}.
 */
public final class Cautions {

    /** One line, under 100 columns, for the end of a table. */
    public static final String LINE = "Estimates only; high-current drives can burn; follow local electrical codes and licensed practice.";

    /** The full wording, for explain output and documentation. */
    public static final String FULL = "Results are estimates for shortlisting, not a substitute for measuring the built drive.\n"
            + "High-current drives can burn, and battery- and mains-powered equipment must follow local\n"
            + "electrical codes and licensed practice. Verify temperatures on the real hardware before\n"
            + "relying on them.";

    /** The full cautions, one paragraph per entry, for the workbench's cautions screen. */
    public static final List<String> PARAGRAPHS = List.of(
            "Estimates for shortlisting. Every figure here comes from models with simplifying assumptions "
                    + "and from catalog values that may be typical rather than worst case. They narrow the "
                    + "choice; they are not a substitute for measuring the built drive.",
            "High-current drives can burn. Motors, switches, wiring and batteries get hot enough to burn skin "
                    + "and start fires, and a shorted bridge leg can destroy parts violently. Fuse the supply, "
                    + "limit current while testing and keep flammable material away.",
            "Battery and mains-powered equipment must follow local electrical codes and licensed practice. "
                    + "Lithium packs and anything connected to the mains need protection, insulation and "
                    + "wiring done to the rules where you are, by someone entitled to do it.",
            "Verify temperatures on the real hardware. Measure case and winding temperatures under the real "
                    + "duty cycle, at the highest ambient temperature expected, before relying on the margins "
                    + "shown here.");

    private Cautions() {
    }
}
