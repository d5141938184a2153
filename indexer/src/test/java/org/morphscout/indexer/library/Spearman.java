package org.morphscout.indexer.library;

import java.util.Arrays;
import java.util.Comparator;

/**
 * Spearman's rank correlation coefficient (Spearman 1904): the Pearson correlation of the ranks, tied values taking
 * the mean of the ranks they span (the usual treatment of ties). Plain reference code for tests.
 */
final class Spearman {
  private Spearman() {}

  /** rho of x and y, in [-1, 1]; NaN when either has no spread. */
  static double rho(double[] x, double[] y) {
    if (x.length != y.length || x.length < 2) {
      throw new IllegalArgumentException("need two series of equal length >= 2, got " + x.length + ", " + y.length);
    }
    return pearson(ranks(x), ranks(y));
  }

  /** Ranks 1..n, ties averaged. */
  static double[] ranks(double[] v) {
    Integer[] order = new Integer[v.length];
    for (int i = 0; i < v.length; i++) {
      order[i] = i;
    }
    Arrays.sort(order, Comparator.comparingDouble(i -> v[i]));
    double[] r = new double[v.length];
    int i = 0;
    while (i < v.length) {
      int j = i;
      while (j + 1 < v.length && v[order[j + 1]] == v[order[i]]) {
        j++;
      }
      double mean = (i + j) / 2.0 + 1;
      for (int k = i; k <= j; k++) {
        r[order[k]] = mean;
      }
      i = j + 1;
    }
    return r;
  }

  private static double pearson(double[] a, double[] b) {
    double ma = Arrays.stream(a).average().orElseThrow();
    double mb = Arrays.stream(b).average().orElseThrow();
    double sab = 0;
    double saa = 0;
    double sbb = 0;
    for (int i = 0; i < a.length; i++) {
      sab += (a[i] - ma) * (b[i] - mb);
      saa += (a[i] - ma) * (a[i] - ma);
      sbb += (b[i] - mb) * (b[i] - mb);
    }
    return sab / Math.sqrt(saa * sbb);
  }
}
