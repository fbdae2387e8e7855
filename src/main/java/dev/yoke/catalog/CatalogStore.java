package dev.yoke.catalog;

import dev.yoke.catalog.CatalogText.FieldValue;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;

/**
 * A catalog folder opened for editing: what the parts editors read and save through.
 *
 * <p>Every change is a text edit of the file that holds the part ({@link CatalogText}), so the
 * user's comments, blank lines, key order and number spelling survive. Each save:
 * <ol>
 *   <li>takes the folder's lock ({@link CatalogLock}), so two Yoke processes never interleave;</li>
 *   <li>checks that each file it will rewrite is byte-for-byte what was loaded (SHA-256); if not,
 *       throws {@link ChangedOnDiskException} and writes nothing;</li>
 *   <li>writes each file with {@link AtomicFile} (the previous version kept as {@code NAME.bak});</li>
 *   <li>reloads the whole folder and checks that the saved part loads back equal and that the other
 *       parts of the written files did not change; otherwise puts the previous files back and
 *       reports ({@link SaveNotVerifiedException}, or the loader's {@link InputException}).</li>
 * </ol>
 * A part moved to another file is first added to the new file, then removed from the old one: if
 * Yoke dies between the two writes the part is defined twice (the loader says where), never lost.
 *
 * <p>Methods are synchronized: one store may be shared by the UI thread and a background saver.
 */
public final class CatalogStore {

    private static final Duration LOCK_PATIENCE = Duration.ofSeconds(5);

    private final Path folder;
    private LoadedCatalog loaded;

    private CatalogStore(Path folder, LoadedCatalog loaded) {
        this.folder = folder;
        this.loaded = loaded;
    }

    /**
     * Loads the catalog in {@code folder}.
     *
     * @throws InputException when a file cannot be used (every problem, located)
     * @throws IOException    when the folder cannot be read
     */
    public static CatalogStore open(Path folder) throws IOException, InputException {
        Path absolute = folder.toAbsolutePath().normalize();
        return new CatalogStore(absolute, CatalogLoader.load(absolute));
    }

    /** The catalog folder (absolute). */
    public Path folder() {
        return folder;
    }

    /** The parts as last loaded or saved. */
    public synchronized Catalog catalog() {
        return loaded.catalog();
    }

    /** Everything the last load found: parts, where each is defined, file stamps, warnings. */
    public synchronized LoadedCatalog loaded() {
        return loaded;
    }

    /**
     * Reads the folder again, taking in changes made by others (the "reload" answer to a
     * {@link ChangedOnDiskException}); an edit in hand can then be saved again on top of them.
     */
    public synchronized void reload() throws IOException, InputException {
        loaded = CatalogLoader.load(folder);
    }

    /** The catalog files as last loaded, in load (name) order. */
    public synchronized List<Path> files() {
        return loaded.files().stream().map(f -> absolute(f.path())).toList();
    }

    /** The file that defines the motor or switch {@code id}. */
    public synchronized Optional<Path> fileOf(String id) {
        return fileOfMotor(id).or(() -> fileOfSwitch(id));
    }

    /** The file that defines motor {@code id}. */
    public synchronized Optional<Path> fileOfMotor(String id) {
        return Optional.ofNullable(loaded.motorOrigins().get(id)).map(Origin::file);
    }

    /** The file that defines switch {@code id}. */
    public synchronized Optional<Path> fileOfSwitch(String id) {
        return Optional.ofNullable(loaded.switchOrigins().get(id)).map(Origin::file);
    }

    /**
     * An id not yet used by any motor or switch: {@code wanted} itself, else {@code wanted-2},
     * {@code wanted-3}, …
     */
    public synchronized String freeId(String wanted) {
        return freeId(loaded, wanted);
    }

    /** A copy of motor {@code id} under a free id ({@code ID-copy}), ready to edit and save as new. */
    public synchronized Motor copyOfMotor(String id) throws IOException {
        Motor original = find(loaded.catalog().motors(), Motor::id, id)
                .orElseThrow(() -> new IOException("no motor with id '" + id + "'"));
        return PartText.MOTOR.withIdAndLabel(original, freeId(id + "-copy"), copyLabel(original.label()));
    }

    /** A copy of switch {@code id} under a free id ({@code ID-copy}), ready to edit and save as new. */
    public synchronized PowerSwitch copyOfSwitch(String id) throws IOException {
        PowerSwitch original = find(loaded.catalog().switches(), PowerSwitch::id, id)
                .orElseThrow(() -> new IOException("no switch with id '" + id + "'"));
        return PartText.SWITCH.withIdAndLabel(original, freeId(id + "-copy"), copyLabel(original.label()));
    }

    /**
     * Saves a motor: an edit of motor {@code originalIdOrNull} (its id may change), or a new motor
     * when that is null. {@code targetFile} is the file to hold it: null keeps an edited part where
     * it is; another file moves it there; a file that does not exist yet is created in the folder.
     *
     * @throws ChangedOnDiskException a file to rewrite changed since it was loaded; nothing written
     * @throws InputException         the saved catalog would not load; the previous files are back
     * @throws IOException            the id is taken, the part is missing, the lock is busy
     *                                ({@link CatalogBusyException}), the save did not verify
     *                                ({@link SaveNotVerifiedException}) or the disk failed
     */
    public synchronized void saveMotor(Motor edited, String originalIdOrNull, Path targetFile)
            throws IOException, InputException, ChangedOnDiskException {
        save(PartText.MOTOR, edited, originalIdOrNull, targetFile);
    }

    /** Saves a switch; see {@link #saveMotor}. */
    public synchronized void saveSwitch(PowerSwitch edited, String originalIdOrNull, Path targetFile)
            throws IOException, InputException, ChangedOnDiskException {
        save(PartText.SWITCH, edited, originalIdOrNull, targetFile);
    }

    /** Removes motor {@code id} from its file; see {@link #saveMotor} for the exceptions. */
    public synchronized void deleteMotor(String id) throws IOException, InputException, ChangedOnDiskException {
        delete(PartText.MOTOR, id);
    }

    /** Removes switch {@code id} from its file; see {@link #saveMotor} for the exceptions. */
    public synchronized void deleteSwitch(String id) throws IOException, InputException, ChangedOnDiskException {
        delete(PartText.SWITCH, id);
    }

    /**
     * The "keep both" answer to a {@link ChangedOnDiskException}: the changed file is left as the
     * other writer made it, and {@code edited} is written to a new file beside it,
     * {@code STEM.mine.yaml} (or {@code STEM.mine-2.yaml}, …), under a free id ({@code ID-mine}) so
     * that the folder still loads. The new file's header says what happened; the user merges by hand.
     *
     * @param besideFile the file that changed (names the new file); null for {@code parts}
     * @return where the part went and its id there
     */
    public synchronized Saved saveMotorBeside(Motor edited, Path besideFile)
            throws IOException, InputException {
        return saveBeside(PartText.MOTOR, edited, besideFile);
    }

    /** The "keep both" answer for a switch; see {@link #saveMotorBeside}. */
    public synchronized Saved saveSwitchBeside(PowerSwitch edited, Path besideFile)
            throws IOException, InputException {
        return saveBeside(PartText.SWITCH, edited, besideFile);
    }

    /** Where a part kept beside a changed file went. */
    public record Saved(Path file, String id) {
    }

    private <T> void save(PartText<T> kind, T edited, String originalId, Path targetFile)
            throws IOException, InputException, ChangedOnDiskException {
        Objects.requireNonNull(edited, "edited");
        String newId = kind.id(edited);
        Map<String, Origin> origins = kind.origins(loaded);
        Path source = null;
        if (originalId != null) {
            Origin origin = origins.get(originalId);
            if (origin == null) {
                throw new IOException("no " + kind.kind().noun() + " with id '" + originalId + "' to save over");
            }
            source = absolute(origin.file());
        }
        if (!newId.equals(originalId)) {
            Origin taken = idOwner(loaded, newId);
            if (taken != null) {
                throw new IOException("id '" + newId + "' is already used at " + taken);
            }
        }
        Path target = targetFile == null ? source : catalogFile(targetFile);
        if (target == null) {
            throw new IOException("a new " + kind.kind().noun() + " needs a file to go in");
        }
        Map<Path, String> writes = new LinkedHashMap<>();
        try (CatalogLock lock = CatalogLock.acquire(folder, LOCK_PATIENCE)) {
            if (target.equals(source)) {
                CatalogText text = CatalogText.parse(checkedText(target));
                T before = find(kind.parts(loaded), kind::id, originalId).orElseThrow();
                List<FieldValue> changes = kind.changedFields(before, edited, text.keysOf(kind.listKey(), originalId));
                if (changes.isEmpty()) {
                    return;
                }
                writes.put(target, text.withFields(kind.listKey(), originalId, changes, kind.keyOrder()));
            } else {
                String targetText = Files.exists(target) ? checkedText(target) : newFileText(kind, "");
                writes.put(target, CatalogText.parse(targetText).withItemAppended(kind.listKey(), kind.allFields(edited)));
                if (source != null) {
                    writes.put(source, CatalogText.parse(checkedText(source)).withoutItem(kind.listKey(), originalId));
                }
            }
            commit(kind, writes, List.of(Objects.requireNonNullElse(originalId, newId), newId),
                    (parts, problems) -> {
                        T saved = parts.get(newId);
                        if (saved == null) {
                            problems.add(kind.kind().noun() + " '" + newId + "' is missing after the save");
                        } else if (!saved.equals(edited)) {
                            problems.add(kind.kind().noun() + " '" + newId + "' loads back as " + saved
                                    + " instead of " + edited);
                        }
                        if (originalId != null && !originalId.equals(newId) && parts.containsKey(originalId)) {
                            problems.add("the old id '" + originalId + "' is still there");
                        }
                    });
        }
    }

    private <T> void delete(PartText<T> kind, String id) throws IOException, InputException, ChangedOnDiskException {
        Origin origin = kind.origins(loaded).get(id);
        if (origin == null) {
            throw new IOException("no " + kind.kind().noun() + " with id '" + id + "' to delete");
        }
        Path file = absolute(origin.file());
        try (CatalogLock lock = CatalogLock.acquire(folder, LOCK_PATIENCE)) {
            String text = checkedText(file);
            Map<Path, String> writes = Map.of(file, CatalogText.parse(text).withoutItem(kind.listKey(), id));
            commit(kind, writes, List.of(id), (parts, problems) -> {
                if (parts.containsKey(id)) {
                    problems.add(kind.kind().noun() + " '" + id + "' is still there after deleting it");
                }
            });
        }
    }

    private <T> Saved saveBeside(PartText<T> kind, T edited, Path besideFile) throws IOException, InputException {
        try (CatalogLock lock = CatalogLock.acquire(folder, LOCK_PATIENCE)) {
            LoadedCatalog current = CatalogLoader.load(folder);
            String id = freeId(current, kind.id(edited) + "-mine");
            T renamed = kind.withIdAndLabel(edited, id, null);
            String stem = besideFile == null ? "parts" : stem(besideFile.getFileName().toString());
            Path file = folder.resolve(stem + ".mine.yaml");
            for (int n = 2; Files.exists(file); n++) {
                file = folder.resolve(stem + ".mine-" + n + ".yaml");
            }
            String header = "# Kept by Yoke on " + Instant.now().truncatedTo(ChronoUnit.SECONDS) + ": "
                    + (besideFile == null ? "the catalog" : besideFile.getFileName())
                    + " changed on disk while\n# " + kind.kind().noun() + " '" + kind.id(edited)
                    + "' was being edited, so the edit was saved here as '" + id + "'.\n"
                    + "# Compare both versions, keep the one you want, and delete this file.\n";
            String text = CatalogText.parse(newFileText(kind, header))
                    .withItemAppended(kind.listKey(), kind.allFields(renamed));
            loaded = current;
            commit(kind, Map.of(file, text), List.of(id), (parts, problems) -> {
                if (!renamed.equals(parts.get(id))) {
                    problems.add(kind.kind().noun() + " '" + id + "' does not load back as written");
                }
            });
            return new Saved(file, id);
        }
    }

    /**
     * Writes every file, reloads, and checks: the parts named in {@code touched} pass
     * {@code verify}, and every other part of the written files is unchanged. On any failure the
     * written files are put back as they were.
     */
    private <T> void commit(PartText<T> kind, Map<Path, String> writes, List<String> touched,
            Verifier<T> verifier) throws IOException, InputException {
        Map<String, T> untouchedBefore = partsIn(kind, loaded, writes.keySet());
        touched.forEach(untouchedBefore::remove);
        List<Path> written = new ArrayList<>();
        List<Boolean> existed = new ArrayList<>();
        try {
            for (Map.Entry<Path, String> write : writes.entrySet()) {
                existed.add(Files.exists(write.getKey()));
                AtomicFile.write(write.getKey(), write.getValue().getBytes(StandardCharsets.UTF_8));
                written.add(write.getKey());
            }
            LoadedCatalog reloaded = CatalogLoader.load(folder);
            Map<String, T> all = new LinkedHashMap<>();
            for (T part : kind.parts(reloaded)) {
                all.put(kind.id(part), part);
            }
            List<String> problems = new ArrayList<>();
            verifier.check(all, problems);
            Map<String, T> untouchedAfter = partsIn(kind, reloaded, writes.keySet());
            touched.forEach(untouchedAfter::remove);
            if (!untouchedAfter.equals(untouchedBefore)) {
                problems.add("other " + kind.listKey() + " in " + writes.keySet() + " changed");
            }
            if (!problems.isEmpty()) {
                throw new SaveNotVerifiedException(writes.keySet(), problems);
            }
            loaded = reloaded;
        } catch (IOException | InputException | RuntimeException e) {
            undo(written, existed, e);
            throw e;
        }
    }

    /** Checks the reloaded parts of one kind, adding a line per difference found. */
    private interface Verifier<T> {
        void check(Map<String, T> parts, List<String> problems);
    }

    private static void undo(List<Path> written, List<Boolean> existed, Exception cause) {
        for (int i = written.size() - 1; i >= 0; i--) {
            try {
                if (existed.get(i)) {
                    AtomicFile.restoreBackup(written.get(i));
                } else {
                    Files.deleteIfExists(written.get(i));
                }
            } catch (IOException restoreFailure) {
                cause.addSuppressed(restoreFailure);
            }
        }
    }

    private <T> Map<String, T> partsIn(PartText<T> kind, LoadedCatalog catalog, java.util.Set<Path> files) {
        Map<String, T> parts = new LinkedHashMap<>();
        Map<String, Origin> origins = kind.origins(catalog);
        for (T part : kind.parts(catalog)) {
            Origin origin = origins.get(kind.id(part));
            if (origin != null && files.contains(absolute(origin.file()))) {
                parts.put(kind.id(part), part);
            }
        }
        return parts;
    }

    /** The file's text, after checking it is byte-for-byte the version that was loaded. */
    private String checkedText(Path file) throws IOException, ChangedOnDiskException {
        CatalogFile stamp = stampOf(file);
        if (stamp == null) {
            throw new ChangedOnDiskException(file); // appeared since the load
        }
        return SourceFile.textOf(stamp.readUnchanged(file));
    }

    private CatalogFile stampOf(Path file) {
        for (CatalogFile stamp : loaded.files()) {
            if (absolute(stamp.path()).equals(file)) {
                return stamp;
            }
        }
        return null;
    }

    /** A target file given by the editor: a {@code .yaml} file directly in the catalog folder. */
    private Path catalogFile(Path targetFile) throws IOException {
        Path file = targetFile.isAbsolute() ? targetFile.normalize() : folder.resolve(targetFile).normalize();
        Path inside = SafePaths.resolveInside(folder, folder.relativize(file).toString());
        if (!folder.equals(inside.getParent())) {
            throw new UnsafePathException(targetFile.toString(), "catalog files live directly in " + folder);
        }
        String name = inside.getFileName().toString();
        if (!name.endsWith(".yaml") && !name.endsWith(".yml")) {
            throw new UnsafePathException(name, "catalog files end in .yaml");
        }
        return inside;
    }

    private Path absolute(Path file) {
        return (file.isAbsolute() ? file : folder.resolve(file)).toAbsolutePath().normalize();
    }

    private static String newFileText(PartText<?> kind, String header) {
        String intro = header.isEmpty()
                ? "# Parts catalog written by Yoke. Numbers carry their units; see the file format notes.\n"
                : header;
        return intro + kind.listKey() + ": []\n";
    }

    private static String stem(String name) {
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    private static String copyLabel(String label) {
        return label == null || label.isEmpty() ? "copy" : label + " (copy)";
    }

    private static String freeId(LoadedCatalog catalog, String wanted) {
        String id = wanted;
        for (int n = 2; idOwner(catalog, id) != null; n++) {
            id = wanted + "-" + n;
        }
        return id;
    }

    private static Origin idOwner(LoadedCatalog catalog, String id) {
        Origin motor = catalog.motorOrigins().get(id);
        return motor != null ? motor : catalog.switchOrigins().get(id);
    }

    private static <T> Optional<T> find(List<T> parts, Function<T, String> id, String wanted) {
        return parts.stream().filter(p -> id.apply(p).equals(wanted)).findFirst();
    }
}
