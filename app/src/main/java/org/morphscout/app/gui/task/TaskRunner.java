package org.morphscout.app.gui.task;

import java.util.function.Consumer;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Runs work away from the user-interface thread and hands results back on it. View-models use only this interface, so
 * their tests run with {@link DirectTaskRunner} and no toolkit.
 *
 * <p>Contract: {@code onSuccess} and {@code onFailure} run on the UI thread (the JavaFX application thread in the
 * browser); exactly one of them runs, unless the task was cancelled before it produced a result, in which case
 * neither runs. A {@link CancellationToken.CancelledException} thrown by the work counts as cancellation, not failure.
 */
public interface TaskRunner {

  /** One unit of background work; poll {@code token} between steps of long work. */
  @FunctionalInterface
  interface Work<T> {
    T call(CancellationToken token) throws Exception;
  }

  /**
   * Submits {@code work}.
   *
   * @param name short name for logs and the worker thread ("load images", "find chains")
   */
  <T> TaskHandle submit(String name, Work<T> work, Consumer<? super T> onSuccess, Consumer<Throwable> onFailure);

  /** Runs {@code action} on the UI thread (soon, not now, when called from elsewhere); used for progress updates. */
  void onUiThread(Runnable action);
}
