package org.morphscout.app.gui.common;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * A least-recently-used map holding at most {@code capacity} entries; the eldest is dropped on overflow. Thread-safe
 * (every method synchronised): thumbnails are put by loader threads and read by the UI thread.
 */
public final class LruCache<K, V> {
  private final int capacity;
  private final LinkedHashMap<K, V> map;

  public LruCache(int capacity) {
    if (capacity < 1) {
      throw new IllegalArgumentException("capacity must be >= 1, got " + capacity);
    }
    this.capacity = capacity;
    this.map = new LinkedHashMap<>(16, 0.75f, true) {
      private static final long serialVersionUID = 1L;

      @Override
      protected boolean removeEldestEntry(Map.Entry<K, V> eldest) {
        return size() > LruCache.this.capacity;
      }
    };
  }

  public synchronized Optional<V> get(K key) {
    return Optional.ofNullable(map.get(key));
  }

  public synchronized void put(K key, V value) {
    map.put(key, value);
  }

  public synchronized int size() {
    return map.size();
  }

  public synchronized void clear() {
    map.clear();
  }

  public int capacity() {
    return capacity;
  }
}
