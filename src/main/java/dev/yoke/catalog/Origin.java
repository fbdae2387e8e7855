package dev.yoke.catalog;

import java.nio.file.Path;

/** Where a part was defined: its file and the line of its entry, for messages and editors. */
public record Origin(Path file, int line) {

    @Override
    public String toString() {
        return file + ":" + line;
    }
}
