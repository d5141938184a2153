package org.morphscout.indexer.vector;

import java.io.Closeable;
import java.io.IOException;
import java.util.List;
import java.util.Set;

/**
 * Approximate nearest-neighbour search over the two per-image vectors. Ids are catalog image ids. Writers are
 * serialised by the implementation; searches may run concurrently with writes and see the last committed state.
 */
public interface VectorIndex extends Closeable {

  /** Which vector to search. */
  enum Field {
    APPEARANCE,
    SHAPE
  }

  /** One result: a catalog image id and its similarity to the query (cosine, in [-1, 1], higher is closer). */
  record Hit(long id, float similarity) {}

  /** Adds or replaces the vectors of one image (either may be null to leave that field out). */
  void upsert(long id, float[] appearance, float[] shape) throws IOException;

  void delete(long id) throws IOException;

  /** Makes all changes so far durable and visible to searches. */
  void commit() throws IOException;

  /** The {@code k} nearest images to {@code query} on {@code field}, closest first, without {@code exclude}. */
  List<Hit> search(Field field, float[] query, int k, Set<Long> exclude) throws IOException;

  /** All image ids in the index (committed state). */
  Set<Long> ids() throws IOException;

  /** Removes everything. */
  void clear() throws IOException;
}
