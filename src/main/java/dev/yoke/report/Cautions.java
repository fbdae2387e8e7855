package dev.yoke.report;

import java.util.List;

/**
 * The safety words every report ends with: the figures are screening estimates, hot drives burn and
 * ignite, and battery or mains wiring follows local codes and licensed electricians (common practice
 * for design tools that size power electronics). The one place this wording lives: the workbench renders
 * {@link #PARAGRAPHS}, the batch commands print {@link #LINE} and {@link #FULL}.
 */
public final class Cautions {

    /** One line, under 100 columns, for the end of a table. */
    public static final String LINE =
            "Screening estimates only; hot drives burn and ignite; wire to local codes with licensed help.";

    /** The full wording, for explain output and documentation. */
    public static final String FULL =
            "These figures are screening estimates from simplified models and catalog values: measure the\n"
            + "built drive before trusting them. Power stages, motors and battery packs run hot enough to\n"
            + "burn skin and start fires. Battery and mains wiring falls under local electrical codes: have\n"
            + "it done or checked by a licensed electrician. Confirm junction and winding temperatures on\n"
            + "the real machine, at its hottest expected ambient.";

    /** The full cautions, one paragraph per entry, for the workbench's cautions screen. */
    public static final List<String> PARAGRAPHS = List.of(
            "Screening estimates. Every figure here comes from simplified models and from catalog values "
                    + "that may be typical rather than worst case. Use them to narrow the choice, then measure "
                    + "the built drive.",
            "Burns and fire. Motors, switches, wiring and batteries can get hot enough to burn skin and start "
                    + "fires, and a shorted bridge leg can fail violently. Fuse the supply, limit the current "
                    + "while testing and keep flammable material away.",
            "Local codes. Battery packs and anything tied to the mains need protection, insulation and wiring "
                    + "to the rules where you are, done or checked by a licensed electrician.",
            "Measure temperatures. Check case and winding temperatures under the real duty cycle, at the "
                    + "hottest ambient expected, before relying on the margins shown here.");

    private Cautions() {
    }
}
