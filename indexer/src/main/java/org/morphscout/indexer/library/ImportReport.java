package org.morphscout.indexer.library;

import java.time.Duration;
import java.util.List;

/**
 * What an import did.
 *
 * @param added images new to the catalog
 * @param replaced paths that now hold another picture (re-analysed content; decisions stay with the old picture)
 * @param moved pictures found at a new path (same content, old file gone): they keep their identity and decisions
 * @param unchanged images the catalog already held with the same content and setup
 * @param failures files the job could not analyse, with the job's reasons
 * @param cancelled whether the import was cancelled (finished batches are kept)
 * @param modelId the appearance model of the imported analyses
 * @param elapsed wall time
 */
public record ImportReport(int added, int replaced, int moved, int unchanged, List<IndexReport.FileFailure> failures,
    boolean cancelled, String modelId, Duration elapsed) {

  public ImportReport {
    failures = List.copyOf(failures);
  }
}
