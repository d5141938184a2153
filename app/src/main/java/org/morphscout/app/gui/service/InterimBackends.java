package org.morphscout.app.gui.service;

import java.util.function.Supplier;
import org.morphscout.indexer.library.Library;

/**
 * The backends the browser uses until the library's services land: brute-force search over the stored vectors,
 * interim scoring, a cross-dissolve preview, and no indexing. Each is replaced one by one in {@link #create}.
 */
public final class InterimBackends {
  private InterimBackends() {}

  public static Backends create(Library library) {
    Supplier<StoredVectors> vectors = memoised(() -> StoredVectors.load(library.features()));
    return new Backends(new VectorSimilarity(vectors), new StoredPairs(library, vectors), new GraphChains(vectors),
        new GreedyWalk(vectors), new CrossDissolvePreview(library), new PendingIndexing());
  }

  /** Loads once, on first use (from a worker thread), then returns the same value. */
  static <T> Supplier<T> memoised(Supplier<T> loader) {
    return new Supplier<>() {
      private volatile T value;

      @Override
      public T get() {
        T v = value;
        if (v == null) {
          synchronized (this) {
            v = value;
            if (v == null) {
              v = loader.get();
              value = v;
            }
          }
        }
        return v;
      }
    };
  }
}
