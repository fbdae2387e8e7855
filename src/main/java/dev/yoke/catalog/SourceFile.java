package dev.yoke.catalog;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

/** The bytes of a user's file and its identity (digest, size, time), or a problem saying why not. */
record SourceFile(byte[] bytes, CatalogFile identity) {

    /** The byte-order mark as a character: U+FEFF, EF BB BF in UTF-8 (RFC 3629, section 6). */
    private static final char BYTE_ORDER_MARK = '\uFEFF';

    /**
     * {@code bytes} decoded as UTF-8, without the byte-order mark some editors put first: it marks
     * the encoding and is not part of the text, so edits and saves drop it.
     */
    static String textOf(byte[] bytes) {
        String text = new String(bytes, StandardCharsets.UTF_8);
        return !text.isEmpty() && text.charAt(0) == BYTE_ORDER_MARK ? text.substring(1) : text;
    }

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
