package org.morphscout.indexer.library;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.NeighbourStore;
import org.morphscout.indexer.chain.StepCost;
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.vector.VectorIndex;

/**
 * Keeps the stored neighbour graph up to date as images come and go. Each image's candidates come from the HNSW index
 * (appearance and shape fields both, so images with compatible outlines but different surfaces are found too); their
 * step components are computed exactly, ranked by the default step cost, and the best {@code k} are stored. Links are
 * stored one way and read as undirected, which symmetrises the graph.
 */
public final class NeighbourGraphUpdater {
  private final Library library;
  private final VectorIndex index;
  private final AnalysisCache cache;
  private final int k;
  private final StepCostModel ranking = StepCostModel.DEFAULT;

  public NeighbourGraphUpdater(Library library, VectorIndex index, AnalysisCache cache, int k) {
    this.library = library;
    this.index = index;
    this.cache = cache;
    this.k = k;
  }

  /**
   * Recomputes the lists of {@code changed} images, drops {@code removed} ones and recomputes the lists that pointed
   * at them. Call after the vector index was committed.
   *
   * @return number of lists recomputed
   */
  public int update(Collection<Long> changed, Collection<Long> removed, ProgressListener progress,
      CancellationToken cancel) throws IOException {
    Set<Long> todo = new LinkedHashSet<>(changed);
    for (long id : removed) {
      todo.addAll(library.neighbours().removeNode(id));
      todo.remove(id);
    }
    progress.phase("neighbours", todo.size());
    long done = 0;
    List<Long> batch = new ArrayList<>();
    for (long id : todo) {
      cancel.throwIfCancelled();
      batch.add(id);
      if (batch.size() == 256) {
        store(batch);
        batch.clear();
      }
      progress.progressed(++done, "");
    }
    store(batch);
    return todo.size();
  }

  private void store(List<Long> ids) throws IOException {
    Map<Long, List<NeighbourStore.Link>> lists = new LinkedHashMap<>();
    for (long id : ids) {
      Optional<ImageAnalysis> a = cache.get(id);
      if (a.isPresent()) {
        lists.put(id, nearest(a.get()));
      }
    }
    library.catalog().inTransaction(c -> {
      lists.forEach((id, links) -> library.neighbours().replace(id, links));
      return null;
    });
  }

  /** The {@code k} best links of one image. */
  List<NeighbourStore.Link> nearest(ImageAnalysis a) throws IOException {
    Set<Long> candidates = new LinkedHashSet<>();
    Set<Long> self = Set.of(a.id());
    // An image without a silhouette (uniform, fully transparent) has a zero shape vector, which has no direction to
    // search with: its candidates come from appearance alone (and a degenerate zero appearance gives none).
    float[] appearance = VectorSync.nonZeroOrNull(a.appearance());
    if (appearance != null) {
      for (VectorIndex.Hit h : index.search(VectorIndex.Field.APPEARANCE, appearance, 2 * k, self)) {
        candidates.add(h.id());
      }
    }
    float[] shape = VectorSync.nonZeroOrNull(a.shape().shapeVector());
    if (shape != null) {
      for (VectorIndex.Hit h : index.search(VectorIndex.Field.SHAPE, shape, k, self)) {
        candidates.add(h.id());
      }
    }
    List<NeighbourStore.Link> links = new ArrayList<>();
    for (long c : candidates) {
      Optional<ImageAnalysis> b = cache.get(c);
      if (b.isPresent() && b.get().modelId().equals(a.modelId())) {
        StepCost s = StepFeatures.between(a, b.get());
        links.add(new NeighbourStore.Link(a.id(), c, s.appearanceDistance(), s.shapeIncompatibility(), s.colourGap()));
      }
    }
    links.sort(Comparator.comparingDouble(l -> ranking.cost(l.appearance(), l.shape(), l.colour())));
    return links.size() > k ? new ArrayList<>(links.subList(0, k)) : links;
  }
}
