package dev.yoke.catalog;

import dev.yoke.model.Scenario;
import java.util.List;

/**
 * A scenario as loaded from its file.
 *
 * @param scenario the machine: bench and profile
 * @param file     the file read, with its digest for change detection
 * @param warnings plausibility doubts (the scenario still loads)
 */
public record LoadedScenario(Scenario scenario, CatalogFile file, List<Problem> warnings) {

    public LoadedScenario {
        warnings = List.copyOf(warnings);
    }
}
