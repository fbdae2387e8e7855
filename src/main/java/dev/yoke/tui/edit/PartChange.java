package dev.yoke.tui.edit;

import java.nio.file.Path;
import java.util.Objects;

/** One change the parts editor asks the catalog store to write. */
public sealed interface PartChange {

    /** The file the change is written to. */
    Path file();

    /**
     * Adds a part, or replaces one.
     *
     * @param part       the new record ({@code Motor} or {@code PowerSwitch})
     * @param replacedId id of the part it replaces (the old id when the id was edited); null for a new part
     * @param file       the file holding the replaced part, or the file the user picked for a new one
     */
    record Put(Object part, String replacedId, Path file) implements PartChange {
        public Put {
            Objects.requireNonNull(part, "part");
            Objects.requireNonNull(file, "file");
        }
    }

    /**
     * Deletes a part.
     *
     * @param part the record deleted
     * @param id   its id
     * @param file the file holding it
     */
    record Remove(Object part, String id, Path file) implements PartChange {
        public Remove {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(file, "file");
        }
    }
}
