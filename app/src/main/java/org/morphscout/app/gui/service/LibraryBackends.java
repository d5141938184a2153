package org.morphscout.app.gui.service;

import java.nio.file.Files;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.QueryContext;

/**
 * The browser's backends: the library's own services where they exist (similarity through the vector index,
 * indexing), the interim implementations for the rest (pairs, chains, walkthrough, preview) until their services land.
 * A catalog without a vector index yet falls back to exact search over the stored vectors.
 */
public final class LibraryBackends {
  private LibraryBackends() {}

  public static Backends create(Library library) {
    Backends interim = InterimBackends.create(library);
    QueryContext context = new QueryContext(library, AnalysisSetup.defaults());
    SimilarityBackend similarity = Files.isDirectory(library.catalog().vectorDir())
        ? new ServiceSimilarity(context) : interim.similarity();
    return new Backends(similarity, interim.pairs(), interim.chains(), interim.walk(), interim.preview(),
        new ServiceIndexing(library, AnalysisSetup.defaults(), IndexOptions.defaults()), context);
  }
}
