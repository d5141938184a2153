package org.morphscout.app.gui.service;

import java.nio.file.Path;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/** Stands in for the indexing service until it lands: says plainly what to do instead. */
public final class PendingIndexing implements IndexingBackend {
  @Override
  public IndexSummary index(Path folder, ProgressListener progress, CancellationToken token) {
    throw new MorphscoutException("indexing from the browser is not available in this build yet; index "
        + folder + " with: morphscout index \"" + folder + "\", then reopen the catalog");
  }
}
