package dev.yoke.catalog;

import java.nio.file.Path;
import java.nio.file.attribute.FileTime;

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
}
