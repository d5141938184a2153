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
  private final long declaredPixels;

  public ImageReadException(Path path, ReadFailure failure, String reason) {
    this(path, failure, reason, null);
  }

  public ImageReadException(Path path, ReadFailure failure, String reason, Throwable cause) {
    this(path, failure, reason, 0, cause);
  }

  /** @param declaredPixels the pixel count the file declares, for {@link ReadFailure#TOO_LARGE}; 0 when unknown */
  public ImageReadException(Path path, ReadFailure failure, String reason, long declaredPixels, Throwable cause) {
    super("Cannot read image " + path + ": " + reason, cause);
    this.path = Objects.requireNonNull(path, "path");
    this.failure = Objects.requireNonNull(failure, "failure");
    this.reason = Objects.requireNonNull(reason, "reason");
    this.declaredPixels = declaredPixels;
  }

  /** The file that failed. */
  public Path path() {
    return path;
  }

  /** The stable code of the cause. */
  public ReadFailure failure() {
    return failure;
  }

  /** The pixel count the file declares when it was refused as too large; 0 otherwise. */
  public long declaredPixels() {
    return declaredPixels;
  }

  /** The cause as a short phrase without the path, e.g. {@code "empty file (0 bytes)"}. */
  public String reason() {
    return reason;
  }
}
