package org.morphscout.app.gui.task;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import javafx.application.Platform;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * The browser's runner: a fixed pool of named daemon threads ({@code morphscout-gui-N}) for the work, and
 * {@link Platform#runLater} for the callbacks. Daemon threads so that closing the window never hangs on a long task.
 */
public final class FxTaskRunner implements TaskRunner, AutoCloseable {
  private final ExecutorService pool;

  /** @param threads worker threads, at least 1; analysis is CPU-bound, so more than the core count gains nothing */
  public FxTaskRunner(int threads) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be >= 1, got " + threads);
    }
    this.pool = Executors.newFixedThreadPool(threads, namedDaemons("morphscout-gui-"));
  }

  /** A factory of daemon threads named {@code prefix + n}. */
  public static ThreadFactory namedDaemons(String prefix) {
    AtomicInteger n = new AtomicInteger();
    return r -> {
      Thread t = new Thread(r, prefix + n.incrementAndGet());
      t.setDaemon(true);
      return t;
    };
  }

  @Override
  public <T> TaskHandle submit(String name, Work<T> work, Consumer<? super T> onSuccess,
      Consumer<Throwable> onFailure) {
    TaskHandle handle = new TaskHandle(new CancellationToken());
    pool.execute(() -> TaskOutcome.run(handle, work, onSuccess, onFailure, Platform::runLater));
    return handle;
  }

  @Override
  public void onUiThread(Runnable action) {
    if (Platform.isFxApplicationThread()) {
      action.run();
    } else {
      Platform.runLater(action);
    }
  }

  @Override
  public void close() {
    pool.shutdownNow();
  }
}
