package org.morphscout.app.gui.task;

import java.util.function.Consumer;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Runs work at once on the calling thread, callbacks included. For view-model tests (no toolkit) and for work that is
 * known to be instant. Not for the browser: it would run analysis on the JavaFX thread.
 */
public final class DirectTaskRunner implements TaskRunner {

  @Override
  public <T> TaskHandle submit(String name, Work<T> work, Consumer<? super T> onSuccess,
      Consumer<Throwable> onFailure) {
    TaskHandle handle = new TaskHandle(new CancellationToken());
    TaskOutcome.run(handle, work, onSuccess, onFailure, Runnable::run);
    return handle;
  }

  @Override
  public void onUiThread(Runnable action) {
    action.run();
  }
}
