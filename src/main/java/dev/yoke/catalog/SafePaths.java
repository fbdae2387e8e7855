package dev.yoke.catalog;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.LinkOption;
import java.nio.file.Path;

/**
 * Turns a file name the user typed (an export file, a new catalog file) into a path that stays
 * inside the folder the user chose.
 *
 * <p>Refused: empty names, control characters, absolute paths (including {@code C:} and
 * {@code \\server} forms), any {@code ..} component, hidden final names (which could hit Yoke's
 * lock or temporary files), and names that lead out of the folder through a symbolic link, whether
 * the link is a folder on the way or the file itself (a dangling link is refused too). Sub-folders
 * inside the folder are allowed. The check guards against mistakes and hostile file names, not
 * against someone who can swap links in the folder between the check and the write.
 */
public final class SafePaths {

    private SafePaths() {
    }

    /**
     * {@code folder/name}, after checking it stays inside {@code folder}.
     *
     * @throws UnsafePathException naming the rule the name breaks
     * @throws IOException         when {@code folder} does not exist
     */
    public static Path resolveInside(Path folder, String name) throws IOException {
        if (name == null || name.isBlank()) {
            throw new UnsafePathException(String.valueOf(name), "the name is empty");
        }
        if (name.codePoints().anyMatch(c -> c < 0x20 || c == 0x7f)) {
            throw new UnsafePathException(name, "the name holds control characters");
        }
        String slashed = name.replace('\\', '/');
        if (slashed.startsWith("/") || slashed.matches("^[A-Za-z]:.*") || slashed.startsWith("~")) {
            throw new UnsafePathException(name, "give a name inside the folder, not an absolute path");
        }
        for (String part : slashed.split("/")) {
            if (part.equals("..")) {
                throw new UnsafePathException(name, "'..' would leave the folder");
            }
        }
        Path relative;
        try {
            relative = Path.of(slashed);
        } catch (InvalidPathException e) {
            throw new UnsafePathException(name, "not a valid file name here (" + e.getReason() + ")");
        }
        if (relative.isAbsolute() || relative.getRoot() != null) {
            throw new UnsafePathException(name, "give a name inside the folder, not an absolute path");
        }
        Path fileName = relative.normalize().getFileName();
        if (fileName == null || fileName.toString().isEmpty() || fileName.toString().startsWith(".")) {
            throw new UnsafePathException(name, "hidden names are kept for Yoke's own lock and temporary files");
        }
        Path base = folder.toAbsolutePath().normalize();
        Path realBase = base.toRealPath();
        Path target = base.resolve(relative).normalize();
        if (!target.startsWith(base) || target.equals(base)) {
            throw new UnsafePathException(name, "it would leave the folder");
        }
        // Every existing step from the folder down to the target must stay inside the real folder.
        Path step = base;
        for (Path part : base.relativize(target)) {
            step = step.resolve(part);
            if (Files.isSymbolicLink(step)) {
                if (!Files.exists(step)) {
                    throw new UnsafePathException(name, "it is a symbolic link to nothing");
                }
                if (!step.toRealPath().startsWith(realBase)) {
                    throw new UnsafePathException(name, "a symbolic link leads out of the folder");
                }
            } else if (!Files.exists(step, LinkOption.NOFOLLOW_LINKS)) {
                break;
            }
        }
        if (Files.isDirectory(target)) {
            throw new UnsafePathException(name, "it names a folder, not a file");
        }
        return target;
    }
}
