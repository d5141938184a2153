package org.morphscout.app.gui.task;

import org.morphscout.indexer.progress.CancellationToken;

/** A submitted task: cancel it, or ask whether it is over. Thread-safe. */
public final class TaskHandle {
  private final CancellationToken token;
  private volatile boolean done;

  public TaskHandle(CancellationToken token) {
    this.token = token;
  }

  /** Asks the work to stop at its next check; its callbacks will not run. */
  public void cancel() {
    token.cancel();
  }

  public boolean isCancelled() {
    return token.isCancelled();
  }

  /** Whether the work has finished (normally, failed or cancelled). */
  public boolean isDone() {
    return done;
  }

  /** The token the work polls. */
  public CancellationToken token() {
    return token;
  }

  void markDone() {
    done = true;
  }
}
