package dev.yoke.tui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The screen shown while the catalog and scenario are read: every file with its size and how far
 * it has got, the parts found so far, the share of bytes read and the time taken. Long lists of
 * files shrink to the ones being read and a count of the others.
 */
final class LoadingReport {

    /** More files than this are summarized rather than listed one a line. */
    static final int LISTED_FILES = 12;

    private LoadingReport() {
    }

    static List<Line> lines(BackgroundLoad<?> load, TerminalTraits traits, int width) {
        List<BackgroundLoad.FileStatus> files = load.files();
        List<Line> out = new ArrayList<>();
        out.add(Line.blank());
        out.add(Line.of(Tone.HEADING, "  Reading the parts catalog and the scenario"));
        out.add(Line.blank());
        int nameWidth = 12;
        for (BackgroundLoad.FileStatus f : files) {
            nameWidth = Math.max(nameWidth, Math.min(40, name(f).length()));
        }
        int read = 0;
        int waiting = 0;
        for (BackgroundLoad.FileStatus f : files) {
            if (f.stage() == BackgroundLoad.Stage.READ) {
                read++;
            } else if (f.stage() == BackgroundLoad.Stage.WAITING) {
                waiting++;
            }
        }
        boolean summarize = files.size() > LISTED_FILES;
        for (BackgroundLoad.FileStatus f : files) {
            if (summarize && f.stage() != BackgroundLoad.Stage.READING) {
                continue;
            }
            String size = f.bytes() < 0 ? "" : Cells.engineering(f.bytes(), "B");
            Line.Builder line = Line.builder()
                    .add("    " + KeyMap.pad(Painter.clip(name(f), nameWidth), nameWidth) + "  " + pad(size, 9) + "  ");
            switch (f.stage()) {
                case WAITING -> line.add(Tone.DIM, "waiting");
                case READING -> line.add(Tone.HEADING, "reading");
                case READ -> line.add(Tone.GOOD, f.parts() > 0
                        ? String.format(Locale.ROOT, "read, %,d parts", f.parts()) : "read");
                default -> { }
            }
            out.add(line.build());
        }
        if (summarize) {
            out.add(Line.of(Tone.DIM, String.format(Locale.ROOT, "    %d files read, %d waiting", read, waiting)));
        }
        if (files.isEmpty()) {
            out.add(Line.of(Tone.DIM, "    looking for the files"));
        }
        out.add(Line.blank());
        double fraction = load.fraction();
        String bar = Double.isNaN(fraction) ? ""
                : DetailReport.bar(fraction, Math.max(5, Math.min(30, width - 60)), traits.glyphs())
                        + String.format(Locale.ROOT, " %3.0f%%  ", 100 * fraction);
        out.add(Line.of(String.format(Locale.ROOT, "  %s%,d parts so far, %d of %d files, %.1f s",
                bar, load.partsRead(), read, files.size(), load.seconds())));
        out.add(Line.blank());
        out.add(Line.of(Tone.DIM, "  The shortlist opens and starts ranking as soon as both are read."));
        return out;
    }

    private static String name(BackgroundLoad.FileStatus f) {
        return f.file().getFileName() == null ? f.file().toString() : f.file().getFileName().toString();
    }

    private static String pad(String s, int width) {
        return s.length() >= width ? s : " ".repeat(width - s.length()) + s;
    }
}
