package dev.yoke.catalog;

import java.io.IOException;
import java.nio.file.Path;

/** Another Yoke is saving to the same catalog folder right now; try again in a moment. */
public final class CatalogBusyException extends IOException {

    private final Path folder;

    public CatalogBusyException(Path folder) {
        super("another Yoke is saving to " + folder + " (lock " + CatalogLock.FILE_NAME + "); try again");
        this.folder = folder;
    }

    /** The catalog folder whose lock is taken. */
    public Path folder() {
        return folder;
    }
}
