package dev.yoke.cli;

import java.nio.file.Path;
import picocli.CommandLine.Option;

/** The {@code --catalog DIR} option every command that reads the parts catalog shares (a picocli mixin). */
final class CatalogOption {

    @Option(names = "--catalog", paramLabel = "DIR", defaultValue = "catalog",
            description = "Catalog folder: every *.yaml file in it (default: ${DEFAULT-VALUE}).")
    Path catalogDir;
}
