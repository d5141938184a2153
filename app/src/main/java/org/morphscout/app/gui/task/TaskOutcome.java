package org.morphscout.app.gui.task;

import java.util.concurrent.Executor;
import java.util.function.Consumer;
import org.morphscout.indexer.progress.CancellationToken;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/** Runs one piece of work and routes its outcome to the right callback through {@code ui}; shared by the runners. */
final class TaskOutcome {
  private static final Logger LOG = LoggerFactory.getLogger(TaskOutcome.class);

  private TaskOutcome() {}

  static <T> void run(TaskHandle handle, TaskRunner.Work<T> work, Consumer<? super T> onSuccess,
      Consumer<Throwable> onFailure, Executor ui) {
    try {
      T result = work.call(handle.token());
      handle.markDone();
      if (!handle.isCancelled()) {
        ui.execute(() -> {
          if (!handle.isCancelled()) {
            onSuccess.accept(result);
          }
        });
      }
    } catch (CancellationToken.CancelledException e) {
      handle.markDone();
      LOG.debug("task cancelled");
    } catch (Exception | LinkageError | AssertionError e) {
      handle.markDone();
      if (handle.isCancelled()) {
        LOG.debug("cancelled task failed afterwards", e);
        return;
      }
      LOG.debug("task failed", e);
      ui.execute(() -> onFailure.accept(e));
    }
  }
}
