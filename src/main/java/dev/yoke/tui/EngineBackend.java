package dev.yoke.tui;

import dev.yoke.catalog.CatalogFile;
import dev.yoke.engine.DriveEvaluator;
import dev.yoke.engine.RowFilter;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.SortKey;
import dev.yoke.engine.Sweep;
import dev.yoke.engine.SweepOptions;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import dev.yoke.report.Meta;
import dev.yoke.report.ShortlistCsvWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The real backend: the drive evaluator swept on every core, and the shortlist CSV writer with a
 * sidecar naming the input files (path, SHA-256, size, time) so an export can be reproduced.
 */
public final class EngineBackend implements WorkbenchBackend {

    private final String version;
    private final Path scenarioFile;
    private final List<Path> catalogFiles;

    /**
     * @param version      the running Yoke version, for the export sidecar
     * @param scenarioFile the scenario file, or null when the scenario was made in memory
     * @param catalogFiles the catalog files read
     */
    public EngineBackend(String version, Path scenarioFile, List<Path> catalogFiles) {
        this.version = version;
        this.scenarioFile = scenarioFile;
        this.catalogFiles = List.copyOf(catalogFiles);
    }

    /**
     * Most rows the workbench keeps when a sweep is larger (a catalog of thousands of parts gives
     * hundreds of millions of pairings): the best 200,000 by the default order, which with the
     * sweep's per-thread buffers stays well inside a 512 MB heap (a kept million did not: measured
     * out of memory at -Xmx512m). Smaller sweeps are kept whole.
     */
    static final int GRID_ROW_LIMIT = 200_000;

    @Override
    public Shortlist rank(Scenario scenario, Catalog catalog, RankProgress progress) {
        SweepOptions options = SweepOptions.DEFAULT.withProgress(progress::report).withCancel(progress::isCancelled);
        long pairings = (long) catalog.motors().size() * catalog.switches().size()
                * scenario.bench().pwmFrequencies().size() * scenario.bench().gearRatios().size();
        if (pairings > GRID_ROW_LIMIT) {
            options = options.withTop(GRID_ROW_LIMIT, SortKey.DEFAULT, RowFilter.ALL);
        }
        return Sweep.run(DriveEvaluator.of(scenario, catalog), options);
    }

    @Override
    public void writeCsv(Path file, Shortlist shortlist, int[] order, ViewSettings view) throws IOException {
        Map<String, String> options = new LinkedHashMap<>();
        options.put("sort", view.describeSort());
        options.put("filter", view.describeFilters().isEmpty() ? "none" : view.describeFilters());
        List<Meta.SourceFile> catalogs = new java.util.ArrayList<>();
        for (Path p : catalogFiles) {
            catalogs.add(sourceFile(p));
        }
        Meta meta = new Meta(version, Instant.now(), scenarioFile == null ? null : sourceFile(scenarioFile), catalogs,
                List.of(), options);
        ShortlistCsvWriter.write(shortlist, order, file, meta);
    }

    /** A file as it is now: path as given, SHA-256 of its bytes, size and modification time. */
    static Meta.SourceFile sourceFile(Path path) throws IOException {
        byte[] bytes = Files.readAllBytes(path);
        return new Meta.SourceFile(path.toString(), CatalogFile.sha256(bytes), bytes.length,
                Files.getLastModifiedTime(path).toInstant());
    }
}
