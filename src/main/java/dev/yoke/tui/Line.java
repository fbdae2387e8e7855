package dev.yoke.tui;

import java.util.ArrayList;
import java.util.List;

/** One line of a {@link TextPage}: pieces of text, each with its own {@link Tone}. */
public record Line(List<Span> spans) {

    /** A piece of text in one tone; {@code reverse} draws it in reverse video (highlights that need no colour). */
    public record Span(String text, Tone tone, boolean reverse) {
    }

    public Line {
        spans = List.copyOf(spans);
    }

    /** A line of ordinary text. */
    public static Line of(String text) {
        return of(Tone.NORMAL, text);
    }

    /** A line in one tone. */
    public static Line of(Tone tone, String text) {
        return new Line(List.of(new Span(text, tone, false)));
    }

    /** An empty line. */
    public static Line blank() {
        return new Line(List.of());
    }

    /** The line's text without styles (tests, captures). */
    public String text() {
        StringBuilder s = new StringBuilder();
        for (Span span : spans) {
            s.append(span.text());
        }
        return s.toString();
    }

    /** Builds a line from pieces. */
    public static final class Builder {
        private final List<Span> spans = new ArrayList<>();

        public Builder add(String text) {
            return add(Tone.NORMAL, text);
        }

        public Builder add(Tone tone, String text) {
            spans.add(new Span(text, tone, false));
            return this;
        }

        public Builder addReversed(Tone tone, String text) {
            spans.add(new Span(text, tone, true));
            return this;
        }

        public Line build() {
            return new Line(spans);
        }
    }

    public static Builder builder() {
        return new Builder();
    }
}
