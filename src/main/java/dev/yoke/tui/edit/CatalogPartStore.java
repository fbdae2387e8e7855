package dev.yoke.tui.edit;

import dev.yoke.catalog.CatalogStore;
import dev.yoke.catalog.ChangedOnDiskException;
import dev.yoke.catalog.InputException;
import dev.yoke.catalog.Problem;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * The parts editor's store on a catalog folder: every write is the catalog package's text edit
 * of the one part (comments, key order and the other parts' text kept), atomic, with a backup,
 * checked for changes on disk and verified by loading the folder again.
 */
public final class CatalogPartStore implements PartStore {

    private final CatalogStore store;

    public CatalogPartStore(CatalogStore store) {
        this.store = store;
    }

    /**
     * Opens the catalog folder for editing.
     *
     * @throws IOException when it cannot be read or does not load (the message lists every problem)
     */
    public static CatalogPartStore open(Path folder) throws IOException {
        try {
            return new CatalogPartStore(CatalogStore.open(folder));
        } catch (InputException e) {
            throw new IOException(describe(e), e);
        }
    }

    @Override
    public Catalog catalog() {
        return store.catalog();
    }

    @Override
    public List<Path> files() {
        return store.files();
    }

    @Override
    public Optional<Path> fileOf(String id) {
        return store.fileOf(id);
    }

    @Override
    public Set<String> doubtfulIds() {
        return store.loaded().implausibleIds();
    }

    @Override
    public void apply(PartChange change) throws IOException, ChangedOnDiskException {
        try {
            if (change instanceof PartChange.Put put) {
                if (put.part() instanceof Motor m) {
                    store.saveMotor(m, put.replacedId(), put.file());
                } else {
                    store.saveSwitch((PowerSwitch) put.part(), put.replacedId(), put.file());
                }
            } else {
                PartChange.Remove remove = (PartChange.Remove) change;
                if (remove.part() instanceof Motor) {
                    store.deleteMotor(remove.id());
                } else {
                    store.deleteSwitch(remove.id());
                }
            }
        } catch (InputException e) {
            throw new IOException(describe(e), e);
        }
    }

    @Override
    public Kept applyBeside(PartChange change) throws IOException {
        if (!(change instanceof PartChange.Put put)) {
            throw new IOException("a deletion cannot be kept beside the changed file; reload and delete again");
        }
        try {
            CatalogStore.Saved saved = put.part() instanceof Motor m
                    ? store.saveMotorBeside(m, put.file())
                    : store.saveSwitchBeside((PowerSwitch) put.part(), put.file());
            return new Kept(saved.file(), saved.id());
        } catch (InputException e) {
            throw new IOException(describe(e), e);
        }
    }

    @Override
    public void reload() throws IOException {
        try {
            store.reload();
        } catch (InputException e) {
            throw new IOException(describe(e), e);
        }
    }

    /** Every error of a load as one line: {@code file:line:column: field: message; …}. */
    static String describe(InputException e) {
        return e.errors().stream().map(Problem::toString).collect(Collectors.joining("; "));
    }
}
