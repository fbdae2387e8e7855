package dev.yoke.catalog;

import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Stream;

/**
 * Loads a parts catalog: every {@code *.yaml} / {@code *.yml} file of a folder, in name order.
 * All problems of all files are collected before giving up, so one run reports them all.
 */
public final class CatalogLoader {

    private CatalogLoader() {
    }

    /**
     * Every YAML file directly inside {@code dir}, sorted by name.
     *
     * @throws InputException when the folder is missing or any file is broken
     */
    public static LoadedCatalog load(Path dir) throws InputException {
        return loadFiles(catalogFiles(dir));
    }

    /** As {@link #load(Path)}, telling {@code listener} about each file as it is read. */
    public static LoadedCatalog load(Path dir, LoadListener listener) throws InputException {
        return loadFiles(catalogFiles(dir), listener);
    }

    /** The catalog files of {@code dir}, sorted by name. */
    public static List<Path> catalogFiles(Path dir) throws InputException {
        if (!Files.isDirectory(dir)) {
            throw new InputException(List.of(Problem.error(dir, 0, 0, "",
                    Files.exists(dir) ? "is not a folder; give the catalog folder" : "no such catalog folder")));
        }
        try (Stream<Path> entries = Files.list(dir)) {
            return entries.filter(p -> {
                String name = p.getFileName().toString().toLowerCase(Locale.ROOT);
                return (name.endsWith(".yaml") || name.endsWith(".yml")) && !name.startsWith(".")
                        && Files.isRegularFile(p);
            }).sorted().toList();
        } catch (IOException e) {
            throw new InputException(List.of(Problem.error(dir, 0, 0, "", "cannot be listed: " + e.getMessage())));
        }
    }

    /**
     * The given files as one catalog. Ids must be unique across all of them.
     *
     * @throws InputException listing every error (and the warnings found alongside)
     */
    public static LoadedCatalog loadFiles(List<Path> paths) throws InputException {
        return loadFiles(paths, LoadListener.NONE);
    }

    /** As {@link #loadFiles(List)}, telling {@code listener} about each file as it is read. */
    public static LoadedCatalog loadFiles(List<Path> paths, LoadListener listener) throws InputException {
        listener.filesFound(paths);
        List<Problem> problems = new ArrayList<>();
        List<Motor> motors = new ArrayList<>();
        List<PowerSwitch> switches = new ArrayList<>();
        Map<String, Origin> motorOrigins = new LinkedHashMap<>();
        Map<String, Origin> switchOrigins = new LinkedHashMap<>();
        List<CatalogFile> files = new ArrayList<>();
        Set<String> implausible = new LinkedHashSet<>();
        // Files are read and checked in parallel (each on its own problem list), then merged in
        // name order, so the result and the order of problems do not depend on the threads.
        List<FileResult> results = paths.size() > 1
                ? paths.parallelStream().map(p -> readFile(p, listener)).toList()
                : paths.stream().map(p -> readFile(p, listener)).toList();
        for (int i = 0; i < paths.size(); i++) {
            Path path = paths.get(i);
            FileResult result = results.get(i);
            problems.addAll(result.problems());
            if (result.identity() == null) {
                continue;
            }
            files.add(result.identity());
            CatalogReader reader = result.reader();
            if (reader == null) {
                continue;
            }
            take(path, reader.motors, Motor::id, "motor", motors, motorOrigins, implausible, problems);
            take(path, reader.switches, PowerSwitch::id, "switch", switches, switchOrigins, implausible, problems);
        }
        if (problems.stream().anyMatch(p -> !p.warning())) {
            throw new InputException(problems);
        }
        return new LoadedCatalog(new Catalog(motors, switches), motorOrigins, switchOrigins, files, problems,
                implausible);
    }

    /** One file read and checked on its own: its stamp (null when unreadable), its parts (null when not YAML), its problems. */
    private record FileResult(CatalogFile identity, CatalogReader reader, List<Problem> problems) {
    }

    private static FileResult readFile(Path path, LoadListener listener) {
        listener.fileStarted(path);
        FileResult result = readFile(path);
        CatalogReader reader = result.reader();
        listener.fileRead(path, reader == null ? 0 : reader.motors.size() + reader.switches.size());
        return result;
    }

    private static FileResult readFile(Path path) {
        List<Problem> problems = new ArrayList<>();
        SourceFile source = SourceFile.read(path, problems);
        if (source == null) {
            return new FileResult(null, null, problems);
        }
        YamlNode root = YamlReader.read(path, source.bytes(), problems);
        if (root == null) {
            return new FileResult(source.identity(), null, problems);
        }
        CatalogReader reader = new CatalogReader(new SectionReader(path, problems));
        reader.read(root);
        return new FileResult(source.identity(), reader, problems);
    }

    /** Adds the parts of one file whose ids are new, noting where each is defined and which are doubtful. */
    private static <T> void take(Path path, List<CatalogReader.Located<T>> found, Function<T, String> idOf,
            String noun, List<T> parts, Map<String, Origin> origins, Set<String> implausible, List<Problem> problems) {
        for (CatalogReader.Located<T> located : found) {
            String id = idOf.apply(located.part());
            if (unique(path, located, id, noun, origins, problems)) {
                parts.add(located.part());
                origins.put(id, new Origin(path, located.line()));
                if (located.implausible()) {
                    implausible.add(id);
                }
            }
        }
    }

    private static boolean unique(Path path, CatalogReader.Located<?> part, String id, String noun,
            Map<String, Origin> seen, List<Problem> problems) {
        Origin first = seen.get(id);
        if (first == null) {
            return true;
        }
        problems.add(Problem.error(path, part.idLine(), part.idColumn(), "id", "duplicate " + noun + " id '" + id
                + "': also defined at " + first));
        return false;
    }
}
