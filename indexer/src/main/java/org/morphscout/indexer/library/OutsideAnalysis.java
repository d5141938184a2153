package org.morphscout.indexer.library;

import java.util.Objects;
import org.morphscout.indexer.analysis.ImageAnalysis;

/**
 * One file analysed outside the catalog (for example by the cluster job), as read back for {@link AnalysisImporter}:
 * the file's identity and either its analysis (with its thumbnail) or why it failed.
 *
 * @param path the file's path (absolute local path, or a URI such as {@code hdfs://...} for files the importing
 *     machine cannot open)
 * @param size the file's size in bytes
 * @param mtimeMs the file's modification time, milliseconds since the epoch
 * @param contentHash hex SHA-256 of the file's bytes
 * @param orientation the EXIF orientation applied (1..8), 0 for a failed file
 * @param analysis the analysis (its id is ignored), or null when the file failed
 * @param thumbnail the encoded thumbnail, or null (failed file, or none made)
 * @param thumbnailExtension {@code jpg} or {@code png}; empty when there is no thumbnail
 * @param failure why the file failed, or null when it was analysed
 */
public record OutsideAnalysis(String path, long size, long mtimeMs, String contentHash, int orientation,
    ImageAnalysis analysis, byte[] thumbnail, String thumbnailExtension, FailureKind.Failure failure) {

  public OutsideAnalysis {
    Objects.requireNonNull(path, "path");
    Objects.requireNonNull(contentHash, "contentHash");
    if ((analysis == null) == (failure == null)) {
      throw new IllegalArgumentException("an outside analysis holds either an analysis or a failure: " + path);
    }
    if (thumbnail != null && !thumbnailExtension.equals("jpg") && !thumbnailExtension.equals("png")) {
      throw new IllegalArgumentException("thumbnail extension must be jpg or png, got " + thumbnailExtension);
    }
    thumbnailExtension = thumbnailExtension == null ? "" : thumbnailExtension;
  }

  /**
   * How the catalog names a file or folder the job named: a {@code file:} URI or a plain path becomes the absolute,
   * normalised local path {@code index} would store; a URI of another file system ({@code hdfs://...}) stays as it is.
   */
  public static String catalogName(String pathOrUri) {
    if (pathOrUri.startsWith("file:")) {
      return java.nio.file.Path.of(java.net.URI.create(pathOrUri)).toAbsolutePath().normalize().toString();
    }
    return pathOrUri.contains("://") ? pathOrUri
        : java.nio.file.Path.of(pathOrUri).toAbsolutePath().normalize().toString();
  }

  /** Whether the file was analysed (else it failed). */
  public boolean analysed() {
    return analysis != null;
  }
}
