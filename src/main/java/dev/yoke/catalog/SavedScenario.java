package dev.yoke.catalog;

import dev.yoke.model.Scenario;
import java.util.Objects;
import java.util.Optional;

/**
 * What a scenario save did: the file as loaded back, and whether its text was edited in place
 * (comments kept) or its body written anew, which drops the comments below its top comment block;
 * the previous file, comments and all, is then only in the backup ({@code NAME.bak}).
 *
 * @param loaded          the file as loaded back after the save
 * @param rewrittenBecause why the body was written anew (for example "profile.segments is written
 *                        in flow style [...]"), or empty when the file was edited in place or
 *                        created (nothing of the user's was dropped)
 */
public record SavedScenario(LoadedScenario loaded, String rewrittenBecause) {

    public SavedScenario {
        Objects.requireNonNull(loaded, "loaded");
        Objects.requireNonNull(rewrittenBecause, "rewrittenBecause");
    }

    /** The scenario as loaded back. */
    public Scenario scenario() {
        return loaded.scenario();
    }

    /** The file as written, with its digest for change detection. */
    public CatalogFile file() {
        return loaded.file();
    }

    /** Why the file's body was written anew, comments in it dropped; empty when it was edited in place. */
    public Optional<String> bodyRewritten() {
        return rewrittenBecause.isEmpty() ? Optional.empty() : Optional.of(rewrittenBecause);
    }
}
