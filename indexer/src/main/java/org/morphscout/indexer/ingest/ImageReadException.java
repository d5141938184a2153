package org.morphscout.indexer.ingest;

import java.nio.file.Path;
import java.util.Objects;
import org.morphscout.indexer.MorphscoutException;

/**
 * One file could not be decoded. The message names the file and the cause; {@link #reason()} is the cause alone
 * (for example {@code "truncated JPEG data"}) so the catalog can store it beside the path, and {@link #failure()}
 * is its stable code.
 */
public final class ImageReadException extends MorphscoutException {
  private static final long serialVersionUID = 1L;

  private final transient Path path;
  private final ReadFailure failure;
  private final String reason;

  public ImageReadException(Path path, ReadFailure failure, String reason) {
    this(path, failure, reason, null);
  }

  public ImageReadException(Path path, ReadFailure failure, String reason, Throwable cause) {
    super("Cannot read image " + path + ": " + reason, cause);
    this.path = Objects.requireNonNull(path, "path");
    this.failure = Objects.requireNonNull(failure, "failure");
    this.reason = Objects.requireNonNull(reason, "reason");
  }

  /** The file that failed. */
  public Path path() {
    return path;
  }

  /** The stable code of the cause. */
  public ReadFailure failure() {
    return failure;
  }

  /** The cause as a short phrase without the path, e.g. {@code "empty file (0 bytes)"}. */
  public String reason() {
    return reason;
  }
}
