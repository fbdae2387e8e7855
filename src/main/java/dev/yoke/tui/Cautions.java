package dev.yoke.tui;

import java.util.List;

/** The safety cautions screen: what the numbers are, and what they are not. */
public final class Cautions {

    private Cautions() {
    }

    /** The cautions, one paragraph per entry. */
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

    /** The cautions laid out for a width. */
    public static List<Line> lines(int width) {
        List<Line> out = new java.util.ArrayList<>();
        out.add(Line.of(Tone.HEADING, "Safety cautions"));
        out.add(Line.blank());
        int wrap = Math.max(30, Math.min(width - 2, 96));
        int n = 1;
        for (String p : PARAGRAPHS) {
            List<String> wrapped = wrap(p, wrap - 4);
            for (int i = 0; i < wrapped.size(); i++) {
                String lead = i == 0 ? " " + n + ". " : "    ";
                out.add(i == 0 ? Line.builder().add(Tone.WARN, lead).add(wrapped.get(i)).build()
                        : Line.of(lead + wrapped.get(i)));
            }
            out.add(Line.blank());
            n++;
        }
        return out;
    }

    /** Greedy word wrap. */
    static List<String> wrap(String text, int width) {
        List<String> lines = new java.util.ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                lines.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) {
                line.append(' ');
            }
            line.append(word);
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
