package dev.yoke.catalog;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * A file as it was when read: its digest, size and modification time let a later save notice
 * that someone else changed it meanwhile.
 *
 * @param path         the file
 * @param sha256       hex SHA-256 of the exact bytes that were parsed
 * @param size         bytes
 * @param lastModified modification time read just before the bytes
 */
public record CatalogFile(Path path, String sha256, long size, FileTime lastModified) {

    /** Hex SHA-256 of {@code bytes} (FIPS 180-4); the one digest every stamp and export uses. */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    /**
     * The bytes of {@code file} now, provided they are exactly the ones this stamp was taken of.
     *
     * @throws ChangedOnDiskException the file is gone or its bytes differ (size or digest)
     */
    byte[] readUnchanged(Path file) throws IOException, ChangedOnDiskException {
        byte[] now;
        try {
            now = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new ChangedOnDiskException(file); // deleted since the load
        }
        if (now.length != size || !sha256(now).equalsIgnoreCase(sha256)) {
            throw new ChangedOnDiskException(file);
        }
        return now;
    }
}
