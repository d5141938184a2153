package org.morphscout.indexer.library;

import java.io.IOException;
import java.util.HashSet;
import java.util.Set;
import org.morphscout.indexer.catalog.FeatureStore;
import org.morphscout.indexer.vector.VectorIndex;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Makes the vector index agree with the catalog: the catalog is the source of truth (it stores every vector), so
 * images missing from the index are added from it and ids the catalog does not hold as ready are deleted. Needed after
 * a crash between a catalog commit and an index commit, and after {@code --rebuild-vectors}.
 */
public final class VectorSync {
  private static final Logger LOG = LoggerFactory.getLogger(VectorSync.class);

  private VectorSync() {}

  /**
   * @param rebuild clear the index first and add everything again
   * @param invalid receives ready images whose stored vectors are unusable (not finite); the caller analyses them again
   * @return the number of images whose vectors were (re)added
   */
  public static int sync(FeatureStore features, VectorIndex index, String modelId, boolean rebuild,
      java.util.List<Long> invalid) throws IOException {
    if (rebuild) {
      index.clear();
    }
    Set<Long> inIndex = rebuild ? Set.of() : index.ids();
    Set<Long> wanted = new HashSet<>(features.readyIds(modelId));
    int added = 0;
    for (long id : wanted) {
      if (inIndex.contains(id)) {
        continue;
      }
      FeatureStore.Vectors v = features.vectorsOf(id).orElse(null);
      if (v == null || !finite(v.appearance()) || !finite(v.shape())) {
        invalid.add(id);
        continue;
      }
      index.upsert(id, v.appearance(), nonZeroOrNull(v.shape()));
      added++;
    }
    int removed = 0;
    for (long id : inIndex) {
      if (!wanted.contains(id)) {
        index.delete(id);
        removed++;
      }
    }
    if (added > 0 || removed > 0 || rebuild) {
      index.commit();
      LOG.info("vector index brought in line with the catalog: {} added, {} removed", added, removed);
    }
    return added;
  }

  public static boolean finite(float[] v) {
    for (float x : v) {
      if (!Float.isFinite(x)) {
        return false;
      }
    }
    return true;
  }

  /** An image without a silhouette has a zero shape vector, which has no direction: it stays out of that field. */
  static float[] nonZeroOrNull(float[] v) {
    for (float x : v) {
      if (x != 0) {
        return v;
      }
    }
    return null;
  }
}
