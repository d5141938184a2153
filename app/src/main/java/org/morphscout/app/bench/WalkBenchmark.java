package org.morphscout.app.bench;

import java.util.SplittableRandom;
import org.morphscout.indexer.walk.WalkPlanner;
import org.morphscout.indexer.walk.WalkResult;

/**
 * Walkthrough ordering ({@link WalkPlanner#planOpen}, default config) of {@code n} items whose distances are
 * Euclidean between random points in 8 dimensions (a stand-in for the pair cost; the planner only sees a distance
 * function). The first run is untimed warm-up.
 */
public final class WalkBenchmark {

  /** @param plan latency of one complete plan */
  public record Result(int items, Latencies plan, Latencies planCpu) {}

  private WalkBenchmark() {}

  public static Result run(int items, int repetitions, long seed) {
    if (items < 3 || items > WalkPlanner.MAX_ITEMS || repetitions < 1) {
      throw new IllegalArgumentException("need 3 <= items <= " + WalkPlanner.MAX_ITEMS + " and repetitions >= 1");
    }
    SplittableRandom rnd = new SplittableRandom(seed);
    double[][] p = new double[items][8];
    for (double[] row : p) {
      for (int d = 0; d < row.length; d++) {
        row[d] = rnd.nextDouble();
      }
    }
    WalkPlanner planner = new WalkPlanner();
    long[] nanos = new long[repetitions];
    long[] cpu = new long[repetitions];
    for (int r = -1; r < repetitions; r++) {
      long c0 = CpuClock.threadNanos();
      long t0 = System.nanoTime();
      WalkResult w = planner.planOpen(items, (i, j) -> distance(p[i], p[j]));
      long elapsed = System.nanoTime() - t0;
      if (w == null) {
        throw new IllegalStateException("planner returned no walk");
      }
      if (r >= 0) {
        nanos[r] = elapsed;
        cpu[r] = CpuClock.threadNanos() - c0;
      }
    }
    return new Result(items, Latencies.ofNanos(nanos), Latencies.ofNanos(cpu));
  }

  private static double distance(double[] a, double[] b) {
    double s = 0;
    for (int d = 0; d < a.length; d++) {
      s += (a[d] - b[d]) * (a[d] - b[d]);
    }
    return Math.sqrt(s);
  }
}
