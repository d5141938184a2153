package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.Mask;

/** Flat-array helpers for small float grids (row-major, index coordinates: pixel {@code i} centred at {@code i}). */
final class Grids {
  /** Sub-pixel offsets of the 2x2 supersampling used when a mask is resampled onto a grid. */
  private static final double[] SUB = {-0.25, 0.25};

  private Grids() {}

  /** A's mask on the canvas: per-pixel object coverage in [0, 1], from 2x2 supersampling. */
  static float[] rasterise(Mask a, Canvas canvas) {
    return rasterise(a, canvas, IDENTITY, 0, 0, a.width(), a.height());
  }

  /** B's mask on the canvas through the similarity that maps B onto A. */
  static float[] rasterise(Mask b, Canvas canvas, Similarity sim) {
    return rasterise(b, canvas, sim.inverseMatrix(), 0, 0, b.width(), b.height());
  }

  /** {@link #rasterise(Mask, Canvas)} knowing where A's object lies (its moments' box): the same grid, sooner. */
  static float[] rasterise(Mask a, MaskMoments box, Canvas canvas) {
    return rasterise(a, canvas, IDENTITY, (int) box.minX(), (int) box.minY(), (int) box.maxX(), (int) box.maxY());
  }

  /** {@link #rasterise(Mask, Canvas, Similarity)} knowing where B's object lies: the same grid, sooner. */
  static float[] rasterise(Mask b, MaskMoments box, Canvas canvas, Similarity sim) {
    return rasterise(b, canvas, sim.inverseMatrix(), (int) box.minX(), (int) box.minY(), (int) box.maxX(),
        (int) box.maxY());
  }

  private static final double[] IDENTITY = {1, 0, 0, 0, 1, 0};

  /**
   * @param m 2x3 matrix from A-mask coordinates to the sampled mask's coordinates
   * @param x0 the sampled mask's first column that may hold object pixels; {@code y0} its first row, {@code x1} and
   *     {@code y1} one past its last column and row
   */
  private static float[] rasterise(Mask mask, Canvas canvas, double[] m, int x0, int y0, int x1, int y1) {
    int n = canvas.size();
    int w = mask.width();
    int h = mask.height();
    byte[] d = mask.data();
    // The matrix's terms of each sample column and row, computed once (the same products as sample by sample, so
    // the same coordinates to the last bit): sample s of column i is index 2 i + s, with sub-pixel offset SUB[s].
    int samples = 2 * n;
    double[] colX = new double[samples];
    double[] colY = new double[samples];
    double[] rowX = new double[samples];
    double[] rowY = new double[samples];
    for (int i = 0; i < n; i++) {
      for (int s = 0; s < 2; s++) {
        double ax = canvas.maskX(i + SUB[s]);
        double ay = canvas.maskY(i + SUB[s]);
        colX[2 * i + s] = m[0] * ax;
        colY[2 * i + s] = m[3] * ax;
        rowX[2 * i + s] = m[1] * ay;
        rowY[2 * i + s] = m[4] * ay;
      }
    }
    int[] hits = new int[n * n];
    for (int sy = 0; sy < samples; sy++) {
      double rx = rowX[sy];
      double ry = rowY[sy];
      // Along a row of samples the mask coordinates are monotone (each step adds the same kind of term, and rounding
      // keeps order), so the samples that land in the object's box form one run: found by bisection, the samples
      // outside it are skipped, which cannot change a count.
      int from = Math.max(run(colX, rx, m[2], x0, x1, true), run(colY, ry, m[5], y0, y1, true));
      int to = Math.min(run(colX, rx, m[2], x0, x1, false), run(colY, ry, m[5], y0, y1, false));
      int row = (sy >> 1) * n;
      for (int sx = from; sx < to; sx++) {
        int x = (int) Math.floor(colX[sx] + rx + m[2]);
        int y = (int) Math.floor(colY[sx] + ry + m[5]);
        if (x >= 0 && y >= 0 && x < w && y < h && d[y * w + x] != 0) {
          hits[row + (sx >> 1)]++;
        }
      }
    }
    float[] out = new float[n * n];
    for (int i = 0; i < out.length; i++) {
      out[i] = hits[i] * 0.25f;
    }
    return out;
  }

  /**
   * The first sample index (when {@code first}) or one past the last whose coordinate {@code floor(c[k] + r + t)}
   * lies in [lo, hi), for {@code c} monotone; an empty run gives first >= end.
   */
  private static int run(double[] c, double r, double t, int lo, int hi, boolean first) {
    int count = c.length;
    boolean rising = cell(c, 0, r, t) <= cell(c, count - 1, r, t);
    if (rising) {
      // Cells rise with k: those >= lo start at the first such k, those < hi end before the first k at >= hi.
      return first ? firstWhere(c, r, t, lo, true) : firstWhere(c, r, t, hi, true);
    }
    // Cells fall with k: those < hi start at the first k below hi, those >= lo end before the first k below lo.
    return first ? firstWhere(c, r, t, hi, false) : firstWhere(c, r, t, lo, false);
  }

  /**
   * The first k with {@code cell(k) >= bound} (rising cells, {@code atLeast}) or {@code cell(k) < bound} (falling
   * cells), by bisection; {@code c.length} when there is none.
   */
  private static int firstWhere(double[] c, double r, double t, int bound, boolean atLeast) {
    int lo = 0;
    int hi = c.length;
    while (lo < hi) {
      int mid = (lo + hi) >>> 1;
      int v = cell(c, mid, r, t);
      if (atLeast ? v >= bound : v < bound) {
        hi = mid;
      } else {
        lo = mid + 1;
      }
    }
    return lo;
  }

  private static int cell(double[] c, int k, double r, double t) {
    return (int) Math.floor(c[k] + r + t);
  }

  /** A mask resampled onto an n x n grid in image-relative coordinates (the grid spans the whole image). */
  static float[] imageRelative(Mask mask, int n) {
    int w = mask.width();
    int h = mask.height();
    byte[] d = mask.data();
    float[] out = new float[n * n];
    for (int j = 0; j < n; j++) {
      for (int i = 0; i < n; i++) {
        int hits = 0;
        for (double oy : SUB) {
          int y = Math.min(h - 1, (int) Math.floor((j + 0.5 + oy) / n * h));
          for (double ox : SUB) {
            int x = Math.min(w - 1, (int) Math.floor((i + 0.5 + ox) / n * w));
            hits += d[y * w + x];
          }
        }
        out[j * n + i] = hits * 0.25f;
      }
    }
    return out;
  }

  /**
   * Soft intersection over union of two coverage grids: sum of minima over sum of maxima, which equals the usual IoU
   * for 0/1 grids. 1 when both are empty.
   */
  static double iou(float[] a, float[] b) {
    double inter = 0;
    double union = 0;
    for (int i = 0; i < a.length; i++) {
      inter += Math.min(a[i], b[i]);
      union += Math.max(a[i], b[i]);
    }
    return union == 0 ? 1.0 : inter / union;
  }

  /**
   * {@link #iou} of two grids whose values are multiples of 1/4 in [0, 1] (what {@link #rasterise} and
   * {@link #imageRelative} give), exactly equal to it and faster: the sums are counted in quarters as integers, which
   * is exact, as the double sums of such values are. Other values would be truncated to a quarter.
   */
  static double quarterIou(float[] a, float[] b) {
    int inter = 0;
    int union = 0;
    for (int i = 0; i < a.length; i++) {
      int qa = (int) (a[i] * 4f);
      int qb = (int) (b[i] * 4f);
      inter += Math.min(qa, qb);
      union += Math.max(qa, qb);
    }
    return union == 0 ? 1.0 : inter / (double) union;
  }

  static double sum(float[] a) {
    double s = 0;
    for (float v : a) {
      s += v;
    }
    return s;
  }

  /** Bilinear sample at index coordinates, clamping to the border. */
  static float bilinear(float[] img, int w, int h, double x, double y) {
    if (x < 0) {
      x = 0;
    } else if (x > w - 1) {
      x = w - 1;
    }
    if (y < 0) {
      y = 0;
    } else if (y > h - 1) {
      y = h - 1;
    }
    int x0 = (int) x;
    int y0 = (int) y;
    int x1 = Math.min(x0 + 1, w - 1);
    int y1 = Math.min(y0 + 1, h - 1);
    float fx = (float) (x - x0);
    float fy = (float) (y - y0);
    int r0 = y0 * w;
    int r1 = y1 * w;
    float top = img[r0 + x0] + fx * (img[r0 + x1] - img[r0 + x0]);
    float bottom = img[r1 + x0] + fx * (img[r1 + x1] - img[r1 + x0]);
    return top + fy * (bottom - top);
  }

  /** out(x) = img(x + u(x)), bilinear with border clamping, on a w x h grid. */
  static void warp(float[] img, int w, int h, float[] ux, float[] uy, float[] out) {
    float maxX = w - 1;
    float maxY = h - 1;
    for (int y = 0, i = 0; y < h; y++) {
      for (int x = 0; x < w; x++, i++) {
        float px = x + ux[i];
        float py = y + uy[i];
        px = px < 0 ? 0 : (px > maxX ? maxX : px);
        py = py < 0 ? 0 : (py > maxY ? maxY : py);
        int x0 = (int) px;
        int y0 = (int) py;
        int x1 = x0 < w - 1 ? x0 + 1 : x0;
        int y1 = y0 < h - 1 ? y0 + 1 : y0;
        float fx = px - x0;
        float fy = py - y0;
        float top = img[y0 * w + x0] + fx * (img[y0 * w + x1] - img[y0 * w + x0]);
        float bottom = img[y1 * w + x0] + fx * (img[y1 * w + x1] - img[y1 * w + x0]);
        out[i] = top + fy * (bottom - top);
      }
    }
  }

  /** Halves a grid by 2x2 averaging; w and h must be even. */
  static float[] downsample(float[] img, int w, int h) {
    int w2 = w / 2;
    int h2 = h / 2;
    float[] out = new float[w2 * h2];
    for (int y = 0; y < h2; y++) {
      int r0 = 2 * y * w;
      int r1 = r0 + w;
      for (int x = 0; x < w2; x++) {
        out[y * w2 + x] = 0.25f * (img[r0 + 2 * x] + img[r0 + 2 * x + 1] + img[r1 + 2 * x] + img[r1 + 2 * x + 1]);
      }
    }
    return out;
  }
}
