package org.morphscout.indexer.warp;

/**
 * Separable Gaussian smoothing of a flat float grid, in place. Near the border the kernel is cut and renormalised,
 * so a constant field (a pure translation) stays constant (up to float rounding). Not thread-safe (holds scratch);
 * make one per registration.
 *
 * <p>Every pixel's sum is taken in a fixed order (rows: the centre, then the pairs at distance 1, 2, ...; columns:
 * the centre, then the taps from the top down), the same as a plain per-pixel loop, so the result is identical to
 * one ({@code ReferenceKernelsTest}). For speed, the interior of each pass runs tap by tap over the whole grid as one
 * long loop (a loop per row of 16 to 64 pixels spends much of its time entering and leaving: a third of the
 * smoothing's time at 64 x 64); the pixels near the border, whose kernel is cut, are then computed again one by one.
 */
final class GaussianSmoother {
  private final float[] kernel;
  private final int radius;
  private final int w;
  private final int h;
  private final float[] scratch;
  /** 1 / the whole kernel's sum, added in the order of the row pass (centre, then twice each side tap). */
  private final float invRowSum;
  /** 1 / the whole kernel's sum, added in the order of the column pass (centre, then the taps from the top down). */
  private final float invColumnSum;

  /**
   * @param sigma standard deviation in pixels; 0 disables smoothing
   */
  GaussianSmoother(double sigma, int w, int h) {
    this.w = w;
    this.h = h;
    this.radius = sigma <= 0 ? 0 : (int) Math.ceil(3 * sigma);
    this.kernel = new float[radius + 1];
    if (radius == 0) {
      kernel[0] = 1;
    } else {
      for (int k = 0; k <= radius; k++) {
        kernel[k] = (float) Math.exp(-0.5 * k * k / (sigma * sigma));
      }
    }
    this.scratch = new float[w * h];
    float sum = kernel[0];
    for (int k = 1; k <= radius; k++) {
      sum += 2 * kernel[k];
    }
    this.invRowSum = 1f / sum;
    this.invColumnSum = 1f / columnNorm(-radius, radius);
  }

  void smooth(float[] img) {
    if (radius == 0) {
      return;
    }
    smoothRows(img);
    smoothColumns(img);
  }

  /** img's rows into scratch. */
  private void smoothRows(float[] img) {
    int n = w * h;
    // Interior formula over the whole grid; it also writes the pixels within the radius of a row's ends (reading
    // the neighbouring row), which the border loop below then overwrites.
    if (w > 2 * radius) {
      int from = radius;
      int to = n - radius;
      float k0 = kernel[0];
      for (int i = from; i < to; i++) {
        scratch[i] = k0 * img[i];
      }
      for (int k = 1; k <= radius; k++) {
        float kv = kernel[k];
        for (int i = from; i < to; i++) {
          scratch[i] += kv * (img[i - k] + img[i + k]);
        }
      }
      for (int i = from; i < to; i++) {
        scratch[i] *= invRowSum;
      }
    }
    int lo0 = Math.min(radius, w);
    int hi0 = Math.max(lo0, w - radius);
    for (int y = 0; y < h; y++) {
      int row = y * w;
      for (int x = 0; x < w; x++) {
        if (x == lo0 && hi0 > lo0) {
          x = hi0 - 1;
          continue;
        }
        float acc = kernel[0] * img[row + x];
        float norm = kernel[0];
        int lo = Math.max(-radius, -x);
        int hi = Math.min(radius, w - 1 - x);
        for (int k = lo; k < 0; k++) {
          acc += kernel[-k] * img[row + x + k];
          norm += kernel[-k];
        }
        for (int k = 1; k <= hi; k++) {
          acc += kernel[k] * img[row + x + k];
          norm += kernel[k];
        }
        scratch[row + x] = acc / norm;
      }
    }
  }

  /** scratch's columns back into img. */
  private void smoothColumns(float[] img) {
    // Rows with the whole kernel inside, as one long loop per tap.
    if (h > 2 * radius) {
      int from = radius * w;
      int to = (h - radius) * w;
      float k0 = kernel[0];
      for (int i = from; i < to; i++) {
        img[i] = k0 * scratch[i];
      }
      for (int k = -radius; k <= radius; k++) {
        if (k == 0) {
          continue;
        }
        float kv = kernel[Math.abs(k)];
        int offset = k * w;
        for (int i = from; i < to; i++) {
          img[i] += kv * scratch[i + offset];
        }
      }
      for (int i = from; i < to; i++) {
        img[i] *= invColumnSum;
      }
    }
    for (int y = 0; y < h; y++) {
      if (y == radius && h > 2 * radius) {
        y = h - radius - 1;
        continue;
      }
      int lo = Math.max(-radius, -y);
      int hi = Math.min(radius, h - 1 - y);
      float inv = 1f / columnNorm(lo, hi);
      int row = y * w;
      for (int x = 0; x < w; x++) {
        img[row + x] = kernel[0] * scratch[row + x];
      }
      for (int k = lo; k <= hi; k++) {
        if (k == 0) {
          continue;
        }
        float kv = kernel[Math.abs(k)];
        int src = (y + k) * w;
        for (int x = 0; x < w; x++) {
          img[row + x] += kv * scratch[src + x];
        }
      }
      for (int x = 0; x < w; x++) {
        img[row + x] *= inv;
      }
    }
  }

  /** The sum of the taps lo..hi (lo <= 0 <= hi): the centre, then the others from lo up. */
  private float columnNorm(int lo, int hi) {
    float norm = kernel[0];
    for (int k = lo; k <= hi; k++) {
      if (k != 0) {
        norm += kernel[Math.abs(k)];
      }
    }
    return norm;
  }
}
