package org.morphscout.app.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;

/**
 * CPU-time clocks. On a shared, loaded machine wall-clock latencies include time spent waiting for a core; the CPU
 * time of the measuring thread (or of the whole process) does not, so reporting both separates the code's cost from
 * the machine's load.
 */
public final class CpuClock {
  private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

  private CpuClock() {}

  /** CPU nanoseconds used by the calling thread so far, or -1 when the JVM cannot tell. */
  public static long threadNanos() {
    return THREADS.isCurrentThreadCpuTimeSupported() ? THREADS.getCurrentThreadCpuTime() : -1;
  }

  /** CPU nanoseconds used by the whole process so far, or -1 when the platform cannot tell. */
  public static long processNanos() {
    if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
      return os.getProcessCpuTime();
    }
    return -1;
  }
}
