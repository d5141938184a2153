package org.morphscout.indexer.library;

import java.util.LinkedHashMap;
import java.util.Map;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.pairing.PairMeasurer;
import org.morphscout.indexer.warp.WarpShape;

/**
 * The silhouettes prepared for warping during one run of pair measuring, by image id: a picture is in 20 to 30
 * stored pairs, and preparing it once instead of once per pair saves that work with the same measures. Bounded
 * (least recently used go first) and thread-safe; made per run, so a picture whose mask changed between runs is
 * never served from an earlier one.
 */
final class WarpShapeCache {
  private final PairMeasurer measurer;
  private final Map<Long, WarpShape> entries;

  /** @param capacity silhouettes kept (about 33 KB each at the 64-pixel grid and 128-pixel masks) */
  WarpShapeCache(PairMeasurer measurer, int capacity) {
    if (capacity < 1) {
      throw new IllegalArgumentException("capacity must be at least 1, got " + capacity);
    }
    this.measurer = measurer;
    this.entries = new LinkedHashMap<>(Math.min(capacity, 1 << 12), 0.75f, true) {
      private static final long serialVersionUID = 1L;

      @Override
      protected boolean removeEldestEntry(Map.Entry<Long, WarpShape> eldest) {
        return size() > capacity;
      }
    };
  }

  /**
   * The prepared silhouette of image {@code id}, whose analysis is {@code analysis}.
   *
   * @throws IllegalArgumentException when the picture has no object
   */
  WarpShape get(long id, ImageAnalysis analysis) {
    synchronized (entries) {
      WarpShape hit = entries.get(id);
      if (hit != null) {
        return hit;
      }
    }
    // Prepared outside the lock: two threads may both prepare one picture, which costs only the time.
    WarpShape made = measurer.shape(analysis);
    synchronized (entries) {
      entries.put(id, made);
    }
    return made;
  }
}
