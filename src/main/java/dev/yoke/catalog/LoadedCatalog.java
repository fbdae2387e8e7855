package dev.yoke.catalog;

import dev.yoke.model.Catalog;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A catalog as loaded from its files, with where each part came from and what looked doubtful.
 *
 * @param catalog        the parts, in file order
 * @param motorOrigins   motor id to its file and line
 * @param switchOrigins  switch id to its file and line
 * @param files          the files read, with digests for change detection
 * @param warnings       plausibility doubts (the parts still load)
 * @param implausibleIds ids of motors and switches that drew a warning, for marking in the grid
 */
public record LoadedCatalog(Catalog catalog, Map<String, Origin> motorOrigins, Map<String, Origin> switchOrigins,
        List<CatalogFile> files, List<Problem> warnings, Set<String> implausibleIds) {

    public LoadedCatalog {
        motorOrigins = Collections.unmodifiableMap(new LinkedHashMap<>(motorOrigins));
        switchOrigins = Collections.unmodifiableMap(new LinkedHashMap<>(switchOrigins));
        files = List.copyOf(files);
        warnings = List.copyOf(warnings);
        implausibleIds = Set.copyOf(implausibleIds);
    }
}
