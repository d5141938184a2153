package org.morphscout.indexer.walk;

/**
 * Nearest-neighbour construction (Rosenkrantz, Stearns and Lewis, SIAM J. Computing 1977): from a first item,
 * always step to the closest unvisited one. {@code last}, when &gt;= 0, is held back until every other item is
 * placed, so a fixed path end is respected from the start and the local search never has to repair it.
 */
final class NearestNeighbourTour {
  private NearestNeighbourTour() {}

  static int[] build(WeightMatrix wm, int first, int second, int last) {
    int m = wm.m;
    int[] tour = new int[m];
    boolean[] used = new boolean[m];
    tour[0] = first;
    used[first] = true;
    int k = 1;
    if (second >= 0 && second != first) {
      tour[k++] = second;
      used[second] = true;
    }
    if (last >= 0) {
      used[last] = true;
    }
    int end = last >= 0 ? m - 1 : m;
    while (k < end) {
      int u = tour[k - 1];
      int best = -1;
      double bestW = Double.POSITIVE_INFINITY;
      for (int v = 0; v < m; v++) {
        if (!used[v] && wm.w(u, v) < bestW) {
          bestW = wm.w(u, v);
          best = v;
        }
      }
      tour[k++] = best;
      used[best] = true;
    }
    if (last >= 0) {
      tour[m - 1] = last;
    }
    return tour;
  }
}
