package org.morphscout.indexer.library;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.vector.VectorIndex;
import org.morphscout.indexer.vector.VectorMath;

/** Finds the catalog images nearest to a query image by appearance, by silhouette shape, or both. */
public final class SimilarityService {
  /** Most candidates asked of the index per field when many are not ready. */
  private static final int MAX_FETCH = 4096;

  private final QueryContext context;

  public SimilarityService(QueryContext context) {
    this.context = context;
  }

  /** What "similar" means. */
  public enum By {
    /** The appearance vector (texture, layout, colour). */
    APPEARANCE,
    /** The normalised silhouette (outline compatibility, whatever the surface). */
    SHAPE,
    /** The mean of both distances. */
    BOTH
  }

  /**
   * One result.
   *
   * @param distance 1 - cosine similarity of the chosen vectors (for BOTH, the mean of the two), in [0, 2]; lower is
   *     closer
   */
  public record Hit(long id, String path, double distance) {}

  /** The {@code k} nearest catalog images, nearest first, the query itself (or a file with its bytes) left out. */
  public List<Hit> similar(ImageAnalysis query, int k, By by) throws IOException {
    // A zero vector (no silhouette: a uniform or fully transparent picture) has no direction to search with.
    float[] appearanceQuery = VectorSync.nonZeroOrNull(query.appearance());
    float[] shapeQuery = VectorSync.nonZeroOrNull(query.shape().shapeVector());
    if (by == By.SHAPE && shapeQuery == null) {
      throw new MorphscoutException(query.path() + " has no silhouette (a uniform or fully transparent picture), so "
          + "there is no shape to compare: search by appearance instead");
    }
    VectorIndex index = context.index();
    Set<Long> exclude = new HashSet<>();
    context.sameContent(query).ifPresent(exclude::add);
    // Candidates that are not ready (being analysed again by a running indexer) are dropped; ask for more until k
    // remain or the index has no more to give.
    int fetch = by == By.BOTH ? Math.max(3 * k, 30) : k;
    while (true) {
      Set<Long> candidates = new LinkedHashSet<>();
      boolean exhausted = true;
      if (by != By.SHAPE && appearanceQuery != null) {
        List<VectorIndex.Hit> found = index.search(VectorIndex.Field.APPEARANCE, appearanceQuery, fetch, exclude);
        found.forEach(h -> candidates.add(h.id()));
        exhausted &= found.size() < fetch;
      }
      if (by != By.APPEARANCE && shapeQuery != null) {
        List<VectorIndex.Hit> found = index.search(VectorIndex.Field.SHAPE, shapeQuery, fetch, exclude);
        found.forEach(h -> candidates.add(h.id()));
        exhausted &= found.size() < fetch;
      }
      List<Hit> hits = score(query, candidates, by);
      if (hits.size() >= k || exhausted || fetch >= MAX_FETCH) {
        return hits.size() > k ? List.copyOf(hits.subList(0, k)) : hits;
      }
      fetch = Math.min(MAX_FETCH, fetch * 4);
    }
  }

  private List<Hit> score(ImageAnalysis query, Set<Long> candidates, By by) {
    List<Hit> hits = new ArrayList<>();
    for (long id : candidates) {
      Optional<ImageAnalysis> a = context.cache().get(id);
      if (a.isEmpty()) {
        continue;
      }
      double app = 1 - VectorMath.dot(query.appearance(), a.get().appearance());
      double shape = 1 - VectorMath.dot(query.shape().shapeVector(), a.get().shape().shapeVector());
      double d = switch (by) {
        case APPEARANCE -> app;
        case SHAPE -> shape;
        case BOTH -> (app + shape) / 2;
      };
      hits.add(new Hit(id, a.get().path(), Math.max(0, d)));
    }
    hits.sort(Comparator.comparingDouble(Hit::distance).thenComparingLong(Hit::id));
    return hits;
  }
}
