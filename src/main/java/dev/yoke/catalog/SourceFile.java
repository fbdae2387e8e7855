package dev.yoke.catalog;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

/** The bytes of a user's file and its identity (digest, size, time), or a problem saying why not. */
record SourceFile(byte[] bytes, CatalogFile identity) {

    /** Reads {@code path}; on failure records a problem and returns null. Huge files are refused unread. */
    static SourceFile read(Path path, List<Problem> problems) {
        try {
            if (Files.isDirectory(path)) {
                problems.add(Problem.error(path, 0, 0, "", "is a folder, expected a YAML file"));
                return null;
            }
            long size = Files.size(path);
            if (size > YamlReader.MAX_FILE_BYTES) {
                problems.add(Problem.error(path, 0, 0, "", YamlReader.tooLarge(size)));
                return null;
            }
            FileTime modified = Files.getLastModifiedTime(path);
            byte[] bytes = Files.readAllBytes(path);
            if (bytes.length > YamlReader.MAX_FILE_BYTES) { // grew while we looked
                problems.add(Problem.error(path, 0, 0, "", YamlReader.tooLarge(bytes.length)));
                return null;
            }
            return new SourceFile(bytes, new CatalogFile(path, CatalogFile.sha256(bytes), bytes.length, modified));
        } catch (NoSuchFileException e) {
            problems.add(Problem.error(path, 0, 0, "", "no such file"));
        } catch (IOException | SecurityException e) {
            problems.add(Problem.error(path, 0, 0, "", "cannot be read: " + e.getMessage()));
        }
        return null;
    }
}
