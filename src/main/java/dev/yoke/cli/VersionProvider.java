package dev.yoke.cli;

import picocli.CommandLine;

/** Reads the version from the jar manifest (or "dev" when run from classes). */
public final class VersionProvider implements CommandLine.IVersionProvider {

    /** The running Yoke version. */
    public static String version() {
        String v = VersionProvider.class.getPackage().getImplementationVersion();
        return v == null ? "dev" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"yoke " + version()};
    }
}
