package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Interim walkthrough ordering until the walk planner's service lands: nearest-neighbour tours from several starts,
 * the shortest kept, then improved by 2-opt segment reversals on the open path (Croes 1958) until no reversal helps.
 * Steps weigh appearance and shape equally.
 */
public final class GreedyWalk implements WalkBackend {
  static final int MAX_IMAGES = 3000;
  private static final double SHAPE_WEIGHT = 0.5;

  private final Supplier<StoredVectors> vectors;

  public GreedyWalk(Supplier<StoredVectors> vectors) {
    this.vectors = vectors;
  }

  @Override
  public List<Long> order(List<Long> ids, CancellationToken token) {
    if (ids.size() > MAX_IMAGES) {
      throw new MorphscoutException("a walkthrough of " + ids.size() + " images is too long here; choose at most "
          + MAX_IMAGES);
    }
    int n = ids.size();
    if (n < 3) {
      return List.copyOf(ids);
    }
    StoredVectors all = vectors.get();
    double[][] d = new double[n][n];
    for (int i = 0; i < n; i++) {
      token.throwIfCancelled();
      for (int j = i + 1; j < n; j++) {
        d[i][j] = d[j][i] = all.distance(ids.get(i), ids.get(j), SHAPE_WEIGHT);
      }
    }
    int[] best = null;
    double bestLen = Double.MAX_VALUE;
    int starts = Math.min(n, 24);
    for (int s = 0; s < starts; s++) {
      token.throwIfCancelled();
      int[] tour = nearestNeighbour(d, s * n / starts);
      twoOpt(tour, d, token);
      double len = length(tour, d);
      if (len < bestLen - 1e-12) {
        bestLen = len;
        best = tour;
      }
    }
    List<Long> result = new ArrayList<>(n);
    for (int i : best) {
      result.add(ids.get(i));
    }
    return result;
  }

  @Override
  public List<Double> steps(List<Long> ordered, CancellationToken token) {
    StoredVectors all = vectors.get();
    List<Double> steps = new ArrayList<>();
    for (int i = 0; i + 1 < ordered.size(); i++) {
      steps.add(all.distance(ordered.get(i), ordered.get(i + 1), SHAPE_WEIGHT));
    }
    return steps;
  }

  static int[] nearestNeighbour(double[][] d, int start) {
    int n = d.length;
    boolean[] used = new boolean[n];
    int[] tour = new int[n];
    tour[0] = start;
    used[start] = true;
    for (int k = 1; k < n; k++) {
      int from = tour[k - 1];
      int next = -1;
      for (int j = 0; j < n; j++) {
        if (!used[j] && (next < 0 || d[from][j] < d[from][next])) {
          next = j;
        }
      }
      tour[k] = next;
      used[next] = true;
    }
    return tour;
  }

  /** 2-opt on an open path: reversing tour[i..j] replaces edges (i-1,i) and (j,j+1) by (i-1,j) and (i,j+1). */
  static void twoOpt(int[] t, double[][] d, CancellationToken token) {
    int n = t.length;
    boolean improved = true;
    int rounds = 0;
    while (improved && rounds++ < 50) {
      token.throwIfCancelled();
      improved = false;
      for (int i = 0; i < n - 1; i++) {
        for (int j = i + 1; j < n; j++) {
          double before = (i > 0 ? d[t[i - 1]][t[i]] : 0) + (j < n - 1 ? d[t[j]][t[j + 1]] : 0);
          double after = (i > 0 ? d[t[i - 1]][t[j]] : 0) + (j < n - 1 ? d[t[i]][t[j + 1]] : 0);
          if (after < before - 1e-12) {
            for (int a = i, b = j; a < b; a++, b--) {
              int tmp = t[a];
              t[a] = t[b];
              t[b] = tmp;
            }
            improved = true;
          }
        }
      }
    }
  }

  static double length(int[] t, double[][] d) {
    double len = 0;
    for (int i = 0; i + 1 < t.length; i++) {
      len += d[t[i]][t[i + 1]];
    }
    return len;
  }
}
