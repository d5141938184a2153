package org.morphscout.indexer.library;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;

/**
 * A bounded, thread-safe cache of stored analyses by image id, so graph building and pair discovery do not parse the
 * same features again and again. Least recently used entries go first.
 */
public final class AnalysisCache {
  private final Library library;
  private final Map<Long, ImageAnalysis> entries;

  public AnalysisCache(Library library, int capacity) {
    this.library = library;
    this.entries = new LinkedHashMap<>(Math.min(capacity, 1 << 16), 0.75f, true) {
      private static final long serialVersionUID = 1L;

      @Override
      protected boolean removeEldestEntry(Map.Entry<Long, ImageAnalysis> eldest) {
        return size() > capacity;
      }
    };
  }

  /** The stored analysis of a ready image; empty when the image is not ready or has no features. */
  public Optional<ImageAnalysis> get(long id) {
    synchronized (entries) {
      ImageAnalysis hit = entries.get(id);
      if (hit != null) {
        return Optional.of(hit);
      }
    }
    Optional<ImageRow> row = library.images().byId(id);
    if (row.isEmpty() || row.get().status() != ImageStatus.READY) {
      return Optional.empty();
    }
    Optional<ImageAnalysis> loaded = library.features().load(row.get());
    loaded.ifPresent(a -> {
      synchronized (entries) {
        entries.put(id, a);
      }
    });
    return loaded;
  }

  /** Forgets one image (after it changed). */
  public void invalidate(long id) {
    synchronized (entries) {
      entries.remove(id);
    }
  }
}
