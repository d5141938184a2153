package org.morphscout.indexer.feature;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Dominant colours by k-means in CIELAB (Lloyd's iterations, Euclidean distance = CIE76 Delta E) seeded with k-means++
 * (Arthur and Vassilvitskii, "k-means++: the advantages of careful seeding", SODA 2007) from a fixed seed, so the same
 * pixels always give the same colours. Large regions are subsampled with a fixed stride to at most
 * {@link #MAX_SAMPLES} pixels. Immutable and thread-safe.
 *
 * @param clusters number of clusters, 1 to {@link #MAX_CLUSTERS}; fewer come back when there are fewer distinct colours
 * @param seed the seed of the k-means++ draws
 */
public record LabKMeans(int clusters, long seed) {
  /** Most colours {@link ColourStats} keeps. */
  public static final int MAX_CLUSTERS = 4;

  /** The seed used by default (any fixed value works; this one is arbitrary). */
  public static final long DEFAULT_SEED = 0x5EEDL;

  /** Sample cap: enough for stable weights at the 1% level while keeping an analysis image under ~10 ms. */
  public static final int MAX_SAMPLES = 20_000;

  private static final int MAX_ITERATIONS = 30;

  /** Clusters closer than this CIEDE2000 difference are merged (about two just-noticeable differences). */
  public static final double MERGE_DELTA_E = 5.0;

  public LabKMeans {
    if (clusters < 1 || clusters > MAX_CLUSTERS) {
      throw new IllegalArgumentException("clusters must be 1.." + MAX_CLUSTERS + ": " + clusters);
    }
  }

  /** Dominant colours of the given Lab pixels, most weighty first; empty for no pixels. */
  public List<ColourStats.DominantColour> dominant(List<float[]> pixels) {
    if (pixels.isEmpty()) {
      return List.of();
    }
    int stride = Math.max(1, (pixels.size() + MAX_SAMPLES - 1) / MAX_SAMPLES);
    List<float[]> sample = new ArrayList<>();
    for (int i = 0; i < pixels.size(); i += stride) {
      sample.add(pixels.get(i));
    }
    double[][] centres = seed(sample);
    int k = centres.length;
    int[] assignment = new int[sample.size()];
    for (int iter = 0; iter < MAX_ITERATIONS; iter++) {
      boolean changed = assign(sample, centres, assignment) || iter == 0;
      double[][] sums = new double[k][3];
      int[] counts = new int[k];
      for (int i = 0; i < sample.size(); i++) {
        float[] p = sample.get(i);
        int c = assignment[i];
        counts[c]++;
        for (int d = 0; d < 3; d++) {
          sums[c][d] += p[d];
        }
      }
      for (int c = 0; c < k; c++) {
        if (counts[c] > 0) {
          for (int d = 0; d < 3; d++) {
            centres[c][d] = sums[c][d] / counts[c];
          }
        }
      }
      if (!changed) {
        break;
      }
    }
    assign(sample, centres, assignment);
    int[] counts = new int[k];
    for (int a : assignment) {
      counts[a]++;
    }
    List<double[]> kept = new ArrayList<>();
    List<Integer> weights = new ArrayList<>();
    for (int c = 0; c < k; c++) {
      if (counts[c] > 0) {
        kept.add(centres[c].clone());
        weights.add(counts[c]);
      }
    }
    mergeNearDuplicates(kept, weights);
    List<ColourStats.DominantColour> out = new ArrayList<>();
    for (int c = 0; c < kept.size(); c++) {
      out.add(new ColourStats.DominantColour(kept.get(c), weights.get(c) / (double) sample.size()));
    }
    out.sort(Comparator.comparingDouble(ColourStats.DominantColour::weight).reversed());
    return List.copyOf(out);
  }

  /**
   * Fixed-k k-means splits a large uniform region into near-identical clusters; merge (weighted mean) every pair
   * closer than {@link #MERGE_DELTA_E} so the list holds visibly different colours. A departure from plain k-means.
   */
  private static void mergeNearDuplicates(List<double[]> centres, List<Integer> weights) {
    while (centres.size() > 1) {
      int bi = -1;
      int bj = -1;
      double best = MERGE_DELTA_E;
      for (int i = 0; i < centres.size(); i++) {
        for (int j = i + 1; j < centres.size(); j++) {
          double d = Ciede2000.difference(centres.get(i), centres.get(j));
          if (d < best) {
            best = d;
            bi = i;
            bj = j;
          }
        }
      }
      if (bi < 0) {
        return;
      }
      double wi = weights.get(bi);
      double wj = weights.get(bj);
      double[] a = centres.get(bi);
      double[] b = centres.get(bj);
      for (int d = 0; d < 3; d++) {
        a[d] = (a[d] * wi + b[d] * wj) / (wi + wj);
      }
      weights.set(bi, (int) (wi + wj));
      centres.remove(bj);
      weights.remove(bj);
    }
  }

  /** k-means++ seeding; stops early when every remaining pixel equals a chosen centre. */
  private double[][] seed(List<float[]> sample) {
    SplittableRandom random = new SplittableRandom(seed);
    List<double[]> centres = new ArrayList<>();
    centres.add(toDouble(sample.get(random.nextInt(sample.size()))));
    double[] d2 = new double[sample.size()];
    while (centres.size() < clusters) {
      double total = 0;
      double[][] chosen = centres.toArray(double[][]::new);
      for (int i = 0; i < sample.size(); i++) {
        d2[i] = nearest(sample.get(i), chosen)[1];
        total += d2[i];
      }
      if (total <= 0) {
        break;
      }
      double r = random.nextDouble() * total;
      int pick = sample.size() - 1;
      for (int i = 0; i < sample.size(); i++) {
        r -= d2[i];
        if (r < 0 && d2[i] > 0) {
          pick = i;
          break;
        }
      }
      centres.add(toDouble(sample.get(pick)));
    }
    return centres.toArray(double[][]::new);
  }

  private static boolean assign(List<float[]> sample, double[][] centres, int[] assignment) {
    boolean changed = false;
    for (int i = 0; i < sample.size(); i++) {
      int c = (int) nearest(sample.get(i), centres)[0];
      changed |= c != assignment[i];
      assignment[i] = c;
    }
    return changed;
  }

  /** {index of the nearest centre, squared distance to it}. */
  private static double[] nearest(float[] p, double[][] centres) {
    int best = 0;
    double bestD = Double.MAX_VALUE;
    for (int c = 0; c < centres.length; c++) {
      double dl = p[0] - centres[c][0];
      double da = p[1] - centres[c][1];
      double db = p[2] - centres[c][2];
      double d = dl * dl + da * da + db * db;
      if (d < bestD) {
        bestD = d;
        best = c;
      }
    }
    return new double[] {best, bestD};
  }

  private static double[] toDouble(float[] p) {
    return new double[] {p[0], p[1], p[2]};
  }
}
