package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.PriorityQueue;
import java.util.function.Supplier;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.catalog.FeatureStore;
import org.morphscout.indexer.progress.CancellationToken;

/** Exact nearest-neighbour search by brute force over the stored vectors (interim until the HNSW service lands). */
public final class VectorSimilarity implements SimilarityBackend {
  private final Supplier<StoredVectors> vectors;

  public VectorSimilarity(Supplier<StoredVectors> vectors) {
    this.vectors = vectors;
  }

  @Override
  public List<Match> similar(long id, SimilarityMode mode, int limit, CancellationToken token) {
    StoredVectors all = vectors.get();
    FeatureStore.Vectors query = all.get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has not been analysed yet, so it has no " + mode.label() + " to compare"));
    float[] q = mode == SimilarityMode.SHAPE ? query.shape() : query.appearance();
    // max-heap on distance keeps the `limit` nearest seen so far
    PriorityQueue<Match> best = new PriorityQueue<>(Comparator.comparingDouble(Match::distance).reversed());
    int n = 0;
    for (FeatureStore.Vectors v : all.all()) {
      if (v.imageId() == id) {
        continue;
      }
      if ((++n & 1023) == 0) {
        token.throwIfCancelled();
      }
      double d = StoredVectors.cosineDistance(q, mode == SimilarityMode.SHAPE ? v.shape() : v.appearance());
      best.add(new Match(v.imageId(), d));
      if (best.size() > limit) {
        best.poll();
      }
    }
    List<Match> result = new ArrayList<>(best);
    result.sort(Comparator.comparingDouble(Match::distance).thenComparingLong(Match::id));
    return result;
  }
}
