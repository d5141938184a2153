package org.morphscout.app.gui.service;

import java.nio.file.Files;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.QueryContext;

/**
 * The browser's backends: the library's own services where they exist (similarity through the vector index,
 * indexing, pair scoring, chains on the stored neighbour graph), the interim implementations for the rest
 * (walkthrough, preview) until their services land.
 * A catalog without a vector index yet falls back to exact search over the stored vectors.
 */
public final class LibraryBackends {
  /** Worker threads for pair scoring: leave one core to the window. */
  static final int THREADS = Math.max(1, Runtime.getRuntime().availableProcessors() - 1);

  private LibraryBackends() {}

  public static Backends create(Library library) {
    Backends interim = InterimBackends.create(library);
    QueryContext context = new QueryContext(library, AnalysisSetup.defaults());
    boolean indexed = Files.isDirectory(library.catalog().vectorDir());
    SimilarityBackend similarity = indexed ? new ServiceSimilarity(context) : interim.similarity();
    PairsBackend pairs = indexed ? new ServicePairs(context, THREADS) : interim.pairs();
    ChainsBackend chains = indexed ? new ServiceChains(context, interim.chains()) : interim.chains();
    return new Backends(similarity, pairs, chains, interim.walk(), interim.preview(),
        new ServiceIndexing(library, AnalysisSetup.defaults(), IndexOptions.defaults()), context);
  }
}
