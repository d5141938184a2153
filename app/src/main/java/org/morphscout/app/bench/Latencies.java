package org.morphscout.app.bench;

import java.util.Arrays;

/**
 * Summary of repeated wall-clock timings, in milliseconds.
 *
 * @param count number of timed repetitions, at least 1
 * @param p50Ms median
 * @param p99Ms 99th percentile (nearest-rank), equal to the maximum below 100 repetitions
 * @param meanMs arithmetic mean
 */
public record Latencies(int count, double p50Ms, double p99Ms, double meanMs) {

  public Latencies {
    if (count < 1) {
      throw new IllegalArgumentException("count must be at least 1: " + count);
    }
  }

  /** Summarises durations in nanoseconds (the array is not changed). */
  public static Latencies ofNanos(long[] nanos) {
    if (nanos.length == 0) {
      throw new IllegalArgumentException("no timings");
    }
    long[] sorted = nanos.clone();
    Arrays.sort(sorted);
    double sum = 0;
    for (long n : sorted) {
      sum += n;
    }
    return new Latencies(sorted.length, rank(sorted, 0.50) / 1e6, rank(sorted, 0.99) / 1e6,
        sum / sorted.length / 1e6);
  }

  /** Nearest-rank percentile: the smallest value with at least {@code q} of the values at or below it. */
  static long rank(long[] sorted, double q) {
    int index = (int) Math.ceil(q * sorted.length) - 1;
    return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
  }
}
