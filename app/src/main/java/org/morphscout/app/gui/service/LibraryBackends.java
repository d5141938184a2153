package org.morphscout.app.gui.service;

import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.ChainService;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.PreviewService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.WalkService;
import org.morphscout.indexer.pairing.ScoreConfig;

/**
 * The browser's backends: the library's own services (similarity through the vector index, pairs, chains,
 * walks, preview morphs, indexing) with the command line's defaults, so the browser and the command line give
 * the same answers for the same catalog. A catalog without a vector folder is searched exactly over its stored
 * vectors ({@link QueryContext#index()}).
 */
public final class LibraryBackends {
  private LibraryBackends() {}

  public static Backends create(Library library) {
    // the setup `index` uses without options (auto silhouettes), so a folder added here is analysed as there
    AnalysisSetup setup = AnalysisSetup.indexDefaults();
    QueryContext context = new QueryContext(library, setup);
    IndexingBackend indexing = new ServiceIndexing(library, setup, IndexOptions.defaults());
    PairService pairs = new PairService(context, ScoreConfig.DEFAULTS);
    return new Backends(new ServiceSimilarity(context), new ServicePairs(context, pairs),
        new ServiceChains(context, new ChainService(context, pairs)), new ServiceWalk(context, new WalkService(context)),
        new ServicePreview(context, new PreviewService(context)), indexing, context);
  }
}
