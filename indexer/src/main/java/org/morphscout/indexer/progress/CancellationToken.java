package org.morphscout.indexer.progress;

import java.util.concurrent.atomic.AtomicBoolean;

/** A flag long work polls between units; cancelling is idempotent and thread-safe. */
public final class CancellationToken {
  private final AtomicBoolean cancelled = new AtomicBoolean();

  /** A token that is never cancelled (for callers that cannot cancel). */
  public static CancellationToken none() {
    return new CancellationToken();
  }

  public void cancel() {
    cancelled.set(true);
  }

  public boolean isCancelled() {
    return cancelled.get();
  }

  /** Throws {@link CancelledException} when cancelled; call between units of work. */
  public void throwIfCancelled() {
    if (cancelled.get()) {
      throw new CancelledException();
    }
  }

  /** Thrown by {@link #throwIfCancelled()}; work that catches it must leave stored state consistent. */
  public static final class CancelledException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public CancelledException() {
      super("cancelled");
    }
  }
}
