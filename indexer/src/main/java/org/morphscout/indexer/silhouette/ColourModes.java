package org.morphscout.indexer.silhouette;

import java.util.Arrays;

/**
 * The colour modes of the background band: k-means (S. Lloyd, "Least squares quantization in PCM", IEEE Trans. IT
 * 28(2), 1982) over the band's Lab values, seeded with the band's median and then farthest points so runs are
 * deterministic and a rare second colour is still found. Modes holding less than a minimum share of the band are
 * dropped, so an object cut by the frame does not become a background colour. Thread-safe (stateless).
 */
final class ColourModes {
  private static final int KMEANS_ITERATIONS = 10;

  private ColourModes() {}

  /** The band's colour modes (each {L, a, b}) that hold at least {@code minShare} of the band. */
  static float[][] of(float[][] lab, int[] band, int k, double minShare) {
    int n = band.length;
    float[][] centres = new float[k][3];
    for (int c = 0; c < 3; c++) {
      float[] vals = new float[n];
      for (int j = 0; j < n; j++) {
        vals[j] = lab[c][band[j]];
      }
      centres[0][c] = (float) BackgroundModel.median(vals);
    }
    // Farthest-point seeding: deterministic, and it finds a second or third colour even when it is rare.
    float[] minD = new float[n];
    Arrays.fill(minD, Float.MAX_VALUE);
    for (int m = 1; m < k; m++) {
      int far = 0;
      for (int j = 0; j < n; j++) {
        minD[j] = Math.min(minD[j], dist2(lab, band[j], centres[m - 1]));
        if (minD[j] > minD[far]) {
          far = j;
        }
      }
      for (int c = 0; c < 3; c++) {
        centres[m][c] = lab[c][band[far]];
      }
    }
    int[] assign = new int[n];
    int[] counts = new int[k];
    for (int it = 0; it < KMEANS_ITERATIONS; it++) {
      double[][] sums = new double[k][3];
      Arrays.fill(counts, 0);
      for (int j = 0; j < n; j++) {
        int best = 0;
        float bestD = Float.MAX_VALUE;
        for (int m = 0; m < k; m++) {
          float dd = dist2(lab, band[j], centres[m]);
          if (dd < bestD) {
            bestD = dd;
            best = m;
          }
        }
        assign[j] = best;
        counts[best]++;
        for (int c = 0; c < 3; c++) {
          sums[best][c] += lab[c][band[j]];
        }
      }
      for (int m = 0; m < k; m++) {
        if (counts[m] > 0) {
          for (int c = 0; c < 3; c++) {
            centres[m][c] = (float) (sums[m][c] / counts[m]);
          }
        }
      }
    }
    float[][] kept = new float[k][];
    int nk = 0;
    for (int m = 0; m < k; m++) {
      if (counts[m] > 0 && counts[m] >= minShare * n) {
        kept[nk++] = centres[m];
      }
    }
    return Arrays.copyOf(kept, nk);
  }

  private static float dist2(float[][] lab, int i, float[] c) {
    float dl = lab[0][i] - c[0];
    float da = lab[1][i] - c[1];
    float db = lab[2][i] - c[2];
    return dl * dl + da * da + db * db;
  }
}
