package org.morphscout.indexer.ingest;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Something the scan could not look at; the scan carries on past it.
 *
 * @param path the file or folder concerned
 * @param reason short phrase, e.g. {@code "permission denied"}, {@code "vanished during the scan"},
 *     {@code "symbolic link loop"}
 */
public record ScanProblem(Path path, String reason) {
  public ScanProblem {
    Objects.requireNonNull(path, "path");
    Objects.requireNonNull(reason, "reason");
  }
}
