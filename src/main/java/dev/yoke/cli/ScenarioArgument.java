package dev.yoke.cli;

import java.nio.file.Path;
import picocli.CommandLine.Parameters;

/** The required SCENARIO argument of the batch commands that evaluate one scenario (a picocli mixin). */
final class ScenarioArgument {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Scenario file (bench and duty profile).")
    Path scenarioFile;
}
