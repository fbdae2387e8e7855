package dev.yoke.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What an export needs to be reproduced: the scenario and catalog files with their SHA-256, the
 * Yoke version, the time and the options of the command or view that produced it. Written as a
 * sidecar {@code NAME.meta.json} beside each CSV export.
 *
 * @param yokeVersion  the running version
 * @param created      when the export was made (UTC)
 * @param scenario     the scenario file (null when the scenario was built in memory)
 * @param catalogFiles every catalog file read
 * @param command      the command line arguments (empty when exported from the terminal UI)
 * @param options      the view or command options in words: sort, filter, top, …
 */
public record Meta(String yokeVersion, Instant created, SourceFile scenario, List<SourceFile> catalogFiles,
                   List<String> command, Map<String, String> options) {

    /**
     * One input file as it was when read.
     *
     * @param path         as given (relative paths stay relative to where Yoke ran)
     * @param sha256       hex digest of the bytes read
     * @param size         bytes
     * @param lastModified modification time
     */
    public record SourceFile(String path, String sha256, long size, Instant lastModified) {
    }

    public Meta {
        catalogFiles = List.copyOf(catalogFiles);
        command = List.copyOf(command);
        options = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(options));
    }

    /**
     * A record of the files as the loaders read them, made now.
     *
     * @param yokeVersion  {@code dev.yoke.cli.VersionProvider.version()}
     * @param scenario     the scenario file as read, or null
     * @param catalogFiles the catalog files as read
     */
    public static Meta of(String yokeVersion, dev.yoke.catalog.CatalogFile scenario,
                          List<dev.yoke.catalog.CatalogFile> catalogFiles, List<String> command, Map<String, String> options) {
        List<SourceFile> files = new java.util.ArrayList<>();
        for (dev.yoke.catalog.CatalogFile f : catalogFiles) {
            files.add(source(f));
        }
        return new Meta(yokeVersion, Instant.now(), scenario == null ? null : source(scenario), files, command, options);
    }

    private static SourceFile source(dev.yoke.catalog.CatalogFile f) {
        return new SourceFile(f.path().toString(), f.sha256(), f.size(),
                f.lastModified() == null ? null : f.lastModified().toInstant());
    }

    /** A view's sort order and filter in words, for {@link #options()}. */
    public static Map<String, String> viewOptions(List<dev.yoke.engine.SortKey> order, dev.yoke.engine.RowFilter filter) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("sort", order.stream().map(dev.yoke.engine.SortKey::toString).collect(java.util.stream.Collectors.joining(",")));
        m.put("feasible_only", Boolean.toString(filter.feasibleOnly()));
        m.put("pareto_only", Boolean.toString(filter.paretoOnly()));
        m.put("max_cost", filter.maxCost() == Double.POSITIVE_INFINITY ? "" : Double.toString(filter.maxCost()));
        m.put("match", filter.text());
        StringBuilder least = new StringBuilder();
        filter.atLeast().entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> {
            if (least.length() > 0) {
                least.append(',');
            }
            least.append(e.getKey().key()).append(">=").append(e.getValue());
        });
        m.put("at_least", least.toString());
        return m;
    }

    /** The sidecar path of an export: {@code short.csv} gives {@code short.meta.json}. */
    public static java.nio.file.Path sidecarOf(java.nio.file.Path export) {
        String name = export.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        return export.resolveSibling(base + ".meta.json");
    }

    /** The sidecar as JSON, with the export's own row count and digest. */
    byte[] toJson(String exportName, long rows, String exportSha256) {
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = mapper.createObjectNode();
        root.put("export", exportName);
        root.put("rows", rows);
        root.put("export_sha256", exportSha256);
        root.put("yoke_version", yokeVersion);
        root.put("created", created.toString());
        if (scenario != null) {
            root.set("scenario", file(mapper, scenario));
        } else {
            root.putNull("scenario");
        }
        ArrayNode files = root.putArray("catalog_files");
        for (SourceFile f : catalogFiles) {
            files.add(file(mapper, f));
        }
        ArrayNode cmd = root.putArray("command");
        command.forEach(cmd::add);
        ObjectNode opts = root.putObject("options");
        options.forEach(opts::put);
        try {
            return mapper.writeValueAsBytes(root);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static ObjectNode file(ObjectMapper mapper, SourceFile f) {
        ObjectNode n = mapper.createObjectNode();
        n.put("path", f.path());
        n.put("sha256", f.sha256());
        n.put("size", f.size());
        n.put("last_modified", f.lastModified() == null ? null : f.lastModified().toString());
        return n;
    }
}
