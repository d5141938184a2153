package org.morphscout.app.gui.common;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class LruCacheTest {
  @Test
  void dropsTheLeastRecentlyUsed() {
    LruCache<Integer, String> c = new LruCache<>(2);
    c.put(1, "a");
    c.put(2, "b");
    assertThat(c.get(1)).contains("a"); // 1 is now the most recent
    c.put(3, "c");
    assertThat(c.get(2)).isEmpty();
    assertThat(c.get(1)).contains("a");
    assertThat(c.get(3)).contains("c");
    assertThat(c.size()).isEqualTo(2);
  }

  @Test
  void staysBoundedUnderManyInserts() {
    LruCache<Integer, Integer> c = new LruCache<>(100);
    for (int i = 0; i < 100_000; i++) {
      c.put(i, i);
    }
    assertThat(c.size()).isEqualTo(100);
    assertThat(c.get(99_999)).contains(99_999);
    assertThat(c.get(0)).isEmpty();
  }
}
