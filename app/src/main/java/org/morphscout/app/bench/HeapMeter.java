package org.morphscout.app.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;

/**
 * Heap measurements through the platform MXBeans. {@link #usedAfterGc()} asks for several collections first, so it
 * approximates the live data; {@link #resetPeak()} and {@link #peakSinceReset()} bracket a run to find the most heap
 * it occupied (the sum of the heap pools' peaks, an upper bound, since pools peak at different moments).
 */
public final class HeapMeter {
  private HeapMeter() {}

  /** Bytes of heap in use after a few full collections (System.gc is a request; the JDK honours it by default). */
  public static long usedAfterGc() {
    long used = Long.MAX_VALUE;
    for (int i = 0; i < 3; i++) {
      System.gc();
      try {
        Thread.sleep(50);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
        break;
      }
      used = Math.min(used, ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed());
    }
    return used;
  }

  /** The largest heap the JVM may use, bytes (-Xmx). */
  public static long maxHeap() {
    return Runtime.getRuntime().maxMemory();
  }

  /** Starts a peak measurement. */
  public static void resetPeak() {
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP) {
        pool.resetPeakUsage();
      }
    }
  }

  /** Sum of the heap pools' peak usage since {@link #resetPeak()}, bytes. */
  public static long peakSinceReset() {
    long sum = 0;
    for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
      if (pool.getType() == MemoryType.HEAP && pool.getPeakUsage() != null) {
        sum += pool.getPeakUsage().getUsed();
      }
    }
    return sum;
  }
}
