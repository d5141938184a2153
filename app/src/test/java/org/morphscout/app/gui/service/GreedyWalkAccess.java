package org.morphscout.app.gui.service;

import org.morphscout.indexer.progress.CancellationToken;

/** Test access to the package-private steps of {@link GreedyWalk}. */
public final class GreedyWalkAccess {
  private GreedyWalkAccess() {}

  /** Nearest neighbour from every start, each improved by 2-opt; the shortest. */
  public static int[] bestTour(double[][] d) {
    int[] best = null;
    for (int s = 0; s < d.length; s++) {
      int[] t = GreedyWalk.nearestNeighbour(d, s);
      GreedyWalk.twoOpt(t, d, CancellationToken.none());
      if (best == null || GreedyWalk.length(t, d) < GreedyWalk.length(best, d)) {
        best = t;
      }
    }
    return best;
  }

  public static double length(int[] t, double[][] d) {
    return GreedyWalk.length(t, d);
  }
}
