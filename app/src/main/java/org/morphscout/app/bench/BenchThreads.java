package org.morphscout.app.bench;

import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;

/** Named daemon threads for benchmark pools ("morphscout-bench-N"). */
final class BenchThreads {
  private static final AtomicInteger COUNT = new AtomicInteger();

  private BenchThreads() {}

  static ThreadFactory factory() {
    return r -> {
      Thread t = new Thread(r, "morphscout-bench-" + COUNT.incrementAndGet());
      t.setDaemon(true);
      return t;
    };
  }
}
