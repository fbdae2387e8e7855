package dev.yoke.tui.edit;

import dev.yoke.catalog.ChangedOnDiskException;
import dev.yoke.model.Catalog;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * The catalog files as the parts editor sees them: what they hold, and the writes it asks for.
 * Writes are atomic and keep a backup of the previous file; text outside the changed part is
 * the store's to keep.
 */
public interface PartStore {

    /** The parts as last loaded or saved. */
    Catalog catalog();

    /** The catalog files, in load order; new parts go to the first by default. */
    List<Path> files();

    /** The file holding the part with that id. */
    Optional<Path> fileOf(String id);

    /**
     * Writes one change.
     *
     * @throws ChangedOnDiskException when the file was changed by someone else since it was loaded;
     *                                nothing was written
     * @throws IOException            when the file cannot be written; it is then unchanged
     */
    void apply(PartChange change) throws IOException, ChangedOnDiskException;

    /**
     * Keeps both versions after a {@link ChangedOnDiskException}: the file on disk stays as it is,
     * and the edited version is written beside it.
     *
     * @return where the edited version went
     * @throws IOException when it cannot be written, or the change is a deletion (nothing to keep)
     */
    Kept applyBeside(PartChange change) throws IOException;

    /** Ids of parts the catalog's plausibility check doubts (marked in the shortlist). */
    default Set<String> doubtfulIds() {
        return Set.of();
    }

    /**
     * Where a part kept beside a changed file went.
     *
     * @param file the new file
     * @param id   the part's id there (changed when the old one is taken)
     */
    record Kept(Path file, String id) {
    }

    /** Reads every file again from disk, forgetting what was loaded before. */
    void reload() throws IOException;
}
