package org.morphscout.indexer.library;

import java.time.Duration;
import java.util.List;

/**
 * What an indexing run did.
 *
 * @param indexed images analysed in this run (new or changed)
 * @param unchanged images skipped because they had not changed
 * @param moved images found at a new path (matched by content hash); they keep their identity and decisions
 * @param replaced paths that now hold a different picture than before (edited or swapped files); decisions stay with
 *     the old picture, so the new one starts with none
 * @param missing images no longer found (kept, marked missing)
 * @param failures files that could not be read or analysed, and problems met while scanning
 * @param vectorsRestored images whose vectors were restored into the vector index from the catalog
 * @param cancelled whether the run was cancelled before the end (finished work is kept)
 * @param modelId the appearance model in use
 */
public record IndexReport(
    int indexed,
    int unchanged,
    int moved,
    int replaced,
    int missing,
    List<FileFailure> failures,
    int vectorsRestored,
    boolean cancelled,
    String modelId,
    Duration elapsed) {

  /** One failure: the absolute path and the plain-language cause. */
  public record FileFailure(String path, String reason) {}

  public int failed() {
    return failures.size();
  }
}
