package org.morphscout.app.gui;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.morphscout.app.gui.task.FxTaskRunner;

/**
 * The highest used heap seen every {@value #PERIOD_MS} ms on a named daemon thread, from construction to
 * {@link #stop()}: the occupancy at its worst, garbage included. A lower bound of the true peak (a spike between
 * samples is missed), where the heap pools' summed peaks ({@code HeapMeter.peakSinceReset}) are an upper bound (the
 * pools peak at different moments). For benchmarks only.
 */
final class HeapSampler {
  static final long PERIOD_MS = 5;

  private final AtomicLong max = new AtomicLong();
  private final ScheduledExecutorService timer =
      Executors.newSingleThreadScheduledExecutor(FxTaskRunner.namedDaemons("bench-heap-sampler-"));

  HeapSampler() {
    MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
    timer.scheduleAtFixedRate(() -> max.accumulateAndGet(memory.getHeapMemoryUsage().getUsed(), Math::max), 0,
        PERIOD_MS, TimeUnit.MILLISECONDS);
  }

  /** Stops sampling; returns the highest used heap seen, bytes. */
  long stop() {
    timer.shutdownNow();
    return max.get();
  }
}
