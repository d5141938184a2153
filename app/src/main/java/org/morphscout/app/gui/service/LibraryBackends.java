package org.morphscout.app.gui.service;

import java.nio.file.Files;
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
 * walkthroughs, preview morphs, indexing), with the command line's defaults. Until a catalog has a vector index
 * (nothing indexed yet, or a catalog written by other means) the interim implementations serve from the stored
 * vectors instead.
 */
public final class LibraryBackends {
  private LibraryBackends() {}

  public static Backends create(Library library) {
    Backends interim = InterimBackends.create(library);
    QueryContext context = new QueryContext(library, AnalysisSetup.defaults());
    IndexingBackend indexing = new ServiceIndexing(library, AnalysisSetup.defaults(), IndexOptions.defaults());
    if (!Files.isDirectory(library.catalog().vectorDir())) {
      return new Backends(interim.similarity(), interim.pairs(), interim.chains(), interim.walk(), interim.preview(),
          indexing, context);
    }
    PairService pairs = new PairService(context, ScoreConfig.DEFAULTS);
    return new Backends(new ServiceSimilarity(context), new ServicePairs(context, pairs),
        new ServiceChains(context, new ChainService(context, pairs)), new ServiceWalk(context, new WalkService(context)),
        new ServicePreview(context, new PreviewService(context)), indexing, context);
  }
}
