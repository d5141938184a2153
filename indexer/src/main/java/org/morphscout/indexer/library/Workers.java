package org.morphscout.indexer.library;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import org.morphscout.indexer.progress.CancellationToken;

/** Named worker pools, and waiting for their results the way the library reports failures. */
final class Workers {
  private static final AtomicInteger POOLS = new AtomicInteger();

  private Workers() {}

  /** A fixed pool of daemon threads named {@code morphscout-<name>-<pool>-<n>}. */
  static ExecutorService pool(String name, int threads) {
    int pool = POOLS.incrementAndGet();
    AtomicInteger n = new AtomicInteger();
    return Executors.newFixedThreadPool(threads, r -> {
      Thread t = new Thread(r, "morphscout-" + name + "-" + pool + "-" + n.incrementAndGet());
      t.setDaemon(true);
      return t;
    });
  }

  /**
   * The task's result. An interrupted wait is a cancellation; a task's unchecked exception is rethrown as it is
   * (a {@link CancellationToken.CancelledException} included), anything else wrapped.
   */
  static <T> T await(Future<T> future) {
    try {
      return future.get();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new CancellationToken.CancelledException();
    } catch (ExecutionException e) {
      if (e.getCause() instanceof RuntimeException r) {
        throw r;
      }
      if (e.getCause() instanceof Error err) {
        throw err;
      }
      throw new IllegalStateException(e.getCause());
    }
  }
}
