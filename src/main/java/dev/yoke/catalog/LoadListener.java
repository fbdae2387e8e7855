package dev.yoke.catalog;

import java.nio.file.Path;
import java.util.List;

/**
 * Hears how far a load has got, so a screen can show it while a large catalog is read. The
 * catalog's files are read in parallel, so the calls may come from several threads at once.
 * Every method does nothing by default.
 */
public interface LoadListener {

    /** Hears nothing. */
    LoadListener NONE = new LoadListener() {
    };

    /** The files about to be read, in name order (called once, before any of them is read). */
    default void filesFound(List<Path> files) {
    }

    /** A file is being read now. */
    default void fileStarted(Path file) {
    }

    /** A file has been read and checked; {@code parts} motors and switches were found in it. */
    default void fileRead(Path file, int parts) {
    }
}
