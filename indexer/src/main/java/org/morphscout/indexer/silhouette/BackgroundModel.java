package org.morphscout.indexer.silhouette;

import java.util.Arrays;

/**
 * The background model behind {@link BorderModelSilhouettes}: it learns the background from a band along the image
 * border and gives every pixel its CIELAB distance (Delta E*ab, 1976) to that background.
 *
 * <p>Two complementary models, a pixel's distance being the smaller of the two:
 * <ul>
 *   <li>a smooth surface per Lab channel (plane or quadratic in x and y) fitted over the band by iteratively
 *       reweighted least squares with Tukey's biweight on the joint Lab residual (Holland and Welsch, "Robust
 *       regression using iteratively reweighted least-squares", Comm. Statistics A6(9), 1977); it follows gradients
 *       and vignetting, and band pixels that belong to an object get weight 0;</li>
 *   <li>up to three colour modes of the band ({@link ColourModes}); they cover two- and three-colour sets (wall
 *       and floor) that no smooth surface fits.</li>
 * </ul>
 * The band's robust spread (median + 3 * 1.4826 * MAD of the band's own distances, at least 1 Delta E) is the unit
 * the extractor thresholds in. Thread-safe (stateless).
 */
final class BackgroundModel {
  /**
   * @param distance per pixel, CIELAB distance to the modelled background
   * @param spread robust spread of the band's distances, Delta E, at least 1
   * @param modes number of colour modes kept
   */
  record Fit(float[] distance, double spread, int modes) {}

  private static final int IRLS_ITERATIONS = 8;
  /** Tukey's biweight cut-off, in units of the median joint residual. */
  private static final double TUKEY_C = 4.0;

  private BackgroundModel() {}

  static Fit fit(float[][] lab, int w, int h, BorderModelOptions o) {
    int bandWidth = Math.max(2, (int) Math.round(o.bandFraction() * Math.min(w, h)));
    int[] band = bandPixels(w, h, bandWidth);
    double[][] coef = fitSurface(lab, w, h, band, o.surfaceDegree());
    float[][] modes = ColourModes.of(lab, band, o.maxModes(), o.minModeShare());

    float[] l = lab[0];
    float[] a = lab[1];
    float[] b = lab[2];
    float[] d = new float[l.length];
    double[] basis = new double[6];
    int p = coef[0].length;
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        basis(x, y, w, h, basis);
        double sl = 0;
        double sa = 0;
        double sb = 0;
        for (int k = 0; k < p; k++) {
          sl += coef[0][k] * basis[k];
          sa += coef[1][k] * basis[k];
          sb += coef[2][k] * basis[k];
        }
        double best = sq(l[i] - sl) + sq(a[i] - sa) + sq(b[i] - sb);
        for (float[] m : modes) {
          best = Math.min(best, sq(l[i] - m[0]) + sq(a[i] - m[1]) + sq(b[i] - m[2]));
        }
        d[i] = (float) Math.sqrt(best);
      }
    }
    float[] bandD = new float[band.length];
    for (int k = 0; k < band.length; k++) {
      bandD[k] = d[band[k]];
    }
    double med = median(bandD);
    for (int k = 0; k < bandD.length; k++) {
      bandD[k] = (float) Math.abs(bandD[k] - med);
    }
    double spread = Math.max(1.0, med + 3 * 1.4826 * median(bandD));
    return new Fit(d, spread, modes.length);
  }

  static int[] bandPixels(int w, int h, int bandWidth) {
    int bw = Math.min(bandWidth, Math.min(w, h) / 2);
    int[] out = new int[w * h];
    int n = 0;
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        if (x < bw || y < bw || x >= w - bw || y >= h - bw) {
          out[n++] = y * w + x;
        }
      }
    }
    return Arrays.copyOf(out, Math.max(n, 1));
  }

  /** Surface coefficients per channel ([3][3] for planes, [3][6] for quadratics) over u, v in [-1, 1]. */
  private static double[][] fitSurface(float[][] lab, int w, int h, int[] band, int degree) {
    int p = degree == 1 ? 3 : 6;
    double[][] coef = new double[3][p];
    for (int c = 0; c < 3; c++) {
      float[] vals = new float[band.length];
      for (int k = 0; k < band.length; k++) {
        vals[k] = lab[c][band[k]];
      }
      coef[c][0] = median(vals); // robust start: the band's median colour as a flat surface
    }
    double[] basis = new double[6];
    float[] resid = new float[band.length];
    double[] weights = new double[band.length];
    for (int it = 0; it < IRLS_ITERATIONS; it++) {
      for (int k = 0; k < band.length; k++) {
        int i = band[k];
        basis(i % w, i / w, w, h, basis);
        double r2 = 0;
        for (int c = 0; c < 3; c++) {
          double s = 0;
          for (int j = 0; j < p; j++) {
            s += coef[c][j] * basis[j];
          }
          r2 += sq(lab[c][i] - s);
        }
        resid[k] = (float) Math.sqrt(r2);
      }
      double cut = TUKEY_C * Math.max(0.5, median(resid.clone()));
      for (int k = 0; k < band.length; k++) {
        double u = resid[k] / cut;
        weights[k] = u < 1 ? sq(1 - u * u) : 0;
      }
      double[][] ata = new double[p][p];
      double[][] atb = new double[3][p];
      for (int k = 0; k < band.length; k++) {
        double wk = weights[k];
        if (wk == 0) {
          continue;
        }
        int i = band[k];
        basis(i % w, i / w, w, h, basis);
        for (int r = 0; r < p; r++) {
          double br = wk * basis[r];
          for (int s = r; s < p; s++) {
            ata[r][s] += br * basis[s];
          }
          for (int c = 0; c < 3; c++) {
            atb[c][r] += br * lab[c][i];
          }
        }
      }
      for (int r = 0; r < p; r++) {
        for (int s = 0; s < r; s++) {
          ata[r][s] = ata[s][r];
        }
      }
      for (int c = 0; c < 3; c++) {
        double[] sol = solve(ata, atb[c]);
        if (sol.length == 0) {
          return coef; // degenerate weights: keep the last good surface
        }
        coef[c] = sol;
      }
    }
    return coef;
  }

  /** Basis 1, u, v, u^2, uv, v^2 with u, v the pixel position scaled to [-1, 1]. */
  private static void basis(int x, int y, int w, int h, double[] out) {
    double u = w > 1 ? 2.0 * x / (w - 1) - 1 : 0;
    double v = h > 1 ? 2.0 * y / (h - 1) - 1 : 0;
    out[0] = 1;
    out[1] = u;
    out[2] = v;
    out[3] = u * u;
    out[4] = u * v;
    out[5] = v * v;
  }

  /** Gaussian elimination with partial pivoting; an empty array when the system is (near) singular. */
  private static double[] solve(double[][] a0, double[] b0) {
    int n = b0.length;
    double[][] a = new double[n][];
    for (int i = 0; i < n; i++) {
      a[i] = a0[i].clone();
    }
    double[] b = b0.clone();
    for (int col = 0; col < n; col++) {
      int piv = col;
      for (int r = col + 1; r < n; r++) {
        if (Math.abs(a[r][col]) > Math.abs(a[piv][col])) {
          piv = r;
        }
      }
      if (Math.abs(a[piv][col]) < 1e-9) {
        return new double[0];
      }
      double[] t = a[col];
      a[col] = a[piv];
      a[piv] = t;
      double tb = b[col];
      b[col] = b[piv];
      b[piv] = tb;
      for (int r = col + 1; r < n; r++) {
        double f = a[r][col] / a[col][col];
        for (int c = col; c < n; c++) {
          a[r][c] -= f * a[col][c];
        }
        b[r] -= f * b[col];
      }
    }
    double[] x = new double[n];
    for (int r = n - 1; r >= 0; r--) {
      double s = b[r];
      for (int c = r + 1; c < n; c++) {
        s -= a[r][c] * x[c];
      }
      x[r] = s / a[r][r];
    }
    return x;
  }

  /** Median of the values (sorts the array in place). */
  static double median(float[] v) {
    if (v.length == 0) {
      return 0;
    }
    Arrays.sort(v);
    int n = v.length;
    return n % 2 == 1 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
  }

  private static double sq(double x) {
    return x * x;
  }
}
