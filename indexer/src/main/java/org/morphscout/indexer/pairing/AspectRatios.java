package org.morphscout.indexer.pairing;

import java.util.Locale;

/** Names an image's aspect ratio the way photographers do ("4:3", "9:16"), or as a decimal ratio when uncommon. */
final class AspectRatios {
  /** Common photo and video ratios (common practice), landscape form; portrait is the reverse. */
  private static final int[][] COMMON = {{1, 1}, {5, 4}, {4, 3}, {3, 2}, {16, 10}, {16, 9}, {2, 1}, {21, 9}};

  /** Relative tolerance for snapping to a common ratio (covers odd pixel counts and crops by a few pixels). */
  private static final double TOLERANCE = 0.015;

  private AspectRatios() {}

  static String describe(int width, int height) {
    double r = width / (double) height;
    boolean portrait = r < 1;
    double land = portrait ? 1 / r : r;
    for (int[] c : COMMON) {
      double v = c[0] / (double) c[1];
      if (Math.abs(land / v - 1) <= TOLERANCE) {
        return portrait ? c[1] + ":" + c[0] : c[0] + ":" + c[1];
      }
    }
    String x = String.format(Locale.ROOT, "%.2f", land);
    return portrait ? "1:" + x : x + ":1";
  }
}
