package dev.yoke.tui;

import java.nio.file.Path;
import java.util.Locale;

/**
 * The file an export writes: a plain file name inside the chosen folder. Names that would leave
 * the folder (separators, "..", absolute paths, drive letters) are refused, and ".csv" is added
 * when missing, so an export can never overwrite a scenario or catalog file by a slip of the keys.
 */
public final class ExportTarget {

    /** The name offered first. */
    public static final String DEFAULT_NAME = "shortlist.csv";

    private ExportTarget() {
    }

    /**
     * Resolves a typed name in a folder.
     *
     * @throws IllegalArgumentException with a message for the user when the name is not a plain file name
     */
    public static Path resolve(Path folder, String typed) {
        String name = typed == null ? "" : typed.strip();
        if (name.isEmpty()) {
            throw new IllegalArgumentException("type a file name, e.g. " + DEFAULT_NAME);
        }
        if (name.contains("/") || name.contains("\\") || name.contains(":") || name.indexOf('\0') >= 0) {
            throw new IllegalArgumentException("a plain file name please, without folders: '" + name + "'");
        }
        if (name.equals(".") || name.equals("..") || name.startsWith(".")) {
            throw new IllegalArgumentException("the name must not start with a dot: '" + name + "'");
        }
        if (!name.toLowerCase(Locale.ROOT).endsWith(".csv")) {
            name = name + ".csv";
        }
        Path base = folder.toAbsolutePath().normalize();
        Path file = base.resolve(name).normalize();
        if (!base.equals(file.getParent())) {
            throw new IllegalArgumentException("'" + typed + "' would leave " + base);
        }
        return file;
    }
}
