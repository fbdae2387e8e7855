package dev.yoke.tui;

import java.util.List;

/**
 * The safety cautions screen: what the numbers are, and what they are not. The wording is
 * {@link dev.yoke.report.Cautions#PARAGRAPHS}, shared with the batch reports so the two cannot drift apart.
 */
public final class Cautions {

    private Cautions() {
    }

    /** The cautions laid out for a width. */
    public static List<Line> lines(int width) {
        List<Line> out = new java.util.ArrayList<>();
        out.add(Line.of(Tone.HEADING, "Safety cautions"));
        out.add(Line.blank());
        int wrap = Math.max(30, Math.min(width - 2, 96));
        int n = 1;
        for (String p : dev.yoke.report.Cautions.PARAGRAPHS) {
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

    /** Greedy word wrap at spaces: lines of at most {@code width} columns (a longer word stands alone). */
    public static List<String> wrap(String text, int width) {
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
