package dev.yoke.catalog;

import java.nio.file.Path;

/**
 * A file the save would rewrite changed on disk after Yoke loaded it (edited in another terminal
 * or by another Yoke). Nothing was written: the user's edit is still in hand, and the UI offers
 *
 * <ul>
 *   <li><b>reload</b>: {@link CatalogStore#reload()} reads the other version, after which the same
 *       save applies the user's edit on top of it (other parts' changes are kept); or</li>
 *   <li><b>keep both</b>: {@link CatalogStore#saveMotorBeside}/{@link CatalogStore#saveSwitchBeside}
 *       leave the changed file alone and write the user's part, under a fresh id so that no id is
 *       defined twice, to a new file beside it ({@code NAME.mine.yaml}, numbered when taken).</li>
 * </ul>
 * The whole user's version of the file is never written beside the original: the catalog folder is
 * loaded as a whole, and every part would then be defined twice.
 */
public final class ChangedOnDiskException extends Exception {

    private final Path file;

    public ChangedOnDiskException(Path file) {
        super(file + " changed on disk since it was loaded; reload it, or keep both versions");
        this.file = file;
    }

    /** The file that changed. */
    public Path file() {
        return file;
    }
}
