package org.morphscout.indexer.progress;

/**
 * Receives progress of long work. Calls may come from worker threads; implementations must be thread-safe and
 * cheap (no blocking I/O).
 */
public interface ProgressListener {
  /** A listener that ignores everything. */
  ProgressListener NONE = new ProgressListener() {};

  /** A phase starts; {@code total} is the number of units of work, or -1 when unknown. */
  default void phase(String name, long total) {}

  /** {@code done} units of the current phase are finished; {@code item} names the last one (may be empty). */
  default void progressed(long done, String item) {}

  /** All work is over (successfully, cancelled or failed). */
  default void finished() {}
}
