package dev.yoke.catalog;

import java.io.IOException;

/** A file name the user typed would write outside the chosen folder, or is otherwise unusable. */
public final class UnsafePathException extends IOException {

    private final String name;

    public UnsafePathException(String name, String reason) {
        super("cannot use '" + name + "': " + reason);
        this.name = name;
    }

    /** The name as typed. */
    public String name() {
        return name;
    }
}
