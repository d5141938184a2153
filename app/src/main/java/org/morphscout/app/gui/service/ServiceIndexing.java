package org.morphscout.app.gui.service;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.IndexReport;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * Indexing through the library's {@link LibraryIndexer}, with the default analysis (built-in descriptor, default
 * silhouettes) and default options, as {@code morphscout index <folder>} without options does.
 */
public final class ServiceIndexing implements IndexingBackend {
  private final Library library;
  private final AnalysisSetup setup;
  private final IndexOptions options;

  public ServiceIndexing(Library library, AnalysisSetup setup, IndexOptions options) {
    this.library = library;
    this.setup = setup;
    this.options = options;
  }

  @Override
  public IndexSummary index(Path folder, ProgressListener progress, CancellationToken token) throws IOException {
    IndexReport r = new LibraryIndexer(library, setup, options).index(List.of(folder), progress, token);
    token.throwIfCancelled();
    int ready = r.indexed() + r.unchanged() + r.moved();
    return new IndexSummary(ready + r.failed(), ready, r.failed());
  }
}
