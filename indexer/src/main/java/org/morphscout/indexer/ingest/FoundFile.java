package org.morphscout.indexer.ingest;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Objects;

/**
 * An image file found by {@link LibraryScanner}.
 *
 * @param path the path as reached from the root (through links, when links are followed)
 * @param size size in bytes at scan time
 * @param mtime last modification time at scan time
 */
public record FoundFile(Path path, long size, Instant mtime) {
  public FoundFile {
    Objects.requireNonNull(path, "path");
    Objects.requireNonNull(mtime, "mtime");
    if (size < 0) {
      throw new IllegalArgumentException("size must be >= 0, got " + size);
    }
  }
}
