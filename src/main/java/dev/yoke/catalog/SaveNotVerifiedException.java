package dev.yoke.catalog;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Collection;
import java.util.List;

/**
 * A save was written but did not load back as intended, so the previous files were put back:
 * nothing changed on disk. Says what differed; this points at a bug, not at the user.
 */
public final class SaveNotVerifiedException extends IOException {

    private final List<String> differences;

    public SaveNotVerifiedException(Collection<Path> files, List<String> differences) {
        super("the save of " + files + " did not load back as written, so the previous version was put back: "
                + String.join("; ", differences));
        this.differences = List.copyOf(differences);
    }

    /** What differed after reloading. */
    public List<String> differences() {
        return differences;
    }
}
