package org.morphscout.indexer.library;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/**
 * The last steps of every run that adds analyses to a catalog (indexing files, importing analyses made elsewhere):
 * the vector index is merged when it has become split ({@link SegmentMerge}), then the neighbour graph and the
 * stored pairs are brought up to date for what changed.
 */
final class GraphAndPairs {
  private GraphAndPairs() {}

  /**
   * Merges the vector index when worth it, links {@code analysed} images (and ready images that have no neighbour
   * list: returned files, an interrupted earlier run) into the neighbour graph, unlinks {@code removed}, then lets
   * the store of pairs catch up.
   *
   * @return false when cancelled (finished steps are kept)
   */
  static boolean update(Library library, LuceneVectorIndex index, String modelId, List<Long> analysed,
      List<Long> removed, IndexOptions options, ProgressListener progress, CancellationToken cancel)
      throws java.io.IOException {
    AnalysisCache cache = new AnalysisCache(library, 10_000); // about 20 KB an image: at most ~200 MB
    Set<Long> linked = library.neighbours().idsWithLinks();
    List<Long> changed = new ArrayList<>(analysed);
    Set<Long> analysedIds = new HashSet<>(analysed); // a set: this loop runs over the whole library
    for (long id : library.features().readyIds(modelId)) {
      if (!linked.contains(id) && !analysedIds.contains(id)) {
        changed.add(id);
      }
    }
    try {
      SegmentMerge.mergeIfWorthIt(index, progress, cancel);
      new NeighbourGraphUpdater(library, index, cache, options.neighbours()).update(changed, removed, progress, cancel);
      new PairStoreUpdater(library, index, cache, options.threads()).update(modelId, progress, cancel);
      return true;
    } catch (CancellationToken.CancelledException e) {
      return false;
    }
  }
}
