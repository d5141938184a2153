package org.morphscout.indexer.walk;

import java.util.Arrays;

/**
 * The step weights the local search minimises, as a dense m x m matrix (m = items, plus one dummy item for open
 * paths), with each item's nearest candidates. Weights are the plain distances shaped by the jump penalty; the
 * dummy item joins the path's two ends to each other so an open path becomes a closed tour (the usual reduction).
 * Dummy weights: all 0 with free ends; with fixed ends, 0 to the fixed ones and {@link #forbidden} to all others.
 * With one fixed end every tour that keeps it next to the dummy pays the forbidden weight exactly once (for the
 * free end), and one that loses it pays twice, so no improving move can lose it.
 */
final class WeightMatrix {
  final int m;
  final double[] w;
  final int[][] candidates;
  final double forbidden;

  private WeightMatrix(int m, double[] w, int[][] candidates, double forbidden) {
    this.m = m;
    this.w = w;
    this.candidates = candidates;
    this.forbidden = forbidden;
  }

  double w(int i, int j) {
    return w[i * m + j];
  }

  /** Weights for a closed tour of n items ({@code raw}: plain distances, n x n row-major). */
  static WeightMatrix closed(double[] raw, int n, double lambda, int k) {
    return of(raw, n, lambda, false, -1, -1, k);
  }

  /** Weights for an open path of n items plus the dummy item n; {@code start}/{@code end} &lt; 0 = free. */
  static WeightMatrix open(double[] raw, int n, double lambda, int start, int end, int k) {
    return of(raw, n, lambda, true, start, end, k);
  }

  private static WeightMatrix of(double[] raw, int n, double lambda, boolean dummy, int start, int end, int k) {
    double dMax = 0;
    for (double d : raw) {
      dMax = Math.max(dMax, d);
    }
    int m = dummy ? n + 1 : n;
    double[] w = new double[m * m];
    double maxW = 0;
    for (int i = 0; i < n; i++) {
      for (int j = 0; j < n; j++) {
        double d = raw[i * n + j];
        double x = dMax > 0 ? d * (1 + lambda * d / dMax) : d;
        w[i * m + j] = x;
        maxW = Math.max(maxW, x);
      }
    }
    // Larger than any tour without forbidden steps, so no improving move ever adds one.
    double forbidden = (maxW + 1) * (m + 1) * 4;
    if (dummy) {
      for (int i = 0; i < n; i++) {
        boolean free = start < 0 && end < 0;
        double x = free || i == start || i == end ? 0 : forbidden;
        w[i * m + n] = x;
        w[n * m + i] = x;
      }
    }
    int[][] candidates = new int[m][];
    for (int i = 0; i < n; i++) {
      candidates[i] = nearest(w, m, n, i, Math.min(k, n - 1), dummy && w[i * m + n] == 0 ? n : -1);
    }
    if (dummy) {
      int count = 0;
      int[] all = new int[n];
      for (int i = 0; i < n; i++) {
        if (w[n * m + i] == 0) {
          all[count++] = i;
        }
      }
      candidates[n] = Arrays.copyOf(all, count);
    }
    return new WeightMatrix(m, w, candidates, forbidden);
  }

  /** The k nearest real items of i by weight (closest first, ties by index), plus {@code extra} when &gt;= 0. */
  private static int[] nearest(double[] w, int m, int n, int i, int k, int extra) {
    // Insertion into a sorted k-slot buffer: O(n k) without boxing, much faster than sorting each row.
    int[] idx = new int[k];
    double[] key = new double[k];
    int filled = 0;
    for (int j = 0; j < n; j++) {
      if (j == i) {
        continue;
      }
      double x = w[i * m + j];
      if (filled == k && x >= key[k - 1]) {
        continue;
      }
      int at = filled < k ? filled++ : k - 1;
      while (at > 0 && key[at - 1] > x) {
        key[at] = key[at - 1];
        idx[at] = idx[at - 1];
        at--;
      }
      key[at] = x;
      idx[at] = j;
    }
    if (extra < 0) {
      return idx;
    }
    int[] out = Arrays.copyOf(idx, k + 1);
    out[k] = extra;
    return out;
  }
}
