package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.Mask;

/**
 * Times {@link WarpEstimator#estimate} on synthetic ellipse masks, for the benchmark suite (the library has no console
 * output, so the caller prints). Not used by tests: timings belong to benchmarks.
 */
public final class WarpBenchmark {
  private WarpBenchmark() {}

  /**
   * Mean wall-clock milliseconds per estimate on one thread, after a warm-up of {@code repetitions} estimates.
   *
   * @param gridSize canvas side (also the side of the synthetic masks)
   * @param repetitions estimates to time, at least 1
   */
  public static double millisPerEstimate(int gridSize, int repetitions) {
    WarpEstimator estimator = new WarpEstimator(DemonsConfig.DEFAULT.withGridSize(gridSize), true);
    Mask a = ellipse(gridSize, 0.30, 0.18, 0.3);
    Mask b = ellipse(gridSize, 0.22, 0.25, -0.4);
    double sink = 0;
    for (int i = 0; i < repetitions; i++) {
      sink += estimator.estimate(a, b).iouWarped();
    }
    long start = System.nanoTime();
    for (int i = 0; i < repetitions; i++) {
      sink += estimator.estimate(a, b).iouWarped();
    }
    long elapsed = System.nanoTime() - start;
    if (Double.isNaN(sink)) {
      throw new IllegalStateException("estimate returned NaN");
    }
    return elapsed / 1e6 / repetitions;
  }

  /** A filled, rotated ellipse with semi-axes given as fractions of the side. */
  static Mask ellipse(int n, double ra, double rb, double angle) {
    byte[] d = new byte[n * n];
    double c = Math.cos(angle);
    double s = Math.sin(angle);
    for (int y = 0; y < n; y++) {
      for (int x = 0; x < n; x++) {
        double px = (x + 0.5) / n - 0.5;
        double py = (y + 0.5) / n - 0.5;
        double u = c * px + s * py;
        double v = -s * px + c * py;
        if ((u / ra) * (u / ra) + (v / rb) * (v / rb) <= 1) {
          d[y * n + x] = 1;
        }
      }
    }
    return new Mask(n, n, d);
  }
}
