package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Path;
import java.util.stream.Stream;

/**
 * Reads analyses made outside a catalog from a folder (the cluster job's output). Implementations are found with
 * {@link java.util.ServiceLoader}: the reader ships with the module that writes the format, so the desktop install
 * carries none of its dependencies.
 */
public interface OutsideAnalyses {

  /**
   * What a folder of outside analyses holds, checked before anything is stored.
   *
   * @param images how many files it describes (analysed and failed)
   * @param folder the folder the job read, as it named it
   * @param modelId the appearance model every analysis was made with
   * @param dimension the appearance vector's length
   * @param silhouettes the silhouettes every analysis used, in the catalog's words ({@code classical}, {@code auto},
   *     {@code learned})
   */
  record Summary(long images, String folder, String modelId, int dimension, String silhouettes) {}

  /** One word for the format, used in messages (for example "Parquet"). */
  String format();

  /**
   * Checks every file of the folder (format, columns, one model and one silhouette setup throughout) without storing
   * anything.
   *
   * @throws org.morphscout.indexer.MorphscoutException naming the file and the cause when a file is damaged, foreign,
   *     or the folder mixes setups
   */
  Summary check(Path folder) throws IOException;

  /** Streams the folder's images in path order; the caller closes the stream. */
  Stream<OutsideAnalysis> read(Path folder) throws IOException;
}
